// Gate decisions on fixture pairs with known answers (fixtures/gate/, invented designs).
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { runGate, type GateRequest } from '../../src/run-gate.js';
import type { Report } from '../../src/report/report.js';
import { gateFixture, lineOf, memoryDeps, pairRepo, repoRoot, type MemoryRepo } from './memory-repo.js';

const request: GateRequest = { base: 'base', head: 'head', policySource: 'base', mode: 'block' };
const FILE = 'networks/site.net.yaml';

async function gate(repo: MemoryRepo, extra: Partial<GateRequest> = {}) {
  return runGate({ ...request, ...extra }, memoryDeps(repo));
}

const fileOf = (r: Report, p = FILE) => r.files.find((f) => f.path === p)!;

describe('gate decisions on fixture pairs', () => {
  it('retiring the span that closes a ring makes a chain: new bridges and cut nodes fail, at their lines', async () => {
    const { report, exitCode } = await gate(pairRepo('ring-to-chain'));
    expect(exitCode).toBe(1);
    expect(report.verdict).toBe('fail');
    const f = fileOf(report);
    expect(f.status).toBe('weakened');
    const head = gateFixture('ring-to-chain/head.net.yaml');
    // Every link of a path is a bridge and every inner node a cut node (common practice, textbook fact).
    const bridges = f.findings.filter((x) => x.rule === 'new-bridge');
    const chain = ['harbour, mill', 'mill, quarry', 'quarry, ridge', 'ridge, weir', 'weir, orchard'];
    expect(bridges.map((b) => b.line)).toEqual(chain.map((l) => lineOf(head, `between: [${l}]`)));
    expect(
      bridges.every((b) => b.severity === 'fail' && b.elements[0].kind === 'link' && b.elements[0].line === b.line),
    ).toBe(true);
    const cuts = f.findings.filter((x) => x.rule === 'new-cut-node');
    expect(cuts.map((c) => c.elements[0].id)).toEqual(['mill', 'quarry', 'ridge', 'weir']);
    expect(cuts.map((c) => c.line)).toEqual(['mill', 'quarry', 'ridge', 'weir'].map((n) => lineOf(head, `id: ${n}`)));
    // Bridges and cut nodes are counted in rows of their own, never added together.
    const rows = f.requirements
      .filter((r) => r.id.startsWith('no-new-spof'))
      .map((r) => [r.id, r.description, r.base, r.head, r.status]);
    expect(rows).toEqual([
      ['no-new-spof/bridges', 'no new bridges', 0, 5, 'weakened'],
      ['no-new-spof/cut-nodes', 'no new cut nodes', 0, 4, 'weakened'],
      ['no-new-spof/risk-groups', 'no new shared-risk groups that strand sites', 0, 0, 'holds'],
    ]);
    // The removed span is listed with its line in the base.
    expect(f.changes?.removed).toEqual([
      {
        id: 'orchard\u2014harbour',
        kind: 'link',
        line: lineOf(gateFixture('ring-to-chain/base.net.yaml'), 'between: [orchard, harbour]'),
      },
    ]);
  });

  it('adding a redundant link passes with a positive delta', async () => {
    const { report, exitCode } = await gate(pairRepo('redundant-link'));
    expect(exitCode).toBe(0);
    const f = fileOf(report);
    expect(f.status).toBe('holds');
    expect(f.findings.filter((x) => x.severity !== 'notice')).toEqual([]);
    // Node failures use the same node keys on both sides, so every realization removes the same
    // nodes; a link more never lowers pair connectivity or efficiency: the delta cannot be negative.
    const area = f.requirements.find((r) => r.id === 'area-floor:node-failures')!;
    expect(area.delta).toBeGreaterThan(0);
    expect(area.delta!).toBeGreaterThan(2 * area.se!);
    expect(f.requirements.find((r) => r.id === 'n-1:link')!.delta).toBeGreaterThan(0);
    expect(f.changes?.added.map((e) => e.id)).toEqual(['harbour\u2014ridge']);
  });

  it('an unchanged design gives a delta of exactly 0 and no finding', async () => {
    const same = gateFixture('unchanged/base.net.yaml');
    const policy = gateFixture('policy.yaml');
    const repo: MemoryRepo = {
      base: { '.netbrace.yaml': policy, [FILE]: same },
      head: { '.netbrace.yaml': policy, [FILE]: same },
    };
    const { report } = await gate(repo, { paths: [FILE] });
    const f = fileOf(report);
    expect(f.findings).toEqual([]);
    for (const r of f.requirements) expect([r.delta, r.se]).toEqual([0, 0]);
  });

  it('a reworded comment (same topology, different text) also gives exactly 0: common random numbers', async () => {
    const { report } = await gate(pairRepo('unchanged'));
    const f = fileOf(report);
    expect(f.status).toBe('holds');
    expect(f.findings).toEqual([]);
    for (const r of f.requirements) expect([r.delta, r.se]).toEqual([0, 0]);
  });

  it('a removed node whose loss is within tolerance passes with a notice', async () => {
    const { report, exitCode } = await gate(pairRepo('removed-node'));
    expect(exitCode).toBe(0);
    const f = fileOf(report);
    expect(f.status).toBe('holds');
    const notices = f.findings.filter((x) => x.rule === 'regression');
    expect(notices.length).toBeGreaterThan(0);
    expect(notices.every((x) => x.severity === 'notice')).toBe(true);
    expect(notices.some((x) => /within the allowed 0\.050|inside the error/.test(x.message))).toBe(true);
    const dropped = f.requirements.filter((r) => r.delta !== null && r.delta < 0);
    expect(dropped.length).toBeGreaterThan(0);
    for (const r of dropped) expect(-r.delta!).toBeLessThanOrEqual(0.05);
    expect(f.changes?.removed.filter((e) => e.kind === 'node').map((e) => e.id)).toEqual(['annex']);
  });

  it('a drop below error-multiple × se is inside the error, never a failure, even with no allowance', async () => {
    const strict = gateFixture('policy.yaml').replace('allowed-drop: 0.05', 'allowed-drop: 0');
    const { report } = await gate(pairRepo('removed-node', FILE, strict));
    const f = fileOf(report);
    const noisy = f.requirements.filter((r) => r.status === 'inside-error');
    expect(noisy.length).toBeGreaterThan(0);
    for (const r of noisy) expect(-r.delta!).toBeLessThan(2 * r.se!);
    for (const r of noisy) {
      const x = f.findings.find((y) => y.requirement === r.id && y.rule === 'regression')!;
      expect([x.severity, /inside the error, not a failure/.test(x.message)]).toEqual(['notice', true]);
    }
    // Drops beyond the noise with no allowance are regressions.
    const weakened = f.requirements.filter((r) => r.status === 'weakened');
    for (const r of weakened) expect(-r.delta!).toBeGreaterThanOrEqual(2 * r.se!);
    expect(report.verdict).toBe(weakened.length > 0 ? 'fail' : 'pass');
  });

  it('a head that does not parse fails with its line; the other designs are still judged', async () => {
    const repo = pairRepo('redundant-link');
    repo.base['networks/broken.net.yaml'] = gateFixture('unchanged/base.net.yaml');
    repo.head['networks/broken.net.yaml'] = 'nodes:\n  - id: a\nlinks:\n  - between: [a, nowhere]\n';
    const { report, exitCode } = await gate(repo);
    expect(exitCode).toBe(1);
    const broken = fileOf(report, 'networks/broken.net.yaml');
    expect(broken.status).toBe('unreadable');
    expect(broken.error?.line).toBe(4);
    expect(broken.findings[0]).toMatchObject({ rule: 'parse-error', severity: 'fail', line: 4 });
    expect(fileOf(report).status).toBe('holds');
    expect(report.counts).toMatchObject({ unreadable: 1, holds: 1 });
  });

  it('a deleted design is reported; it fails only when the policy says so', async () => {
    const repo = pairRepo('unchanged');
    delete repo.head[FILE];
    const soft = await gate(repo);
    expect(fileOf(soft.report)).toMatchObject({
      status: 'removed',
      findings: [{ rule: 'removed-design', severity: 'notice' }],
    });
    expect(soft.exitCode).toBe(0);
    const strict = gateFixture('policy.yaml').replace('removed-designs: notice', 'removed-designs: fail');
    repo.base['.netbrace.yaml'] = strict;
    const hard = await gate(repo);
    expect(hard.exitCode).toBe(1);
    expect(fileOf(hard.report).findings[0].severity).toBe('fail');
  });

  it('a renamed design is compared with its old self', async () => {
    const repo = pairRepo('unchanged');
    repo.head = { '.netbrace.yaml': repo.head['.netbrace.yaml'], 'networks/moved.net.yaml': repo.base[FILE] };
    repo.renames = { 'networks/moved.net.yaml': FILE };
    const { report } = await gate(repo);
    expect(report.files).toHaveLength(1);
    const f = fileOf(report, 'networks/moved.net.yaml');
    expect([f.status, f.previousPath]).toEqual(['renamed', FILE]);
    for (const r of f.requirements) expect(r.delta).toBe(0);
  });

  it('a new design is judged on thresholds only', async () => {
    const repo = pairRepo('unchanged');
    repo.head['networks/extra.net.yaml'] = gateFixture('ring-to-chain/head.net.yaml');
    const { report, exitCode } = await gate(repo);
    const f = fileOf(report, 'networks/extra.net.yaml');
    expect(f.status).toBe('new');
    expect(f.requirements.every((r) => r.base === null && r.delta === null)).toBe(true);
    expect(f.findings.filter((x) => x.rule === 'new-bridge')).toEqual([]);
    expect(exitCode).toBe(0);
  });
});

