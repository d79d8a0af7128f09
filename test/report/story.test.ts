// The view-neutral story (src/report/story.ts): verdict sentence, requirement lines worded
// from data, consequences worst first, definitions and the one-sentence policy change. The
// expected texts are our own wording (no outside source applies); the numbers are the
// report's, formatted as report/format.ts does.
import { describe, expect, it } from 'vitest';
import { formatDelta, formatError, shortRevision, utf8Length } from '../../src/report/format.js';
import type { FileReport, Finding, RequirementResult } from '../../src/report/report.js';
import {
  CAUTION_LINE,
  definitions,
  designStory,
  elementSentence,
  plainSentence,
  policyChangeSentence,
  requirementLine,
  verdictStory,
} from '../../src/report/story.js';
import { RULE_TITLE, fileFails, judgedTitle } from '../../src/report/vocabulary.js';
import { emptyReport, sampleReport } from './sample-report.js';

const q10: RequirementResult = {
  id: 'r-threshold:site-failures@0.1:q0.1',
  description: '10 % quantile of R at 10 % of nodes removed, "site-failures" (random nodes) \u2265 0.42',
  severity: 'fail',
  base: 0.463801736019,
  head: 0.450412585034,
  delta: -0.0133891509851,
  se: 0.00538844883711,
  threshold: 0.42,
  status: 'holds',
  subject: {
    kind: 'r-threshold',
    remove: 'nodes',
    challenge: 'site-failures',
    order: 'random',
    at: 0.1,
    statistic: { kind: 'quantile', q: 0.1 },
    higherIsBetter: true,
  },
};

describe('verdict sentence', () => {
  it('says the merge is blocked only when it is', () => {
    const r = sampleReport();
    expect(plainSentence(verdictStory(r).sentence)).toBe(
      'netbrace blocks this merge: 1 design weakened, 1 design could not be read',
    );
    r.mode = 'inform';
    const inform = plainSentence(verdictStory(r).sentence);
    expect(inform).toBe(
      'netbrace: 1 design weakened, 1 design could not be read; inform mode, so the merge is not blocked',
    );
    expect(inform).not.toContain('blocks this merge');
  });

  it('a part never says it blocks the merge', () => {
    const r = sampleReport();
    r.part = { index: 2, total: 3 };
    const v = verdictStory(r);
    expect(v.tone).toBe('part');
    expect(plainSentence(v.sentence)).toBe(
      'netbrace, part 2 of 3: 1 design weakened, 1 design could not be read in this part; the joined report decides the merge',
    );
  });

  it('a passing report says nothing weakened, or that nothing fails when there are warnings', () => {
    expect(plainSentence(verdictStory({ ...emptyReport(), files: [] }).sentence)).toBe(
      'netbrace: no design file changed, nothing to judge',
    );
    const r = sampleReport();
    r.verdict = 'pass';
    r.files = [r.files[0]]; // dc/fabric.gml, no findings
    expect(plainSentence(verdictStory(r).sentence)).toBe('netbrace: no design weakened');
    expect(CAUTION_LINE).toContain('does not replace engineering studies');
  });
});

describe('how much: one line per requirement', () => {
  it('words a requirement from its data in the form "status · what base → head (Δ ± se), floor"', () => {
    expect(plainSentence(requirementLine(q10).sentence)).toBe(
      'holds \u00b7 R at 10 % sites removed (q10) 0.464 \u2192 0.450 (\u22120.013 \u00b1 0.005), floor 0.42',
    );
  });

  it('uses the deciding decimals and the allowance the gate recorded', () => {
    const r: RequirementResult = { ...q10, status: 'weakened', decimals: 4 };
    const allowance: Finding = {
      rule: 'regression',
      severity: 'fail',
      message: 'm',
      requirement: q10.id,
      allowance: 0.01,
      elements: [],
      line: 1,
    };
    expect(plainSentence(requirementLine(r, [allowance]).sentence)).toBe(
      'weakened \u00b7 R at 10 % sites removed (q10) 0.4638 \u2192 0.4504 (\u22120.0134 \u00b1 0.0054), floor 0.42, allowed drop 0.0100',
    );
  });

  it('counts of weak points are whole numbers, a ceiling is a ceiling', () => {
    const spof: RequirementResult = {
      id: 'no-new-spof:bridges',
      description: 'no new bridges',
      severity: 'fail',
      base: 3,
      head: 7,
      delta: 4,
      se: 0,
      threshold: null,
      status: 'weakened',
      subject: { kind: 'no-new-spof', higherIsBetter: false },
    };
    expect(plainSentence(requirementLine(spof).sentence)).toBe(
      'weakened \u00b7 bridges 3 \u2192 7 (+4), no new one allowed',
    );
    const spread: RequirementResult = {
      ...q10,
      id: 'spread-ceiling:site-failures',
      base: 0.0825,
      head: 0.0968,
      delta: 0.0143,
      se: 0.0025,
      threshold: 0.2,
      subject: { kind: 'spread-ceiling', remove: 'nodes', order: 'random', higherIsBetter: false },
    };
    expect(plainSentence(requirementLine(spread).sentence)).toBe(
      'holds \u00b7 spread, random site removals 0.083 \u2192 0.097 (+0.014 \u00b1 0.003), ceiling 0.2',
    );
  });

  it('an older report without a subject keeps its plain description', () => {
    const { subject: _drop, ...old } = q10;
    expect(plainSentence(requirementLine(old).label)).toBe(q10.description);
  });
});

