import type { LocalGraph } from './subgraph.js';
/** Population count of a 32-bit word (Hacker's Delight, §5-1). */
export declare function popcount32(x: number): number;
export interface HopHistogram {
    /** hist[d] for d = 1..maxDistance (index 0 unused). */
    readonly hist: Float64Array;
    /** Largest distance seen (0 when no pair is connected). */
    maxDistance: number;
}
/** From this eccentricity of the first source on, searches run one source at a time. */
export declare const LONG_GRAPH_ECCENTRICITY = 12;
/**
 * A histogram kernel for graphs of up to `capacity` nodes. `run(graph, sources, count)`
 * searches from `sources[0..count)` (local indices) and returns the shared histogram.
 */
export declare function createHopHistogram(capacity: number): {
    run(graph: LocalGraph, sources: Int32Array, count: number): HopHistogram;
};
