import { describe, expect, it } from 'vitest';
import { graphFromEdges } from '../../src/graph/compact.js';
import { createMask } from '../../src/graph/mask.js';
import { getMetric } from '../../src/metrics/registry.js';
import { evaluateDesign, planEvaluation, type EvaluationSpec } from '../../src/envelope/evaluate.js';
import { pairedStatistic } from '../../src/envelope/pairing.js';
import { bandPlan } from '../../src/envelope/engine.js';
import { resolveParams } from '../../src/challenges/registry.js';
import { greatCircleKm as haversineKm } from '../../src/topology/geodesy.js';
import { removeUnit } from '../../src/challenges/units.js';
import type { MetricId } from '../../src/metrics/types.js';
import { design, preferentialGraph, randomGraph } from './graphs.js';

const single = (id: MetricId) => ({ metrics: [{ id, weight: 1 }], combine: 'mean' as const });

describe('evaluateDesign', () => {
  const g = randomGraph(60, 120, 3);

  it('stores each realization at each grid point exactly as the metric gives it on that mask', () => {
    const spec: EvaluationSpec = {
      r: single('largest_component'),
      seed: 5,
      challenges: [{ challenge: 'random-nodes', realizations: 12 }],
    };
    const ev = evaluateDesign(g, spec);
    const params = resolveParams(g, spec.challenges[0], spec.seed);
    const bp = bandPlan(g, params);
    const order = new Int32Array(bp.maxUnits);
    const steps = new Float64Array(bp.x.length);
    const metric = getMetric('largest_component').create(g);
    const samples = ev.samples.get('random-nodes')!;
    for (let r = 0; r < 12; r++) {
      bp.realize(r, order, steps);
      bp.x.forEach((_, j) => {
        // 60 nodes and a grid in steps of 0.05: every count x·N is whole here.
        expect(Number.isInteger(steps[j])).toBe(true);
        const mask = createMask(g);
        for (let i = 0; i < steps[j]; i++) removeUnit(g, mask, 'node', order[i]);
        expect(samples[r][j]).toBe(metric(mask).normalized);
      });
    }
    const env = ev.evaluation.envelopes[0];
    expect(env.x).toEqual([0, 0.05, 0.1, 0.15, 0.2, 0.25, 0.3, 0.35, 0.4, 0.45, 0.5]);
    expect(Object.keys(env.quantiles)).toEqual(['0.1', '0.5', '0.9']);
    expect(env.weakest).toHaveLength(3);
    expect(env.weakest[0].elements).toHaveLength(30);
    expect(env.weakest[0].values).toHaveLength(30);
    // The weakest realization has the lowest mean over the grid.
    const mean = (a: Float64Array) => a.slice(1).reduce((s, v) => s + v, 0) / (a.length - 1);
    const lowest = Math.min(...samples.map(mean));
    expect(mean(samples[env.weakest[0].realization!])).toBe(lowest);
    for (let j = 0; j < env.x.length; j++) {
      expect(env.min[j]).toBeLessThanOrEqual(env.quantiles['0.1'].value[j]);
      expect(env.quantiles['0.1'].lo[j]).toBeLessThanOrEqual(env.quantiles['0.1'].value[j]);
      expect(env.quantiles['0.1'].value[j]).toBeLessThanOrEqual(env.quantiles['0.1'].hi[j]);
      expect(env.quantiles['0.9'].value[j]).toBeLessThanOrEqual(env.max[j]);
    }
  });

  it('puts the requested x values on the grid (policy thresholds are exact grid points)', () => {
    const ev = evaluateDesign(g, {
      r: single('largest_component'),
      seed: 1,
      challenges: [{ challenge: 'random-links', realizations: 5, at: [0.33, 0.1] }],
    });
    expect(ev.evaluation.envelopes[0].x).toContain(0.33);
    expect(ev.evaluation.envelopes[0].x.filter((x) => x === 0.1)).toHaveLength(1);
  });

  it('reports distance metrics at grid steps only, and attacks at every step', () => {
    const ev = evaluateDesign(g, {
      r: single('efficiency'),
      seed: 1,
      challenges: [
        { challenge: 'random-links', realizations: 4, points: 3 },
        { challenge: 'degree', until: 0.2 },
      ],
    });
    const w = ev.evaluation.envelopes[0].weakest[0];
    expect(w.steps).toEqual([30, 60]);
    expect(w.values).toHaveLength(2);
    const attack = ev.evaluation.attacks[0];
    expect(attack.values).toHaveLength(13);
    expect(attack.x[12]).toBeCloseTo(0.2, 12);
    expect(attack.sequence).toHaveLength(12);
  });

  it('never removes hardened elements, in any challenge', () => {
    const nodes = Array.from({ length: 12 }, (_, i) => ({ id: `s${i}`, hardened: i === 0 || i === 5 }));
    const links = Array.from({ length: 12 }, (_, i) => ({ a: `s${i}`, b: `s${(i + 1) % 12}`, hardened: i === 3 }));
    links.push({ a: 's0', b: 's6', hardened: false }, { a: 's5', b: 's9', hardened: false });
    const d = design(nodes, links);
    const ev = evaluateDesign(d, {
      r: single('pair_connectivity'),
      seed: 2,
      challenges: [
        { challenge: 'random-nodes', realizations: 30, until: 1, worstCase: 3 },
        { challenge: 'random-links', realizations: 30, until: 1 },
        { challenge: 'degree-adaptive', until: 1 },
        { challenge: 'betweenness', until: 1 },
        { challenge: 'link-betweenness-adaptive', until: 1 },
        { challenge: 'n-2' },
      ],
    });
    const seen = new Set<string>();
    for (const e of ev.evaluation.envelopes) {
      for (const w of e.weakest) w.elements.forEach((x) => seen.add(x));
      e.worstCase?.elements.forEach((x) => seen.add(x));
    }
    for (const a of ev.evaluation.attacks) a.sequence.forEach((x) => seen.add(x));
    for (const c of ev.evaluation.contingencies) c.worst.forEach((w) => w.elements.forEach((x) => seen.add(x)));
    expect(seen.has('s0') || seen.has('s5') || seen.has('s3-s4')).toBe(false);
    expect(ev.evaluation.attacks[0].sequence).toHaveLength(10);
    expect(ev.evaluation.contingencies[0].total).toBe(45);
  });

  it('reduces realizations under a small work budget and says so', () => {
    const spec: EvaluationSpec = {
      r: single('efficiency'),
      seed: 1,
      challenges: [{ challenge: 'random-nodes', realizations: 200 }, { challenge: 'n-2' }],
      budget: { maxWork: 1e7 },
    };
    const plan = planEvaluation(g, spec);
    expect(plan.degraded.length).toBeGreaterThan(0);
    const ev = evaluateDesign(g, spec);
    const env = ev.evaluation.envelopes[0];
    expect(env.realizations).toBeLessThan(200);
    expect(env.realizations).toBeGreaterThanOrEqual(10);
    expect(env.degraded).toMatch(/realizations reduced from 200 to \d+/);
    const c = ev.evaluation.contingencies[0];
    expect(c.evaluated).toBeLessThan(c.total);
    expect(ev.evaluation.degraded).toEqual(plan.degraded);
  });

  it('switches an exact worst-case search to greedy when the budget is too small, and says so', () => {
    const spec: EvaluationSpec = {
      r: single('efficiency'),
      seed: 1,
      challenges: [{ challenge: 'random-nodes', realizations: 10, worstCase: 2 }],
      budget: { maxWork: 2e6 },
    };
    const ev = evaluateDesign(g, spec);
    expect(ev.evaluation.envelopes[0].worstCase!.method).toBe('greedy');
    expect(ev.evaluation.degraded.join()).toMatch(/worst-case search greedy instead of exact/);
    const full = evaluateDesign(g, { ...spec, budget: undefined });
    expect(full.evaluation.envelopes[0].worstCase!.method).toBe('exact');
    expect(full.evaluation.envelopes[0].worstCase!.values[1]).toBeLessThanOrEqual(
      ev.evaluation.envelopes[0].worstCase!.values[1],
    );
  });

  it('measures the attack gap against the most harmful attack of the same kind', () => {
    const ev = evaluateDesign(g, {
      r: single('largest_component'),
      seed: 1,
      challenges: [
        { challenge: 'random-nodes', realizations: 50 },
        { challenge: 'degree', until: 0.5 },
        { challenge: 'betweenness-adaptive', until: 0.5 },
      ],
    });
    const env = ev.evaluation.envelopes[0];
    const worst = [...ev.evaluation.attacks].sort((a, b) => a.area - b.area)[0];
    expect(env.attackGap!.attack).toBe(worst.challenge);
    const lo = env.quantiles['0.1'].value;
    const expected =
      env.x.slice(1).reduce((s, x, i) => s + lo[i + 1] - worst.values[Math.round(x * 60)], 0) / (env.x.length - 1);
    expect(env.attackGap!.value).toBeCloseTo(expected, 12);
    expect(env.attackGap!.value).toBeGreaterThan(0);
  });

  it('skips challenges the design cannot support as not applicable, with a reason, not as a reduction', () => {
    const ev = evaluateDesign(g, {
      r: single('largest_component'),
      seed: 1,
      challenges: [{ challenge: 'regional' }, { challenge: 'risk-groups' }],
    });
    expect(ev.evaluation.envelopes).toHaveLength(0);
    expect(ev.evaluation.degraded).toEqual([]);
    expect(ev.evaluation.notApplicable).toEqual([
      { challenge: 'regional', reason: 'no site has coordinates (lat/lon)' },
      { challenge: 'risk-groups', reason: 'the design has no shared-risk group that can fail' },
    ]);
  });

  it('reports the structure of the intact design', () => {
    const path = graphFromEdges(4, [
      [0, 1],
      [1, 2],
      [2, 3],
    ]);
    const s = evaluateDesign(path, { r: single('largest_component'), seed: 1, challenges: [] }).evaluation.structure;
    expect(s).toMatchObject({ nodes: 4, links: 3, components: 1 });
    expect(s.bridges.map((b) => b.id)).toEqual(['e0', 'e1', 'e2']);
    expect(s.cutNodes.map((c) => c.id)).toEqual(['1', '2']);
  });
});

