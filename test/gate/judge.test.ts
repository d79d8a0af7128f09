// The two judgements of a requirement, called directly: the head against its floor
// (judgeFloor) and base against head under the weakening rule (judgeWeakening). The expected
// statuses follow the decision table in src/gate/compare.ts's header; the numbers are chosen
// so that each case sits clearly on one side of its limit (the table is the project's own
// rule, not a published value).

import { describe, expect, it } from 'vitest';
import { REDUCED_MARGIN_SE, judgeFloor, judgeWeakening, type Judging } from '../../src/gate/compare.js';
import type { Measured } from '../../src/gate/measure.js';
import type { Requirement, WeakeningRule } from '../../src/policy/types.js';

const where = { file: '.netbrace.yaml', line: 3, column: 5 };

function requirement(over: Partial<Extract<Requirement, { kind: 'r-threshold' }>> = {}): Requirement {
  return {
    kind: 'r-threshold',
    id: 'r@0.2',
    severity: 'fail',
    where,
    valueWhere: where,
    challenge: 'random-nodes',
    challengeWhere: where,
    at: 0.2,
    statistic: { kind: 'quantile', q: 0.05 },
    min: 0.5,
    ...over,
  };
}

function judging(m: Partial<Measured>, r: Requirement = requirement()): Judging {
  const measured: Measured = { base: null, head: 0.7, delta: null, se: null, higherIsBetter: true, elements: [], ...m };
  const threshold = r.kind === 'r-threshold' ? r.min : null;
  return {
    r,
    m: measured,
    headValue: measured.head!,
    description: 'R at 20 %',
    threshold,
    rule: 'r-threshold',
    elements: [],
    extra: { requirement: r.id },
  };
}

const rule: WeakeningRule = { allowedDrop: 0.02, errorMultiple: 2, severity: 'fail', where, fieldWhere: {} };

describe('judgeFloor', () => {
  it('a head above its floor holds, with nothing to say', () => {
    expect(judgeFloor(judging({ head: 0.7 }))).toEqual({ status: 'holds', findings: [] });
  });

  it('a head below its floor is short, a finding at the requirement\u2019s severity', () => {
    const { status, findings } = judgeFloor(judging({ head: 0.4 }));
    expect(status).toBe('short');
    expect(findings).toHaveLength(1);
    expect(findings[0]).toMatchObject({ rule: 'r-threshold', severity: 'fail', status: 'short', requirement: 'r@0.2' });
    expect(findings[0].message).toContain('is below 0.5');
  });

  it('a ceiling (lower is better) is short when the head is above it', () => {
    const r: Requirement = {
      kind: 'spread-ceiling',
      id: 'spread',
      severity: 'warn',
      where,
      valueWhere: where,
      challenge: 'random-nodes',
      challengeWhere: where,
      max: 0.1,
    };
    const j = { ...judging({ head: 0.15, higherIsBetter: false }, r), threshold: 0.1, rule: 'spread-ceiling' as const };
    const { status, findings } = judgeFloor(j);
    expect(status).toBe('short');
    expect(findings[0]).toMatchObject({ severity: 'warn' });
    expect(findings[0].message).toContain('is above 0.1');
  });

  it('met, but the confidence interval reaches below the floor: unsettled, a notice', () => {
    const { status, findings } = judgeFloor(judging({ head: 0.55, lo: 0.45, hi: 0.6 }));
    expect(status).toBe('unsettled');
    expect(findings[0]).toMatchObject({ severity: 'notice', status: 'unsettled' });
  });

  it('met by incomplete work: unsettled, a warning (never holds)', () => {
    const { status, findings } = judgeFloor(judging({ head: 0.9, incomplete: 'the N\u22121 cases were cut' }));
    expect(status).toBe('unsettled');
    expect(findings[0]).toMatchObject({ severity: 'warn', status: 'unsettled' });
  });

  it(`on cut realizations, a margin of at most ${REDUCED_MARGIN_SE} standard errors is unsettled; a wider one holds`, () => {
    const reduced = 'the budget ran 100 of 400 realizations';
    // margin 0.05, 2 × se = 0.06: not cleared.
    expect(judgeFloor(judging({ head: 0.55, headSe: 0.03, reduced })).status).toBe('unsettled');
    // margin 0.05, 2 × se = 0.02: cleared.
    expect(judgeFloor(judging({ head: 0.55, headSe: 0.01, reduced }))).toEqual({ status: 'holds', findings: [] });
  });

  it('a minimum over cut realizations is never proven', () => {
    const r = requirement({ statistic: { kind: 'min' } });
    const { status, findings } = judgeFloor(
      judging({ head: 0.9, headSe: 0.001, reduced: 'the budget ran 10 of 400 realizations' }, r),
    );
    expect(status).toBe('unsettled');
    expect(findings[0].message).toContain('the minimum of fewer realizations can only be higher');
  });

  it('a tracked value (no floor) is not judged here', () => {
    const j = { ...judging({ head: 0.1 }), threshold: null };
    expect(judgeFloor(j)).toEqual({ status: 'holds', findings: [] });
  });
});

