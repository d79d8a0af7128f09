import type { LocalGraph } from './subgraph.js';
export declare function createBandedResistance(capacity: number): {
    /**
     * The band width the ordering gives for `g` (connected, n ≥ 2), leaving the ordering in
     * place for `resistance`. The ground is the last node of the ordering.
     */
    prepare(g: LocalGraph): number;
    /** R_G of the connected graph `g` after `prepare(g)` returned `b`. */
    resistance(g: LocalGraph, b: number): number;
};
