// R at a fraction f of elements removed is read at the real count f·N: linear between ⌊f·N⌋
// and ⌈f·N⌉ removals of the same realization (or attack), exact when f·N is whole. Checked on
// designs whose R after k removals has a closed form (elementary graph facts, common practice):
// - star K_{1,n−1}, n = 7: while the hub survives, removing k leaves leaves a star with
//   m = n − 1 − k leaves, so the largest component is n − k and the global efficiency
//   (Latora & Marchiori, PRL 87:198701, 2001, with the original n0(n0 − 1) ordered pairs) is
//   (2m·1 + m(m − 1)·½) / (n(n − 1)); once the hub is gone every survivor is alone: the
//   largest component is 1 and the efficiency 0;
// - path P_7 under the degree attack (ties to the lowest index): nodes 1, 2, 3, 4, 5 go first
//   and the largest component after k of them is 6 − k.
import { describe, expect, it } from 'vitest';
import { graphFromEdges } from '../../src/graph/compact.js';
import { evaluateDesign, planEvaluation, type EvaluationSpec } from '../../src/envelope/evaluate.js';
import { pairedStatistic } from '../../src/envelope/pairing.js';
import { ATTACK_EVALUATIONS, ATTACK_PIECE_EVALUATIONS, bandPlan, planTasks } from '../../src/envelope/engine.js';
import { closeWorkers, evaluateDesignParallel } from '../../src/parallel/pool.js';
import { resolveParams } from '../../src/challenges/registry.js';
import { countAt } from '../../src/challenges/units.js';
import type { MetricId } from '../../src/metrics/types.js';

const N = 7;
const star = graphFromEdges(
  N,
  [1, 2, 3, 4, 5, 6].map((leaf) => [0, leaf] as [number, number]),
);

/** R of the star after the first k nodes of `order` are removed (closed forms above). */
function starR(metric: 'largest_component' | 'efficiency', order: ArrayLike<number>, k: number): number {
  let hubGone = false;
  for (let i = 0; i < k; i++) if (order[i] === 0) hubGone = true;
  if (hubGone) return metric === 'largest_component' ? 1 / N : 0;
  const m = N - 1 - k;
  return metric === 'largest_component' ? (N - k) / N : (2 * m + (m * (m - 1)) / 2) / (N * (N - 1));
}

const spec = (metric: MetricId): EvaluationSpec => ({
  r: { metrics: [{ id: metric, weight: 1 }], combine: 'mean' },
  seed: 11,
  challenges: [{ challenge: 'random-nodes', until: 0.5, points: 2, realizations: 40, at: [0.3, 3 / 7] }],
});

describe('R at a fraction of nodes removed', () => {
  for (const metric of ['largest_component', 'efficiency'] as const) {
    it(`${metric}: every realization is read between the two whole counts around f·N (star, closed form)`, () => {
      const ev = evaluateDesign(star, spec(metric));
      const env = ev.evaluation.envelopes[0];
      // f·N = 0, 2.1, 3 (whole: 3/7 of 7), 3.5.
      expect(env.x).toEqual([0, 0.3, 0.428571428571, 0.5]);
      const counts = env.x.map((x) => countAt(x, N, N));
      expect(counts[1]).toBeCloseTo(2.1, 12);
      expect(counts[2]).toBe(3);
      expect(counts[3]).toBe(3.5);
      const bp = bandPlan(star, resolveParams(star, spec(metric).challenges[0], 11));
      const order = new Int32Array(bp.maxUnits);
      const steps = new Float64Array(bp.x.length);
      const samples = ev.samples.get('random-nodes')!;
      let between = 0;
      for (let r = 0; r < samples.length; r++) {
        bp.realize(r, order, steps);
        counts.forEach((c, j) => {
          const lo = Math.floor(c);
          const w = c - lo;
          const expected =
            w === 0 ? starR(metric, order, lo) : (1 - w) * starR(metric, order, lo) + w * starR(metric, order, lo + 1);
          if (w === 0) expect(samples[r][j]).toBe(expected);
          else expect(Math.abs(samples[r][j] - expected)).toBeLessThan(1e-15);
          if (starR(metric, order, lo) !== starR(metric, order, Math.ceil(c))) between++;
        });
      }
      // The check has teeth: many realizations change R between the two neighbouring counts.
      expect(between).toBeGreaterThan(20);
      // Quantiles are taken over the interpolated realization values.
      const col = samples.map((s) => s[3]).sort((a, b) => a - b);
      expect(env.min[3]).toBe(col[0]);
      expect(env.max[3]).toBe(col[col.length - 1]);
    });
  }

  it('an attack curve keeps a value per step, and is read between two steps at a fraction (path, degree attack)', () => {
    const path = graphFromEdges(
      7,
      [0, 1, 2, 3, 4, 5].map((i) => [i, i + 1] as [number, number]),
    );
    const ev = evaluateDesign(path, {
      r: { metrics: [{ id: 'largest_component', weight: 1 }], combine: 'mean' },
      seed: 1,
      challenges: [{ challenge: 'degree', until: 0.5 }],
    });
    const a = ev.evaluation.attacks[0];
    // ⌈0.5 · 7⌉ = 4 steps: nodes 1, 2, 3, 4; largest component 6 − k after k ≥ 1 of them.
    expect(a.sequence).toEqual(['1', '2', '3', '4']);
    expect(a.values).toEqual([1, 5 / 7, 4 / 7, 3 / 7, 2 / 7]);
    // At 0.5 (3.5 removals): halfway between 3 and 4 removals.
    expect(pairedStatistic(ev, ev, 'degree', { kind: 'mean' }, 0.5).head).toBeCloseTo((3 / 7 + 2 / 7) / 2, 15);
    // At 3/7 (3 removals, whole): exactly the third step.
    expect(pairedStatistic(ev, ev, 'degree', { kind: 'mean' }, 3 / 7).head).toBe(3 / 7);
    // Area up to 3.5 removals: (R(1) + R(2) + R(3) + 0.5·R(3.5)) / 3.5.
    expect(a.area).toBeCloseTo((5 / 7 + 4 / 7 + 3 / 7 + 0.5 * (5 / 14)) / 3.5, 15);
  });
});

