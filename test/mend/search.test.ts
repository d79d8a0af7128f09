// What would mend a failing design, through the gate (runGate, in memory): the suggestion for a
// ring that lost a span, candidates from the planner's list, the limits, and determinism —
// the same suggestions, byte for byte, on every run and with any number of worker threads.
import { afterAll, describe, expect, it } from 'vitest';
import { closeWorkers, evaluateDesignParallel } from '../../src/parallel/pool.js';
import { serializeReport } from '../../src/report/report.js';
import { runGate, type GateDeps, type GateRequest } from '../../src/run-gate.js';
import { gateFixture, memoryDeps, pairRepo } from '../gate/memory-repo.js';

afterAll(() => closeWorkers());

const request: GateRequest = { base: 'base', head: 'head', policySource: 'base', mode: 'block' };
const FILE = 'networks/site.net.yaml';
const threaded =
  (n: number): GateDeps['evaluate'] =>
  (g, spec) =>
    evaluateDesignParallel(g, spec, n, { minWork: 0 });

describe('mending a ring that became a chain', () => {
  it('suggests the one link that closes the ring again: the Eswaran–Tarjan bound, and it holds', async () => {
    const { report } = await runGate(request, memoryDeps(pairRepo('ring-to-chain')));
    const f = report.files[0];
    expect(f.status).toBe('weakened');
    const m = f.mend!;
    expect(m.targets.filter((t) => t.rule === 'new-bridge')).toHaveLength(5);
    // A chain's bridge tree is the chain: two leaves, one link (Eswaran & Tarjan 1976).
    expect(m.bounds.newBridges).toEqual({ leaves: 2, isolated: 0, links: 1 });
    expect(m.candidates.source).toBe('generated');
    const first = m.suggestions[0];
    expect(first.kind).toBe('links');
    expect(first.links.map((l) => [...l.between].sort())).toEqual([['harbour', 'orchard']]);
    expect(first.holds).toBe(true);
    expect(first.status).toBe('holds');
    expect(first.fixes).toHaveLength(m.targets.length);
    expect(first.method).toContain('the Eswaran\u2013Tarjan bound is 1');
    expect(first.rAfter!).toBeGreaterThan(first.rBefore!);
    // The ring again: R̄ after equals the base's R̄ exactly (same dice: common random numbers).
    const baseAreas = f.base!.envelopes.map((e) => e.area);
    expect(first.rAfter).toBeCloseTo(baseAreas.reduce((s, a) => s + a, 0) / baseAreas.length, 12);
    // The alternative: harden the new single points of failure.
    const harden = m.suggestions.find((s) => s.kind === 'harden')!;
    expect(harden.harden.map((e) => e.kind).sort()).toEqual([
      'link',
      'link',
      'link',
      'link',
      'link',
      'node',
      'node',
      'node',
      'node',
    ]);
    expect(harden.fixes.filter((k) => k.startsWith('new-'))).toHaveLength(9);
  });

  it('gives the same suggestions on every run and with 1, 2 or 4 worker threads', async () => {
    const runs: string[] = [];
    for (const evaluate of [undefined, threaded(1), threaded(2), threaded(4)]) {
      const { report } = await runGate(
        { ...request, threads: 2 },
        memoryDeps(pairRepo('ring-to-chain'), evaluate ? { evaluate } : {}),
      );
      runs.push(serializeReport(report));
    }
    const again = await runGate(request, memoryDeps(pairRepo('ring-to-chain')));
    runs.push(serializeReport(again.report));
    expect(JSON.parse(runs[0]).files[0].mend.suggestions.length).toBeGreaterThan(0);
    for (const r of runs) expect(r).toBe(runs[0]);
  }, 120_000);

  it('takes the candidates from the list the policy names, priced by cost', async () => {
    const policy = `${gateFixture('policy.yaml')}mend:\n  candidates: planning/links.yaml\n`;
    const repo = pairRepo('ring-to-chain', FILE, policy);
    // harbour–weir and mill–orchard together also remove every bridge, but take two links.
    repo.head['planning/links.yaml'] = [
      'candidates:',
      '  - {between: [harbour, weir], cost: 3}',
      '  - {between: [mill, orchard], cost: 4}',
      '  - {between: [harbour, orchard], cost: 10, id: harbour-orchard-lease}',
    ].join('\n');
    const m = (await runGate(request, memoryDeps(repo))).report.files[0].mend!;
    expect(m.candidates).toEqual({ source: 'list', path: 'planning/links.yaml', count: 3 });
    const first = m.suggestions[0];
    expect(first.links).toEqual([
      { id: 'harbour-orchard-lease', between: ['harbour', 'orchard'], cost: 10, source: 'list', line: 4 },
    ]);
    expect(first.unit).toBe('cost');
    expect(first.total).toBe(10);
    expect(first.holds).toBe(true);
  });

  it('says so when the list is missing or broken, and still offers hardening', async () => {
    const policy = `${gateFixture('policy.yaml')}mend:\n  candidates: planning/links.yaml\n`;
    const missing = (await runGate(request, memoryDeps(pairRepo('ring-to-chain', FILE, policy)))).report.files[0].mend!;
    expect(missing.notes.join('\n')).toContain('planning/links.yaml named by the policy does not exist at head');
    expect(missing.suggestions.map((s) => s.kind)).toEqual(['harden']);
    const repo = pairRepo('ring-to-chain', FILE, policy);
    repo.head['planning/links.yaml'] = 'candidates:\n  - {between: [harbour], cost: 1}\n';
    const broken = (await runGate(request, memoryDeps(repo))).report.files[0].mend!;
    expect(broken.notes.join('\n')).toContain('planning/links.yaml:2:');
    expect(broken.notes.join('\n')).toContain('"between" must list two site ids');
  });

  it('searches nothing with mend.evaluations: 0, or for a design that passes', async () => {
    const policy = `${gateFixture('policy.yaml')}mend:\n  evaluations: 0\n`;
    const off = (await runGate(request, memoryDeps(pairRepo('ring-to-chain', FILE, policy)))).report.files[0];
    expect(off.status).toBe('weakened');
    expect(off.mend).toBeUndefined();
    const passing = (await runGate(request, memoryDeps(pairRepo('redundant-link')))).report.files[0];
    expect(passing.status).toBe('holds');
    expect(passing.mend).toBeUndefined();
    expect(passing.map).toBeDefined();
  });

  it('without a base, aims at the floors it falls short of', async () => {
    const policy = 'requirements:\n  - kind: n-1\n    element: link\n    min: 0.7\n';
    const repo = { base: {}, head: { '.netbrace.yaml': policy, [FILE]: gateFixture('ring-to-chain/head.net.yaml') } };
    const { report } = await runGate(
      { head: 'head', paths: [FILE], policySource: 'head', mode: 'block', mend: 'always' },
      memoryDeps(repo),
    );
    const m = report.files[0].mend!;
    expect(m.targets.map((t) => t.key)).toEqual(['n-1|n-1:link']);
    expect(m.suggestions.length).toBeGreaterThan(0);
    for (const s of m.suggestions) {
      const row = s.requirements.find((r) => r.id === 'n-1:link')!;
      expect(row.after!).toBeGreaterThanOrEqual(row.before!);
    }
    expect(m.suggestions[0].holds).toBe(true);
  });
});
