// One extremal eigenvalue (and, on request, its eigenvector) of a large sparse symmetric
// operator by the plain Lanczos three-term recurrence, with NO reorthogonalisation against
// the basis. Why: on a graph Laplacian a product costs a few flops per link, while full
// reorthogonalisation costs about 4·n flops per basis vector per step; in the thick-restart
// solver (lanczos.ts) that dominated the time of the Fiedler value (BA(5000, 2): 1.6 s).
// Why it is still exact: in finite precision, loss of orthogonality goes hand in hand with
// convergence of Ritz values, and a Ritz value θ of the tridiagonal T_k whose residual
// estimate β_k·|s_k| is small lies that close to an eigenvalue of the operator (Paige, Linear
// Algebra Appl. 34:235, 1980); lost orthogonality only adds copies ("ghosts") of values that
// have already converged (Cullum & Willoughby, Lanczos Algorithms for Large Symmetric
// Eigenvalue Computations, vol. 1, 1985). The nested T_k interlace, so the smallest Ritz value
// falls monotonically to the smallest eigenvalue; we stop when its residual estimate is
// ≤ tol·|θ|, the same test as lanczos.ts. The deflation vector (the constant vector of a
// Laplacian) is projected out of every new direction, so its eigenvalue never reappears.
// T_k's smallest eigenvalue comes from Sturm-sequence bisection and its eigenvector (for s_k)
// from inverse iteration with the LDLᵀ factors at the bisection's lower end, where T − xI is
// positive definite, so the factorisation needs no pivoting. The eigenvector of the operator,
// when asked for, comes from a second run of the same recurrence (bit-identical vectors)
// accumulating Σ y_j v_j: O(n) storage instead of O(n·k). The start vector is a fixed
// function of the original node indices (plus the caller's, if given), so results do not
// depend on call order. Structured starts (degree, level sets from a peripheral node) were
// tried on the benchmark graphs and saved at most 6% of the steps: Lanczos needs no good start.

import { noise } from './hash-noise.js';
import type { SymmetricOperator } from './lanczos.js';

export interface ExtremalRequest {
  which: 'smallest' | 'largest';
  /** A unit vector to keep out of the search space (e.g. the constant vector of a Laplacian). */
  deflate?: Float64Array;
  /** Stop when the Ritz residual ≤ tol·|θ| (default 1e-10), floored at 1e-14·normBound. */
  tol?: number;
  /** Start vector (length ≥ n; 1e-3 of the default is mixed in); null for the default. */
  start?: Float64Array | null;
  /** Original index per entry, for the default start vector (identity when absent). */
  keys?: Int32Array | null;
  /** Upper limit on operator applications (default 60·n, at least 2000). */
  maxApplications?: number;
  /** Also form the unit eigenvector (in `vector`); costs a second pass. */
  wantVector?: boolean;
}

export interface ExtremalResult {
  value: number;
  /** The eigenvector in entries 0..n-1 when `wantVector` was set. */
  vector: Float64Array;
  /** Operator applications of the first pass (the second pass repeats them). */
  applications: number;
  /** Lanczos steps taken (the order of T). */
  steps: number;
  converged: boolean;
}

// Module-level kernels on explicit arrays keep the hot call sites monomorphic.

function dot(a: Float64Array, ao: number, b: Float64Array, n: number): number {
  let s = 0;
  for (let i = 0; i < n; i++) s += a[ao + i] * b[i];
  return s;
}

function project(w: Float64Array, d: Float64Array | undefined, n: number): void {
  if (!d) return;
  const c = dot(d, 0, w, n);
  for (let i = 0; i < n; i++) w[i] -= c * d[i];
}

/**
 * w ← sgn·A v − βprev·u; returns α = vᵀw. The coupling to u is removed before α is formed
 * (the stabler of Paige's variants).
 */
function couple(
  op: SymmetricOperator,
  sgn: number,
  v: Float64Array,
  u: Float64Array,
  w: Float64Array,
  betaPrev: number,
  n: number,
): number {
  op.apply(v, w);
  let alpha = 0;
  for (let i = 0; i < n; i++) {
    const x = sgn * w[i] - betaPrev * u[i];
    w[i] = x;
    alpha += x * v[i];
  }
  return alpha;
}

/**
 * w ← w − α·v; returns β² = ‖w − c·d‖² and leaves c = dᵀw in out[0]. One sweep instead of
 * three (subtract, project, norm): w is orthogonal to d up to rounding, so c is tiny and
 * ‖w‖² − c² loses nothing. nextVector then applies the projection while normalising.
 */
