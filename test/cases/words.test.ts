// What the gate says and how its views word it, on the words-* fixture cases and on inputs a
// case cannot express: report files that cannot be written, R that a design cannot support in
// explain and envelope, NaN and infinite values, annotation titles, and what the change does
// in every view.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Ajv } from 'ajv';
import { afterAll, describe, expect, it } from 'vitest';
import { evaluateDesign } from '../../src/envelope/evaluate.js';
import { planAnnotations } from '../../src/report/annotations.js';
import { renderHtml } from '../../src/report/html.js';
import { renderSummary } from '../../src/report/markdown.js';
import schema from '../../src/report/report.schema.json' with { type: 'json' };
import { serializeReport, type FileReport, type Report } from '../../src/report/report.js';
import { renderSarif } from '../../src/report/sarif.js';
import { runGate, type GateDeps } from '../../src/run-gate.js';
import { main } from '../../src/shell/dispatch.js';
import { memoryDeps } from '../gate/memory-repo.js';
import { recordIO } from '../shell/helpers-io.js';
import { caseNames, cleanupCases, runCase } from './harness.js';

afterAll(cleanupCases);

const scratch: string[] = [];
afterAll(() => {
  for (const d of scratch.splice(0)) rmSync(d, { recursive: true, force: true });
});

function only(report: Report | null): FileReport {
  expect(report?.files.length).toBe(1);
  return report!.files[0];
}

describe('report files that cannot be written', () => {
  // Each is a path the user named; the verdict is printed before the error, and the run exits 2.
  const targets: [string, string, RegExp][] = [
    [
      'a directory that cannot be created',
      '/proc/netbrace-none/report.json',
      /its directory does not exist and cannot be created \(ENOENT\)/,
    ],
    ['an existing directory', '.', /it is a directory \(EISDIR\)/],
    ['a path below a regular file', '.netbrace.yaml/report.json', /a part of the path is not a directory \(ENOTDIR\)/],
    ['a read-only pseudo file', '/proc/version', /\((EIO|EACCES|EPERM|EROFS)\)/],
  ];
  for (const [what, target, why] of targets) {
    it(`--json to ${what} is a located error after the verdict, exit 2, never an internal error`, async () => {
      const run = await runCase('words-spof-counts-apart', ['--json', target]);
      expect(run.code, run.out + run.err).toBe(2);
      expect(run.out).toMatch(/^\u25A0 netbrace blocks this merge: 1 design weakened\n/);
      expect(run.err).toContain(`${target}: cannot write the --json report: `);
      expect(run.err).toMatch(why);
      expect(run.err).toContain('give --json a file in a writable directory');
      expect(run.err).not.toMatch(/internal error/);
    });
  }

  it('one output that cannot be written does not stop the others', async () => {
    const run = await runCase('words-spof-counts-apart', ['--html', '/proc/version']);
    expect(run.code).toBe(2);
    // The JSON report (written by the harness's --json) is still there.
    expect(run.report?.verdict).toBe('fail');
    expect(run.err).toContain('/proc/version: cannot write the --html report');
  });
});

describe('a metric the design cannot support is an error naming the design and the metric, never an R of 0', () => {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'netbrace-words-'));
  scratch.push(dir);
  // Invented triangle with no demands and no link lengths.
  writeFileSync(
    path.join(dir, 'moor.net.yaml'),
    'nodes:\n  - id: cairn\n  - id: tarn\n  - id: heath\nlinks:\n  - between: [cairn, tarn]\n  - between: [tarn, heath]\n  - between: [heath, cairn]\n',
  );

  const cases: [string, string[], string][] = [
    [
      'explain --metric demand_served',
      ['explain', 'moor.net.yaml', '--metric', 'demand_served'],
      'metric demand_served needs demands \u2014 ',
    ],
    [
      'explain --metric weighted_efficiency',
      ['explain', 'moor.net.yaml', '--metric', 'weighted_efficiency'],
      'metric weighted_efficiency needs a latency, length or weight > 0 on every link \u2014 ',
    ],
    [
      'envelope --metric demand_served',
      ['envelope', 'moor.net.yaml', '--metric', 'demand_served', '--challenge', 'random-nodes'],
      'metric demand_served needs demands \u2014 ',
    ],
    [
      'envelope --score with demand_served',
      ['envelope', 'moor.net.yaml', '--score', 'largest_component=1,demand_served=1', '--challenge', 'degree'],
      'metric demand_served needs demands \u2014 ',
    ],
  ];
  for (const [what, args, message] of cases) {
    it(what, async () => {
      const io = recordIO(dir, { NO_COLOR: '1' });
      const code = await main(args, io);
      const text = io.out.join('') + io.err.join('');
      expect(code, text).toBe(1);
      expect(io.err.join('')).toContain(`moor.net.yaml:1:1: ${message}`);
      expect(text).not.toMatch(/intact R|internal error/);
    });
  }

  it('explain with the r-value of the policy in the working directory', async () => {
    const sub = mkdtempSync(path.join(os.tmpdir(), 'netbrace-words-'));
    scratch.push(sub);
    writeFileSync(path.join(sub, '.netbrace.yaml'), 'r-value:\n  metrics:\n    demand_served: 1\n');
    writeFileSync(path.join(sub, 'moor.net.yaml'), 'nodes:\n  - id: a\n  - id: b\nlinks:\n  - between: [a, b]\n');
    const io = recordIO(sub, { NO_COLOR: '1' });
    expect(await main(['explain', 'moor.net.yaml'], io)).toBe(1);
    expect(io.err.join('')).toContain('moor.net.yaml:1:1: metric demand_served needs demands');
  });
});

