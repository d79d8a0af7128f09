// `netbrace explain` and `netbrace envelope` read the gate's policy (the repository's
// .netbrace.yaml, from a subfolder too): its R, its challenges by name with the gate's
// parameters, its seed, its regional radius and its work budget. Their numbers are checked
// against the gate's own JSON report for the same design (the report's 12 significant digits).
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { main } from '../../src/shell/dispatch.js';
import type { Report } from '../../src/report/report.js';
import { REGIONAL_UNTIL_KM } from '../../src/policy/defaults.js';
import { compileTopology } from '../../src/graph/compact.js';
import { findCutElements } from '../../src/graph/structure.js';
import { passCost, rCost, survivorShape } from '../../src/envelope/cost.js';
import { defaultRegionalUntil } from '../../src/challenges/regional.js';
import { parseDesign } from '../../src/topology/parse.js';
import { recordIO } from './helpers-io.js';

const scratch: string[] = [];
afterAll(() => {
  for (const d of scratch) rmSync(d, { recursive: true, force: true });
});

async function run(cwd: string, ...args: string[]) {
  const io = recordIO(cwd, { NO_COLOR: '1' });
  const code = await main(args, io);
  return { code, out: io.out.join(''), err: io.err.join('') };
}

const sig = (x: number) => Number(x.toPrecision(12));

/** Invented: ten sites on a circle of about 170 km radius, two chords and a spur site. */
function circleDesign(): string {
  const lines = ['network:', '  name: Invented circle', 'nodes:'];
  for (let i = 0; i < 10; i++) {
    const a = (2 * Math.PI * i) / 10;
    lines.push(
      `  - id: s${i}`,
      `    site: {lat: ${(46 + 1.5 * Math.cos(a)).toFixed(4)}, lon: ${(8 + 2.2 * Math.sin(a)).toFixed(4)}}`,
    );
  }
  lines.push('  - id: spur', '    site: {lat: 46.1, lon: 8.1}', 'links:');
  for (let i = 0; i < 10; i++) lines.push(`  - between: [s${i}, s${(i + 1) % 10}]`);
  lines.push('  - between: [s0, s5]', '  - between: [s2, s7]', '  - between: [s3, spur]');
  return `${lines.join('\n')}\n`;
}

const POLICY = `# Invented policy: R is efficiency only.
seed: 7
r-value:
  metrics:
    efficiency: 1
challenges:
  node-failures:
    remove: nodes
    until: 0.4
    points: 5
    realizations: 60
  quake:
    remove: region
requirements:
  - kind: area-floor
    challenge: node-failures
  - kind: r-threshold
    challenge: node-failures
    at: 0.25
    statistic: median
    min: 0
  - kind: area-floor
    challenge: quake
  - kind: n-1
    element: link
    min: 0
`;

function newRepo(files: Record<string, string>): string {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'netbrace-policy-cmd-'));
  scratch.push(dir);
  const git = (...args: string[]) => execFileSync('git', args, { cwd: dir, encoding: 'utf8' });
  git('init', '-q', '-b', 'main');
  git('config', 'user.email', 'planner@example.invalid');
  git('config', 'user.name', 'Planner');
  git('config', 'commit.gpgsign', 'false');
  for (const [p, text] of Object.entries(files)) {
    mkdirSync(path.dirname(path.join(dir, p)), { recursive: true });
    writeFileSync(path.join(dir, p), text);
  }
  git('add', '-A');
  git('commit', '-q', '-m', 'base');
  return dir;
}