// Long attacks are computed every ⌈K/ATTACK_EVALUATIONS⌉-th removal (engine.ts attackStride).
// Path P_n under the degree attack (ties to the lowest index) loses nodes 1, 2, 3, … in turn:
// after k ≥ 1 removals node 0 is alone and nodes k+1..n−1 form a path of m = n − 1 − k nodes,
// whose ordered-pair efficiency sum is 2 Σ_{d=1}^{m−1} (m − d)/d (elementary; Latora &
// Marchiori's definition with the original n(n − 1) pairs).
describe('a long attack, computed at every few removals', () => {
  const n = 1101;
  const path = graphFromEdges(
    n,
    Array.from({ length: n - 1 }, (_, i) => [i, i + 1] as [number, number]),
  );
  const exact = (k: number) => {
    const m = k === 0 ? n : n - 1 - k;
    let s = 0;
    for (let d = 1; d < m; d++) s += (m - d) / d;
    return (2 * s) / (n * (n - 1));
  };
  const run = evaluateDesign(path, {
    r: { metrics: [{ id: 'efficiency', weight: 1 }], combine: 'mean' },
    seed: 3,
    challenges: [{ challenge: 'degree', until: 0.2 }],
  }).evaluation.attacks[0];
  const K = Math.ceil(0.2 * n);

  it('says its stride, and is exact where it computes', () => {
    expect(K).toBeGreaterThan(ATTACK_EVALUATIONS);
    expect(run.every).toBe(Math.ceil(K / ATTACK_EVALUATIONS));
    expect(run.values).toHaveLength(K + 1);
    for (let k = 0; k < K; k += run.every!) expect(run.values[k]).toBeCloseTo(exact(k), 12);
    expect(run.values[K]).toBeCloseTo(exact(K), 12);
  });

  it('reads linearly between, and keeps the area within 1e-6 of every step computed', () => {
    const s = run.every!;
    for (let k = 1; k < K; k++) {
      if (k % s === 0) continue;
      const a = k - (k % s);
      const b = Math.min(a + s, K);
      expect(run.values[k]).toBeCloseTo(exact(a) + ((k - a) / (b - a)) * (exact(b) - exact(a)), 12);
    }
    let full = 0;
    for (let k = 1; k <= 0.2 * n; k++) full += exact(k);
    const c = 0.2 * n;
    const lo = Math.floor(c);
    full = (full + (c - lo) * (exact(lo) + (c - lo) * (exact(lo + 1) - exact(lo)))) / c;
    expect(Math.abs(run.area - full)).toBeLessThan(1e-6);
  });

  it('is shared out to pieces fixed by the plan, which give the same curve on any number of threads', async () => {
    const spec = {
      r: { metrics: [{ id: 'efficiency' as const, weight: 1 }], combine: 'mean' as const },
      seed: 3,
      challenges: [{ challenge: 'degree' as const, until: 0.2 }],
    };
    const plan = planEvaluation(path, spec);
    const tasks = planTasks(plan, path);
    const evaluations = Math.ceil(K / run.every!) + 1;
    expect(tasks.filter((t) => t.type === 'attack')).toHaveLength(Math.ceil(evaluations / ATTACK_PIECE_EVALUATIONS));
    const threaded = await evaluateDesignParallel(path, spec, 2, { minWork: 0 });
    expect(threaded.evaluation.attacks[0]).toEqual(run);
    await closeWorkers();
  });

  it('computes short attacks at every step', () => {
    const short = evaluateDesign(graphFromEdges(50, [[0, 1]]), {
      r: { metrics: [{ id: 'efficiency', weight: 1 }], combine: 'mean' },
      seed: 3,
      challenges: [{ challenge: 'degree', until: 0.5 }],
    }).evaluation.attacks[0];
    expect(short.every).toBeUndefined();
  });
});
