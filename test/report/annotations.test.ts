import { describe, expect, it } from 'vitest';
import { annotationsOf, planAnnotations } from '../../src/report/annotations.js';
import { hugeReport, sampleReport } from './sample-report.js';

describe('annotations', () => {
  it('puts each finding on its design file at the element\u2019s line, with title and numbers', () => {
    const all = annotationsOf(sampleReport());
    const bridge = all.find((a) => a.rule === 'new-bridge')!;
    expect(bridge).toMatchObject({ level: 'error', file: 'backbone/core.net.yaml', startLine: 42 });
    expect(bridge.title).toBe('netbrace: new bridge');
    const regression = all.find((a) => a.rule === 'regression')!;
    expect(regression.message).toContain('(base 0.742, head 0.680, \u0394 \u22120.062 \u00b1 0.004)');
    const parse = all.find((a) => a.rule === 'parse-error')!;
    expect(parse).toMatchObject({ file: 'edge/west.net.yaml', startLine: 7, startColumn: 13, level: 'error' });
  });

  it('ranks by severity, then lines the change touched', () => {
    const changed = new Map([['metro/north.graphml', new Set([88])]]);
    const all = annotationsOf(sampleReport(), { changedLines: changed });
    const levels = all.map((a) => a.level);
    expect(levels).toEqual(
      [...levels].sort((a, b) => ['error', 'warning', 'notice'].indexOf(a) - ['error', 'warning', 'notice'].indexOf(b)),
    );
    const warnings = all.filter((a) => a.level === 'warning');
    expect(warnings[0]).toMatchObject({ file: 'metro/north.graphml', startLine: 88, inDiff: true });
    expect(warnings[1].inDiff).toBe(false);
  });

  it('emits everything, with no closing notice, when the budget suffices', () => {
    const plan = planAnnotations(sampleReport());
    expect(plan.omitted).toBe(0);
    expect(plan.annotations.length).toBe(plan.total);
    expect(plan.annotations.some((a) => a.rule === 'more')).toBe(false);
  });

  it('keeps 10 per level and ends with a notice counting the rest', () => {
    const r = hugeReport(20, 30); // 600 findings, 200 of each severity
    const plan = planAnnotations(r);
    const count = (l: string) => plan.annotations.filter((a) => a.level === l).length;
    expect(count('error')).toBe(10);
    expect(count('warning')).toBe(10);
    expect(count('notice')).toBe(10); // 9 findings + the closing notice
    const last = plan.annotations[plan.annotations.length - 1];
    expect(last.rule).toBe('more');
    expect(plan.omitted).toBe(600 - 29);
    expect(last.message).toContain(`${600 - 29} more findings (of 600)`);
    expect(last.message).toContain('the job summary and the SARIF file');
  });

  it('keeps an error slot free for the step\u2019s own failure message, so at most 10 errors reach GitHub in all', () => {
    // GitHub keeps 10 error annotations per step (shared ACTIONS limits, documented by GitHub);
    // core.setFailed logs one more error, so a failing run may annotate 9 findings as errors.
    const plan = planAnnotations(hugeReport(20, 30), { reservedErrors: 1 });
    expect(plan.annotations.filter((a) => a.level === 'error').length).toBe(9);
    expect(plan.omitted).toBe(600 - 28);
    expect(plan.annotations.at(-1)?.rule).toBe('more');
  });

  it('prefixes the working directory and never points at line 0', () => {
    const r = sampleReport();
    r.files[1].findings[1].line = 0;
    const all = annotationsOf(r, { pathPrefix: 'networks/' });
    expect(all.every((a) => a.file.startsWith('networks/'))).toBe(true);
    expect(all.every((a) => a.startLine >= 1)).toBe(true);
  });

  it('defuses workflow commands and invisible characters in messages', () => {
    const r = sampleReport();
    r.files[1].findings[0].message = 'bad\n::error file=x,line=1::forged\u202E';
    const a = annotationsOf(r).find((x) => x.rule === 'new-bridge')!;
    expect(a.message.split('\n').some((l) => l.startsWith('::'))).toBe(false);
    expect(a.message).not.toContain('\u202E');
  });
});

describe('the policy change as an annotation', () => {
  it('is one sentence on the policy file, at the first line the head changes, a warning when it would loosen', () => {
    const r = sampleReport();
    r.policy.changed = true;
    r.policy.changes = [
      {
        subject: 'threshold:random-nodes@0.2:q0.1',
        key: 'min',
        effect: 'loosens',
        base: 0.5,
        head: 0.45,
        file: 'netbrace.policy.yaml',
        line: 9,
      },
      {
        subject: 'weakening',
        key: 'allowed-drop',
        effect: 'tightens',
        base: 0.02,
        head: 0.01,
        file: 'netbrace.policy.yaml',
        line: 14,
      },
    ];
    const a = planAnnotations(r).annotations.find((x) => x.rule === 'policy-changed')!;
    expect(a).toMatchObject({
      level: 'warning',
      file: 'netbrace.policy.yaml',
      startLine: 9,
      title: 'netbrace: policy changed',
    });
    expect(a.message).toBe(
      'This change edits the policy: the head\u2019s version would loosen the floor of threshold:random-nodes@0.2:q0.1 from 0.5 to 0.45, and tighten the allowed drop from 0.02 to 0.01; the base\u2019s version judges this change, and the head\u2019s applies once merged.',
    );
    r.policy.changes = r.policy.changes.filter((c) => c.effect === 'tightens');
    expect(planAnnotations(r).annotations.find((x) => x.rule === 'policy-changed')).toMatchObject({
      level: 'notice',
      startLine: 14,
    });
  });
});