describe('explain and envelope under the repository policy', () => {
  let dir: string;
  let report: Report;
  beforeAll(async () => {
    dir = newRepo({ '.netbrace.yaml': POLICY, 'networks/circle.net.yaml': circleDesign() });
    const gate = await run(dir, 'check', 'networks/circle.net.yaml', '--format', 'json');
    expect(gate.code, gate.err).toBe(0);
    report = JSON.parse(gate.out) as Report;
  });
  const sub = () => path.join(dir, 'networks');
  const gateHead = () => report.files[0].head!;

  it('the gate used R = efficiency, so there is something to agree with', () => {
    // The built-in source count stands (the design has fewer sites, so efficiency is exact).
    const { sourceSeed, ...r } = gateHead().r;
    expect(r).toEqual({ metrics: [{ id: 'efficiency', weight: 1 }], combine: 'mean', sources: 1024 });
    expect(typeof sourceSeed).toBe('number');
    expect(gateHead().sampling).toBeUndefined();
    expect(
      gateHead()
        .envelopes.map((e) => e.challenge)
        .sort(),
    ).toEqual(['random-nodes', 'regional']);
  });

  it('explain, run from a subfolder, takes R from the repository policy: its N−1 link values are the gate\u2019s', async () => {
    const r = await run(sub(), 'explain', 'circle.net.yaml', '--kind', 'link', '--json');
    expect(r.code, r.err).toBe(0);
    const x = JSON.parse(r.out) as {
      r: unknown;
      rSource: string;
      intact: number;
      elements: { id: string; r: number }[];
    };
    expect(x.r).toEqual(gateHead().r);
    expect(x.rSource).toBe('policy .netbrace.yaml');
    const n1 = gateHead().contingencies.find((c) => c.challenge === 'n-1' && c.kind === 'link')!;
    expect(sig(x.elements[0].r)).toBe(n1.min);
    // The same values in the same order; ties may list different elements (explain lists ties in
    // file order, the gate's table in id order), and a shared element has the same value.
    expect(x.elements.slice(0, n1.worst.length).map((e) => sig(e.r))).toEqual(n1.worst.map((w) => w.value));
    const gateValue = new Map(n1.worst.map((w) => [w.elements[0], w.value]));
    for (const e of x.elements) if (gateValue.has(e.id)) expect(sig(e.r), e.id).toBe(gateValue.get(e.id));
    // intact R: the envelope's value with nothing removed
    const env = gateHead().envelopes.find((e) => e.challenge === 'random-nodes')!;
    expect(sig(x.intact)).toBe(env.median[0]);
  });

  it('envelope --challenge node-failures (the policy\u2019s name) gives the gate\u2019s envelope: grid, seed, R, values', async () => {
    const r = await run(
      sub(),
      'envelope',
      'circle.net.yaml',
      '--challenge',
      'node-failures',
      '--json',
      '--threads',
      '1',
    );
    expect(r.code, r.err).toBe(0);
    const j = JSON.parse(r.out);
    const env = gateHead().envelopes.find((e) => e.challenge === 'random-nodes')!;
    expect([j.policy_challenge, j.challenge, j.seed, j.realizations]).toEqual(['node-failures', 'random-nodes', 7, 60]);
    expect(j.r).toEqual(gateHead().r);
    expect(j.x).toEqual(env.x); // 0, 0.1, 0.2, 0.25 (the threshold's x), 0.3, 0.4
    expect(j.x).toContain(0.25);
    expect((j.median as number[]).map(sig)).toEqual(env.median);
    expect(sig(j.area)).toBe(env.area);
    // --metric still wins over the policy
    const lc = JSON.parse(
      (
        await run(
          sub(),
          'envelope',
          'circle.net.yaml',
          '--challenge',
          'node-failures',
          '--metric',
          'largest_component',
          '--json',
        )
      ).out,
    );
    expect(lc.r.metrics).toEqual([{ id: 'largest_component', weight: 1 }]);
  });

  it(`a region runs to the gate\u2019s fixed ${REGIONAL_UNTIL_KM} km, named as the policy names it or as the engine does`, async () => {
    const env = gateHead().envelopes.find((e) => e.challenge === 'regional')!;
    expect(env.x[env.x.length - 1]).toBe(REGIONAL_UNTIL_KM);
    const quake = JSON.parse((await run(sub(), 'envelope', 'circle.net.yaml', '--challenge', 'quake', '--json')).out);
    expect(quake.x).toEqual(env.x);
    expect((quake.median as number[]).map(sig)).toEqual(env.median);
    // The engine's name without --until: the same radius, not the engine's own default (a
    // quarter of the widest site distance, which differs here).
    const g = compileTopology(parseDesign(circleDesign(), 'circle.net.yaml'));
    expect(defaultRegionalUntil(g)).not.toBe(REGIONAL_UNTIL_KM);
    const plain = JSON.parse(
      (await run(sub(), 'envelope', 'circle.net.yaml', '--challenge', 'regional', '--json')).out,
    );
    expect(plain.x[plain.x.length - 1]).toBe(REGIONAL_UNTIL_KM);
  });

  it('--policy FILE is read relative to the working directory; a missing one is exit 2', async () => {
    writeFileSync(path.join(sub(), 'lc.yaml'), 'r-value:\n  metrics:\n    largest_component: 1\n');
    const r = await run(sub(), 'explain', 'circle.net.yaml', '--policy', 'lc.yaml', '--json', '--kind', 'node');
    expect(JSON.parse(r.out).rSource).toBe('policy networks/lc.yaml');
    expect(JSON.parse(r.out).r.metrics).toEqual([{ id: 'largest_component', weight: 1 }]);
    const missing = await run(
      sub(),
      'envelope',
      'circle.net.yaml',
      '--challenge',
      'node-failures',
      '--policy',
      'nope.yaml',
    );
    expect([missing.code, missing.err]).toEqual([
      2,
      'policy file nope.yaml not found — give a path relative to the working directory\n',
    ]);
    const unknown = await run(sub(), 'envelope', 'circle.net.yaml', '--challenge', 'node-failure');
    expect(unknown.code).toBe(2);
    expect(unknown.err).toContain('one of: node-failures, quake, random-nodes');
  });
});

