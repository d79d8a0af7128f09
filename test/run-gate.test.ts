// The orchestrator: which policy judges, which files are judged, parts and joining,
// determinism, and that configuration errors stop the run before any evaluation.
import { describe, expect, it, vi } from 'vitest';
import { PolicyError, UsageError } from '../src/errors.js';
import { evaluateDesign } from '../src/envelope/evaluate.js';
import { joinReports, runGate, inPart, type GateRequest } from '../src/run-gate.js';
import { fnv1a32 as pathHash } from '../src/random.js';
import { REPORT_VERSION, serializeReport, type Report } from '../src/report/report.js';
import { gateFixture, memoryDeps, pairRepo, type MemoryRepo } from './gate/memory-repo.js';

const request: GateRequest = { base: 'base', head: 'head', policySource: 'base', mode: 'block' };
const FILE = 'networks/site.net.yaml';
const spy = () => vi.fn(evaluateDesign);

describe('trusted policy', () => {
  it('is read from the base: a change that loosens its own policy is judged by the old one', async () => {
    const repo = pairRepo('ring-to-chain');
    repo.head['.netbrace.yaml'] = 'requirements: []\n';
    const { report, exitCode } = await runGate(request, memoryDeps(repo));
    expect(exitCode).toBe(1);
    expect(report.policy).toMatchObject({ source: 'file', path: '.netbrace.yaml', revision: 'base', changed: true });
    expect(report.policy.note).toContain('the version at the base judges it');
  });

  it('policy-source head applies the policy of the head, and says the policy changed', async () => {
    const repo = pairRepo('ring-to-chain');
    repo.head['.netbrace.yaml'] = 'requirements: []\n';
    const { report, exitCode } = await runGate({ ...request, policySource: 'head' }, memoryDeps(repo));
    expect(exitCode).toBe(0);
    expect(report.policy).toMatchObject({ revision: 'head', changed: true });
  });

  it('a broken proposed policy is reported in the note, not applied', async () => {
    const repo = pairRepo('unchanged');
    repo.head['.netbrace.yaml'] = 'requirments: []\n';
    const { report } = await runGate(request, memoryDeps(repo));
    expect(report.policy.note).toContain('.netbrace.yaml:1:1: unknown key "requirments"');
  });

  it('without a policy file the built-in policy applies and the report says so', async () => {
    const repo = pairRepo('ring-to-chain');
    delete repo.base['.netbrace.yaml'];
    delete repo.head['.netbrace.yaml'];
    const { report, exitCode } = await runGate(request, memoryDeps(repo));
    expect(report.policy).toEqual({ source: 'builtin', revision: 'base' });
    expect(exitCode).toBe(1); // the built-in policy fails new single points of failure
    expect(report.files[0].findings.some((f) => f.rule === 'new-bridge' && f.severity === 'fail')).toBe(true);
  });

  it('a policy added by the change does not judge it', async () => {
    const repo = pairRepo('unchanged');
    delete repo.base['.netbrace.yaml'];
    const { report } = await runGate(request, memoryDeps(repo));
    expect(report.policy).toMatchObject({ source: 'builtin', changed: true });
  });

  it('a missing explicit policy file is a usage error', async () => {
    await expect(
      runGate({ ...request, policyPath: 'nope.yaml' }, memoryDeps(pairRepo('unchanged'))),
    ).rejects.toBeInstanceOf(UsageError);
  });

  it('a scope that loosens an inherited floor stops the run with both lines, before any evaluation', async () => {
    const repo = pairRepo('redundant-link');
    // fixtures/gate/inherits/: the team's policy inherits the organisation's and lowers its floor.
    const [org, team] = [gateFixture('inherits/org.yaml'), gateFixture('inherits/team.yaml')];
    for (const side of [repo.base, repo.head]) Object.assign(side, { 'org.yaml': org, '.netbrace.yaml': team });
    const evaluate = spy();
    const error = await runGate(request, memoryDeps(repo, { evaluate })).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(PolicyError);
    const e = error as PolicyError;
    expect([e.file, e.line]).toEqual(['.netbrace.yaml', 8]);
    expect(e.related.map((r) => [r.file, r.line])).toEqual([['org.yaml', 5]]);
    expect(e.format()).toMatch(
      /^\.netbrace\.yaml:8:14: scope 1, requirement 1 loosens n-1:link: min 0\.5 where min 0\.7 is required/,
    );
    expect(evaluate).not.toHaveBeenCalled();
  });

  it('a broken policy at the base stops the run before any evaluation', async () => {
    const repo = pairRepo('redundant-link');
    repo.base['.netbrace.yaml'] = 'seed: -1\n';
    const evaluate = spy();
    await expect(runGate(request, memoryDeps(repo, { evaluate }))).rejects.toMatchObject({
      kind: 'policy',
      line: 1,
      column: 7,
    });
    expect(evaluate).not.toHaveBeenCalled();
  });
});

