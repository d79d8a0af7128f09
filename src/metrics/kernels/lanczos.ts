// A few extremal eigenpairs of a large sparse symmetric operator: Lanczos with full
// reorthogonalisation (the three-term recurrence, then a Gram–Schmidt pass against the whole
// basis, repeated once when it cancels too much: "twice is enough", Giraud et al., Numer.
// Math. 101:87, 2005) and thick restart (Wu & Simon, SIAM J. Matrix Anal. Appl.
// 22:602, 2000). The Rayleigh quotient of the whole basis is formed by the projection
// itself, which is what makes the restarted "arrow" matrix come out right without special
// cases. Deflation vectors (e.g. the constant vector of a Laplacian) are projected out of
// every new direction. Scratch is allocated once per capacity; a warm start vector is
// accepted, and without one the start vector is a fixed function of the original node
// indices so results do not depend on evaluation order.

import { noise } from './hash-noise.js';
import { symmetricEigen } from './symmetric-eigen.js';

export interface SymmetricOperator {
  /** Dimension. */
  n: number;
  /** y ← A x on entries 0..n-1. */
  apply(x: Float64Array, y: Float64Array): void;
  /** An upper bound on ‖A‖₂ (e.g. Gershgorin); convergence is relative to it. */
  normBound: number;
}

export interface EigenRequest {
  which: 'smallest' | 'largest';
  /** Number of eigenpairs wanted. */
  count: number;
  /** Orthonormal vectors to keep out of the search space: `deflation[k*stride .. +n)`. */
  deflation?: Float64Array;
  deflationCount?: number;
  /**
   * Stop when every wanted Ritz pair has residual ‖Ax − θx‖ ≤ tol·|θ| (default 1e-10): an
   * eigenvalue lies within that distance of θ, so θ is then correct to `tol` relative.
   * A floor of 1e-14·normBound keeps eigenvalues at 0 from iterating forever.
   */
  tol?: number;
  /** Start vector (length ≥ n); null for the fixed default. */
  start?: Float64Array | null;
  /** Original index per entry, for the default start vector (identity when absent). */
  keys?: Int32Array | null;
  /** Upper limit on operator applications (default 60·n, at least 2000). */
  maxApplications?: number;
}

export interface EigenResult {
  /** Eigenvalues, ascending for 'smallest', descending for 'largest'. */
  values: Float64Array;
  /** Eigenvector k is vectors[k*stride .. k*stride + n). */
  vectors: Float64Array;
  stride: number;
  /** How many pairs were found (≤ count; fewer only when the space is smaller). */
  found: number;
  applications: number;
  converged: boolean;
}

// The vector kernels are module-level functions on explicit arrays, so every solver
// instance calls the same monomorphic code (closures per instance would make the hot call
// sites polymorphic once several metrics are in use).

function dot(a: Float64Array, ao: number, b: Float64Array, bo: number, n: number): number {
  let s = 0;
  for (let i = 0; i < n; i++) s += a[ao + i] * b[bo + i];
  return s;
}

/** w ← w − c·V[off ..]. */
function axpy(w: Float64Array, c: number, V: Float64Array, off: number, n: number): void {
  for (let i = 0; i < n; i++) w[i] -= c * V[off + i];
}

function norm(w: Float64Array, n: number): number {
  return Math.sqrt(dot(w, 0, w, 0, n));
}

/**
 * Remove from w the deflation space and basis vectors 0..upTo-1 of V (row stride `stride`)
 * by Gram–Schmidt, adding the coefficients to `coeff`. A second pass runs only when the first
 * one cancelled most of w relative to `ref` (the DGKS criterion, Daniel, Gragg, Kaufman &
 * Stewart, Math. Comp. 30:772, 1976), which keeps the basis orthogonal to working accuracy.
 */
