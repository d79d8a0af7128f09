/** Realizations where the boundary is tightest (ours: two batches of 32). */
export declare const TIGHT_AT = 64;
/**
 * The mixing precision ρ that minimises the normal-mixture boundary at v = σ²·TIGHT_AT, by the
 * approximation of Howard et al. (2021, §3.5): ρ = v / (2 ln(1/α) + ln(1 + 2 ln(1/α))).
 */
export declare function mixingPrecision(alpha: number, v?: number): number;
/** Two-sided normal-mixture boundary on |S_t| at intrinsic time v (= σ²·t), level α. */
export declare function mixtureBoundary(v: number, alpha: number, rho?: number): number;
/** Radius of the confidence sequence for the mean of t values in [0, 1], level α, at time t. */
export declare function meanRadius(t: number, alpha: number): number;
export interface Bounds {
    lo: number;
    hi: number;
}
/** Confidence-sequence bounds of the mean of values in [0, 1] (clipped to [0, 1]). */
export declare function meanBounds(values: ArrayLike<number>, alpha: number): Bounds;
/**
 * Confidence-sequence bounds of the p-quantile ξ_p = inf{x : F(x) ≥ p} of values in [0, 1], from
 * an ascending-sorted sample of size t. With r the radius: lo = X_(k) for k = ⌈t(p − r)⌉ (0 when
 * k < 1), since every x below X_(k) has F̂(x) ≤ (k − 1)/t < p − r; hi = X_(k) for
 * k = ⌊t(p + r)⌋ + 1 (1 when k > t), since ξ_p above X_(k) would need F̂(ξ_p−) ≥ k/t > p + r.
 */
export declare function quantileBounds(sorted: ArrayLike<number>, p: number, alpha: number): Bounds;
