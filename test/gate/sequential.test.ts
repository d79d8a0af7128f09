// The sequential stopping rule through the gate (docs/METHODS.md §7.6), forced on a small design
// (request.sequential) so that every branch is quick to reach: batches of 32 by realization
// index, a decision settled by its confidence sequence stops the run, an open one at the most
// realizations is unsettled, the thread count changes nothing, and an unchanged design stops
// after one batch with a change of exactly 0.
import { afterAll, describe, expect, it } from 'vitest';
import { runGate, type GateRequest } from '../../src/run-gate.js';
import { closeWorkers, runTasksParallel } from '../../src/parallel/pool.js';
import { serializeReport } from '../../src/report/report.js';
import { gateFixture, memoryDeps, pairRepo } from './memory-repo.js';

afterAll(closeWorkers);

const request: GateRequest = { base: 'base', head: 'head', policySource: 'base', mode: 'block', sequential: true };

describe('a sequential run', () => {
  it('runs whole batches, says per requirement how many realizations its decision needed, with its bounds', async () => {
    const { report } = await runGate(request, memoryDeps(pairRepo('removed-node')));
    const f = report.files[0];
    for (const env of f.head!.envelopes) {
      expect(env.realizations % 32 === 0 || env.maxRealizations === undefined).toBe(true);
      if (env.maxRealizations !== undefined) expect(env.realizations).toBeLessThan(env.maxRealizations);
    }
    const random = f.requirements.filter((r) => r.bounds !== undefined);
    expect(random.length).toBeGreaterThan(0);
    for (const r of random) {
      expect(r.realizations).toBeGreaterThan(0);
      expect(r.bounds!.head!.lo).toBeLessThanOrEqual(r.head!);
      expect(r.bounds!.head!.hi).toBeGreaterThanOrEqual(r.head!);
      // A settled weakening decision is the one its bounds give; an open one is unsettled.
      const drop = r.bounds!.delta!;
      if (r.status === 'weakened') expect(-drop.hi).toBeGreaterThan(0.05);
      if (r.status === 'unsettled') expect(-drop.lo > 0.05 || -drop.hi <= 0.05).toBe(false);
    }
  });

  it('gives the same report, byte for byte, on 1, 2 and 4 threads', async () => {
    const threaded = memoryDeps(pairRepo('removed-node'), {
      runTasks: (g, plan, tasks, n) => runTasksParallel(g, plan, tasks, n ?? 1, { minWork: 0 }),
    });
    const bytes: string[] = [];
    for (const threads of [1, 2, 4])
      bytes.push(serializeReport((await runGate({ ...request, threads }, threaded)).report));
    bytes.push(serializeReport((await runGate(request, memoryDeps(pairRepo('removed-node')))).report));
    for (const b of bytes) expect(b).toBe(bytes[0]);
  }, 60_000);

  it('an unchanged design (a reworded file) stops after one batch with every change exactly 0', async () => {
    const text = gateFixture('removed-node/base.net.yaml');
    const repo = { base: { 'n.net.yaml': text }, head: { 'n.net.yaml': `# reworded\n${text}` } };
    const f = (await runGate(request, memoryDeps(repo))).report.files[0];
    for (const env of f.head!.envelopes) expect(env.realizations).toBe(32);
    for (const r of f.requirements) expect(r.delta).toBe(0);
    for (const r of f.requirements.filter((x) => x.bounds)) expect(r.bounds!.delta).toEqual({ lo: 0, hi: 0 });
  });

  const FILE = 'n.net.yaml';
  const policy = (min: number) =>
    [
      'version: 1',
      'challenges:',
      '  nodes: { remove: nodes, order: random, until: 0.3, points: 4, realizations: 160 }',
      'requirements:',
      `  - { kind: r-threshold, challenge: nodes, at: 0.2, statistic: quantile, q: 0.1, min: ${min} }`,
      '',
    ].join('\n');
  const floorRun = async (min: number) => {
    const repo = {
      base: {},
      head: { '.netbrace.yaml': policy(min), [FILE]: gateFixture('removed-node/base.net.yaml') },
    };
    const f = (
      await runGate(
        { head: 'head', policySource: 'head', mode: 'block', paths: [FILE], sequential: true },
        memoryDeps(repo),
      )
    ).report.files[0];
    const env = f.head!.envelopes[0];
    return { f, env, value: env.quantiles['0.1'].value[env.x.indexOf(0.2)] };
  };

  it('a floor far above the head is settled below after one batch; one at the estimate runs every realization and stays unsettled', async () => {
    const far = await floorRun(0.99);
    expect(far.env.realizations).toBe(32);
    expect(far.f.requirements[0].status).toBe('short');
    expect(far.f.requirements[0].realizations).toBe(32);
    const full = await floorRun(far.value);
    const at = await floorRun(full.value);
    expect(at.env.realizations).toBe(160);
    expect(at.value).toBe(full.value);
    const q = at.f.requirements[0];
    expect(q.status).toBe('unsettled');
    expect(q.realizations).toBe(160);
    expect(q.bounds!.head!.lo).toBeLessThan(full.value);
    expect(at.f.findings.find((x) => x.rule === 'r-threshold')!.message).toContain(
      'after 160 realizations its confidence sequence still reaches',
    );
  });
});
