// Sampled sources for efficiency (src/metrics/kernels/source-sample.ts): the per-source sums
// of the bit-parallel kernel against plain BFS (the textbook definition), the sample's
// independence from file order and index, and the estimator against the exact value on
// Topology Zoo networks (Knight et al., IEEE JSAC 29:1765, 2011, CC BY 4.0) and seeded random
// graphs. The statistical checks use fixed seeds; each bound is derived in its comment from
// the error the estimator states (finite-population sampling, Cochran 1977 §2.4 — from memory).
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { compileTopology, graphFromEdges, type CompactGraph } from '../../src/graph/compact.js';
import { createMask, type Mask } from '../../src/graph/mask.js';
import { createHopHistogram } from '../../src/metrics/kernels/bit-bfs.js';
import { sampleMean, sampleSources } from '../../src/metrics/kernels/source-sample.js';
import { createSurvivorBuilder } from '../../src/metrics/kernels/subgraph.js';
import { getMetric } from '../../src/metrics/registry.js';
import { parseDesign } from '../../src/topology/parse.js';
import { randomEdges, rng } from './families.js';

const root = path.resolve(path.dirname(new URL(import.meta.url).pathname), '..', '..');
const eff = getMetric('efficiency');

function zoo(name: string): CompactGraph {
  const file = path.join(root, 'fixtures', 'topology-zoo', 'gml', `${name}.gml`);
  return compileTopology(parseDesign(readFileSync(file, 'utf8'), file));
}

/** Σ_t 1/d(s, t) by plain BFS over the surviving graph. */
function bruteSums(g: CompactGraph, mask: Mask): Float64Array {
  const adj: number[][] = Array.from({ length: g.n }, () => []);
  for (let e = 0; e < g.m; e++) {
    const a = g.linkSource[e];
    const b = g.linkTarget[e];
    if (mask.link[e] || mask.node[a] || mask.node[b] || a === b) continue;
    adj[a].push(b);
    adj[b].push(a);
  }
  const out = new Float64Array(g.n);
  for (let s = 0; s < g.n; s++) {
    if (mask.node[s]) continue;
    const dist = new Int32Array(g.n).fill(-1);
    dist[s] = 0;
    const q = [s];
    for (let h = 0; h < q.length; h++)
      for (const w of adj[q[h]]) if (dist[w] < 0) ((dist[w] = dist[q[h]] + 1), q.push(w));
    for (let t = 0; t < g.n; t++) if (dist[t] > 0) out[s] += 1 / dist[t];
  }
  return out;
}

function randomMask(g: CompactGraph, nodeShare: number, linkShare: number, seed: number): Mask {
  const r = rng(seed);
  const mask = createMask(g);
  for (let v = 0; v < g.n; v++) mask.node[v] = r() < nodeShare ? 1 : 0;
  for (let e = 0; e < g.m; e++) mask.link[e] = r() < linkShare ? 1 : 0;
  return mask;
}

describe('bit-parallel BFS, per-source sums', () => {
  it('equal plain BFS on fragmented random graphs, long cycles and paths, for any source subset', () => {
    const graphs: CompactGraph[] = [
      graphFromEdges(700, randomEdges(700, 1100, 3)), // one large component, batches of 256 and 64
      graphFromEdges(300, randomEdges(300, 260, 4)), // many small components
      graphFromEdges(
        90,
        Array.from({ length: 90 }, (_, i) => [i, (i + 1) % 90] as [number, number]),
      ), // long: one source at a time
    ];
    for (const [gi, g] of graphs.entries()) {
      for (const [mi, mask] of [createMask(g), randomMask(g, 0.1, 0.2, 10 + gi)].entries()) {
        const local = createSurvivorBuilder(g, true)(mask);
        const expected = bruteSums(g, mask);
        const bfs = createHopHistogram(g.n);
        const r = rng(50 + gi * 7 + mi);
        const chosen = Array.from({ length: local.n }, (_, i) => i).filter(() => r() < 0.6);
        const sources = Int32Array.from(chosen);
        const sums = new Float64Array(sources.length);
        const h = bfs.run(local, sources, sources.length, sums);
        let histSum = 0;
        for (let d = 1; d <= h.maxDistance; d++) histSum += h.hist[d] / d;
        let total = 0;
        for (let i = 0; i < sources.length; i++) {
          const want = expected[local.toOriginal[sources[i]]];
          expect(Math.abs(sums[i] - want), `graph ${gi} mask ${mi} source ${i}`).toBeLessThanOrEqual(
            1e-9 * Math.max(1, want),
          );
          total += want;
        }
        expect(Math.abs(histSum - total)).toBeLessThanOrEqual(1e-9 * Math.max(1, total));
      }
    }
  });
});

