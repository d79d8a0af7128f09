import type { CompactGraph } from '../graph/compact.js';
import type { Mask } from '../graph/mask.js';
import type { MetricId } from '../metrics/types.js';
import type { RValueSpec } from './types.js';
/** Units per node or adjacency entry a plain pass touches (a queue search, a scan, a build). */
export declare const PLAIN_VISIT = 0.35;
/** Units per node or entry a bit-parallel level sweep touches, per 32-bit word of sources. */
export declare const WORD_VISIT = 0.18;
/** Level sweeps of one batch per level of the first source's eccentricity (+1). */
export declare const LEVELS_PER_ECCENTRICITY = 1;
/** Share of a long component's levels swept in full beyond a batch's span (fitted on grids of 20–50 a side). */
export declare const FRONTIER_SHARE = 0.45;
/** Fixed units of one evaluation of an all-pairs metric (scratch resets, histogram). */
export declare const ALL_PAIRS_OVERHEAD = 2000;
/** Plain passes of every evaluation's structure summary (components, bridges and cut nodes). */
export declare const STRUCTURE_PASSES = 4;
/** Passes of every spectral evaluation: the simple survivor graph and its components. */
export declare const SPECTRAL_BUILD_PASSES = 1.3;
/** Units per n³ of a dense symmetric eigenvalue solve (reduction and QL), natural_connectivity at 750–1,000 nodes. */
export declare const DENSE_CUBE = 0.05;
/** μ₂ by the plain Lanczos recurrence: component sweeps, base, per node and per level of eccentricity. */
export declare const FIEDLER_PASSES = 120;
export declare const FIEDLER_PASSES_PER_NODE = 0.06;
export declare const FIEDLER_PASSES_PER_LEVEL = 0.5;
/** λ₁ by thick-restart Lanczos (with its reorthogonalisation): component sweeps, base and per level. */
export declare const RADIUS_PASSES = 20;
export declare const RADIUS_PASSES_PER_LEVEL = 10;
/** natural_connectivity above its dense limit: top eigenpairs and 32–256 quadrature probes, in sweeps. */
export declare const NATURAL_PASSES = 1500;
/** effective_resistance above its exact limits: 32 probes of up to 120 Lanczos steps, in sweeps. */
export declare const RESISTANCE_PASSES = 1500;
/** Units per n·(b + 2)² of the banded factorisation and Takahashi's recurrence. */
export declare const BANDED_UNIT = 0.15;
/** Sweeps of the reverse Cuthill–McKee ordering and the band's set-up before it. */
export declare const BANDED_PASSES = 10;
/** The surviving graph's components, each with its size, adjacency entries and first node's eccentricity. */
export interface SurvivorShape {
    /** Nodes and adjacency entries of the whole design (what a survivor build scans). */
    designEntries: number;
    sizes: number[];
    entries: number[];
    eccentricities: number[];
    /**
     * Nodes in the widest breadth-first level from a far node (the first node's last one, as a
     * Cuthill–McKee ordering starts from a peripheral node): about that ordering's band. Only
     * with `bands`; otherwise from the first node.
     */
    widths: number[];
}
/** Components of the survivors of `mask` (none removed when absent), in the kernel's order. */
export declare function survivorShape(g: CompactGraph, mask?: Mask, bands?: boolean): SurvivorShape;
/** Whether costing R needs the survivors' band widths (survivorShape's `bands`). */
export declare function needsBands(spec: RValueSpec): boolean;
/**
 * Units of one all-pairs hop search from every survivor (bit-bfs.ts), on a shape; with `share`
 * < 1 from that share of them (a source sample, spread over the components as the sites are).
 */
export declare function hopSearchCost(shape: SurvivorShape, share?: number): number;
/** Units of one evaluation of R on the survivors described by `shape`. */
export declare function rCost(g: CompactGraph, spec: RValueSpec, shape: SurvivorShape): number;
/** Units of one evaluation of a spectral metric on the survivors described by `shape` (see the header). */
export declare function spectralCost(id: MetricId, shape: SurvivorShape): number;
/**
 * A seeded removal order of `units` elements (hashes of their ids, sorted): half a pass per
 * doubling, fitted on a 20,000-node G(n, L), where it is most of a union–find realization.
 */
export declare function orderCost(g: CompactGraph, units: number): number;
/** One plain pass over the design, in whole units (rankings, union–find curves, removal orders, linear metrics). */
export declare function passCost(g: CompactGraph): number;