describe('regional failures', () => {
  // Sites on the equator, 1° of longitude apart: 2πR/360 = 111.19508 km each (R = 6371.0088 km).
  const step = (2 * Math.PI * 6371.0088) / 360;
  const nodes = Array.from({ length: 6 }, (_, i) => ({ id: `p${i}`, lat: 0, lon: i }));
  const links = Array.from({ length: 5 }, (_, i) => ({ a: `p${i}`, b: `p${i + 1}` }));
  const d = design([...nodes, { id: 'nowhere' }], [...links, { a: 'p5', b: 'nowhere' }]);

  it('uses great-circle distances on the mean Earth radius', () => {
    expect(haversineKm(0, 0, 0, 1)).toBeCloseTo(step, 9);
    expect(haversineKm(0, 0, 0, 180)).toBeCloseTo(Math.PI * 6371.0088, 6);
  });

  it('removes the sites strictly inside the radius; one realization per epicentre; the band is over epicentres', () => {
    const ev = evaluateDesign(d, {
      r: single('largest_component'),
      seed: 1,
      challenges: [{ challenge: 'regional', until: 2.5 * step, points: 6 }],
    });
    const env = ev.evaluation.envelopes[0];
    expect(env.xUnit).toBe('km');
    expect(env.realizations).toBe(6);
    const samples = ev.samples.get('regional')!;
    // Radius 1.5 steps around p0 takes p0 and p1: the rest (p2..p5 + nowhere) is 5 of 7.
    const j = env.x.findIndex((x) => Math.abs(x - 1.5 * step) < 1e-6);
    expect(samples[0][j]).toBe(5 / 7);
    // Around p2 it takes p1, p2, p3: largest left is p4, p5, nowhere = 3 of 7.
    expect(samples[2][j]).toBe(3 / 7);
    expect(ev.labels.get('regional')).toEqual(['p0', 'p1', 'p2', 'p3', 'p4', 'p5']);
    expect(env.weakest[0].label).toBe(`p${env.weakest[0].realization}`);
    expect(samples.every((s) => s[0] === 1)).toBe(true);
  });
});