function orthogonalize(
  w: Float64Array,
  V: Float64Array,
  stride: number,
  n: number,
  upTo: number,
  defl: Float64Array | undefined,
  dc: number,
  coeff: Float64Array | null,
  ref = norm(w, n),
): void {
  for (let pass = 0; pass < 2; pass++) {
    if (pass === 1 && norm(w, n) > 0.7071 * ref) break;
    for (let k = 0; k < dc; k++) {
      const c = dot(defl!, k * n, w, 0, n);
      axpy(w, c, defl!, k * n, n);
    }
    // Four basis vectors at a time: one sweep over w computes four dot products, a second
    // removes all four components (block Gram–Schmidt; a quarter of the passes over w).
    let l = 0;
    for (; l + 4 <= upTo; l += 4) {
      const o0 = l * stride;
      const o1 = o0 + stride;
      const o2 = o1 + stride;
      const o3 = o2 + stride;
      let c0 = 0;
      let c1 = 0;
      let c2 = 0;
      let c3 = 0;
      for (let i = 0; i < n; i++) {
        const x = w[i];
        c0 += V[o0 + i] * x;
        c1 += V[o1 + i] * x;
        c2 += V[o2 + i] * x;
        c3 += V[o3 + i] * x;
      }
      for (let i = 0; i < n; i++) w[i] -= c0 * V[o0 + i] + c1 * V[o1 + i] + c2 * V[o2 + i] + c3 * V[o3 + i];
      if (coeff) {
        coeff[l] += c0;
        coeff[l + 1] += c1;
        coeff[l + 2] += c2;
        coeff[l + 3] += c3;
      }
    }
    for (; l < upTo; l++) {
      const c = dot(V, l * stride, w, 0, n);
      if (coeff) coeff[l] += c;
      axpy(w, c, V, l * stride, n);
    }
  }
}

