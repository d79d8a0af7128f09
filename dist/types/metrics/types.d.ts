import type { CompactGraph } from '../graph/compact.js';
import type { Mask } from '../graph/mask.js';
export type MetricId = 'efficiency' | 'weighted_efficiency' | 'largest_component' | 'pair_connectivity' | 'average_hop' | 'diameter' | 'algebraic_connectivity' | 'effective_resistance' | 'natural_connectivity' | 'spectral_radius' | 'node_connectivity' | 'link_connectivity' | 'bridges' | 'cut_nodes' | 'demand_served';
/** How the cost of one evaluation grows; used by budgets and the engine's planning. */
export type CostClass = 'linear' | 'all-pairs' | 'spectral' | 'flow';
export interface MetricValue {
    /**
     * The metric in its own unit (hops, eigenvalue, count...). May be Infinity (effective
     * resistance of a disconnected survivor) or NaN (hop metrics with no pair left); JSON
     * output writes both as null. `normalized` is always a finite number in [0, 1].
     */
    raw: number;
    /** In [0, 1]; 1 = the best the metric can say, 0 = no robustness left. */
    normalized: number;
    /**
     * Standard error of `raw` (and of `normalized`, the same scale for the metrics that sample)
     * when the value is an estimate from sampled sources (`MetricOptions.sources`); absent when
     * the value is exact.
     */
    se?: number;
}
export interface MetricOptions {
    /** Latency budget factor for demand_served (overrides the design's). */
    latencyBudget?: number;
    /**
     * Spectral metrics: components of up to this many nodes use the exact dense eigen-solver,
     * larger ones the iterative kernels (Lanczos, stochastic Lanczos quadrature). The default
     * depends on the metric (see its file); Infinity forces the exact path.
     */
    denseLimit?: number;
    /**
     * effective_resistance: survivors whose banded factorisation costs at most this many
     * operations (N·b², b the band width after reverse Cuthill–McKee) are solved exactly even
     * above `denseLimit` (default 5e7); larger ones are estimated.
     */
    exactWork?: number;
    /**
     * Spectral metrics: start each Lanczos run from the previous evaluation's eigenvector
     * (faster on sequences of similar masks). Off by default, because results then depend on
     * the order of evaluation in the last digits (about 1e-10 relative) — with it off, every
     * value is a pure function of the graph and the mask, whatever the thread count.
     * algebraic_connectivity ignores it (its solver is faster cold; kernels/extremal-eigen.ts).
     */
    warmStart?: boolean;
    /**
     * efficiency: search from every node ('all', the default) or from a seeded sample of this
     * many nodes (kernels/source-sample.ts): the value is then the unbiased sample estimate and
     * `se` its standard error. The sample depends only on `sourceSeed` and the node ids, so base
     * and head share their sources and an unchanged design gives the same value exactly.
     */
    sources?: number | 'all';
    /** Seed of the source sample (default 0); pass the policy's seed. */
    sourceSeed?: number;
}
/** An evaluator bound to one graph; reuse it for every mask. */
export type MetricEvaluator = (mask: Mask) => MetricValue;
export interface Metric {
    readonly id: MetricId;
    /** One line for help texts and reports. */
    readonly description: string;
    /** One line saying how raw maps to [0, 1] (shown in `metrics --help` and the README). */
    readonly normalization: string;
    readonly cost: CostClass;
    /** False when the design lacks what the metric needs (weights, demands). */
    appliesTo(g: CompactGraph): boolean;
    /** What appliesTo checks, in words, for the error a design it does not apply to gets. */
    readonly needs?: {
        what: string;
        hint: string;
    };
    create(g: CompactGraph, options?: MetricOptions): MetricEvaluator;
}