describe('shared-risk groups', () => {
  const nodes = ['a', 'b', 'c', 'd'].map((id) => ({ id }));
  const links = [
    { a: 'a', b: 'b', groups: ['duct-1'] },
    { a: 'b', b: 'c', groups: ['duct-2'] },
    { a: 'c', b: 'd', groups: ['duct-2', 'duct-3'] },
    { a: 'd', b: 'a', groups: ['duct-3'] },
  ];
  const d = design(nodes, links);

  it('worst first takes the group whose loss hurts most', () => {
    const ev = evaluateDesign(d, {
      r: single('pair_connectivity'),
      seed: 1,
      challenges: [{ challenge: 'risk-groups-worst', until: 1 }],
    });
    const a = ev.evaluation.attacks[0];
    // duct-2 cuts b-c and c-d: c is isolated (3 of 6 pairs left); duct-3 isolates d the same way;
    // the tie goes to duct-2, first in the file.
    expect(a.sequence[0]).toBe('duct-2');
    expect(a.values[1]).toBe(0.5);
    expect(a.kind).toBe('group');
  });

  it('random groups give a band over realizations on the group axis', () => {
    const ev = evaluateDesign(d, {
      r: single('largest_component'),
      seed: 1,
      challenges: [{ challenge: 'risk-groups', realizations: 50, until: 1, points: 4 }],
    });
    const env = ev.evaluation.envelopes[0];
    expect(env.kind).toBe('group');
    expect(env.max[3]).toBe(0.25);
    expect(env.min[0]).toBe(1);
  });
});

