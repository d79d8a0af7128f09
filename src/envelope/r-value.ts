// The R-value: one number in [0, 1] per state of the design, combining normalized metrics
// (docs/METHODS.md §4, the R-model: R = Σ s_i t_i with weights s_i summing to 1) either as their
// weighted mean or as their minimum (a "weakest aspect" score; weights only select metrics).
// One metric alone is the common case.

import type { CompactGraph } from '../graph/compact.js';
import type { Mask } from '../graph/mask.js';
import { getMetric } from '../metrics/registry.js';
import type { CostClass, MetricId, MetricOptions } from '../metrics/types.js';
import type { RValueSpec } from './types.js';
import type { ConnectivityCurve } from './union-find.js';

export type RFunction = (mask: Mask) => number;

export function validateRSpec(spec: RValueSpec): void {
  if (spec.metrics.length === 0) throw new RangeError('the R-value needs at least one metric');
  for (const m of spec.metrics) {
    if (!(m.weight > 0) || !Number.isFinite(m.weight))
      throw new RangeError(`metric ${m.id}: weight must be > 0, got ${m.weight}`);
  }
  if (spec.combine !== 'mean' && spec.combine !== 'min') throw new RangeError(`combine must be "mean" or "min"`);
}

/** Combines normalized values in spec order; the one formula every path uses, so results agree bit for bit. */
export function combineR(spec: RValueSpec, values: ArrayLike<number>): number {
  if (spec.combine === 'min') {
    let r = Infinity;
    for (let i = 0; i < values.length; i++) if (values[i] < r) r = values[i];
    return r;
  }
  let sum = 0;
  let weight = 0;
  for (let i = 0; i < values.length; i++) {
    sum += spec.metrics[i].weight * values[i];
    weight += spec.metrics[i].weight;
  }
  return sum / weight;
}

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
export function unsupportedMetric(g: CompactGraph, spec: RValueSpec): UnsupportedMetric | undefined {
  for (const m of spec.metrics) {
    const metric = getMetric(m.id);
    if (metric.appliesTo(g)) continue;
    const needs = metric.needs ?? { what: 'data this design does not have', hint: `take ${m.id} out of the r-value` };
    return { id: m.id, message: `metric ${m.id} needs ${needs.what}`, hint: needs.hint };
  }
  return undefined;
}

/** Thrown by createRValue for a design one of R's metrics does not apply to. */
export class UnsupportedMetricError extends RangeError {
  constructor(readonly problem: UnsupportedMetric) {
    super(`${problem.message} — ${problem.hint}`);
  }
}

export function createRValue(g: CompactGraph, spec: RValueSpec, options?: MetricOptions): RFunction {
  validateRSpec(spec);
  const problem = unsupportedMetric(g, spec);
  if (problem) throw new UnsupportedMetricError(problem);
  const evaluators = spec.metrics.map((m) => getMetric(m.id).create(g, metricOptions(spec, options)));
  const values = new Float64Array(evaluators.length);
  return (mask) => {
    for (let i = 0; i < evaluators.length; i++) values[i] = evaluators[i](mask).normalized;
    return combineR(spec, values);
  };
}

/** The metric options R's spec implies (its source sample), under the caller's own. */
function metricOptions(spec: RValueSpec, options?: MetricOptions): MetricOptions | undefined {
  if (spec.sources === undefined) return options;
  return { sources: spec.sources, sourceSeed: spec.sourceSeed ?? 0, ...options };
}

/** Whether R, on this design, is an estimate from sampled sources (fewer sources than sites). */
export function samplesSources(g: CompactGraph, spec: RValueSpec): boolean {
  return spec.sources !== undefined && spec.sources < g.n && spec.metrics.some((m) => m.id === 'efficiency');
}

/**
 * Standard error of R from sampled sources on each of these states: the sampled metrics' se
 * combined as R combines them (weighted mean: Σ w·se / Σ w, a bound whatever the errors'
 * correlation, by the triangle inequality for standard deviations; min: the largest se).
 * 0 for every state when R is exact on this design.
 */
export function rSourceErrors(g: CompactGraph, spec: RValueSpec, masks: readonly Mask[]): number[] {
  if (!samplesSources(g, spec)) return masks.map(() => 0);
  const options = metricOptions(spec);
  const sampled = spec.metrics.map((m) => (m.id === 'efficiency' ? getMetric(m.id).create(g, options) : null));
  const weight = spec.metrics.reduce((s, m) => s + m.weight, 0);
  return masks.map((mask) => {
    let mean = 0;
    let most = 0;
    sampled.forEach((ev, i) => {
      if (!ev) return;
      const se = ev(mask).se ?? 0;
      mean += (spec.metrics[i].weight * se) / weight;
      most = Math.max(most, se);
    });
    return spec.combine === 'min' ? most : mean;
  });
}

const UNION_FIND_METRICS: ReadonlySet<MetricId> = new Set(['largest_component', 'pair_connectivity']);

/**
 * When R uses only largest_component and pair_connectivity, R after k removals follows from a
 * union–find curve (union-find.ts) with no per-step recomputation: returns that mapping, with
 * exactly the normalisations of the registry metrics. Otherwise null.
 */
export function unionFindR(
  g: CompactGraph,
  spec: RValueSpec,
): ((curve: ConnectivityCurve, k: number) => number) | null {
  if (!spec.metrics.every((m) => UNION_FIND_METRICS.has(m.id))) return null;
  const n = g.n;
  const allPairs = (n * (n - 1)) / 2;
  const values = new Float64Array(spec.metrics.length);
  const ids = spec.metrics.map((m) => m.id);
  return (curve, k) => {
    for (let i = 0; i < ids.length; i++) {
      values[i] =
        ids[i] === 'largest_component' ? (n > 0 ? curve.lcc[k] / n : 0) : allPairs > 0 ? curve.pairs[k] / allPairs : 0;
    }
    return combineR(spec, values);
  };
}

/**
 * Work of one evaluation of R in "graph passes" (one pass visits every node and link once):
 * linear metrics 1, all-pairs metrics N (one search per node), spectral 50 (a few dozen
 * sparse products), flow N. The engine's budget multiplies passes by N + L.
 */
export function rPasses(g: CompactGraph, spec: RValueSpec): number {
  const passes: Record<CostClass, number> = {
    linear: 1,
    'all-pairs': Math.max(1, g.n),
    spectral: 50,
    flow: Math.max(1, g.n),
  };
  let total = 0;
  for (const m of spec.metrics) total += passes[getMetric(m.id).cost];
  return total;
}
