// Single-source shortest paths with non-negative link costs: Dijkstra's algorithm (Numer.
// Math. 1:269, 1959) with an indexed binary heap (decrease-key by sift-up), O((N + L) log N)
// per source, allocation-free. Costs are looked up per adjacency entry through linkOf, so
// parallel links simply offer the cheaper of the two.

import type { LocalGraph } from './subgraph.js';

function siftUp(heap: Int32Array, pos: Int32Array, dist: Float64Array, i: number): void {
  const v = heap[i];
  const d = dist[v];
  while (i > 0) {
    const parent = (i - 1) >> 1;
    const u = heap[parent];
    if (dist[u] <= d) break;
    heap[i] = u;
    pos[u] = i;
    i = parent;
  }
  heap[i] = v;
  pos[v] = i;
}

function siftDown(heap: Int32Array, pos: Int32Array, dist: Float64Array, size: number, i: number): void {
  const v = heap[i];
  const d = dist[v];
  for (;;) {
    let child = 2 * i + 1;
    if (child >= size) break;
    if (child + 1 < size && dist[heap[child + 1]] < dist[heap[child]]) child++;
    const u = heap[child];
    if (dist[u] >= d) break;
    heap[i] = u;
    pos[u] = i;
    i = child;
  }
  heap[i] = v;
  pos[v] = i;
}

/**
 * Distances from `source` into `dist[0..g.n)` (Infinity where unreachable), with `heap` and
 * `pos` as scratch. `visit(v, d)` is called as each node is settled, in order of distance;
 * returning true stops early, leaving the unsettled distances as upper bounds.
 */
export function shortestPaths(
  g: LocalGraph,
  cost: Float64Array,
  source: number,
  dist: Float64Array,
  heap: Int32Array,
  pos: Int32Array,
  visit?: (v: number, d: number) => boolean,
): void {
  const n = g.n;
  const { offsets, neighbors, linkOf } = g;
  dist.fill(Infinity, 0, n);
  pos.fill(-1, 0, n);
  let size = 0;
  dist[source] = 0;
  heap[size++] = source;
  pos[source] = 0;
  while (size > 0) {
    const v = heap[0];
    const dv = dist[v];
    pos[v] = -2; // settled
    const last = heap[--size];
    if (size > 0) {
      heap[0] = last;
      pos[last] = 0;
      siftDown(heap, pos, dist, size, 0);
    }
    if (visit !== undefined && visit(v, dv)) return;
    for (let p = offsets[v]; p < offsets[v + 1]; p++) {
      const w = neighbors[p];
      const at = pos[w];
      if (at === -2) continue;
      const nd = dv + cost[linkOf[p]];
      if (nd < dist[w]) {
        dist[w] = nd;
        if (at === -1) {
          heap[size] = w;
          pos[w] = size++;
          siftUp(heap, pos, dist, size - 1);
        } else {
          siftUp(heap, pos, dist, at);
        }
      }
    }
  }
}

export function createDijkstra(capacity: number) {
  const dist = new Float64Array(capacity);
  const heap = new Int32Array(capacity);
  const pos = new Int32Array(capacity);
  return {
    dist,
    /** See shortestPaths; results in `dist`. */
    run(g: LocalGraph, cost: Float64Array, source: number, visit?: (v: number, d: number) => boolean): void {
      shortestPaths(g, cost, source, dist, heap, pos, visit);
    },
  };
}