describe('seeded source samples', () => {
  it('depend on the ids and the seed only, not on their order; nodes a change keeps stay sampled together', () => {
    const ids = Array.from({ length: 500 }, (_, i) => `site-${i}`);
    const pick = (list: string[], seed: number) => [...sampleSources(list, 40, seed)!].map((i) => list[i]).sort();
    const shuffled = [...ids].reverse();
    expect(pick(shuffled, 7)).toEqual(pick(ids, 7));
    expect(pick(ids, 8)).not.toEqual(pick(ids, 7));
    // Adding one node changes at most one member of a bottom-k sample.
    const grown = [...ids, 'site-new'];
    const common = pick(grown, 7).filter((x) => pick(ids, 7).includes(x));
    expect(common.length).toBeGreaterThanOrEqual(39);
    expect(sampleSources(ids, 'all', 7)).toBeNull();
    expect(sampleSources(ids, 500, 7)).toBeNull();
    expect(() => sampleSources(ids, 0, 7)).toThrow(RangeError);
  });

  it('give the same estimate, se included, for the same design listed in another order', () => {
    const edges = randomEdges(400, 800, 21);
    const a = graphFromEdges(400, edges);
    const b = graphFromEdges(
      400,
      [...edges].reverse().map(([x, y]) => [y, x] as [number, number]),
    );
    const va = eff.create(a, { sources: 50, sourceSeed: 3 })(createMask(a));
    const vb = eff.create(b, { sources: 50, sourceSeed: 3 })(createMask(b));
    expect(vb).toEqual(va);
    expect(va.se).toBeGreaterThan(0);
  });

  it('the finite-population se is 0 for a census and matches the textbook formula', () => {
    const y = Float64Array.from([1, 2, 3, 4]);
    expect(sampleMean(y, 4, 4)).toEqual({ mean: 2.5, se: 0 });
    // s² = 5/3, (1 − 4/10)·s²/4 = 0.25.
    expect(sampleMean(y, 4, 10).se).toBeCloseTo(0.5, 12);
  });
});

describe('sampled efficiency against the exact value', () => {
  // For each design and mask, R = 120 seeds give R independent-looking samples of k sources.
  // Checks, each with its bound derived from the stated error:
  // - bias: the mean of the R estimates lies within 4 standard errors of the mean
  //   (sd of the estimates / √R) of the exact value — a false alarm about 1 in 15,000;
  // - calibration: the mean stated variance (se²) is within [0.5, 1.8] of the variance seen
  //   across seeds — the sample variance of R = 120 values has a relative sd of about
  //   √(2/(R−1)) ≈ 0.13 for normal data, widened for the heavier tails of small k;
  // - coverage: |estimate − exact| ≤ 2·se for at least 88 % of seeds (nominal 95 %; binomial
  //   sd √(0.95·0.05/120) ≈ 0.02, so 88 % is more than 3 sd below, allowing for se's own error).
  const cases: { name: string; g: () => CompactGraph; k: number; mask: (g: CompactGraph) => Mask }[] = [
    { name: 'zoo Cogentco', g: () => zoo('Cogentco'), k: 40, mask: (g) => createMask(g) },
    {
      name: 'zoo Kdl, 10 % nodes and 10 % links removed',
      g: () => zoo('Kdl'),
      k: 60,
      mask: (g) => randomMask(g, 0.1, 0.1, 5),
    },
    {
      name: 'random G(n, L), 600 nodes',
      g: () => graphFromEdges(600, randomEdges(600, 1500, 9)),
      k: 50,
      mask: (g) => randomMask(g, 0.05, 0.3, 6),
    },
  ];
  for (const c of cases) {
    it(`is unbiased and its se is calibrated: ${c.name}`, () => {
      const g = c.g();
      const mask = c.mask(g);
      const exact = eff.create(g)(mask).raw;
      const R = 120;
      const est: number[] = [];
      const se2: number[] = [];
      let covered = 0;
      for (let seed = 1; seed <= R; seed++) {
        const v = eff.create(g, { sources: c.k, sourceSeed: seed })(mask);
        expect(v.se).toBeDefined();
        est.push(v.raw);
        se2.push(v.se! ** 2);
        if (Math.abs(v.raw - exact) <= 2 * v.se!) covered++;
      }
      const mean = est.reduce((a, b) => a + b, 0) / R;
      const variance = est.reduce((a, b) => a + (b - mean) ** 2, 0) / (R - 1);
      const stated = se2.reduce((a, b) => a + b, 0) / R;
      expect(Math.abs(mean - exact)).toBeLessThanOrEqual(4 * Math.sqrt(variance / R));
      expect(stated / variance).toBeGreaterThanOrEqual(0.5);
      expect(stated / variance).toBeLessThanOrEqual(1.8);
      expect(covered / R).toBeGreaterThanOrEqual(0.88);
    });
  }
});