/** Invented, seeded: a ring of `n` sites with chords, and a spur of three sites off site 0. */
function bigDesign(n: number): string {
  let s = 12345;
  const rnd = () => (s = (Math.imul(s, 1103515245) + 12345) >>> 0) / 2 ** 32;
  const lines = ['nodes:'];
  for (let i = 0; i < n; i++) lines.push(`  - id: n${i}`);
  lines.push('  - id: spur1', '  - id: spur2', '  - id: spur3', 'links:');
  for (let i = 0; i < n; i++) lines.push(`  - between: [n${i}, n${(i + 1) % n}]`);
  for (let k = 0; k < n / 2; k++) {
    const a = Math.floor(rnd() * n);
    const b = (a + 2 + Math.floor(rnd() * (n - 3))) % n;
    lines.push(`  - between: [n${a}, n${b}]`);
  }
  lines.push('  - between: [n0, spur1]', '  - between: [spur1, spur2]', '  - between: [spur2, spur3]');
  return `${lines.join('\n')}\n`;
}

describe('explain under a work budget', () => {
  const N = 150;
  const text = bigDesign(N);
  const budget = 1e5;

  it('ranks what the policy budget allows, single points of failure first, and says how many it left out', async () => {
    const dir = newRepo({ '.netbrace.yaml': `budget:\n  visits: ${budget}\n`, 'big.net.yaml': text });
    // What the whole ranking would need under the built-in R, by the engine's estimate.
    const g = compileTopology(parseDesign(text, 'big.net.yaml'));
    const rSpec = {
      metrics: [
        { id: 'pair_connectivity' as const, weight: 1 },
        { id: 'efficiency' as const, weight: 1 },
      ],
      combine: 'mean' as const,
    };
    const cases = g.n + g.m;
    const need = (cases + 1) * (rCost(g, rSpec, survivorShape(g)) + passCost(g));
    expect(need).toBeGreaterThan(20 * budget);

    const r = await run(dir, 'explain', 'big.net.yaml', '--json');
    expect(r.code, r.err).toBe(0);
    const x = JSON.parse(r.out);
    expect(x.reduced).toMatchObject({ total: cases, maxWork: budget, work: need });
    expect(x.reduced.evaluated).toBeLessThan(cases);
    expect(x.reduced.evaluated).toBeGreaterThan(0);
    expect(x.elements).toHaveLength(x.reduced.evaluated);
    expect(x.evaluated.node + x.evaluated.link).toBe(x.reduced.evaluated);
    // The spur's cut sites and bridges are all among the ranked.
    const cuts = findCutElements(g);
    const ranked = new Set(x.elements.map((e: { kind: string; id: string }) => `${e.kind}:${e.id}`));
    for (const v of cuts.cutNodes) expect(ranked.has(`node:${g.nodeIds[v]}`)).toBe(true);
    for (const e of cuts.bridges) expect(ranked.has(`link:${g.linkIds[e]}`)).toBe(true);
    expect(cuts.bridges.length).toBe(3);

    const shown = await run(dir, 'explain', 'big.net.yaml');
    expect(shown.out.replace(/\s+/g, ' ')).toContain(
      `reduced: ${x.reduced.evaluated} of ${cases} single losses evaluated within the work budget (100000 element visits`,
    );
  });

  it('--max-work raises it: everything ranked, nothing said', async () => {
    const dir = newRepo({ '.netbrace.yaml': `budget:\n  visits: ${budget}\n`, 'big.net.yaml': text });
    const r = await run(
      dir,
      'explain',
      'big.net.yaml',
      '--json',
      '--max-work',
      '1e12',
      '--metric',
      'largest_component',
    );
    const x = JSON.parse(r.out);
    expect(x.reduced).toBeUndefined();
    expect(x.elements).toHaveLength(N + 3 + N + Math.floor(N / 2) + 3);
    const small = JSON.parse(
      (await run(dir, 'explain', 'big.net.yaml', '--json', '--max-work', '5e4', '--metric', 'largest_component')).out,
    );
    expect(small.reduced.maxWork).toBe(5e4);
    expect((await run(dir, 'explain', 'big.net.yaml', '--max-work', '0')).code).toBe(2);
  });
});