describe('judgeWeakening', () => {
  const paired = (base: number, head: number, se: number, over: Partial<Measured> = {}) =>
    judging({ base, head, delta: head - base, se, ...over });

  it('a drop beyond the allowance and beyond error-multiple × se weakens, at the milder severity', () => {
    const { status, findings } = judgeWeakening(paired(0.8, 0.7, 0.01), { ...rule, severity: 'warn' }, 'holds');
    expect(status).toBe('weakened');
    expect(findings).toHaveLength(1);
    expect(findings[0]).toMatchObject({ rule: 'regression', severity: 'warn', status: 'weakened', allowance: 0.02 });
  });

  it('a drop smaller than error-multiple × se is inside the error: a notice', () => {
    const { status, findings } = judgeWeakening(paired(0.8, 0.75, 0.05), rule, 'holds');
    expect(status).toBe('inside-error');
    expect(findings[0]).toMatchObject({ severity: 'notice', status: 'inside-error' });
  });

  it('a drop within the allowance holds, with a notice', () => {
    const { status, findings } = judgeWeakening(paired(0.8, 0.79, 0.001), rule, 'holds');
    expect(status).toBe('holds');
    expect(findings[0]).toMatchObject({ severity: 'notice', status: 'within-allowance' });
  });

  it('a rise or no change says nothing', () => {
    expect(judgeWeakening(paired(0.7, 0.8, 0.01), rule, 'holds')).toEqual({ status: 'holds', findings: [] });
    expect(judgeWeakening(paired(0.7, 0.7, 0.01), rule, 'holds')).toEqual({ status: 'holds', findings: [] });
  });

  it('a short from the floor stays short when the drop also weakens', () => {
    expect(judgeWeakening(paired(0.8, 0.4, 0.01), rule, 'short').status).toBe('short');
  });

  it('unpaired realizations (cut differently on each side): unsettled whatever the sign', () => {
    const unpaired = 'the budget cut base and head differently';
    for (const [b, h] of [
      [0.8, 0.7],
      [0.7, 0.8],
    ]) {
      const { status, findings } = judgeWeakening(paired(b, h, 0.01, { unpaired }), rule, 'holds');
      expect(status).toBe('unsettled');
      expect(findings[0]).toMatchObject({ status: 'unsettled', severity: 'warn' });
    }
  });

  it('on cut realizations, a drop within error-multiple × se of the allowance is unsettled', () => {
    // drop 0.03, allowance 0.02, noise 2 × 0.01 = 0.02: 0.03 is neither above 0.04 nor at most 0.0.
    const { status } = judgeWeakening(
      paired(0.8, 0.77, 0.01, { reduced: 'the budget ran 100 of 400 realizations' }),
      rule,
      'holds',
    );
    expect(status).toBe('unsettled');
  });

  it('without a base there is nothing to weigh', () => {
    expect(judgeWeakening(judging({ head: 0.3 }), rule, 'short')).toEqual({ status: 'short', findings: [] });
  });
});
