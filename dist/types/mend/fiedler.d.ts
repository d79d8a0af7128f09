import type { CompactGraph } from '../graph/compact.js';
export declare const DENSE_LIMIT = 400;
export interface Fiedler {
    /** μ₂ of the Laplacian (0 when the design is disconnected). */
    value: number;
    /** A unit Fiedler vector, one entry per node. */
    vector: Float64Array;
}
/** The Fiedler pair of the design's Laplacian with `extra` links (node index pairs) added. */
export declare function fiedler(g: CompactGraph, extra?: readonly (readonly [number, number])[]): Fiedler;
/** Ghosh & Boyd's first-order gain in μ₂ of adding link {a, b}: (v_a − v_b)². */
export declare function ghoshBoydScore(f: Fiedler, a: number, b: number): number;