describe('paired comparison with common random numbers', () => {
  const spec: EvaluationSpec = {
    r: single('largest_component'),
    seed: 4,
    challenges: [
      { challenge: 'random-nodes', realizations: 60 },
      { challenge: 'degree', until: 0.3 },
      { challenge: 'n-1' },
    ],
  };
  const g = preferentialGraph(80, 2, 9);

  it('an identical design evaluated twice gives delta exactly 0 and se 0 for every statistic', () => {
    const a = evaluateDesign(g, spec);
    const b = evaluateDesign(
      graphFromEdges(
        g.n,
        Array.from({ length: g.m }, (_, e) => [g.linkSource[e], g.linkTarget[e]] as [number, number]),
      ),
      spec,
    );
    for (const st of [
      { kind: 'quantile', q: 0.1 },
      { kind: 'mean' },
      { kind: 'min' },
      { kind: 'area' },
      { kind: 'spread' },
    ] as const) {
      const p = pairedStatistic(a, b, 'random-nodes', st, 0.2);
      expect(p.delta).toBe(0);
      expect(p.se).toBe(0);
      expect(p.base).toBe(p.head);
    }
    expect(pairedStatistic(a, b, 'random-nodes', { kind: 'quantile', q: 0.1 }, 0.2).base).toBe(
      a.evaluation.envelopes[0].quantiles['0.1'].value[4],
    );
    expect(pairedStatistic(a, b, 'degree', { kind: 'mean' }, 0.1)).toEqual({
      base: a.evaluation.attacks[0].values[8],
      head: a.evaluation.attacks[0].values[8],
      delta: 0,
      se: 0,
    });
    expect(pairedStatistic(a, b, 'n-1', { kind: 'min' }).delta).toBe(0);
    expect(() => pairedStatistic(a, b, 'random-nodes', { kind: 'mean' }, 0.21)).toThrow(/not a grid point/);
  });

  it('karate plus link (11, 33), 7 nodes removed, 4,000 realizations: SD of the LCC difference ≈ 0.0103 paired vs 0.0986 unpaired (docs/METHODS.md §7.4, V)', async () => {
    const { readFileSync } = await import('node:fs');
    const ref = JSON.parse(readFileSync(new URL('../reference/envelope.json', import.meta.url), 'utf8'));
    const edges = ref.graphs[0].edges as [number, number][];
    const base = graphFromEdges(34, edges);
    const head = graphFromEdges(34, [...edges, [11, 33]]);
    const s: EvaluationSpec = {
      r: single('largest_component'),
      seed: 8,
      challenges: [{ challenge: 'random-nodes', realizations: 4000, until: 7 / 34, points: 2 }],
    };
    const eb = evaluateDesign(base, s);
    const eh = evaluateDesign(head, s);
    const sb = eb.samples.get('random-nodes')!;
    const sh = eh.samples.get('random-nodes')!;
    const sd = (d: number[]) => {
      const m = d.reduce((a, v) => a + v, 0) / d.length;
      return Math.sqrt(d.reduce((a, v) => a + (v - m) ** 2, 0) / (d.length - 1));
    };
    const paired = sd(sb.map((v, i) => sh[i][1] - v[1]));
    const unpaired = sd(sb.map((v, i) => sh[(i + 1) % sh.length][1] - v[1]));
    // Tolerances: the SD of an SD estimate from 4,000 draws is roughly SD/√(2·4000) ≈ 1.1 % of it,
    // but the paired difference is mostly 0 with rare jumps (heavy tails), so we allow ±30 %.
    expect(paired, `paired SD ${paired}`).toBeGreaterThan(0.0103 * 0.7);
    expect(paired, `paired SD ${paired}`).toBeLessThan(0.0103 * 1.3);
    expect(Math.abs(unpaired - 0.0986), `unpaired SD ${unpaired}`).toBeLessThan(0.01);
    const p = pairedStatistic(eb, eh, 'random-nodes', { kind: 'mean' }, s.challenges[0].until);
    expect(p.delta).toBeGreaterThanOrEqual(0);
    expect(p.se).toBeCloseTo(paired / Math.sqrt(4000), 12);
    const q = pairedStatistic(eb, eh, 'random-nodes', { kind: 'quantile', q: 0.1 }, s.challenges[0].until);
    expect(q.se).toBeGreaterThanOrEqual(0);
    expect(q.se).toBeLessThan(0.05);
  });
});