describe('which designs are judged', () => {
  it('only changed files that the policy calls designs', async () => {
    const repo = pairRepo('unchanged');
    repo.head['README.md'] = 'notes';
    repo.head['docs/diagram.svg'] = '<svg/>';
    const { report } = await runGate(request, memoryDeps(repo));
    expect(report.files.map((f) => f.path)).toEqual([FILE]);
    expect(report.scope).toBe('changed');
  });

  it('no changed design: a pass that says so', async () => {
    const repo = pairRepo('unchanged');
    repo.head[FILE] = repo.base[FILE];
    const { report, exitCode } = await runGate(request, memoryDeps(repo));
    expect([report.files, report.verdict, exitCode]).toEqual([[], 'pass', 0]);
  });

  it('a scheduled run judges every design on thresholds only', async () => {
    const repo = pairRepo('ring-to-chain');
    repo.head['other.gml'] = 'graph [\n  node [ id 1 ]\n  node [ id 2 ]\n  edge [ source 1 target 2 ]\n]\n';
    const { report, exitCode } = await runGate({ ...request, eventKind: 'schedule' }, memoryDeps(repo));
    expect(report.scope).toBe('all');
    expect(report.base).toBeUndefined();
    // The two-node design misses the N−1 floor (losing its one link leaves R = 0).
    expect(report.files.map((f) => [f.path, f.status])).toEqual([
      [FILE, 'holds'],
      ['other.gml', 'below-floor'],
    ]);
    expect(report.files[1].requirements.find((r) => r.id === 'n-1:link')).toMatchObject({ head: 0, status: 'short' });
    expect(report.files.every((f) => f.requirements.every((r) => r.base === null))).toBe(true);
    expect(exitCode).toBe(1);
  });

  it('inform mode reports the failed verdict and exits 0', async () => {
    const { report, exitCode } = await runGate({ ...request, mode: 'inform' }, memoryDeps(pairRepo('ring-to-chain')));
    expect([report.verdict, report.mode, exitCode]).toEqual(['fail', 'inform', 0]);
  });

  it('rejects a request that makes no sense', async () => {
    const deps = memoryDeps(pairRepo('unchanged'));
    await expect(runGate({ ...request, part: { index: 3, total: 2 } }, deps)).rejects.toBeInstanceOf(UsageError);
    await expect(runGate({ ...request, seed: 1.5 }, deps)).rejects.toBeInstanceOf(UsageError);
    await expect(runGate({ ...request, mode: 'strict' as 'block' }, deps)).rejects.toBeInstanceOf(UsageError);
  });
});

function manyDesigns(): MemoryRepo {
  // Fewer realizations than the fixtures' policy: this test is about bookkeeping, not precision.
  const policy = gateFixture('policy.yaml').replace(/realizations: 200/g, 'realizations: 30');
  const repo: MemoryRepo = { base: { '.netbrace.yaml': policy }, head: { '.netbrace.yaml': policy } };
  const pairs = ['ring-to-chain', 'redundant-link', 'unchanged', 'removed-node'];
  for (let i = 0; i < 8; i++) {
    const pair = pairs[i % pairs.length];
    repo.base[`region-${i}/core.net.yaml`] = gateFixture(`${pair}/base.net.yaml`);
    repo.head[`region-${i}/core.net.yaml`] = gateFixture(`${pair}/head.net.yaml`);
  }
  return repo;
}

