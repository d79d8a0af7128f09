// Node and link connectivity of a connected local graph by unit-capacity max-flow, with the
// Whitney bound κ ≤ λ ≤ δ_min as the starting cap (Whitney, Am. J. Math. 54:150, 1932).
// - Link connectivity λ: min over t ≠ s of the s–t max flow, for one fixed s (any minimum
//   link cut separates s from some t); on simple graphs only the t of a dominating set
//   containing s are needed (see linkConnectivity).
// - Node connectivity κ: with v a node of minimum degree, the minimum over non-neighbours w
//   of the local node connectivity κ(v, w), and over non-adjacent pairs of neighbours of v
//   (Esfahanian & Hakimi's scheme, the one NetworkX's node_connectivity follows — from
//   memory). A complete graph has κ = n − 1.
// Every flow is capped at the best value so far, so most calls stop after a few paths.

import { createFlowNetwork } from './max-flow.js';
import type { LocalGraph } from './subgraph.js';

export function createConnectivityCounter(nodeCapacity: number, entryCapacity: number) {
  const network = createFlowNetwork(nodeCapacity, entryCapacity);
  const mark = new Int32Array(nodeCapacity).fill(-1);
  let stampCounter = 0;

  const domNodes = new Int32Array(nodeCapacity);
  const dominated = new Uint8Array(nodeCapacity);
  const dominating = { nodes: domNodes, count: 0 };

  /** A maximal independent set, greedily in index order: it dominates the graph. */
  function dominatingSet(g: LocalGraph): { nodes: Int32Array; count: number } {
    dominated.fill(0, 0, g.n);
    dominating.count = 0;
    for (let v = 0; v < g.n; v++) {
      if (dominated[v]) continue;
      domNodes[dominating.count++] = v;
      dominated[v] = 1;
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) dominated[g.neighbors[p]] = 1;
    }
    return dominating;
  }

  /** A fresh marker value; the marks are cleared before the counter could overflow. */
  function nextStamp(): number {
    if (stampCounter >= 0x3fffffff) {
      mark.fill(-1);
      stampCounter = 0;
    }
    return ++stampCounter;
  }

  function hasParallel(g: LocalGraph): boolean {
    for (let v = 0; v < g.n; v++) {
      const stamp = nextStamp();
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
        const w = g.neighbors[p];
        if (mark[w] === stamp) return true;
        mark[w] = stamp;
      }
    }
    return false;
  }

  function minDegree(g: LocalGraph): { node: number; degree: number } {
    let node = 0;
    let degree = Infinity;
    for (let v = 0; v < g.n; v++) {
      const d = g.offsets[v + 1] - g.offsets[v];
      if (d < degree) {
        degree = d;
        node = v;
      }
    }
    return { node, degree };
  }

  return {
    /** λ of a connected multigraph (parallel links count) with at least two nodes. */
    linkConnectivity(g: LocalGraph): number {
      const { degree } = minDegree(g);
      let best = degree;
      network.build(g, false);
      // Matula's observation (as in NetworkX's edge_connectivity, from memory): if λ < δ, both
      // sides of a minimum cut hold a node of any dominating set, so flows between the
      // members of one dominating set suffice. It relies on a simple graph; with parallel
      // links every node is tried.
      const dominating = hasParallel(g) ? null : dominatingSet(g);
      const targets = dominating ? dominating.count : g.n;
      const s = dominating ? dominating.nodes[0] : 0;
      for (let k = 0; k < targets && best > 0; k++) {
        const t = dominating ? dominating.nodes[k] : k;
        if (t === s) continue;
        const f = network.flow(s, t, best);
        if (f < best) best = f;
      }
      return best;
    },
    /** κ of a connected simple graph with at least two nodes. */
    nodeConnectivity(g: LocalGraph): number {
      const n = g.n;
      if (g.entries === n * (n - 1)) return n - 1;
      const { node: v, degree } = minDegree(g);
      let best = degree;
      network.build(g, true);
      const stamp = nextStamp();
      mark[v] = stamp;
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) mark[g.neighbors[p]] = stamp;
      for (let w = 0; w < n && best > 0; w++) {
        if (mark[w] === stamp) continue;
        const f = network.flow(v, w, best);
        if (f < best) best = f;
      }
      // Non-adjacent pairs of neighbours of v.
      for (let p = g.offsets[v]; p < g.offsets[v + 1] && best > 0; p++) {
        const x = g.neighbors[p];
        const sx = nextStamp();
        for (let r = g.offsets[x]; r < g.offsets[x + 1]; r++) mark[g.neighbors[r]] = sx;
        for (let q = p + 1; q < g.offsets[v + 1] && best > 0; q++) {
          const y = g.neighbors[q];
          if (mark[y] === sx || y === x) continue;
          const f = network.flow(x, y, best);
          if (f < best) best = f;
        }
      }
      return best;
    },
  };
}
