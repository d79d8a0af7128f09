// Disjoint sets with union by size and path halving (Tarjan, JACM 22:215, 1975): the
// near-linear connectivity kernel behind largest_component, pair_connectivity and the
// "is the survivor connected?" test of the spectral metrics. Allocated once per graph.

import type { CompactGraph } from '../../graph/compact.js';
import type { Mask } from '../../graph/mask.js';
import { kernelWork } from './work-count.js';

/** Root of i's set, halving the path on the way (module-level so every caller stays monomorphic). */
export function findRoot(parent: Int32Array, i: number): number {
  while (parent[i] !== i) {
    const up = parent[parent[i]];
    parent[i] = up;
    i = up;
  }
  return i;
}

/**
 * Join the sets of a and b (union by size); returns false when they were already joined.
 */
export function unite(parent: Int32Array, size: Int32Array, a: number, b: number): boolean {
  let ra = findRoot(parent, a);
  let rb = findRoot(parent, b);
  if (ra === rb) return false;
  if (size[ra] < size[rb]) {
    const t = ra;
    ra = rb;
    rb = t;
  }
  parent[rb] = ra;
  size[ra] += size[rb];
  return true;
}

export interface UnionFind {
  readonly parent: Int32Array;
  /** Size of the set rooted at i (meaningful at roots only). */
  readonly size: Int32Array;
  find(i: number): number;
}

/** Summary of the surviving graph's components, refreshed in place by each call. */
export interface ComponentSummary {
  /** Surviving nodes. */
  alive: number;
  /** Number of components among surviving nodes. */
  count: number;
  /** Size of the largest component (0 when nothing survives). */
  largest: number;
  /** The union–find root of the largest component (-1 when nothing survives); on ties, the root with the lowest index. */
  largestRoot: number;
  /** Σ over components of C(|C|, 2): node pairs that can still reach each other. */
  connectedPairs: number;
}

/**
 * Component summary of the masked graph: one pass over the links with union–find.
 * `uf` is left holding the partition, so callers can ask `findRoot(uf.parent, v)` afterwards.
 */
export function createComponentCounter(g: CompactGraph): {
  uf: UnionFind;
  summary: ComponentSummary;
  run(mask: Mask): ComponentSummary;
} {
  const parent = new Int32Array(g.n);
  const size = new Int32Array(g.n);
  const uf: UnionFind = { parent, size, find: (i) => findRoot(parent, i) };
  const summary: ComponentSummary = { alive: 0, count: 0, largest: 0, largestRoot: -1, connectedPairs: 0 };
  const { linkSource, linkTarget } = g;
  return {
    uf,
    summary,
    run(mask) {
      const node = mask.node;
      const link = mask.link;
      const n = g.n;
      let alive = 0;
      for (let v = 0; v < n; v++) {
        parent[v] = v;
        size[v] = 1;
        alive += node[v] ^ 1;
      }
      let count = alive;
      for (let e = 0; e < g.m; e++) {
        if (link[e]) continue;
        const a = linkSource[e];
        const b = linkTarget[e];
        if (node[a] || node[b]) continue;
        if (unite(parent, size, a, b)) count--;
      }
      let largest = 0;
      let largestRoot = -1;
      let pairs = 0;
      for (let v = 0; v < n; v++) {
        if (node[v] || parent[v] !== v) continue;
        const s = size[v];
        pairs += (s * (s - 1)) / 2;
        if (s > largest) {
          largest = s;
          largestRoot = v;
        }
      }
      summary.alive = alive;
      summary.count = count;
      summary.largest = largest;
      summary.largestRoot = largestRoot;
      summary.connectedPairs = pairs;
      kernelWork.visits += 2 * n + g.m;
      return summary;
    },
  };
}
