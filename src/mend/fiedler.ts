// Ranking candidate links by how much they raise algebraic connectivity, after Ghosh & Boyd
// ("Growing well-connected graphs", Proc. 45th IEEE CDC, 2006): for a Laplacian L with a
// simple second eigenvalue μ₂ and unit eigenvector v (the Fiedler vector), adding link {i, j}
// with weight w changes μ₂ at the rate ∂μ₂/∂w = (v_i − v_j)², so the link whose ends lie
// furthest apart in v raises μ₂ most to first order. We rank by that gradient; the engine then
// judges the real effect. The Laplacian counts parallel links (each is weight 1), as the
// physical graph has them. Dense symmetric eigen-solver up to DENSE_LIMIT sites, thick-restart
// Lanczos above (the constant null vector deflated). When μ₂ is repeated (cycles, symmetric
// designs) v is one vector of its eigenspace: the ranking is then one of several equally
// valid ones, fixed by the solver's deterministic start.

import type { CompactGraph } from '../graph/compact.js';
import { createLanczos, type SymmetricOperator } from '../metrics/kernels/lanczos.js';
import { symmetricEigen } from '../metrics/kernels/symmetric-eigen.js';

export const DENSE_LIMIT = 400;

export interface Fiedler {
  /** μ₂ of the Laplacian (0 when the design is disconnected). */
  value: number;
  /** A unit Fiedler vector, one entry per node. */
  vector: Float64Array;
}

/** The Fiedler pair of the design's Laplacian with `extra` links (node index pairs) added. */
export function fiedler(g: CompactGraph, extra: readonly (readonly [number, number])[] = []): Fiedler {
  const n = g.n;
  if (n < 2) return { value: 0, vector: new Float64Array(n) };
  const src: number[] = [];
  const dst: number[] = [];
  for (let e = 0; e < g.m; e++) {
    src.push(g.linkSource[e]);
    dst.push(g.linkTarget[e]);
  }
  for (const [a, b] of extra) {
    src.push(a);
    dst.push(b);
  }
  if (n <= DENSE_LIMIT) {
    const a = new Float64Array(n * n);
    for (let k = 0; k < src.length; k++) {
      const i = src[k];
      const j = dst[k];
      if (i === j) continue;
      a[i * n + i] += 1;
      a[j * n + j] += 1;
      a[i * n + j] -= 1;
      a[j * n + i] -= 1;
    }
    const d = new Float64Array(n);
    const e = new Float64Array(n);
    symmetricEigen(a, n, d, e);
    const vector = new Float64Array(n);
    for (let i = 0; i < n; i++) vector[i] = a[i * n + 1];
    return { value: Math.max(0, d[1]), vector };
  }
  const degree = new Float64Array(n);
  for (let k = 0; k < src.length; k++) {
    if (src[k] === dst[k]) continue;
    degree[src[k]]++;
    degree[dst[k]]++;
  }
  let maxDegree = 0;
  for (let i = 0; i < n; i++) if (degree[i] > maxDegree) maxDegree = degree[i];
  const op: SymmetricOperator = {
    n,
    normBound: 2 * maxDegree,
    apply(x, y) {
      for (let i = 0; i < n; i++) y[i] = degree[i] * x[i];
      for (let k = 0; k < src.length; k++) {
        const i = src[k];
        const j = dst[k];
        if (i === j) continue;
        y[i] -= x[j];
        y[j] -= x[i];
      }
    },
  };
  const one = new Float64Array(n).fill(1 / Math.sqrt(n));
  const r = createLanczos(n, 1).solve(op, { which: 'smallest', count: 1, deflation: one, deflationCount: 1 });
  return { value: Math.max(0, r.values[0]), vector: r.vectors.slice(0, n) };
}

/** Ghosh & Boyd's first-order gain in μ₂ of adding link {a, b}: (v_a − v_b)². */
export function ghoshBoydScore(f: Fiedler, a: number, b: number): number {
  const d = f.vector[a] - f.vector[b];
  return d * d;
}
