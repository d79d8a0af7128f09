// How many times a band evaluation computes R: once on the intact design for the whole
// evaluation (every realization starts there), then once per distinct whole removal count a
// realization's grid needs — the weakest sequences take their values from the band's own
// evaluations instead of computing them again. Values stay exactly those of a recomputation.
// R with a spectral metric warm-starts (each value seeds the next), so there nothing is skipped.
import { afterEach, describe, expect, it } from 'vitest';
import { resolveParams } from '../../src/challenges/registry.js';
import { bandPlan, StepEvaluator } from '../../src/envelope/engine.js';
import { evaluateDesign, type EvaluationSpec } from '../../src/envelope/evaluate.js';
import type { CompactGraph } from '../../src/graph/compact.js';
import { getMetric } from '../../src/metrics/registry.js';
import type { Metric, MetricId } from '../../src/metrics/types.js';
import { preferentialGraph } from './graphs.js';

const single = (id: MetricId) => ({ metrics: [{ id, weight: 1 }], combine: 'mean' as const });

/** Counts the calls of a metric's evaluators until restored. */
function countCalls(id: MetricId): { calls: number; restore(): void } {
  const metric = getMetric(id) as { create: Metric['create'] };
  const create = metric.create;
  const counter = {
    calls: 0,
    restore: () => {
      metric.create = create;
    },
  };
  metric.create = (g, options) => {
    const ev = create(g, options);
    return (mask) => {
      counter.calls++;
      return ev(mask);
    };
  };
  return counter;
}

/** Distinct whole removal counts (⌊c⌋, ⌈c⌉ of each grid point) of each realization. */
function wholeCounts(g: CompactGraph, spec: EvaluationSpec): number[][] {
  const bp = bandPlan(g, resolveParams(g, spec.challenges[0], spec.seed));
  const order = new Int32Array(bp.maxUnits);
  const steps = new Float64Array(bp.x.length);
  const m = spec.challenges[0].realizations!;
  return Array.from({ length: m }, (_, r) => {
    bp.realize(r, order, steps);
    return [...new Set(Array.from(steps).flatMap((c) => [Math.floor(c), Math.ceil(c)]))];
  });
}

describe('evaluations of R in a band', () => {
  // 150 nodes, 297 links: x·L at 0.1, 0.2, 0.3 is not whole, so each such point reads two counts.
  const g = preferentialGraph(150, 2, 4);
  const spec = (id: MetricId): EvaluationSpec => ({
    r: single(id),
    seed: 7,
    challenges: [{ challenge: 'random-links', realizations: 6, points: 4, until: 0.3 }],
  });
  let counter: { calls: number; restore(): void } | undefined;
  afterEach(() => counter?.restore());

  it('evaluates the intact design once, each other whole count once per realization, nothing again for the weakest', () => {
    const counts = wholeCounts(g, spec('efficiency'));
    expect(counts[0].some((k) => k > 0)).toBe(true);
    expect(counts[0].length).toBeGreaterThan(4); // real counts: two evaluations per point
    counter = countCalls('efficiency');
    const out = evaluateDesign(g, spec('efficiency'));
    const calls = counter.calls;
    counter.restore();
    const perRealization = counts.reduce((s, ks) => s + ks.filter((k) => k > 0).length, 0);
    expect(calls).toBe(1 + perRealization);

    // The weakest sequences' values are exactly what a fresh evaluation gives at their steps.
    const bp = bandPlan(g, resolveParams(g, spec('efficiency').challenges[0], 7));
    const order = new Int32Array(bp.maxUnits);
    const steps = new Float64Array(bp.x.length);
    const weakest = out.evaluation.envelopes[0].weakest;
    expect(weakest).toHaveLength(3);
    for (const seq of weakest) {
      const len = bp.realize(seq.realization!, order, steps);
      const at = seq.steps!;
      expect(at.length).toBeGreaterThan(0);
      const fresh = new StepEvaluator(g, single('efficiency')).at(bp.kind, order, len, at, new Float64Array(at.length));
      expect(seq.values).toEqual(Array.from(fresh));
    }
  });

  it('gives the same report as evaluators that share nothing', () => {
    // Each realization on its own evaluator, from scratch: the grid values must agree bit for bit.
    const out = evaluateDesign(g, spec('efficiency'));
    const bp = bandPlan(g, resolveParams(g, spec('efficiency').challenges[0], 7));
    const order = new Int32Array(bp.maxUnits);
    const steps = new Float64Array(bp.x.length);
    const samples = out.samples.get('random-links')!;
    samples.forEach((values, r) => {
      const len = bp.realize(r, order, steps);
      const fresh = new StepEvaluator(g, single('efficiency')).at(
        bp.kind,
        order,
        len,
        steps,
        new Float64Array(steps.length),
      );
      expect(Array.from(values)).toEqual(Array.from(fresh));
    });
  });

  it('keeps every evaluation of a spectral R, whose values depend on the one before', () => {
    const counts = wholeCounts(g, spec('algebraic_connectivity'));
    counter = countCalls('algebraic_connectivity');
    evaluateDesign(g, spec('algebraic_connectivity'));
    const calls = counter.calls;
    counter.restore();
    const all = counts.reduce((s, ks) => s + ks.length, 0);
    // Every realization from its intact design, plus the weakest three recomputed (links: the
    // same counts in every realization).
    expect(new Set(counts.map((ks) => ks.join()))).toHaveProperty('size', 1);
    const weakest = 3 * counts[0].filter((k) => k > 0).length;
    expect(calls).toBe(all + weakest);
  });
});
