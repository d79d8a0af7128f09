// What the spectral metrics share: the surviving graph as a simple local graph (parallel
// links merged, docs/METHODS.md §2.1), its connected components, and each component as its own
// local graph; plus the choice between the dense solver (components up to `denseLimit`
// nodes) and the iterative kernels above it. All scratch is allocated once per graph.

import type { CompactGraph } from '../../graph/compact.js';
import type { Mask } from '../../graph/mask.js';
import { allocateLocalGraph, createSurvivorBuilder, inducedSubgraph, type LocalGraph } from './subgraph.js';
import { fnv1a32CodeUnits } from '../../random.js';

/** Default dense-size limits: extremal eigenvalues (a, λ₁) and whole-spectrum traces. */
export const EXTREMAL_DENSE_LIMIT = 48;
export const TRACE_DENSE_LIMIT = 300;

export interface ComponentList {
  count: number;
  /** Local node indices grouped by component: component c is order[start[c] .. start[c+1]). */
  order: Int32Array;
  start: Int32Array;
}

export function createSpectralSurvivors(g: CompactGraph) {
  const build = createSurvivorBuilder(g, true);
  const order = new Int32Array(g.n);
  const start = new Int32Array(g.n + 1);
  const seen = new Uint8Array(g.n);
  const list: ComponentList = { count: 0, order, start };
  const part = allocateLocalGraph(g.n, 2 * g.m);
  // Start and probe vectors are keyed by a hash of each node's id, not its index, so a
  // node keeps its random entries when a change renumbers the design (base vs head).
  const idKey = new Int32Array(g.n);
  for (let i = 0; i < g.n; i++) idKey[i] = fnv1a32CodeUnits(g.nodeIds[i] ?? String(i));
  const keys = new Int32Array(g.n);

  return {
    survivors(mask: Mask): LocalGraph {
      return build(mask);
    },
    /** Components of a local graph by breadth-first search. */
    components(local: LocalGraph): ComponentList {
      const n = local.n;
      seen.fill(0, 0, n);
      let tail = 0;
      let c = 0;
      for (let s = 0; s < n; s++) {
        if (seen[s]) continue;
        start[c++] = tail;
        seen[s] = 1;
        let head = tail;
        order[tail++] = s;
        while (head < tail) {
          const v = order[head++];
          for (let p = local.offsets[v]; p < local.offsets[v + 1]; p++) {
            const w = local.neighbors[p];
            if (!seen[w]) {
              seen[w] = 1;
              order[tail++] = w;
            }
          }
        }
      }
      start[c] = tail;
      list.count = c;
      return list;
    },
    /** Per-node keys of a local graph for start and probe vectors (shared buffer). */
    keysOf(graph: LocalGraph): Int32Array {
      for (let i = 0; i < graph.n; i++) keys[i] = idKey[graph.toOriginal[i]];
      return keys;
    },
    /** Component c of `local` as its own local graph (valid until the next call). */
    component(local: LocalGraph, comps: ComponentList, c: number): LocalGraph {
      if (comps.count === 1) return local;
      return inducedSubgraph(local, comps.order, comps.start[c], comps.start[c + 1] - comps.start[c], part);
    },
  };
}
