// Matrix-free Laplacian and adjacency operators over a local (simple) graph, plus the
// dense forms used below the dense-size limit. Simple graph: parallel links are merged by
// the survivor builder, so every entry of A is 0 or 1 (docs/METHODS.md §2.1).

import type { SymmetricOperator } from './lanczos.js';
import type { LocalGraph } from './subgraph.js';

export interface GraphOperator extends SymmetricOperator {
  /** Point the operator at a (new) local graph; recomputes the norm bound. */
  bind(graph: LocalGraph): void;
}

export function maxDegree(g: LocalGraph): number {
  let dmax = 0;
  for (let i = 0; i < g.n; i++) dmax = Math.max(dmax, g.offsets[i + 1] - g.offsets[i]);
  return dmax;
}

export function createLaplacianOperator(): GraphOperator {
  let g: LocalGraph | null = null;
  const op: GraphOperator = {
    n: 0,
    normBound: 0,
    bind(graph) {
      g = graph;
      op.n = graph.n;
      op.normBound = 2 * maxDegree(graph); // Gershgorin
    },
    apply(x, y) {
      const { offsets, neighbors, n } = g!;
      for (let i = 0; i < n; i++) {
        const a = offsets[i];
        const b = offsets[i + 1];
        let s = (b - a) * x[i];
        for (let p = a; p < b; p++) s -= x[neighbors[p]];
        y[i] = s;
      }
    },
  };
  return op;
}

export function createAdjacencyOperator(): GraphOperator {
  let g: LocalGraph | null = null;
  const op: GraphOperator = {
    n: 0,
    normBound: 0,
    bind(graph) {
      g = graph;
      op.n = graph.n;
      op.normBound = maxDegree(graph);
    },
    apply(x, y) {
      const { offsets, neighbors, n } = g!;
      for (let i = 0; i < n; i++) {
        let s = 0;
        for (let p = offsets[i]; p < offsets[i + 1]; p++) s += x[neighbors[p]];
        y[i] = s;
      }
    },
  };
  return op;
}

/** Write the dense n×n Laplacian (laplacian = true) or adjacency matrix of `g` into `out`. */
export function denseMatrix(g: LocalGraph, laplacian: boolean, out: Float64Array): void {
  const n = g.n;
  out.fill(0, 0, n * n);
  for (let i = 0; i < n; i++) {
    const a = g.offsets[i];
    const b = g.offsets[i + 1];
    if (laplacian) out[i * n + i] = b - a;
    for (let p = a; p < b; p++) out[i * n + g.neighbors[p]] = laplacian ? -1 : 1;
  }
}
