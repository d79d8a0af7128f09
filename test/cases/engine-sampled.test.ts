// Efficiency from sampled sources (r-value sources; metrics/kernels/source-sample.ts) through
// `netbrace check`, on the generated 400-site design of sampled-design.ts with 64 sources: the
// report says how R was estimated and how far off it may be, that error joins every change's
// ± (the attack, a deterministic curve, has no other), an unchanged design still gives exactly
// 0, and the same design with every site as a source agrees with the estimate within its error.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { compileTopology } from '../../src/graph/compact.js';
import { evaluateDesign } from '../../src/envelope/evaluate.js';
import { parseDesign } from '../../src/topology/parse.js';
import { createMask } from '../../src/graph/mask.js';
import { efficiency } from '../../src/metrics/efficiency.js';
import { casesRoot, cleanupCases, runCase } from './harness.js';
import { sampledVariants } from './sampled-design.js';

afterAll(cleanupCases);

const NAMES = ['benign', 'harmful', 'unchanged', 'floor-close'].map((n) => `engine-sampled-${n}`);
const read = (name: string, side: string) =>
  readFileSync(path.join(casesRoot, name, side, 'networks', 'torus.csv'), 'utf8');

describe('the sampled design', () => {
  it('the fixture files are the generator output', () => {
    const v = sampledVariants();
    for (const name of NAMES) expect(read(name, 'base')).toBe(v.base);
    expect(read('engine-sampled-benign', 'head')).toBe(v.benign);
    expect(read('engine-sampled-harmful', 'head')).toBe(v.harmful);
    expect(read('engine-sampled-unchanged', 'head')).toBe(v.reordered);
    expect(read('engine-sampled-floor-close', 'head')).toBe(v.reordered);
  });

  it('the 64-source estimate of the intact design lies within 3 of its standard errors of the exact efficiency', () => {
    const g = compileTopology(parseDesign(sampledVariants().base, 'torus.csv'));
    const mask = createMask(g);
    const exact = efficiency.create(g)(mask).raw;
    const est = efficiency.create(g, { sources: 64, sourceSeed: 5 })(mask);
    expect(est.se).toBeGreaterThan(0);
    expect(Math.abs(est.raw - exact)).toBeLessThan(3 * est.se!);
  });
});

describe('through check', () => {
  it('reports the sample and its error on both sides; the attack’s ± is that error alone', async () => {
    const run = await runCase('engine-sampled-benign');
    const f = run.report!.files[0];
    for (const side of [f.head!, f.base!]) {
      expect(side.sampling).toMatchObject({ metric: 'efficiency', sources: 64, nodes: 400 });
      expect(side.sampling!.se).toBeGreaterThan(0);
      expect(side.sampling!.se).toBeLessThan(0.02);
      expect(side.r.sources).toBe(64);
    }
    const attack = f.requirements.find((r) => r.id === 'area-floor:degree-attack')!;
    expect(attack.se).toBeCloseTo(Math.hypot(f.head!.sampling!.se, f.base!.sampling!.se), 12);
    // The random band's ± holds the realizations' own error as well.
    const band = f.requirements.find((r) => r.id === 'area-floor:node-failures')!;
    expect(band.se!).toBeGreaterThan(attack.se!);
  });

  it('an unchanged design, reordered: every change exactly 0 with the same sample', async () => {
    const run = await runCase('engine-sampled-unchanged');
    const f = run.report!.files[0];
    for (const r of f.requirements) if (r.delta !== undefined && r.delta !== null) expect(r.delta).toBe(0);
  });

  it('the floor the sample cannot settle is one the exact value meets: unsettled is the honest answer', async () => {
    const run = await runCase('engine-sampled-floor-close');
    const f = run.report!.files[0];
    const row = f.requirements.find((r) => r.id === 'area-floor:degree-attack')!;
    expect(row.status).toBe('unsettled');
    const exact = evaluateDesign(compileTopology(parseDesign(sampledVariants().base, 'torus.csv')), {
      r: {
        metrics: [
          { id: 'pair_connectivity', weight: 1 },
          { id: 'efficiency', weight: 1 },
        ],
        combine: 'mean',
      },
      seed: 5,
      challenges: [{ challenge: 'degree-adaptive', until: 0.2 }],
    }).evaluation.attacks[0].area;
    expect(exact).toBeGreaterThanOrEqual(0.452);
    // The estimate and the exact value agree within 3 of the estimate's standard errors.
    expect(Math.abs(row.head! - exact)).toBeLessThan(3 * f.head!.sampling!.se);
  });
});
