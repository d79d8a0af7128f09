import type { CompactGraph } from '../graph/compact.js';
import type { Mask } from '../graph/mask.js';
import type { RValueSpec } from './types.js';
/** Units per node or adjacency entry a plain pass touches (a queue search, a scan, a build). */
export declare const PLAIN_VISIT = 0.35;
/** Units per node or entry a bit-parallel level sweep touches, per 32-bit word of sources. */
export declare const WORD_VISIT = 0.18;
/** Level sweeps of one batch per level of the first source's eccentricity (+1). */
export declare const LEVELS_PER_ECCENTRICITY = 1;
/** Fixed units of one evaluation of an all-pairs metric (scratch resets, histogram). */
export declare const ALL_PAIRS_OVERHEAD = 2000;
/** Plain passes of every evaluation's structure summary (components, bridges and cut nodes). */
export declare const STRUCTURE_PASSES = 4;
/** Sparse products of a spectral metric's iterative solver, each over every adjacency entry. */
export declare const SPECTRAL_PRODUCTS = 50;
/** The surviving graph's components, each with its size, adjacency entries and first node's eccentricity. */
export interface SurvivorShape {
    /** Nodes and adjacency entries of the whole design (what a survivor build scans). */
    designEntries: number;
    sizes: number[];
    entries: number[];
    eccentricities: number[];
}
/** Components of the survivors of `mask` (none removed when absent), in the kernel's order. */
export declare function survivorShape(g: CompactGraph, mask?: Mask): SurvivorShape;
/**
 * Units of one all-pairs hop search from every survivor (bit-bfs.ts), on a shape; with `share`
 * < 1 from that share of them (a source sample, spread over the components as the sites are).
 */
export declare function hopSearchCost(shape: SurvivorShape, share?: number): number;
/** Units of one evaluation of R on the survivors described by `shape`. */
export declare function rCost(g: CompactGraph, spec: RValueSpec, shape: SurvivorShape): number;
/**
 * A seeded removal order of `units` elements (hashes of their ids, sorted): half a pass per
 * doubling, fitted on a 20,000-node G(n, L), where it is most of a union–find realization.
 */
export declare function orderCost(g: CompactGraph, units: number): number;
/** One plain pass over the design, in whole units (rankings, union–find curves, removal orders, linear metrics). */
export declare function passCost(g: CompactGraph): number;