describe("envelope floors read the engine's envelope", () => {
  const policy = (min: number) =>
    [
      'challenges:',
      '  failures:',
      '    remove: nodes',
      '    until: 0.5',
      '    points: 4',
      '    realizations: 100',
      'requirements:',
      '  - kind: r-threshold',
      '    challenge: failures',
      '    at: 0.2',
      '    statistic: quantile',
      '    q: 0.1',
      `    min: ${min}`,
      '  - kind: spread-ceiling',
      '    challenge: failures',
      '    max: 0.0001',
      '',
    ].join('\n');
  const run = (min: number) =>
    runGate(
      { head: 'head', policySource: 'head', mode: 'block', paths: [FILE] },
      memoryDeps({
        base: {},
        head: { '.netbrace.yaml': policy(min), [FILE]: gateFixture('removed-node/base.net.yaml') },
      }),
    );

  it("a quantile threshold off the regular grid is put on it, and judged on the envelope's value", async () => {
    const { report } = await run(0.99);
    const f = fileOf(report);
    const env = f.head!.envelopes[0];
    const j = env.x.indexOf(0.2);
    expect(j).toBeGreaterThan(0); // 0, 1/6, 1/3, 1/2 plus the threshold's 0.2
    const [q, spread] = f.requirements;
    expect(q.head).toBe(env.quantiles['0.1'].value[j]);
    expect(q.status).toBe('short');
    expect(spread.head).toBe(env.spread);
    expect(spread.status).toBe(env.spread > 0.0001 ? 'short' : 'holds');
    // 0.2 of 11 nodes is 2.2 removals: R is read between 2 and 3, so 3 elements stand behind it.
    expect(f.findings.find((x) => x.rule === 'r-threshold')!.elements.length).toBe(Math.ceil(0.2 * 11));
  });

  it('a floor met by the estimate but not by its confidence interval is unsettled, does not hold', async () => {
    const first = fileOf((await run(0.99)).report);
    const env = first.head!.envelopes[0];
    const j = env.x.indexOf(0.2);
    const band = env.quantiles['0.1'];
    const f = fileOf((await run(band.value[j])).report);
    expect(f.requirements[0].status).toBe(band.lo[j] < band.value[j] ? 'unsettled' : 'holds');
    expect(band.lo[j]).toBeLessThan(band.value[j]); // this design's band is wide enough to show it
  });
});

