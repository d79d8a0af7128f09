// Unit-capacity maximum flow by shortest augmenting paths (Edmonds & Karp, JACM 19:248,
// 1972) with an early exit: `flow(s, t, limit)` stops as soon as `limit` units are found,
// which is all the connectivity metrics need (they only ask "is it below the best so far?").
// Each augmentation is one BFS over the residual arcs, so a call costs O(limit · arcs).
// Two networks are built over a local graph: the link network (every link is a pair of
// opposite unit arcs) for link connectivity, and the node-split network (v_in → v_out of
// capacity 1, links as u_out → w_in) for node connectivity (Even & Tarjan, SIAM J. Comput.
// 4:507, 1975 — from memory). Arrays are allocated once for the largest graph.

import type { LocalGraph } from './subgraph.js';

export interface FlowNetwork {
  /** Build the network of `graph`: node-split when `split`, else one node per graph node. */
  build(graph: LocalGraph, split: boolean): void;
  /** Max flow from s to t (graph node indices), capped at `limit`. */
  flow(s: number, t: number, limit: number): number;
}

export function createFlowNetwork(nodeCapacity: number, entryCapacity: number): FlowNetwork {
  const maxNodes = 2 * nodeCapacity;
  const maxArcs = 2 * entryCapacity + 2 * nodeCapacity;
  const start = new Int32Array(maxNodes + 1);
  const head = new Int32Array(maxArcs);
  const rev = new Int32Array(maxArcs);
  const cap0 = new Int8Array(maxArcs);
  const cap = new Int8Array(maxArcs);
  const fill = new Int32Array(maxNodes);
  const parentArc = new Int32Array(maxNodes);
  const queue = new Int32Array(maxNodes);
  let nodes = 0;
  let arcs = 0;
  let isSplit = false;

  function addPair(a: number, b: number, capAB: number, capBA: number): void {
    const x = fill[a]++;
    const y = fill[b]++;
    head[x] = b;
    cap0[x] = capAB;
    rev[x] = y;
    head[y] = a;
    cap0[y] = capBA;
    rev[y] = x;
  }

  return {
    build(graph, split) {
      isSplit = split;
      const n = graph.n;
      nodes = split ? 2 * n : n;
      // Degree of every network node, then CSR offsets.
      start.fill(0, 0, nodes + 1);
      for (let v = 0; v < n; v++) {
        const deg = graph.offsets[v + 1] - graph.offsets[v];
        if (split) {
          // v_in: 1 internal arc + one reverse arc per incoming link; v_out: 1 + deg.
          start[2 * v + 1] += 1 + deg;
          start[2 * v + 2] += 1 + deg;
        } else {
          start[v + 1] += deg;
        }
      }
      for (let i = 0; i < nodes; i++) start[i + 1] += start[i];
      arcs = start[nodes];
      for (let i = 0; i < nodes; i++) fill[i] = start[i];
      for (let v = 0; v < n; v++) {
        if (split) addPair(2 * v, 2 * v + 1, 1, 0);
        for (let p = graph.offsets[v]; p < graph.offsets[v + 1]; p++) {
          const w = graph.neighbors[p];
          if (split)
            addPair(2 * v + 1, 2 * w, 1, 0); // v_out → w_in; w's entry adds w_out → v_in
          else if (v < w) addPair(v, w, 1, 1); // one pair per link serves both directions
        }
      }
    },
    flow(s, t, limit) {
      const source = isSplit ? 2 * s + 1 : s;
      const sink = isSplit ? 2 * t : t;
      if (source === sink) return limit;
      for (let a = 0; a < arcs; a++) cap[a] = cap0[a];
      let total = 0;
      while (total < limit) {
        parentArc.fill(-1, 0, nodes);
        let qh = 0;
        let qt = 0;
        queue[qt++] = source;
        parentArc[source] = -2;
        let found = false;
        while (qh < qt && !found) {
          const u = queue[qh++];
          for (let a = start[u]; a < fill[u]; a++) {
            if (cap[a] <= 0) continue;
            const v = head[a];
            if (parentArc[v] !== -1) continue;
            parentArc[v] = a;
            if (v === sink) {
              found = true;
              break;
            }
            queue[qt++] = v;
          }
        }
        if (!found) break;
        for (let v = sink; v !== source;) {
          const a = parentArc[v];
          cap[a]--;
          cap[rev[a]]++;
          v = head[rev[a]];
        }
        total++;
      }
      return total;
    },
  };
}