function orthogonalNorm(
  w: Float64Array,
  v: Float64Array,
  alpha: number,
  d: Float64Array | undefined,
  n: number,
  out: Float64Array,
): number {
  let q = 0;
  let c = 0;
  if (d)
    for (let i = 0; i < n; i++) {
      const x = w[i] - alpha * v[i];
      w[i] = x;
      q += x * x;
      c += x * d[i];
    }
  else
    for (let i = 0; i < n; i++) {
      const x = w[i] - alpha * v[i];
      w[i] = x;
      q += x * x;
    }
  out[0] = c;
  return Math.max(0, q - c * c);
}

/** v ← (w − c·d) / β. */
function nextVector(v: Float64Array, w: Float64Array, c: number, d: Float64Array | undefined, inv: number, n: number) {
  if (d) for (let i = 0; i < n; i++) v[i] = (w[i] - c * d[i]) * inv;
  else for (let i = 0; i < n; i++) v[i] = w[i] * inv;
}

/** Eigenvalues of T (diagonal a, off-diagonal b; b[i] joins i and i+1) below x: Sturm count. */
function countBelow(a: Float64Array, b: Float64Array, k: number, x: number): number {
  let c = 0;
  let q = a[0] - x;
  for (let i = 0; ; i++) {
    if (q < 0) c++;
    if (i + 1 === k) return c;
    if (q === 0) q = 1e-300; // a zero pivot: the limit from above (LAPACK's pivmin idea)
    q = a[i + 1] - x - (b[i] * b[i]) / q;
  }
}

