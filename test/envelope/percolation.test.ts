// Published percolation results as outside checks of the envelope engine.
import { describe, expect, it } from 'vitest';
import { evaluateDesign } from '../../src/envelope/evaluate.js';
import { preferentialGraph, randomGraph } from './graphs.js';

const lcc = { metrics: [{ id: 'largest_component' as const, weight: 1 }], combine: 'mean' as const };

/** Giant component of G(N, c/N) after random removal of a fraction f (Callaway et al. 2000). */
function callaway(c: number, f: number): number {
  let s = 1;
  for (let i = 0; i < 10_000; i++) s = 1 - Math.exp(-c * (1 - f) * s);
  return (1 - f) * s;
}

describe('Erdős–Rényi random node failure vs Callaway, Newman, Strogatz & Watts, PRL 85:5468 (2000)', () => {
  // N = 20,000 nodes with mean degree c = 4 (L = 40,000 links), M = 40 realizations, f up to 0.6.
  const N = 20_000;
  const c = 4;
  const M = 40;
  const g = randomGraph(N, (c * N) / 2, 2000);
  const ev = evaluateDesign(g, {
    r: lcc,
    seed: 3,
    challenges: [{ challenge: 'random-nodes', realizations: M, until: 0.6, points: 13 }],
  });
  const env = ev.evaluation.envelopes[0];
  const samples = ev.samples.get('random-nodes')!;

  it('matches P∞(f) = (1 − f)·S, S = 1 − exp(−c(1 − f)S), at f = 0, 0.25, 0.5, 0.6 (docs/METHODS.md §11.1: 0.980173, 0.705360, 0.398406, 0.256793)', () => {
    expect(callaway(4, 0)).toBeCloseTo(0.980173, 6);
    expect(callaway(4, 0.5)).toBeCloseTo(0.398406, 6);
    for (const f of [0, 0.25, 0.5, 0.6]) {
      const j = env.x.indexOf(f);
      const theory = callaway(c, f);
      // Tolerance from the Monte Carlo error, measured: the median over M realizations has SE
      // ≈ 1.2533·sd/√M (normal approximation). The realizations share one graph, whose own
      // giant component deviates from the N → ∞ limit by O(1/√N) (≤ 2/√N = 0.014 here, i.e.
      // ~2 SD of a binomial share) plus an O(1/N) finite-size bias away from f_c = 0.75.
      const col = samples.map((s) => s[j]);
      const mean = col.reduce((a, v) => a + v, 0) / M;
      const sd = Math.sqrt(col.reduce((a, v) => a + (v - mean) ** 2, 0) / (M - 1));
      const tol = 4 * ((1.2533 * sd) / Math.sqrt(M)) + 2 / Math.sqrt(N);
      expect(
        Math.abs(env.median[j] - theory),
        `f=${f}: median ${env.median[j]} vs theory ${theory} (tolerance ${tol})`,
      ).toBeLessThan(tol);
    }
  });

  it('the area of the median curve equals the same grid average of the theory', () => {
    const theory = env.x.slice(1).reduce((a, f) => a + callaway(c, f), 0) / (env.x.length - 1);
    expect(Math.abs(env.area - theory), `area ${env.area} vs ${theory}`).toBeLessThan(0.01);
  });
});

describe('scale-free vs random graphs (Albert, Jeong & Barabási, Nature 406:378, 2000)', () => {
  // Preferential attachment with 2 links per node against G(N, L) with the same N and L.
  const N = 5000;
  const ba = preferentialGraph(N, 2, 31);
  const er = randomGraph(N, ba.m, 32);
  const spec = {
    r: lcc,
    seed: 6,
    challenges: [
      { challenge: 'random-nodes' as const, realizations: 20, until: 0.8, points: 9 },
      { challenge: 'degree-adaptive' as const, until: 0.3 },
    ],
  };
  const eb = evaluateDesign(ba, spec).evaluation;
  const ee = evaluateDesign(er, spec).evaluation;
  const at = (x: number[], v: number[], f: number) => v[x.findIndex((y) => Math.abs(y - f) < 1e-9)];
  const baRandom = at(eb.envelopes[0].x, eb.envelopes[0].median, 0.7);
  const erRandom = at(ee.envelopes[0].x, ee.envelopes[0].median, 0.7);
  const baAttack = eb.attacks[0].values[Math.round(0.1 * N)];
  const erAttack = ee.attacks[0].values[Math.round(0.1 * N)];

  it(`under random failure the scale-free graph keeps a larger component: LCC/N at f = 0.7 is ${baRandom.toFixed(4)} (BA) vs ${erRandom.toFixed(4)} (ER)`, () => {
    expect(baRandom).toBeGreaterThan(erRandom);
  });

  it(`under a degree attack it loses it faster: LCC/N at f = 0.1 is ${baAttack.toFixed(4)} (BA) vs ${erAttack.toFixed(4)} (ER); attack areas ${eb.attacks[0].area.toFixed(4)} vs ${ee.attacks[0].area.toFixed(4)}`, () => {
    expect(baAttack).toBeLessThan(erAttack);
    expect(eb.attacks[0].area).toBeLessThan(ee.attacks[0].area);
  });
});
