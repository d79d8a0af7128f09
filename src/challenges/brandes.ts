// Shortest-path betweenness of nodes and links by Brandes' accumulation (J. Math. Sociol.
// 25:163, 2001, M): one BFS per source, dependencies summed back in reverse BFS order; O(N·L)
// for unweighted graphs. Paths are counted in hops over working links; parallel links are
// distinct paths. Scores are raw sums over ordered source–target pairs (networkx halves them
// for undirected graphs; a constant factor changes no ranking).
// The kernel can restrict sources to a set (one component), which is what adaptive attacks
// need: removing an element changes scores only inside the component that held it.

import type { CompactGraph } from '../graph/compact.js';
import { createMask, type Mask } from '../graph/mask.js';
import { argmaxTied } from './rank.js';
import { eligibleUnits } from './units.js';

export interface BrandesWorkspace {
  dist: Int32Array;
  sigma: Float64Array;
  delta: Float64Array;
  order: Int32Array;
}

export function createBrandesWorkspace(g: CompactGraph): BrandesWorkspace {
  return {
    dist: new Int32Array(g.n).fill(-1),
    sigma: new Float64Array(g.n),
    delta: new Float64Array(g.n),
    order: new Int32Array(g.n),
  };
}

/**
 * Adds each source's dependencies to `nodeScore` and/or `linkScore` (either may be null).
 * Sources that are removed in the mask are skipped.
 */
export function accumulateBetweenness(
  g: CompactGraph,
  mask: Mask,
  sources: ArrayLike<number>,
  nodeScore: Float64Array | null,
  linkScore: Float64Array | null,
  ws: BrandesWorkspace = createBrandesWorkspace(g),
): void {
  const { dist, sigma, delta, order } = ws;
  const { offsets, neighbors, linkOf } = g;
  const nodeGone = mask.node;
  const linkGone = mask.link;
  for (let si = 0; si < sources.length; si++) {
    const s = sources[si];
    if (nodeGone[s]) continue;
    let head = 0;
    let tail = 0;
    order[tail++] = s;
    dist[s] = 0;
    sigma[s] = 1;
    while (head < tail) {
      const v = order[head++];
      const dv = dist[v] + 1;
      for (let p = offsets[v]; p < offsets[v + 1]; p++) {
        const w = neighbors[p];
        if (nodeGone[w] || linkGone[linkOf[p]]) continue;
        if (dist[w] < 0) {
          dist[w] = dv;
          sigma[w] = 0;
          order[tail++] = w;
        }
        if (dist[w] === dv) sigma[w] += sigma[v];
      }
    }
    for (let i = 0; i < tail; i++) delta[order[i]] = 0;
    for (let i = tail - 1; i > 0; i--) {
      const w = order[i];
      const dw = dist[w] - 1;
      const coeff = (1 + delta[w]) / sigma[w];
      for (let p = offsets[w]; p < offsets[w + 1]; p++) {
        const v = neighbors[p];
        if (dist[v] !== dw || nodeGone[v] || linkGone[linkOf[p]]) continue;
        const c = sigma[v] * coeff;
        delta[v] += c;
        if (linkScore !== null) linkScore[linkOf[p]] += c;
      }
      if (nodeScore !== null) nodeScore[w] += delta[w];
    }
    for (let i = 0; i < tail; i++) dist[order[i]] = -1;
  }
}

/** Nodes of the component holding `start` in the masked graph (BFS order), written to `out`. */
export function componentOf(g: CompactGraph, mask: Mask, start: number, seen: Uint8Array, out: Int32Array): number {
  let head = 0;
  let tail = 0;
  out[tail++] = start;
  seen[start] = 1;
  while (head < tail) {
    const v = out[head++];
    for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
      const w = g.neighbors[p];
      if (seen[w] || mask.node[w] || mask.link[g.linkOf[p]]) continue;
      seen[w] = 1;
      out[tail++] = w;
    }
  }
  for (let i = 0; i < tail; i++) seen[out[i]] = 0;
  return tail;
}

export function allNodes(g: CompactGraph): Int32Array {
  const a = new Int32Array(g.n);
  for (let v = 0; v < g.n; v++) a[v] = v;
  return a;
}

/**
 * Adaptive betweenness attack on nodes or links: remove the element with the highest current
 * score (ties to the lowest index), then recompute only the component that held it — every
 * other component's scores are exactly unchanged. Node components left with at most two nodes
 * have no betweenness, so they are not recomputed.
 */
export function adaptiveBetweenness(g: CompactGraph, kind: 'node' | 'link', steps: number): Int32Array {
  const mask = createMask(g);
  const ws = createBrandesWorkspace(g);
  const nodes = kind === 'node';
  const score = new Float64Array(nodes ? g.n : g.m);
  accumulateBetweenness(g, mask, allNodes(g), nodes ? score : null, nodes ? null : score, ws);
  const candidate = eligibleUnits(g, kind);
  const seen = new Uint8Array(g.n);
  const comp = new Int32Array(g.n);
  const out: number[] = [];
  while (out.length < steps) {
    const u = argmaxTied(score, candidate);
    if (u < 0) break;
    out.push(u);
    candidate[u] = 0;
    const size = componentOf(g, mask, nodes ? u : g.linkSource[u], seen, comp);
    if (nodes) {
      mask.node[u] = 1;
      score[u] = 0;
      for (let i = 0; i < size; i++) score[comp[i]] = 0;
      if (size <= 3) continue; // what is left has at most two nodes per component
    } else {
      mask.link[u] = 1;
      for (let i = 0; i < size; i++) {
        const v = comp[i];
        for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) score[g.linkOf[p]] = 0;
      }
    }
    accumulateBetweenness(g, mask, comp.subarray(0, size), nodes ? score : null, nodes ? null : score, ws);
  }
  return Int32Array.from(out);
}
