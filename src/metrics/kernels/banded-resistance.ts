// Exact effective graph resistance of a connected local graph without any eigenvalue:
// ground one node, factor the reduced Laplacian M (symmetric positive definite) as LDLᵀ in
// band storage after a reverse Cuthill–McKee ordering (Cuthill & McKee, Proc. ACM 1969;
// George & Liu, "Computer Solution of Large Sparse Positive Definite Systems", 1981), take
// the diagonal of M⁻¹ by Takahashi's recurrence on the band (Takahashi, Fagan & Chin, 1973:
// Z = D⁻¹L⁻¹ + (I − Lᵀ)Z needs only entries inside the band), and one solve M x = 1. Then
//   R_G = N·tr(M⁻¹) − 1ᵀM⁻¹1,
// which follows from ω_ij = Z_ii + Z_jj − 2Z_ij and ω_ig = Z_ii for the ground g (derived
// here; checked against the closed forms and NumPy in the tests). Cost O(N·b²) for band
// width b — tiny for the long, sparse graphs real networks are (a few dozen for most zoo
// networks), up to O(N³) for expanders, so the caller caps the work.

import type { LocalGraph } from './subgraph.js';

export function createBandedResistance(capacity: number) {
  const perm = new Int32Array(capacity); // new position → local node
  const place = new Int32Array(capacity); // local node → new position
  const queue = new Int32Array(capacity);
  const seen = new Uint8Array(capacity);
  const order = new Int32Array(capacity);
  const d = new Float64Array(capacity);
  const x = new Float64Array(capacity);
  let band = new Float64Array(0);
  let inverse = new Float64Array(0);

  /** Breadth-first order from `start`, neighbours by increasing degree; returns the last level's first node. */
  function cuthillMcKee(g: LocalGraph, start: number): number {
    seen.fill(0, 0, g.n);
    let head = 0;
    let tail = 0;
    queue[tail++] = start;
    seen[start] = 1;
    let lastLevelStart = start;
    let levelEnd = 1;
    while (head < tail) {
      if (head === levelEnd) {
        lastLevelStart = queue[head];
        levelEnd = tail;
      }
      const v = queue[head++];
      const from = tail;
      for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
        const w = g.neighbors[p];
        if (seen[w]) continue;
        seen[w] = 1;
        // insertion by degree (neighbour lists are short)
        const dw = g.offsets[w + 1] - g.offsets[w];
        let k = tail++;
        while (k > from && g.offsets[queue[k - 1] + 1] - g.offsets[queue[k - 1]] > dw) {
          queue[k] = queue[k - 1];
          k--;
        }
        queue[k] = w;
      }
    }
    return lastLevelStart;
  }

  return {
    /**
     * The band width the ordering gives for `g` (connected, n ≥ 2), leaving the ordering in
     * place for `resistance`. The ground is the last node of the ordering.
     */
    prepare(g: LocalGraph): number {
      const n = g.n;
      // A pseudo-peripheral start: two sweeps from a minimum-degree node (George & Liu).
      let start = 0;
      for (let v = 1; v < n; v++)
        if (g.offsets[v + 1] - g.offsets[v] < g.offsets[start + 1] - g.offsets[start]) start = v;
      start = cuthillMcKee(g, start);
      cuthillMcKee(g, start);
      for (let i = 0; i < n; i++) order[i] = queue[n - 1 - i]; // reversed
      for (let i = 0; i < n; i++) {
        perm[i] = order[i];
        place[order[i]] = i;
      }
      let b = 0;
      for (let v = 0; v < n; v++) {
        for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
          const gap = Math.abs(place[v] - place[g.neighbors[p]]);
          if (gap > b) b = gap;
        }
      }
      return b;
    },

    /** R_G of the connected graph `g` after `prepare(g)` returned `b`. */
    resistance(g: LocalGraph, b: number): number {
      const n = g.n;
      const m = n - 1; // the reduced system: positions 0..n-2; position n-1 is the ground
      const w = b + 1;
      if (band.length < m * w) {
        band = new Float64Array(m * w);
        inverse = new Float64Array(m * w);
      }
      // band[i*w + (i-j)] holds entry (i, j), j ≤ i, of M, then of L (unit diagonal → d).
      band.fill(0, 0, m * w);
      for (let i = 0; i < m; i++) {
        const v = perm[i];
        band[i * w] = g.offsets[v + 1] - g.offsets[v];
        for (let p = g.offsets[v]; p < g.offsets[v + 1]; p++) {
          const j = place[g.neighbors[p]];
          if (j < i) band[i * w + (i - j)] -= 1;
        }
      }
      // LDLᵀ: row by row, L_ij = (M_ij − Σ_k L_ik d_k L_jk) / d_j.
      for (let i = 0; i < m; i++) {
        const lo = Math.max(0, i - b);
        const ri = i * w;
        for (let j = lo; j < i; j++) {
          const rj = j * w;
          let s = band[ri + (i - j)];
          const k0 = Math.max(lo, j - b);
          for (let k = k0; k < j; k++) s -= band[ri + (i - k)] * d[k] * band[rj + (j - k)];
          band[ri + (i - j)] = s / d[j];
        }
        let s = band[ri];
        for (let k = lo; k < i; k++) {
          const l = band[ri + (i - k)];
          s -= l * l * d[k];
        }
        d[i] = s;
      }
      // Takahashi: Z_ij (i < j ≤ i+b) = −Σ_{k>i} L_ki Z_kj, Z_ii = 1/d_i − Σ_{k>i} L_ki Z_ki,
      // from the last row up. inverse[j*w + (j-i)] holds Z_ij = Z_ji for i ≤ j.
      let trace = 0;
      for (let i = m - 1; i >= 0; i--) {
        const hi = Math.min(m - 1, i + b);
        for (let j = hi; j > i; j--) {
          let s = 0;
          for (let k = i + 1; k <= hi; k++) {
            const lki = band[k * w + (k - i)];
            if (lki === 0) continue;
            s -= lki * (k <= j ? inverse[j * w + (j - k)] : inverse[k * w + (k - j)]);
          }
          inverse[j * w + (j - i)] = s;
        }
        let s = 1 / d[i];
        for (let k = i + 1; k <= hi; k++) s -= band[k * w + (k - i)] * inverse[k * w + (k - i)];
        inverse[i * w] = s;
        trace += s;
      }
      // M x = 1: forward with L, scale by D, back with Lᵀ.
      for (let i = 0; i < m; i++) {
        let s = 1;
        for (let k = Math.max(0, i - b); k < i; k++) s -= band[i * w + (i - k)] * x[k];
        x[i] = s;
      }
      for (let i = 0; i < m; i++) x[i] /= d[i];
      for (let i = m - 1; i >= 0; i--) {
        let s = x[i];
        for (let k = i + 1; k <= Math.min(m - 1, i + b); k++) s -= band[k * w + (k - i)] * x[k];
        x[i] = s;
      }
      let total = 0;
      for (let i = 0; i < m; i++) total += x[i];
      return n * trace - total;
    },
  };
}
