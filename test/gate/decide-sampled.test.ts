// A batched run's decisions when R is estimated from sampled sources (docs/METHODS.md §7.6,
// §7.7): the sample's error is common to every realization, so no number of realizations
// narrows it; each side's confidence sequence runs at α/2 and its bounds widen by z·se,
// z = Φ⁻¹(1 − α/4), and the change's by z·√(se_base² + se_head²). Checked on a seeded
// 400-site design against the same decision computed by hand from sideBounds.
import { describe, expect, it } from 'vitest';
import { compileTopology } from '../../src/graph/compact.js';
import { evaluateDesign } from '../../src/envelope/evaluate.js';
import { normalQuantile } from '../../src/envelope/quantiles.js';
import { decide, DECISION_ALPHA, sideBounds } from '../../src/gate/decide.js';
import type { AreaRequirement, ChallengeDef, WeakeningRule } from '../../src/policy/types.js';
import { parseDesign } from '../../src/topology/parse.js';
import { sampledVariants } from '../cases/sampled-design.js';

const where = { file: 'p.yaml', line: 1, col: 1 } as unknown as AreaRequirement['where'];
const v = sampledVariants();
const spec = {
  r: {
    metrics: [
      { id: 'pair_connectivity' as const, weight: 1 },
      { id: 'efficiency' as const, weight: 1 },
    ],
    combine: 'mean' as const,
    sources: 64,
    sourceSeed: 5,
  },
  seed: 5,
  challenges: [{ challenge: 'random-nodes' as const, until: 0.2, points: 5, realizations: 32 }],
};
const base = evaluateDesign(compileTopology(parseDesign(v.base, 'torus.csv')), spec);
const head = evaluateDesign(compileTopology(parseDesign(v.benign, 'torus.csv')), spec);
const challenge = {
  name: 'node-failures',
  engine: 'random-nodes',
  random: true,
  params: spec.challenges[0],
} as unknown as ChallengeDef;
const requirement: AreaRequirement = {
  id: 'area-floor:node-failures',
  kind: 'area-floor',
  challenge: 'node-failures',
  severity: 'fail',
  min: 0.3,
  where,
  valueWhere: where,
  challengeWhere: where,
};
const weakening = { allowedDrop: 0.02, errorMultiple: 2, severity: 'fail', where } as unknown as WeakeningRule;

describe('decisions on sampled sources', () => {
  it('both sides report their source error', () => {
    expect(base.evaluation.sampling!.se).toBeGreaterThan(0);
    expect(head.evaluation.sampling!.se).toBeGreaterThan(0);
  });

  it('widen the head’s bounds by z·se around the confidence sequence at α/2, and the change’s by z·√(se_b² + se_h²)', () => {
    const d = decide({
      requirement,
      challenge,
      head,
      base,
      weakening,
      baseValue: base.evaluation.envelopes[0].area,
      threshold: 0.3,
      higherIsBetter: true,
    })!;
    const z = normalQuantile(1 - DECISION_ALPHA / 4);
    const sh = head.evaluation.sampling!.se;
    const sb = base.evaluation.sampling!.se;
    const env = (e: typeof head) => e.evaluation.envelopes[0];
    const samples = (e: typeof head) => e.samples.get('random-nodes')!;
    const h = sideBounds({ kind: 'area' }, env(head), samples(head), DECISION_ALPHA / 2)!;
    expect(d.head.lo).toBeCloseTo(h.lo - z * sh, 14);
    expect(d.head.hi).toBeCloseTo(h.hi + z * sh, 14);
    const h4 = sideBounds({ kind: 'area' }, env(head), samples(head), DECISION_ALPHA / 4)!;
    const b4 = sideBounds({ kind: 'area' }, env(base), samples(base), DECISION_ALPHA / 4)!;
    const shift = z * Math.hypot(sh, sb);
    expect(d.delta!.lo).toBeCloseTo(h4.lo - b4.hi - shift, 14);
    expect(d.delta!.hi).toBeCloseTo(h4.hi - b4.lo + shift, 14);
  });

  it('an exact R keeps the confidence sequence at α, unwidened', () => {
    const exactSpec = { ...spec, r: { ...spec.r, sources: undefined } };
    const e = evaluateDesign(compileTopology(parseDesign(v.base, 'torus.csv')), exactSpec);
    expect(e.evaluation.sampling).toBeUndefined();
    const d = decide({
      requirement,
      challenge,
      head: e,
      weakening,
      baseValue: null,
      threshold: 0.3,
      higherIsBetter: true,
    })!;
    const b = sideBounds({ kind: 'area' }, e.evaluation.envelopes[0], e.samples.get('random-nodes')!, DECISION_ALPHA)!;
    expect(d.head).toEqual(b);
  });
});
