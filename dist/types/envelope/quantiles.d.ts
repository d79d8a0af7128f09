export declare const DEFAULT_CONFIDENCE = 0.95;
/** Hyndman–Fan type 7 quantile of an ascending-sorted sample. Empty sample: NaN. */
export declare function quantileSorted(sorted: ArrayLike<number>, p: number): number;
export interface QuantileInterval {
    /** 1-based ranks; 0 means "the lower bound of R", n + 1 "the upper bound". */
    r: number;
    s: number;
    /** Exact binomial coverage of [X_(r), X_(s)]. */
    coverage: number;
}
/** Order-statistic ranks for the p-quantile of n observations at the given confidence. */
export declare function quantileRanks(n: number, p: number, confidence?: number): QuantileInterval;
export interface QuantileEstimate {
    value: number;
    lo: number;
    hi: number;
    se: number;
}
/**
 * The p-quantile of an ascending-sorted sample with its order-statistic interval and standard
 * error. `bounds` are the a-priori limits of the variable (R lies in [0, 1]).
 */
export declare function quantileEstimate(sorted: ArrayLike<number>, p: number, confidence?: number, bounds?: readonly [number, number]): QuantileEstimate;
/** Binomial(n, p) probabilities 0..n, computed in log space (no overflow for large n). */
export declare function binomialPmf(n: number, p: number): Float64Array;
/**
 * Standard normal quantile (P. J. Acklam's rational approximation, relative error < 1.2e-9;
 * from memory). Used only for ranks and the width → SE conversion.
 */
export declare function normalQuantile(p: number): number;