export function createExtremalLanczos(capacity: number) {
  const stride = Math.max(1, capacity);
  let v = new Float64Array(stride);
  let u = new Float64Array(stride);
  const w = new Float64Array(stride);
  const vector = new Float64Array(stride);
  let cap = 256;
  let a = new Float64Array(cap);
  let b = new Float64Array(cap);
  let piv = new Float64Array(cap);
  let z = new Float64Array(cap);
  const out = new Float64Array(1);
  const result: ExtremalResult = { value: 0, vector, applications: 0, steps: 0, converged: false };

  function grow(): void {
    cap *= 2;
    const na = new Float64Array(cap);
    na.set(a);
    a = na;
    const nb = new Float64Array(cap);
    nb.set(b);
    b = nb;
    piv = new Float64Array(cap);
    z = new Float64Array(cap);
  }

  /**
   * Smallest eigenvalue θ of T_k and the last entry of its unit eigenvector (left in z).
   * Bisection to full precision, then two inverse-iteration solves at the lower end.
   */
  function smallestRitz(k: number, upper: number): { theta: number; last: number } {
    let lo = Infinity;
    let hi = -Infinity;
    for (let i = 0; i < k; i++) {
      const r = (i > 0 ? Math.abs(b[i - 1]) : 0) + (i + 1 < k ? Math.abs(b[i]) : 0);
      lo = Math.min(lo, a[i] - r);
      hi = Math.max(hi, a[i] + r);
    }
    hi = Math.min(hi, upper);
    lo -= 1e-14 * Math.max(1, Math.abs(lo));
    for (;;) {
      const mid = 0.5 * (lo + hi);
      if (mid <= lo || mid >= hi) break;
      if (countBelow(a, b, k, mid) > 0) hi = mid;
      else lo = mid;
    }
    // LDLᵀ of T − lo·I (all eigenvalues ≥ lo, so the pivots are ≥ 0).
    const tiny = 1e-300;
    piv[0] = a[0] - lo || tiny;
    for (let i = 1; i < k; i++) piv[i] = a[i] - lo - (b[i - 1] * b[i - 1]) / piv[i - 1] || tiny;
    z.fill(1, 0, k);
    for (let it = 0; it < 2; it++) {
      for (let i = 1; i < k; i++) z[i] -= (b[i - 1] / piv[i - 1]) * z[i - 1];
      for (let i = 0; i < k; i++) z[i] /= piv[i];
      for (let i = k - 2; i >= 0; i--) z[i] -= (b[i] / piv[i]) * z[i + 1];
      let s = 0;
      for (let i = 0; i < k; i++) s = Math.max(s, Math.abs(z[i]));
      for (let i = 0; i < k; i++) z[i] /= s; // keep it finite before the next solve
      let nz = 0;
      for (let i = 0; i < k; i++) nz += z[i] * z[i];
      nz = Math.sqrt(nz);
      for (let i = 0; i < k; i++) z[i] /= nz;
    }
    return { theta: 0.5 * (lo + hi), last: z[k - 1] };
  }

  function startVector(op: SymmetricOperator, req: ExtremalRequest, salt: number): number {
    const n = op.n;
    const keys = req.keys ?? null;
    for (let i = 0; i < n; i++) v[i] = noise(keys ? keys[i] : i, 0x5eed + salt);
    if (req.start && salt === 0) {
      // A caller's start keeps 1e-3 of the seeded noise: a start that is (nearly) an
      // eigenvector would otherwise end the recurrence at once in an invariant subspace that
      // need not hold the wanted value (there is no basis to continue orthogonally to).
      let sv = 0;
      let ss = 0;
      for (let i = 0; i < n; i++) {
        sv += v[i] * v[i];
        ss += req.start[i] * req.start[i];
      }
      const c = 1e-3 * Math.sqrt(ss / Math.max(sv, 1e-300));
      for (let i = 0; i < n; i++) v[i] = req.start[i] + c * v[i];
    }
    project(v, req.deflate, n);
    let s = 0;
    for (let i = 0; i < n; i++) s += v[i] * v[i];
    return Math.sqrt(s);
  }

  return {
    result,
    solve(op: SymmetricOperator, req: ExtremalRequest): ExtremalResult {
      const n = op.n;
      const d = req.deflate;
      const sgn = req.which === 'largest' ? -1 : 1;
      const tol = req.tol ?? 1e-10;
      const floor = 1e-14 * Math.max(op.normBound, 1e-300);
      const maxApps = req.maxApplications ?? Math.max(2000, 60 * n);
      result.applications = 0;
      result.steps = 0;
      result.converged = false;
      result.value = 0;
      if (n - (d ? 1 : 0) <= 0) return result;

      // Start vector (a fresh seeded one if the given one lies in the deflation space).
      let salt = 0;
      let norm0 = startVector(op, req, salt);
      while (!(norm0 > 1e-8) && salt < 4) norm0 = startVector(op, req, ++salt);
      for (let i = 0; i < n; i++) v[i] = v[i] / norm0;
      u.fill(0, 0, n);
      let betaPrev = 0;
      let k = 0;
      let nextCheck = 8;
      let upper = Infinity;
      let theta: number;
      for (;;) {
        if (k === cap) grow();
        const alpha = couple(op, sgn, v, u, w, betaPrev, n);
        a[k] = alpha;
        const beta = Math.sqrt(orthogonalNorm(w, v, alpha, d, n, out));
        b[k] = beta;
        k++;
        result.applications++;
        // An invariant subspace (β at rounding level) makes θ exact; otherwise test the
        // residual estimate every so often (every k/16 steps: at most ~6% extra steps).
        const breakdown = beta <= floor;
        if (breakdown || k >= nextCheck || result.applications >= maxApps) {
          const r = smallestRitz(k, upper);
          theta = r.theta;
          // θ_min(T_k) only falls as k grows (interlacing): the next bisection starts below θ,
          // with room for the rounding of this one.
          upper = theta + 1e-12 * Math.max(Math.abs(theta), op.normBound, 1);
          const converged = breakdown || beta * Math.abs(r.last) <= Math.max(tol * Math.abs(theta), floor);
          if (converged || result.applications >= maxApps) {
            result.converged = converged;
            break;
          }
          nextCheck = k + Math.max(8, k >> 4);
        }
        const t = u;
        u = v;
        v = t;
        nextVector(v, w, out[0], d, 1 / beta, n);
        betaPrev = beta;
      }
      result.value = sgn * theta;
      result.steps = k;
      if (req.wantVector) {
        // Second pass: the same recurrence from the same start, accumulating Σ z_j v_j.
        startVector(op, req, salt);
        for (let i = 0; i < n; i++) v[i] = v[i] / norm0;
        u.fill(0, 0, n);
        for (let i = 0; i < n; i++) vector[i] = z[0] * v[i];
        betaPrev = 0;
        for (let j = 1; j < k; j++) {
          const alpha = couple(op, sgn, v, u, w, betaPrev, n);
          orthogonalNorm(w, v, alpha, d, n, out);
          const beta = b[j - 1];
          const t = u;
          u = v;
          v = t;
          nextVector(v, w, out[0], d, 1 / beta, n);
          const c = z[j];
          for (let i = 0; i < n; i++) vector[i] += c * v[i];
          betaPrev = beta;
        }
        project(vector, d, n);
        let s = 0;
        for (let i = 0; i < n; i++) s += vector[i] * vector[i];
        s = Math.sqrt(s);
        for (let i = 0; i < n; i++) vector[i] /= s;
      }
      return result;
    },
  };
}