describe('determinism, parts and joining', () => {
  it('the same inputs and seed give a byte-identical report; another seed another one', async () => {
    const a = await runGate(request, memoryDeps(pairRepo('removed-node')));
    const b = await runGate(request, memoryDeps(pairRepo('removed-node')));
    expect(serializeReport(a.report)).toBe(serializeReport(b.report));
    const c = await runGate({ ...request, seed: 2 }, memoryDeps(pairRepo('removed-node')));
    expect(c.report.seed).toBe(2);
    expect(serializeReport(c.report)).not.toBe(serializeReport(a.report));
  });

  it('parts are a deterministic partition by path hash, and joined they give the report of the whole', async () => {
    const repo = manyDesigns();
    const whole = await runGate(request, memoryDeps(repo));
    const parts = await Promise.all(
      [1, 2, 3].map((index) => runGate({ ...request, part: { index, total: 3 } }, memoryDeps(repo))),
    );
    const paths = parts.map((s) => s.report.files.map((f) => f.path));
    expect(paths.flat().sort()).toEqual(whole.report.files.map((f) => f.path));
    expect(new Set(paths.flat()).size).toBe(paths.flat().length);
    for (const [i, s] of parts.entries()) {
      expect(s.report.part).toEqual({ index: i + 1, total: 3 });
      for (const f of s.report.files) expect(pathHash(f.path) % 3).toBe(i);
    }
    // Join what the part jobs wrote (JSON files), in any order.
    const joined = joinReports([parts[2], parts[0], parts[1]].map((s) => JSON.parse(serializeReport(s.report))));
    expect(joined.parts).toEqual({ total: 3, joined: [1, 2, 3] });
    const strip = (r: Report) => ({ ...r, part: undefined, parts: undefined });
    expect(serializeReport(strip(joined))).toBe(serializeReport(strip(JSON.parse(serializeReport(whole.report)))));
    expect(joined.verdict).toBe(whole.report.verdict);
  });

  it('FNV-1a matches its published test vectors', () => {
    // Fowler–Noll–Vo reference test vectors (FNV-1a, 32 bit).
    expect(pathHash('')).toBe(0x811c9dc5);
    expect(pathHash('a')).toBe(0xe40c292c);
    expect(pathHash('foobar')).toBe(0xbf9cf968);
    expect(inPart('a', { index: 1, total: 1 })).toBe(true);
  });

  it('join reads reports of older writers (optional fields missing) and refuses newer versions', () => {
    const old = {
      version: 1,
      tool: { name: 'netbrace', version: '0.0.9' },
      verdict: 'pass',
      mode: 'block',
      policy: { source: 'builtin' },
      seed: 1,
      files: [{ path: 'a.gml', status: 'holds', findings: [], requirements: [] }],
    };
    const failing = {
      ...old,
      files: [
        {
          path: 'b.gml',
          status: 'unreadable',
          findings: [{ rule: 'parse-error', severity: 'fail', message: 'x', elements: [], line: 3 }],
        },
      ],
    };
    const joined = joinReports([old, failing]);
    expect(joined.version).toBe(REPORT_VERSION);
    expect(joined.files.map((f) => f.path)).toEqual(['a.gml', 'b.gml']);
    expect(joined.counts).toMatchObject({ holds: 1, unreadable: 1 });
    expect(joined.verdict).toBe('fail');
    expect(joined.caution.length).toBeGreaterThan(0);
    expect(() => joinReports([{ ...old, version: REPORT_VERSION + 1 }])).toThrow(UsageError);
    expect(() => joinReports([{ hello: 1 }])).toThrow(UsageError);
    expect(() => joinReports([])).toThrow(UsageError);
  });
});
