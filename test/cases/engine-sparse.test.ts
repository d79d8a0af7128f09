// A generated 1,000-site sparse design (test/cases/sparse-design.ts) under the built-in policy
// and its default budget, through `netbrace check`: its full evaluation is large enough for the
// sequential stopping rule (docs/METHODS.md §7.6), so a clearly benign and a clearly harmful
// change are decided in fewer realizations than the policy's 200, with no work cut by the
// budget, and an unchanged design gives a change of exactly 0. The fixture files are checked to
// be the generator's output, so the design can be rebuilt and read.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { casesRoot, cleanupCases, runCase } from './harness.js';
import { sparseVariants } from './sparse-design.js';

afterAll(cleanupCases);

const read = (name: string, side: string) =>
  readFileSync(path.join(casesRoot, name, side, 'networks', 'torus.csv'), 'utf8');

describe('the generated sparse design', () => {
  it('the fixture files are the generator output (1,000 sites, small enough to keep)', () => {
    const v = sparseVariants();
    for (const name of ['engine-sparse-benign', 'engine-sparse-harmful', 'engine-sparse-unchanged'])
      expect(read(name, 'base')).toBe(v.base);
    expect(read('engine-sparse-benign', 'head')).toBe(v.benign);
    expect(read('engine-sparse-harmful', 'head')).toBe(v.harmful);
    expect(read('engine-sparse-unchanged', 'head')).toBe(v.reordered);
    expect(
      new Set(
        v.base
          .split('\n')
          .slice(1)
          .flatMap((l) => l.split(','))
          .filter(Boolean),
      ).size,
    ).toBe(1000);
    expect(v.base.length).toBeLessThan(300_000);
  });
});

describe('decided in batches within the default budget', () => {
  for (const [name, status] of [
    ['engine-sparse-benign', 'holds'],
    ['engine-sparse-harmful', 'weakened'],
  ] as const) {
    it(`${name}: ${status}, each random decision settled before the policy's 200 realizations, no reduced work`, async () => {
      const run = await runCase(name);
      const f = run.report!.files[0];
      expect(f.status, run.out + run.err).toBe(status);
      expect(f.findings.filter((x) => x.rule === 'degraded' || x.status === 'reduced-work')).toEqual([]);
      for (const env of [...f.head!.envelopes, ...f.base!.envelopes]) {
        expect(env.realizations).toBeLessThan(200);
        expect(env.maxRealizations).toBeGreaterThan(env.realizations);
      }
      const random = f.requirements.filter(
        (r) => r.id === 'area-floor:node-failures' || r.id === 'area-floor:link-failures',
      );
      expect(random).toHaveLength(2);
      for (const r of random) {
        expect(r.status).toBe(status);
        expect(r.realizations).toBeLessThan(200);
        // Settled: the change's bounds lie wholly within (benign) or beyond (harmful) the allowed 0.02.
        if (status === 'holds') expect(-r.bounds!.delta!.lo).toBeLessThanOrEqual(0.02);
        else expect(-r.bounds!.delta!.hi).toBeGreaterThan(0.02);
      }
    }, 900_000);
  }

  it('engine-sparse-unchanged: the same links in another order and direction stop after one batch with every change exactly 0', async () => {
    const run = await runCase('engine-sparse-unchanged');
    const f = run.report!.files[0];
    expect(f.status, run.out + run.err).toBe('holds');
    for (const r of f.requirements) expect(r.delta).toBe(0);
    for (const env of f.head!.envelopes) expect(env.realizations).toBe(32);
    for (const r of f.requirements.filter((x) => x.bounds)) expect(r.bounds!.delta).toEqual({ lo: 0, hi: 0 });
  }, 900_000);
});