describe('a NaN or infinite value is never a pass', () => {
  // Invented ring at base; the head adds a chord. The engine is real; its head results are
  // then poisoned, as a faulty metric would leave them.
  const ring = (chord: boolean) =>
    `nodes:\n${['a', 'b', 'c', 'd', 'e'].map((id) => `  - id: ${id}\n`).join('')}links:\n` +
    ['a, b', 'b, c', 'c, d', 'd, e', 'e, a', ...(chord ? ['a, c'] : [])].map((l) => `  - between: [${l}]\n`).join('');
  const policy = [
    'seed: 1',
    'r-value:',
    '  metrics:',
    '    pair_connectivity: 1',
    'challenges:',
    '  site-failures:',
    '    remove: nodes',
    '    until: 0.4',
    '    points: 3',
    '    realizations: 40',
    '  hub-attack:',
    '    remove: nodes',
    '    order: degree',
    '    until: 0.4',
    'requirements:',
    '  - kind: area-floor',
    '    challenge: site-failures',
    '  - kind: r-threshold',
    '    challenge: hub-attack',
    '    at: 0.2',
    '    min: 0.1',
    'weakening:',
    '  allowed-drop: 0.05',
    '',
  ].join('\n');
  const repo = {
    base: { '.netbrace.yaml': policy, 'ring.net.yaml': ring(false) },
    head: { '.netbrace.yaml': policy, 'ring.net.yaml': ring(true) },
  };

  function poisoned(value: number): GateDeps['evaluate'] {
    return (g, spec) => {
      const ev = evaluateDesign(g, spec);
      if (g.m === 6) {
        // The head: every sample of the random challenge and every step of the attack.
        for (const s of ev.samples.get('random-nodes') ?? []) s.fill(value);
        for (const a of ev.evaluation.attacks) a.values = a.values.map(() => value);
      }
      return ev;
    };
  }

  for (const value of [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY]) {
    it(`${value} in the head's values fails every requirement it reaches`, async () => {
      const { report, exitCode } = await runGate(
        { base: 'base', head: 'head', policySource: 'base', mode: 'block', paths: ['ring.net.yaml'] },
        memoryDeps(repo, { evaluate: poisoned(value) }),
      );
      const f = only(report);
      expect(exitCode).toBe(1);
      expect(f.status).toBe('unreadable');
      const broken = f.findings.filter((x) => x.rule === 'not-computable');
      expect(broken.find((x) => x.requirement === 'area-floor:site-failures')?.severity).toBe('fail');
      for (const x of broken) expect(x.message).toMatch(/is (NaN|-?Infinity)(,| and)/);
      // The attack's value at 0.2 is read between two poisoned steps: an infinite value (not
      // computable), or for NaN no value at all (the floor cannot be judged at head though the
      // base could): a failure either way.
      const attack = f.findings.filter((x) => x.requirement === 'r-threshold:hub-attack@0.2:value');
      expect(attack.map((x) => x.severity)).toEqual(['fail']);
      expect(f.requirements.every((r) => r.status !== 'holds')).toBe(true);
    });
  }

  it('the same run without poison passes (the fixture itself is fine)', async () => {
    const { report, exitCode } = await runGate(
      { base: 'base', head: 'head', policySource: 'base', mode: 'block', paths: ['ring.net.yaml'] },
      memoryDeps(repo),
    );
    expect(exitCode).toBe(0);
    expect(only(report).requirements.map((r) => r.status)).toEqual(['holds', 'holds']);
  });
});

