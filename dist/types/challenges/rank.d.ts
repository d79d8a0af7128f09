/** Scores rounded to multiples of max/2^32 (integers 0..2^32); all-zero scores stay 0. */
export declare function quantizeScores(score: Float64Array, eligible: Uint8Array): Float64Array;
/** Eligible indices by descending score, ties to the lower index; the first `steps` of them. */
export declare function rankDescending(score: ArrayLike<number>, eligible: Uint8Array, steps: number): Int32Array;
/** Static attack order from floating-point scores (quantized first). */
export declare function rankScores(score: Float64Array, eligible: Uint8Array, steps: number): Int32Array;
/**
 * The candidate with the highest score (after rounding to 2^-32 of the maximum), lowest index
 * on ties; -1 when there is no candidate.
 */
export declare function argmaxTied(score: Float64Array, candidate: Uint8Array): number;