describe('what weakened', () => {
  const bridge = (id: string, line: number, lost: number): Finding => ({
    rule: 'new-bridge',
    severity: 'fail',
    message: `link ${id} is a new bridge`,
    elements: [{ id, kind: 'link', line }],
    line,
    consequence: {
      stranded: [{ id: 'kaskeld', kind: 'node', line: 58, label: 'Kaskeld' }],
      strandedCount: 1,
      demandsLost: lost,
      demandsTotal: 47,
      volumeLost: lost * 10,
      volumeTotal: 1096,
    },
  });
  const file = (findings: Finding[], requirements: RequirementResult[] = []): FileReport => ({
    path: 'd.net.yaml',
    status: 'weakened',
    findings,
    requirements,
  });

  it('names each element with label, id and line, and puts the costliest first', () => {
    const s = designStory(file([bridge('a-b', 10, 1), bridge('c-d', 20, 3)]));
    expect(s.weakened.map((x) => x.elements[0].id)).toEqual(['c-d', 'a-b']);
    const first = s.weakened[0].sentence;
    expect(plainSentence(first)).toBe(
      'Link c-d (line 20) is a new bridge; losing it cuts off Kaskeld (kaskeld, line 58) from the largest part; 3 of 47 demands (volume 30 of 1096) lose every path.',
    );
    expect(first.filter((x) => x.kind === 'id').map((x) => x.text)).toEqual(['c-d', 'kaskeld']);
    expect(s.headline).toBe('2 new bridges');
    expect(s.outcome).toBe('fails');
  });

  it('a requirement\u2019s numbers are told by its line, not as a consequence', () => {
    const drop: Finding = {
      rule: 'regression',
      severity: 'fail',
      message: 'dropped',
      requirement: q10.id,
      status: 'weakened',
      elements: [],
      line: 1,
    };
    const s = designStory(file([drop], [{ ...q10, status: 'weakened' }]));
    expect(s.weakened).toEqual([]);
    expect(s.headline).toBe('1 requirement weakened or short');
  });

  it('a design with notices only passes', () => {
    const note: Finding = {
      rule: 'degraded',
      severity: 'notice',
      message: 'head evaluation reduced: fewer realizations',
      elements: [],
      line: 0,
    };
    const s = designStory({ ...file([note], [q10]), status: 'holds' });
    expect(s.outcome).toBe('holds');
    expect(s.weakened).toEqual([]);
    expect(s.notices.map((x) => plainSentence(x.sentence))).toEqual(['head evaluation reduced: fewer realizations.']);
    expect(s.headline).toBe('every requirement holds');
  });

  it('an element without a label or line is its id alone', () => {
    expect(elementSentence({ id: 'x`y', kind: 'node', line: 0 })).toEqual([
      { kind: 'text', text: 'site ' },
      { kind: 'id', text: 'x`y' },
      { kind: 'text', text: '' },
    ]);
    // A label is user text of its own: never merged with our words, never recased.
    expect(elementSentence({ id: 'a', kind: 'node', line: 3, label: 'a|b' })).toEqual([
      { kind: 'text', text: 'a|b', user: true },
      { kind: 'text', text: ' (' },
      { kind: 'id', text: 'a' },
      { kind: 'text', text: ', line 3)' },
    ]);
  });
});

