import type { LocalGraph } from './subgraph.js';
/** Population count of a 32-bit word (Hacker's Delight, §5-1). */
export declare function popcount32(x: number): number;
export interface HopHistogram {
    /** hist[d] for d = 1..maxDistance (index 0 unused). */
    readonly hist: Float64Array;
    /** Largest distance seen (0 when no pair is connected). */
    maxDistance: number;
}
/**
 * Searches run one source at a time in a component where the first source's eccentricity is
 * at least LONG_GRAPH_ECCENTRICITY and its levels are thin: fewer than THIN_LEVEL nodes each
 * on average (component size < THIN_LEVEL · (eccentricity + 1)). Measured crossovers: rings
 * and 10×100 grids favour one source at a time, a 30×30 grid (eccentricity 58) and
 * Barabási–Albert graphs with 60 % of their links cut (eccentricity 19) favour the batches,
 * by 2.5× and 13× — eccentricity alone was the wrong test.
 */
export declare const LONG_GRAPH_ECCENTRICITY = 12;
export declare const THIN_LEVEL = 12;
export interface HopKernel {
    /**
     * Search from `sources[0..count)` (local indices of `graph`) and return the shared
     * histogram. With `perSource` (length ≥ count), perSource[i] receives Σ_t 1/d(sources[i], t).
     */
    run(graph: LocalGraph, sources: Int32Array, count: number, perSource?: Float64Array): HopHistogram;
}
/** A histogram kernel for graphs of up to `capacity` nodes. */
export declare function createHopHistogram(capacity: number, longEccentricity?: number): HopKernel;
