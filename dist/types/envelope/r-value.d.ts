import type { CompactGraph } from '../graph/compact.js';
import type { Mask } from '../graph/mask.js';
import type { MetricId, MetricOptions } from '../metrics/types.js';
import type { RValueSpec } from './types.js';
import type { ConnectivityCurve } from './union-find.js';
export type RFunction = (mask: Mask) => number;
export declare function validateRSpec(spec: RValueSpec): void;
/** Combines normalized values in spec order; the one formula every path uses, so results agree bit for bit. */
export declare function combineR(spec: RValueSpec, values: ArrayLike<number>): number;
/** A metric of R that this design cannot support: its id, what it needs and how to fix it. */
export interface UnsupportedMetric {
    id: MetricId;
    message: string;
    hint: string;
}
/**
 * The first metric of R that does not apply to the design (Metric.appliesTo), in spec order;
 * undefined when R can be computed. A metric that does not apply would score 0 on every state,
 * which reads as "no robustness" rather than "cannot be computed", so callers refuse instead.
 */
export declare function unsupportedMetric(g: CompactGraph, spec: RValueSpec): UnsupportedMetric | undefined;
/** Thrown by createRValue for a design one of R's metrics does not apply to. */
export declare class UnsupportedMetricError extends RangeError {
    readonly problem: UnsupportedMetric;
    constructor(problem: UnsupportedMetric);
}
export declare function createRValue(g: CompactGraph, spec: RValueSpec, options?: MetricOptions): RFunction;
/** Whether R, on this design, is an estimate from sampled sources (fewer sources than sites). */
export declare function samplesSources(g: CompactGraph, spec: RValueSpec): boolean;
/**
 * Standard error of R from sampled sources on each of these states: the sampled metrics' se
 * combined as R combines them (weighted mean: Σ w·se / Σ w, a bound whatever the errors'
 * correlation, by the triangle inequality for standard deviations; min: the largest se).
 * 0 for every state when R is exact on this design.
 */
export declare function rSourceErrors(g: CompactGraph, spec: RValueSpec, masks: readonly Mask[]): number[];
/**
 * When R uses only largest_component and pair_connectivity, R after k removals follows from a
 * union–find curve (union-find.ts) with no per-step recomputation: returns that mapping, with
 * exactly the normalisations of the registry metrics. Otherwise null.
 */
export declare function unionFindR(g: CompactGraph, spec: RValueSpec): ((curve: ConnectivityCurve, k: number) => number) | null;
/**
 * Work of one evaluation of R in "graph passes" (one pass visits every node and link once):
 * linear metrics 1, all-pairs metrics N (one search per node), spectral 50 (a few dozen
 * sparse products), flow N. The engine's budget multiplies passes by N + L.
 */
export declare function rPasses(g: CompactGraph, spec: RValueSpec): number;