describe('definitions', () => {
  it('defines R from the evaluation, and area, spread and \u00b1 only where used', () => {
    const f = sampleReport().files[1]; // backbone/core.net.yaml: efficiency 1, se > 0
    const d = definitions(f);
    expect(d.map((x) => x.term)).toEqual(['R', '\u00b1']);
    expect(plainSentence(d[0].sentence)).toBe(
      'R: the weighted mean of efficiency 1, each metric scaled to 0\u20131 with 1 the intact design.',
    );
    expect(d[0].sentence.find((x) => x.kind === 'code')?.text).toBe('efficiency');
    expect(d.every((x) => x.anchor === 'reading-the-report')).toBe(true);
  });
});

describe('policy change', () => {
  it('says in one sentence what the head\u2019s policy would loosen and tighten', () => {
    const r = sampleReport();
    r.policy.changed = true;
    r.policy.changes = [
      { subject: q10.id, key: 'min', effect: 'loosens', base: 0.42, head: 0.4, file: '.netbrace.yaml', line: 12 },
      {
        subject: 'weakening',
        key: 'error-multiple',
        effect: 'loosens',
        base: 2,
        head: 3,
        file: '.netbrace.yaml',
        line: 20,
      },
      {
        subject: 'n-1:link',
        key: 'severity',
        effect: 'tightens',
        base: 'warn',
        head: 'fail',
        file: '.netbrace.yaml',
        line: 15,
      },
    ];
    const s = policyChangeSentence(r)!;
    const text = plainSentence(s);
    expect(text).toBe(
      'This change edits the policy: the head\u2019s version would loosen the floor of r-threshold:site-failures@0.1:q0.1 from 0.42 to 0.4 and the error multiple from 2 to 3, and tighten the severity of n-1:link from warn to fail; the base\u2019s version judges this change, and the head\u2019s applies once merged.',
    );
    expect(text.match(/\.\s/g)).toBeNull(); // one sentence
    expect(s.filter((x) => x.kind === 'id').map((x) => x.text)).toEqual([q10.id, 'n-1:link']);
    r.policy.changed = false;
    expect(policyChangeSentence(r)).toBeUndefined();
  });
});

describe('shared vocabulary and formats', () => {
  it('one formatDelta for the gate and the views', () => {
    expect(formatDelta(-0.0104, 0.002, 4)).toBe('\u22120.0104 \u00b1 0.0020');
    expect(formatDelta(0.0001)).toBe('0.000');
    expect(formatDelta(-0.0001)).toBe('0.000');
    expect(formatDelta(0.012)).toBe('+0.012');
    expect(formatDelta(null)).toBe('\u2013');
    expect(formatError(0.0001)).toBe('\u00b1 <0.001');
  });
  it('one short revision and one UTF-8 length', () => {
    expect(shortRevision('a'.repeat(40))).toBe('a'.repeat(12));
    expect(shortRevision('main')).toBe('main');
    // Buffer.byteLength (Node's own encoder) as the outside reference, lone surrogates included.
    for (const s of ['a\u00e9\u20ac\u{1f600}', '\ud800a', 'x\udc00'])
      expect(utf8Length(s)).toBe(Buffer.byteLength(s, 'utf8'));
  });
  it('rule titles cover every rule and an unreadable file fails', () => {
    expect(Object.keys(RULE_TITLE).length).toBe(15);
    expect(fileFails({ status: 'unreadable', findings: [] })).toBe(true);
    expect(
      fileFails({
        status: 'holds',
        findings: [{ rule: 'degraded', severity: 'notice', message: 'm', elements: [], line: 0 }],
      }),
    ).toBe(false);
  });
});

describe('a finding is titled by what its judging found', () => {
  it('a drop the policy allows, or one inside the error, is never titled as a weakening', () => {
    expect(judgedTitle({ rule: 'regression', severity: 'notice', status: 'within-allowance' })).toBe(
      'robustness dropped within the allowance',
    );
    expect(judgedTitle({ rule: 'regression', severity: 'notice', status: 'inside-error' })).toBe(
      'change inside the Monte Carlo error',
    );
    expect(judgedTitle({ rule: 'regression', severity: 'notice' })).toBe('robustness changed');
    expect(judgedTitle({ rule: 'regression', severity: 'fail', status: 'weakened' })).toBe(RULE_TITLE.regression);
  });
});
