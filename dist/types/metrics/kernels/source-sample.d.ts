/** Which sources an all-pairs metric searches from: all of them, or a seeded sample of k. */
export type SourceChoice = number | 'all';
/** A 32-bit hash of (seed, id): murmur3-style over the UTF-16 units, seeded. */
export declare function sourceHash(id: string, seed: number): number;
/**
 * The k sampled sources among nodes with these ids (indices into `ids`, ascending), or null
 * when `choice` asks for all of them or k ≥ the node count (the exact value is then cheaper).
 */
export declare function sampleSources(ids: readonly string[], choice: SourceChoice | undefined, seed: number): Int32Array | null;
/** Sample mean of y[0..k) and its finite-population standard error for a population of N. */
export declare function sampleMean(y: Float64Array, k: number, population: number): {
    mean: number;
    se: number;
};
