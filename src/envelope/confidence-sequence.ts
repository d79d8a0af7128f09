// Anytime-valid confidence sequences for values in [0, 1] (docs/METHODS.md §7.6): intervals that
// hold at every sample size at once, so realizations may be added in batches and the run stopped
// as soon as a decision is settled, without the repeated looks inflating the error.
//
// Boundary: the two-sided normal-mixture boundary (Robbins 1970; Howard, Ramdas, McAuliffe &
// Sekhon, "Time-uniform, nonparametric, nonasymptotic confidence sequences", Ann. Statist.
// 49(2):1055–1080, 2021). For S_t a sum of t increments that are sub-Gaussian with variance
// proxy σ² (V_t = σ²t), mixing exp(λS_t − λ²V_t/2) over λ ~ N(0, 1/ρ) and Ville's inequality give
//   P(∃t ≥ 1: |S_t| ≥ √((V_t + ρ) · ln((V_t + ρ) / (ρ α²)))) ≤ α.
// A value in [0, 1] minus its mean is sub-Gaussian with σ² = 1/4 (Hoeffding's lemma), so the
// mean of t values lies within radius(t, α) of the true mean at every t, with probability ≥ 1 − α.
// ρ only tunes where the boundary is tightest (any ρ > 0 is valid); it is fixed at the value
// that makes it tightest near TIGHT_AT realizations (ours), never chosen from the data.
//
// Quantiles: for a fixed level p the indicators 1[X_i ≤ ξ_p] (mean F(ξ_p) ≥ p) and 1[X_i < ξ_p]
// (mean ≤ p) are values in [0, 1], so the empirical distribution function at the true quantile
// stays within the same radius; inverting that gives order statistics as bounds (quantileBounds).
// This is the construction of Howard & Ramdas, "Sequential estimation of quantiles with
// applications to A/B-testing and best-arm identification", Bernoulli 28(3), 2022 (fixed-p
// form), with the Hoeffding-type boundary above instead of their beta-binomial one.

/** Realizations where the boundary is tightest (ours: two batches of 32). */
export const TIGHT_AT = 64;

/**
 * The mixing precision ρ that minimises the normal-mixture boundary at v = σ²·TIGHT_AT, by the
 * approximation of Howard et al. (2021, §3.5): ρ = v / (2 ln(1/α) + ln(1 + 2 ln(1/α))).
 */
export function mixingPrecision(alpha: number, v = TIGHT_AT / 4): number {
  const l = Math.log(1 / alpha);
  return v / (2 * l + Math.log(1 + 2 * l));
}

/** Two-sided normal-mixture boundary on |S_t| at intrinsic time v (= σ²·t), level α. */
export function mixtureBoundary(v: number, alpha: number, rho = mixingPrecision(alpha)): number {
  if (!(alpha > 0 && alpha < 1)) throw new RangeError(`alpha must be in (0, 1), got ${alpha}`);
  return Math.sqrt((v + rho) * Math.log((v + rho) / (rho * alpha * alpha)));
}

/** Radius of the confidence sequence for the mean of t values in [0, 1], level α, at time t. */
export function meanRadius(t: number, alpha: number): number {
  if (t <= 0) return Infinity;
  return mixtureBoundary(t / 4, alpha) / t;
}

export interface Bounds {
  lo: number;
  hi: number;
}

/** Confidence-sequence bounds of the mean of values in [0, 1] (clipped to [0, 1]). */
export function meanBounds(values: ArrayLike<number>, alpha: number): Bounds {
  const t = values.length;
  if (t === 0) return { lo: 0, hi: 1 };
  let sum = 0;
  for (let i = 0; i < t; i++) sum += values[i];
  const r = meanRadius(t, alpha);
  return { lo: Math.max(0, sum / t - r), hi: Math.min(1, sum / t + r) };
}

/**
 * Confidence-sequence bounds of the p-quantile ξ_p = inf{x : F(x) ≥ p} of values in [0, 1], from
 * an ascending-sorted sample of size t. With r the radius: lo = X_(k) for k = ⌈t(p − r)⌉ (0 when
 * k < 1), since every x below X_(k) has F̂(x) ≤ (k − 1)/t < p − r; hi = X_(k) for
 * k = ⌊t(p + r)⌋ + 1 (1 when k > t), since ξ_p above X_(k) would need F̂(ξ_p−) ≥ k/t > p + r.
 */
export function quantileBounds(sorted: ArrayLike<number>, p: number, alpha: number): Bounds {
  const t = sorted.length;
  const r = meanRadius(t, alpha);
  const kLo = Math.ceil(t * (p - r) - 1e-12);
  const kHi = Math.floor(t * (p + r) + 1e-12) + 1;
  return { lo: kLo >= 1 ? sorted[kLo - 1] : 0, hi: kHi <= t ? sorted[kHi - 1] : 1 };
}
