// The surviving graph as its own compact CSR: alive nodes renumbered 0..n'-1, dead links
// dropped, self-loops dropped and (optionally) parallel links merged. Building it costs
// O(N + L) per evaluation and lets the all-pairs and spectral kernels run over dense local
// indices without testing the mask in their inner loops. All arrays are allocated once.

import type { CompactGraph } from '../../graph/compact.js';
import type { Mask } from '../../graph/mask.js';
import { kernelWork } from './work-count.js';

export interface LocalGraph {
  /** Nodes in the local graph. */
  n: number;
  /** Adjacency entries used (twice the number of undirected links). */
  entries: number;
  /** Row offsets, valid for 0..n. */
  readonly offsets: Int32Array;
  /** Local neighbour indices. */
  readonly neighbors: Int32Array;
  /** Original link index of each adjacency entry (the first of merged parallels). */
  readonly linkOf: Int32Array;
  /** Local → original node index. */
  readonly toOriginal: Int32Array;
  /** Original → local node index, -1 when the node is not in the local graph. */
  readonly toLocal: Int32Array;
}

export function allocateLocalGraph(nodeCapacity: number, entryCapacity: number): LocalGraph {
  return {
    n: 0,
    entries: 0,
    offsets: new Int32Array(nodeCapacity + 1),
    neighbors: new Int32Array(entryCapacity),
    linkOf: new Int32Array(entryCapacity),
    toOriginal: new Int32Array(nodeCapacity),
    toLocal: new Int32Array(nodeCapacity).fill(-1),
  };
}

/**
 * A builder of the surviving graph. With `simple`, parallel links collapse into one
 * adjacency entry (what the simple-graph definitions of docs/METHODS.md §2.1 need).
 */
export function createSurvivorBuilder(g: CompactGraph, simple: boolean): (mask: Mask) => LocalGraph {
  const out = allocateLocalGraph(g.n, 2 * g.m);
  const stamp = new Int32Array(g.n).fill(-1);
  const { offsets, neighbors, linkOf } = g;
  return (mask) => {
    const node = mask.node;
    const link = mask.link;
    const toLocal = out.toLocal;
    let n = 0;
    for (let v = 0; v < g.n; v++) {
      if (node[v]) {
        toLocal[v] = -1;
      } else {
        toLocal[v] = n;
        out.toOriginal[n++] = v;
      }
    }
    stamp.fill(-1);
    let k = 0;
    for (let i = 0; i < n; i++) {
      const v = out.toOriginal[i];
      out.offsets[i] = k;
      for (let p = offsets[v]; p < offsets[v + 1]; p++) {
        const w = neighbors[p];
        if (w === v || node[w] || link[linkOf[p]]) continue;
        if (simple) {
          if (stamp[w] === v) continue;
          stamp[w] = v;
        }
        out.neighbors[k] = toLocal[w];
        out.linkOf[k++] = linkOf[p];
      }
    }
    out.offsets[n] = k;
    out.n = n;
    out.entries = k;
    kernelWork.visits += g.n + offsets[g.n];
    return out;
  };
}

/**
 * The subgraph of `src` induced by `nodes[from .. from+count)` (local indices of `src`),
 * written into `out` in that order. `out.toOriginal` maps back to the original graph and
 * `out.toLocal` (sized to the original graph) maps original indices into `out` until the
 * next call.
 */
export function inducedSubgraph(
  src: LocalGraph,
  nodes: Int32Array,
  from: number,
  count: number,
  out: LocalGraph,
): LocalGraph {
  const position = out.toLocal;
  for (let i = 0; i < out.n; i++) position[out.toOriginal[i]] = -1;
  for (let i = 0; i < count; i++) {
    const original = src.toOriginal[nodes[from + i]];
    out.toOriginal[i] = original;
    position[original] = i;
  }
  let k = 0;
  for (let i = 0; i < count; i++) {
    const v = nodes[from + i];
    out.offsets[i] = k;
    for (let p = src.offsets[v]; p < src.offsets[v + 1]; p++) {
      const local = position[src.toOriginal[src.neighbors[p]]];
      if (local < 0) continue; // outside the node set
      out.neighbors[k] = local;
      out.linkOf[k++] = src.linkOf[p];
    }
  }
  out.offsets[count] = k;
  out.n = count;
  out.entries = k;
  return out;
}
