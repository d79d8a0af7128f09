// Single-source shortest paths with non-negative link costs: Dijkstra's algorithm (Numer.
// Math. 1:269, 1959) with an indexed binary heap (decrease-key by sift-up), O((N + L) log N)
// per source, allocation-free. Costs are looked up per adjacency entry through linkOf, so
// parallel links simply offer the cheaper of the two.

import type { LocalGraph } from './subgraph.js';

export function createDijkstra(capacity: number) {
  const dist = new Float64Array(capacity);
  const heap = new Int32Array(capacity);
  const pos = new Int32Array(capacity);
  let size = 0;

  function up(i: number): void {
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

  function down(i: number): void {
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

  return {
    dist,
    /**
     * Distances from `source` into `dist[0..g.n)` (Infinity where unreachable). `visit(v, d)`
     * is called as each node is settled, in order of distance; returning true stops early,
     * leaving the unsettled distances as upper bounds.
     */
    run(g: LocalGraph, cost: Float64Array, source: number, visit?: (v: number, d: number) => boolean): void {
      const n = g.n;
      const { offsets, neighbors, linkOf } = g;
      dist.fill(Infinity, 0, n);
      pos.fill(-1, 0, n);
      size = 0;
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
          down(0);
        }
        if (visit && visit(v, dv)) return;
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
              up(size - 1);
            } else {
              up(at);
            }
          }
        }
      }
    },
  };
}