export function createLanczos(capacity: number, maxCount: number, basis = 24) {
  const m0 = Math.max(basis, 2 * maxCount + 8);
  const stride = Math.max(1, capacity);
  const V = new Float64Array(m0 * stride);
  const w = new Float64Array(stride);
  const tmp = new Float64Array(m0 * stride);
  const H = new Float64Array(m0 * m0);
  const Y = new Float64Array(m0 * m0);
  const theta = new Float64Array(m0);
  const scratch = new Float64Array(m0);
  const h = new Float64Array(m0);
  const views = Array.from({ length: m0 }, (_, i) => V.subarray(i * stride, (i + 1) * stride));
  const result: EigenResult = {
    values: new Float64Array(maxCount),
    vectors: new Float64Array(maxCount * stride),
    stride,
    found: 0,
    applications: 0,
    converged: false,
  };

  return {
    result,
    solve(op: SymmetricOperator, req: EigenRequest): EigenResult {
      const n = op.n;
      const dc = req.deflationCount ?? 0;
      const defl = req.deflation;
      const space = n - dc;
      const count = Math.min(req.count, Math.max(0, space), maxCount);
      const tol = req.tol ?? 1e-10;
      const floor = 1e-14 * Math.max(op.normBound, 1e-300);
      const maxApps = req.maxApplications ?? Math.max(2000, 60 * n);
      result.found = 0;
      result.applications = 0;
      result.converged = true;
      if (count <= 0) return result;
      const m = Math.min(m0, space);
      const keep = Math.min(m - 1, Math.max(count + 2, m >> 1));
      const largest = req.which === 'largest';
      let salt = 1;

      // Start vector.
      const keys = req.keys ?? null;
      if (req.start) for (let i = 0; i < n; i++) w[i] = req.start[i];
      else for (let i = 0; i < n; i++) w[i] = noise(keys ? keys[i] : i, 0x5eed);
      orthogonalize(w, V, stride, n, 0, defl, dc, null);
      let beta = norm(w, n);
      if (!(beta > 1e-8)) {
        for (let i = 0; i < n; i++) w[i] = noise(keys ? keys[i] : i, 0x5eed + salt++);
        orthogonalize(w, V, stride, n, 0, defl, dc, null);
        beta = norm(w, n);
      }
      for (let i = 0; i < n; i++) V[i] = w[i] / beta;
      H.fill(0, 0, m * m);
      let j = 0;
      let apps = 0;
      let betaPrev = 0;

      for (;;) {
        // Extend the basis from j to m vectors.
        let residual = 0;
        for (let i = j; i < m; i++) {
          op.apply(views[i], w);
          apps++;
          h.fill(0, 0, i + 1);
          // The Lanczos recurrence first (the coupling to the previous vector, or after a
          // restart to every kept Ritz vector), then one reorthogonalisation pass.
          if (i === j && j > 0) {
            for (let k = 0; k < j; k++) {
              const c = H[k * m + j];
              h[k] = c;
              if (c !== 0) axpy(w, c, V, k * stride, n);
            }
          } else if (i > 0 && betaPrev !== 0) {
            h[i - 1] = betaPrev;
            axpy(w, betaPrev, V, (i - 1) * stride, n);
          }
          const alpha = dot(V, i * stride, w, 0, n);
          h[i] += alpha;
          axpy(w, alpha, V, i * stride, n);
          orthogonalize(w, V, stride, n, i + 1, defl, dc, h);
          for (let l = 0; l <= i; l++) {
            H[l * m + i] = h[l];
            H[i * m + l] = h[l];
          }
          beta = norm(w, n);
          residual = beta;
          betaPrev = beta;
          if (i + 1 < m) {
            if (beta <= 1e-10 * Math.max(op.normBound, 1)) {
              // Invariant subspace: continue with a fresh direction orthogonal to everything.
              for (let t = 0; t < n; t++) w[t] = noise(keys ? keys[t] : t, 0x5eed + salt++);
              orthogonalize(w, V, stride, n, i + 1, defl, dc, null);
              beta = norm(w, n);
              betaPrev = 0;
              H[(i + 1) * m + i] = 0;
              H[i * m + i + 1] = 0;
            }
            const off = (i + 1) * stride;
            const inv = 1 / beta;
            for (let t = 0; t < n; t++) V[off + t] = w[t] * inv;
          }
        }
        // Rayleigh–Ritz on the basis.
        Y.set(H.subarray(0, m * m));
        symmetricEigen(Y, m, theta, scratch);
        const exact = m === space;
        let allConverged = true;
        for (let k = 0; k < count; k++) {
          const col = largest ? m - 1 - k : k;
          const bound = Math.max(tol * Math.abs(theta[col]), floor);
          if (!exact && residual * Math.abs(Y[(m - 1) * m + col]) > bound) allConverged = false;
        }
        if (allConverged || apps >= maxApps) {
          result.converged = allConverged;
          for (let k = 0; k < count; k++) {
            const col = largest ? m - 1 - k : k;
            result.values[k] = theta[col];
            const out = k * stride;
            result.vectors.fill(0, out, out + n);
            for (let l = 0; l < m; l++) {
              const y = Y[l * m + col];
              const off = l * stride;
              for (let t = 0; t < n; t++) result.vectors[out + t] += y * V[off + t];
            }
          }
          result.found = count;
          result.applications = apps;
          return result;
        }
        // Thick restart: keep the `keep` Ritz vectors at the wanted end plus the residual.
        for (let k = 0; k < keep; k++) {
          const col = largest ? m - 1 - k : k;
          const out = k * stride;
          tmp.fill(0, out, out + n);
          for (let l = 0; l < m; l++) {
            const y = Y[l * m + col];
            if (y === 0) continue;
            const off = l * stride;
            for (let t = 0; t < n; t++) tmp[out + t] += y * V[off + t];
          }
        }
        V.set(tmp.subarray(0, keep * stride));
        H.fill(0, 0, m * m);
        for (let k = 0; k < keep; k++) {
          const col = largest ? m - 1 - k : k;
          H[k * m + k] = theta[col];
          const c = residual * Y[(m - 1) * m + col];
          H[k * m + keep] = c;
          H[keep * m + k] = c;
        }
        // w still holds the unnormalised residual direction of the last step.
        orthogonalize(w, V, stride, n, keep, defl, dc, null);
        beta = norm(w, n);
        if (!(beta > 1e-300)) {
          for (let t = 0; t < n; t++) w[t] = noise(keys ? keys[t] : t, 0x5eed + salt++);
          orthogonalize(w, V, stride, n, keep, defl, dc, null);
          beta = norm(w, n);
        }
        const off = keep * stride;
        for (let t = 0; t < n; t++) V[off + t] = w[t] / beta;
        j = keep;
      }
    },
  };
}