describe('a threshold on a known attack curve (karate club, static degree attack)', () => {
  // test/reference/envelope.json, graph "karate": largest_component after the static
  // highest-degree attack, computed with networkx 2.8.8 (ties to the lowest index).
  const ref = JSON.parse(readFileSync(path.join(repoRoot, 'test', 'reference', 'envelope.json'), 'utf8'));
  const karate = ref.graphs.find((g: { name: string }) => g.name === 'karate');
  const curve: number[] = karate.attacks.degree.largest_component;
  const sequence: number[] = karate.attacks.degree.sequence;
  const design =
    '# Zachary\u2019s karate club (Zachary, J. Anthropol. Res. 33:452, 1977), as networkx ships it, weights dropped\nnodes:\n' +
    Array.from({ length: karate.n }, (_, i) => `  - id: "${i}"\n`).join('') +
    'links:\n' +
    karate.edges.map(([a, b]: [number, number]) => `  - between: ["${a}", "${b}"]\n`).join('');
  const policy = [
    'r-value:',
    '  metrics:',
    '    largest_component: 1',
    'challenges:',
    '  hubs:',
    '    remove: nodes',
    '    order: degree',
    '    until: 0.2',
    'requirements:',
    '  - kind: r-threshold   # 2.04 of 34 removed: between the reference 26/34 and 20/34',
    '    challenge: hubs',
    '    at: 0.06',
    '    min: 0.7',
    '  - kind: r-threshold   # 4.08 of 34 removed: between the reference 10/34 and 8/34',
    '    challenge: hubs',
    '    at: 0.12',
    '    min: 0.7',
    '',
  ].join('\n');

  it('is met at 6 % removed and missed at 12 %, with the values and sequence of the reference', async () => {
    const repo: MemoryRepo = { base: {}, head: { '.netbrace.yaml': policy, 'karate.net.yaml': design } };
    const { report, exitCode } = await runGate(
      { head: 'head', policySource: 'head', mode: 'block', paths: ['karate.net.yaml'] },
      memoryDeps(repo),
    );
    const f = fileOf(report, 'karate.net.yaml');
    const [met, missed] = f.requirements;
    expect(met.id).toBe('r-threshold:hubs@0.06:value');
    expect(met.status).toBe('holds');
    // R at 0.06 · 34 = 2.04 and 0.12 · 34 = 4.08 removals, linear between the reference's steps.
    expect(met.head).toBeCloseTo(curve[2] + 0.04 * (curve[3] - curve[2]), 12);
    expect(missed.status).toBe('short');
    expect(missed.head).toBeCloseTo(curve[4] + 0.08 * (curve[5] - curve[4]), 12);
    expect(f.status).toBe('below-floor');
    expect(exitCode).toBe(1);
    const finding = f.findings.find((x) => x.rule === 'r-threshold')!;
    expect(finding.elements.map((e) => e.id)).toEqual(sequence.slice(0, 5).map(String));
    expect(finding.line).toBe(lineOf(design, `id: "${sequence[0]}"`));
  });

  it('the worst-case and N−1 floors see the brute-force worst removals of the reference', async () => {
    // test/reference/envelope.json, karate "worst": exhaustive search with networkx 2.8.8;
    // also docs/METHODS.md §10.3 (k=1: 27/34 removing node 0; k=2: 24/34 removing nodes 0 and 1).
    const worst = karate.worst.largest_component;
    const strict = [
      'r-value:',
      '  metrics:',
      '    largest_component: 1',
      'challenges:',
      '  failures:',
      '    remove: nodes',
      '    until: 0.2',
      '    points: 3',
      '    realizations: 20',
      '    worst-case: 2',
      'requirements:',
      '  - kind: r-threshold',
      '    challenge: failures',
      '    statistic: worst-case',
      '    removals: 2',
      '    min: 0.72',
      '  - kind: n-1',
      '    element: node',
      '    min: 0.8',
      '',
    ].join('\n');
    const repo: MemoryRepo = { base: {}, head: { '.netbrace.yaml': strict, 'karate.net.yaml': design } };
    const { report } = await runGate(
      { head: 'head', policySource: 'head', mode: 'block', paths: ['karate.net.yaml'] },
      memoryDeps(repo),
    );
    const f = fileOf(report, 'karate.net.yaml');
    const [wc, n1] = f.requirements;
    expect([wc.id, wc.status]).toEqual(['r-threshold:failures:worst-case\u00d72', 'short']);
    expect(wc.head).toBeCloseTo(worst['2'].value, 12);
    expect([n1.id, n1.status]).toEqual(['n-1:node', 'short']);
    expect(n1.head).toBeCloseTo(worst['1'].value, 12);
    const byReq = (id: string) => f.findings.find((x) => x.requirement === id)!;
    expect(
      byReq(wc.id)
        .elements.map((e) => e.id)
        .sort(),
    ).toEqual(worst['2'].set.map(String).sort());
    expect(byReq(n1.id).elements.map((e) => e.id)).toEqual(worst['1'].set.map(String));
    expect(byReq(n1.id).line).toBe(lineOf(design, 'id: "0"'));
  });
});