describe('paired regional comparison', () => {
  it('pairs epicentres by site id when the head adds a site', () => {
    const nodes = Array.from({ length: 8 }, (_, i) => ({ id: `c${i}`, lat: 50 + (i % 3) * 0.3, lon: 8 + i * 0.4 }));
    const links = nodes.slice(1).map((v, i) => ({ a: nodes[i].id, b: v.id }));
    const base = design(nodes, [...links, { a: 'c0', b: 'c4' }]);
    // The new site's id comes first in id order, so epicentre indices shift between the sides.
    const head = design(
      [...nodes, { id: 'a-new', lat: 50.1, lon: 9 }],
      [...links, { a: 'c0', b: 'c4' }, { a: 'a-new', b: 'c2' }],
    );
    const spec: EvaluationSpec = {
      r: single('largest_component'),
      seed: 1,
      challenges: [{ challenge: 'regional', until: 60, points: 4 }],
    };
    const eb = evaluateDesign(base, spec);
    const eh = evaluateDesign(head, spec);
    expect(eh.labels.get('regional')![0]).toBe('a-new');
    const same = pairedStatistic(eb, eb, 'regional', { kind: 'mean' }, 40);
    expect(same).toEqual({ base: same.base, head: same.base, delta: 0, se: 0 });
    const p = pairedStatistic(eb, eh, 'regional', { kind: 'mean' }, 40);
    expect(p.base).toBe(eb.evaluation.envelopes[0].mean[2]);
    expect(p.head).toBe(eh.evaluation.envelopes[0].mean[2]);
    expect(Number.isFinite(p.se)).toBe(true);
  });
});
