// Stochastic Lanczos quadrature for tr f(A) on the orthogonal complement of a deflation
// space (Ubaru, Chen & Saad, SIAM J. Matrix Anal. Appl. 38:1075, 2017 — from memory, see
// docs/METHODS.md §8.5): each Rademacher probe z (Hutchinson, Commun. Stat. Simul. 18:1059, 1989)
// is projected off the deflation space, and zᵀf(A)z is the Gauss quadrature of the
// Lanczos tridiagonal matrix T_k started from z: ‖z‖² Σ_j τ_j² f(θ_j), with τ_j the first
// components of T_k's eigenvectors (Golub & Welsch). The probes are fixed functions of the
// original node indices, so an estimate is a pure function of the graph and the mask.
// The caller deflates the eigenpairs that dominate the trace (the largest for e^A, the
// smallest for L⁺) and adds them exactly; the estimator then only has to resolve the flat
// remainder, which is why few probes suffice (measured errors are in the metric files).

import { sign } from './hash-noise.js';
import type { SymmetricOperator } from './lanczos.js';
import { tridiagonalEigen } from './symmetric-eigen.js';

export interface TraceOptions {
  /** Probes (the fixed count; with `targetSe`, the least). */
  probes: number;
  /**
   * With it, probes continue in blocks of `probes` until the standard error of the mean is at
   * most targetSe(mean so far) (in the trace's units) or `maxProbes` is reached.
   */
  targetSe?: (mean: number) => number;
  maxProbes?: number;
  /** Most Lanczos steps per probe. */
  steps: number;
  /** Stop a probe when the quadrature changes by less than this, relatively. */
  tol: number;
}

export function createTraceEstimator(capacity: number, maxSteps: number) {
  const stride = Math.max(1, capacity);
  const q = new Float64Array(stride);
  const qPrev = new Float64Array(stride);
  const w = new Float64Array(stride);
  const diag = new Float64Array(maxSteps);
  const off = new Float64Array(maxSteps);
  const d = new Float64Array(maxSteps);
  const e = new Float64Array(maxSteps);
  const z = new Float64Array(maxSteps);

  function deflate(v: Float64Array, n: number, defl: Float64Array, dc: number): void {
    for (let k = 0; k < dc; k++) {
      let c = 0;
      const o = k * n;
      for (let i = 0; i < n; i++) c += defl[o + i] * v[i];
      for (let i = 0; i < n; i++) v[i] -= c * defl[o + i];
    }
  }

  function quadrature(k: number, f: (x: number) => number): number {
    tridiagonalEigen(diag, off, k, d, e, z, true);
    let s = 0;
    for (let j = 0; j < k; j++) s += z[j] * z[j] * f(d[j]);
    return s;
  }

  return {
    /**
     * Estimate Σ f(λ) over the eigenvalues of `op` whose eigenvectors are orthogonal to
     * the `dc` orthonormal vectors in `defl` (packed with stride op.n).
     */
    estimate(
      op: SymmetricOperator,
      f: (x: number) => number,
      keys: Int32Array,
      defl: Float64Array,
      dc: number,
      opts: TraceOptions,
    ): number {
      return this.estimateWithError(op, f, keys, defl, dc, opts).mean;
    },

    /**
     * The estimate and its standard error: the probes' sample standard deviation over √probes
     * (each probe is an unbiased Hutchinson sample of the trace, up to the quadrature's error,
     * which `tol` keeps far below it).
     */
    estimateWithError(
      op: SymmetricOperator,
      f: (x: number) => number,
      keys: Int32Array,
      defl: Float64Array,
      dc: number,
      opts: TraceOptions,
    ): { mean: number; se: number; probes: number } {
      const n = op.n;
      if (n - dc <= 0) return { mean: 0, se: 0, probes: 0 };
      const steps = Math.min(opts.steps, maxSteps, n - dc);
      const most = opts.targetSe !== undefined ? Math.max(opts.probes, opts.maxProbes ?? opts.probes) : opts.probes;
      let total = 0;
      let squares = 0;
      let p = 0;
      for (; p < most; p++) {
        if (opts.targetSe !== undefined && p >= opts.probes && p % opts.probes === 0) {
          const mean = total / p;
          const se = Math.sqrt(Math.max(0, squares / p - mean * mean) / (p - 1));
          if (se <= opts.targetSe(mean)) break;
        }
        for (let i = 0; i < n; i++) q[i] = sign(keys[i], 0x51a7 + p);
        deflate(q, n, defl, dc);
        let nz2 = 0;
        for (let i = 0; i < n; i++) nz2 += q[i] * q[i];
        if (nz2 === 0) continue; // counts as a sample of 0
        const inv = 1 / Math.sqrt(nz2);
        for (let i = 0; i < n; i++) {
          q[i] *= inv;
          qPrev[i] = 0;
        }
        let betaPrev = 0;
        let estimate = 0;
        let last = Number.NaN;
        for (let j = 0; j < steps; j++) {
          op.apply(q, w);
          deflate(w, n, defl, dc);
          let alpha = 0;
          for (let i = 0; i < n; i++) alpha += q[i] * w[i];
          let beta2 = 0;
          for (let i = 0; i < n; i++) {
            const v = w[i] - alpha * q[i] - betaPrev * qPrev[i];
            w[i] = v;
            beta2 += v * v;
          }
          const beta = Math.sqrt(beta2);
          diag[j] = alpha;
          off[j] = beta;
          const k = j + 1;
          const breakdown = beta <= 1e-12 * Math.max(op.normBound, 1);
          if (k === steps || breakdown || k % 4 === 0) {
            estimate = quadrature(k, f);
            if (breakdown || Math.abs(estimate - last) <= opts.tol * Math.abs(estimate)) break;
            last = estimate;
          }
          const invBeta = 1 / beta;
          for (let i = 0; i < n; i++) {
            qPrev[i] = q[i];
            q[i] = w[i] * invBeta;
          }
          betaPrev = beta;
        }
        total += nz2 * estimate;
        squares += (nz2 * estimate) ** 2;
      }
      const mean = total / p;
      const se =
        p > 1 ? Math.sqrt((Math.max(0, squares / p - mean * mean) * p) / (p - 1) / p) : Number.POSITIVE_INFINITY;
      return { mean, se, probes: p };
    },
  };
}