describe('views title and word findings by what the judging found', () => {
  it('a drop within the allowance is not titled as a regression; one beyond it is', async () => {
    const run = await runCase('words-deciding-digits');
    const report = run.report!;
    const about = (challenge: string) =>
      planAnnotations(report).annotations.find(
        (a) => a.rule === 'regression' && a.message.startsWith(`area of "${challenge}"`),
      );
    expect(about('link-failures')?.title).toBe('netbrace: requirement weakened');
    expect(about('site-failures')?.title).toBe('netbrace: robustness dropped within the allowance');
    expect(about('site-failures')?.level).toBe('notice');
    // The summary words each requirement from the report's numbers: the drop within the
    // allowance holds, the one beyond it is weakened, at the deciding digits the gate recorded.
    const md = renderSummary(report);
    expect(md).toContain(
      '- \u25A1 holds \u00b7 area, random site removals 0.291 \u2192 0.277 (\u22120.014 \u00b1 0.002), tracked (no floor), allowed drop 0.030\n',
    );
    expect(md).toContain(
      '- \u25A0 weakened \u00b7 area, random link removals 0.46767 \u2192 0.43784 (\u22120.02983 \u00b1 0.00153), tracked (no floor), allowed drop 0.02980\n',
    );
    // The numbers travel as data too: the allowance each drop was judged against.
    const weakened = only(report).findings.find(
      (x) => x.requirement === 'area-floor:link-failures' && x.rule === 'regression',
    )!;
    expect([weakened.status, weakened.allowance]).toEqual(['weakened', 0.0298]);
    const sarif = JSON.stringify(renderSarif(report));
    expect(sarif).toContain('"allowance":0.0298');
    // The HTML tells both drops on their requirement's line: the one within the allowance holds.
    const html = renderHtml(report);
    const line = (id: string) => html.slice(html.indexOf(`data-requirement="${id}"`)).split('</li>')[0];
    expect(line('area-floor:site-failures')).toContain('data-status="holds"');
    expect(line('area-floor:site-failures')).toMatch(/allowed drop 0\.030<\/li>|allowed drop 0\.030$/);
    expect(line('area-floor:link-failures')).toContain('data-status="weakened"');
    expect(line('area-floor:link-failures')).toContain('0.46767 \u2192 0.43784 (\u22120.02983 \u00b1 0.00153)');
  });

  it('what the change does: every view lists attribute changes with base and head lines', async () => {
    const run = await runCase('words-attribute-changes');
    const f = only(run.report);
    expect(f.changes?.modified?.map((c) => `${c.kind} ${c.id} ${c.attribute}: ${c.before} \u2192 ${c.after}`)).toEqual([
      'node quay label: Quay exchange \u2192 Quay hub',
      'node saltings coordinates: 51.55, 1.25 \u2192 51.56, 1.25',
      'node ferry kind: pop \u2192 core',
      'node ferry hardened: no \u2192 yes',
      'link quay\u2014saltings length: 12 km \u2192 12.5 km',
      'link quay\u2014saltings latency: 0.08 ms \u2192 0.09 ms',
      'link quay\u2014saltings capacity: 100 Gbit/s \u2192 400 Gbit/s',
      'link saltings\u2014ferry risk groups: none \u2192 causeway',
      'link ferry\u2014mudflat risk groups: sea-wall \u2192 none',
    ]);
    const line = 'link quay\u2014saltings: length 12 km \u2192 12.5 km (base line 18, head line 19)';
    const md = renderSummary(run.report!);
    expect(md).toContain('**Attributes the change altered**');
    expect(md).toContain('- link `quay\u2014saltings`: length 12 km \u2192 12.5 km (base line 18, head line 19)\n');
    expect(md).toContain('N\u22121 (links), 5 of 5 cases');
    expect(renderHtml(run.report!)).toContain(line);
  });
});

describe('the report schema', () => {
  it('accepts the words-* reports, which carry every field this work added', async () => {
    const validate = new Ajv({ allErrors: true, strict: false }).compile(schema);
    const seen = new Set<string>();
    for (const name of caseNames().filter((n) => n.startsWith('words-'))) {
      const run = await runCase(name);
      const json = JSON.parse(serializeReport(run.report!)) as Report;
      const ok = validate(json);
      expect(validate.errors ?? [], `${name}: ${JSON.stringify(validate.errors?.slice(0, 3))}`).toEqual([]);
      expect(ok).toBe(true);
      for (const f of json.files) {
        if (f.changes?.modified?.length) seen.add('changes.modified');
        if (f.head?.notApplicable?.length) seen.add('evaluation.notApplicable');
        if (f.requirements.some((r) => r.status === 'not-applicable')) seen.add('status not-applicable');
        for (const x of f.findings) {
          if (x.status !== undefined) seen.add('finding.status');
          if (x.allowance !== undefined) seen.add('finding.allowance');
          if (x.threshold !== undefined) seen.add('finding.threshold');
          if (x.rule === 'not-computable') seen.add('rule not-computable');
        }
      }
    }
    expect([...seen].sort()).toEqual([
      'changes.modified',
      'evaluation.notApplicable',
      'finding.allowance',
      'finding.status',
      'finding.threshold',
      'rule not-computable',
      'status not-applicable',
    ]);
  });
});
