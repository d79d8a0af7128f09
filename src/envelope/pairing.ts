// Paired comparison of two evaluations of a design (base and head) with common random numbers:
// realization i of both used the same keys for the elements they share (src/random.ts), so the
// difference of a statistic measures the change, not the dice. An unchanged design gives
// exactly equal samples, hence delta = 0 and se = 0.
// Standard errors:
// - mean: from the paired per-realization differences d_i, se = sd(d)/√n;
// - quantile, min, area, spread: a seeded paired bootstrap (Efron & Tibshirani, An
//   Introduction to the Bootstrap, 1993, M): realization indices are resampled with
//   replacement, the same indices for both sides, and se is the SD of the resampled deltas
//   (BOOTSTRAP_ROUNDS rounds). Area is a mean over the grid of the *median* curve, so the
//   per-realization differences (which measure the mean curve) would estimate the wrong
//   statistic; the bootstrap measures the right one. For `min` the bootstrap is known to be
//   rough (the sample minimum is not smooth); treat its se as indicative.
// Pairs are matched by realization index (by epicentre id for regional); statistics
// themselves are taken on each side's full sample, so they equal the envelope's numbers.
// Deterministic challenges (attacks, N−1/N−2) have se = 0.

import { Xoshiro128, hashString } from '../random.js';
import { quantileSorted } from './quantiles.js';
import { gridMean, sortedColumn } from './summary.js';
import type { Envelope } from './types.js';
import type { ChallengeName } from '../challenges/types.js';
import type { DesignEvaluation } from './evaluate.js';
import { gridIndex as indexOnGrid } from '../challenges/grid.js';
import { countAt, valueAtCount } from '../challenges/units.js';

export type Statistic =
  { kind: 'quantile'; q: number } | { kind: 'mean' } | { kind: 'min' } | { kind: 'area' } | { kind: 'spread' };

export interface PairedStatistic {
  base: number;
  head: number;
  delta: number;
  se: number;
}

export const BOOTSTRAP_ROUNDS = 400;

export function pairedStatistic(
  base: DesignEvaluation,
  head: DesignEvaluation,
  challenge: ChallengeName,
  statistic: Statistic,
  x?: number,
): PairedStatistic {
  const envB = base.evaluation.envelopes.find((e) => e.challenge === challenge);
  const envH = head.evaluation.envelopes.find((e) => e.challenge === challenge);
  if (envB && envH) return pairedBand(base, head, envB, envH, statistic, x);
  const atB = base.evaluation.attacks.find((a) => a.challenge === challenge);
  const atH = head.evaluation.attacks.find((a) => a.challenge === challenge);
  if (atB && atH) {
    const value = (a: typeof atB): number => {
      if (statistic.kind === 'area') return a.area;
      if (statistic.kind === 'spread') return 0;
      if (x === undefined) throw new RangeError(`${challenge}: the ${statistic.kind} of an attack needs x`);
      // R at x·count removals, between the two neighbouring steps when it is not whole (units.ts).
      const count = a.count ?? a.values.length - 1;
      const r = valueAtCount(a.values, countAt(x, count, count));
      if (Number.isNaN(r)) throw new RangeError(`${challenge}: the attack stops before x = ${x}`);
      return r;
    };
    return deterministic(value(atB), value(atH));
  }
  const cB = base.evaluation.contingencies.find((c) => c.challenge === challenge);
  const cH = head.evaluation.contingencies.find((c) => c.challenge === challenge);
  if (cB && cH) {
    if (statistic.kind !== 'min') throw new RangeError(`${challenge}: only the min of a contingency can be compared`);
    return deterministic(cB.min, cH.min);
  }
  throw new RangeError(`challenge ${challenge} was not evaluated on both sides`);
}

function deterministic(base: number, head: number): PairedStatistic {
  return { base, head, delta: head - base, se: 0 };
}

function gridIndex(env: Envelope, x: number | undefined, what: string): number {
  if (x === undefined) throw new RangeError(`${env.challenge}: the ${what} needs x`);
  const j = indexOnGrid(env.x, x);
  if (j < 0)
    throw new RangeError(
      `${env.challenge}: x = ${x} is not a grid point (grid: ${env.x.join(', ')}); add it to the challenge's "at"`,
    );
  return j;
}

function pairedBand(
  base: DesignEvaluation,
  head: DesignEvaluation,
  envB: Envelope,
  envH: Envelope,
  statistic: Statistic,
  x: number | undefined,
): PairedStatistic {
  const sb = base.samples.get(envB.challenge)!;
  const sh = head.samples.get(envH.challenge)!;
  // Which grid column(s) each side's statistic reads.
  let jb = -1;
  let jh = -1;
  if (statistic.kind === 'quantile' || statistic.kind === 'mean' || statistic.kind === 'min') {
    jb = gridIndex(envB, x, statistic.kind);
    jh = gridIndex(envH, x, statistic.kind);
  } else if (envB.x.join() !== envH.x.join()) {
    throw new RangeError(`${envB.challenge}: base and head grids differ; area and spread are not comparable`);
  }
  const band = envB.band;
  const stat = (s: readonly Float64Array[], j: number): number => {
    switch (statistic.kind) {
      case 'quantile':
        return quantileSorted(sortedColumn(s, j), statistic.q);
      case 'mean': {
        let sum = 0;
        for (let i = 0; i < s.length; i++) sum += s[i][j];
        return sum / s.length;
      }
      case 'min':
        return sortedColumn(s, j)[0];
      case 'area':
      case 'spread': {
        const points = s[0]?.length ?? 0;
        const curve = new Float64Array(points);
        for (let k = 0; k < points; k++) {
          const col = sortedColumn(s, k);
          curve[k] =
            statistic.kind === 'area'
              ? quantileSorted(col, 0.5)
              : quantileSorted(col, band[1]) - quantileSorted(col, band[0]);
        }
        return gridMean(curve);
      }
    }
  };
  const b = stat(sb, jb);
  const h = stat(sh, jh);

  // Matched pairs.
  const pairs: [number, number][] = [];
  const lb = base.labels.get(envB.challenge);
  const lh = head.labels.get(envH.challenge);
  if (lb && lh) {
    const where = new Map(lb.map((label, i) => [label, i]));
    lh.forEach((label, i) => {
      const k = where.get(label);
      if (k !== undefined) pairs.push([k, i]);
    });
  } else {
    for (let i = 0; i < Math.min(sb.length, sh.length); i++) pairs.push([i, i]);
  }
  const n = pairs.length;
  if (n < 2) return { base: b, head: h, delta: h - b, se: Number.NaN };

  if (statistic.kind === 'mean') {
    const d = pairs.map(([i, k]) => sh[k][jh] - sb[i][jb]);
    const mean = d.reduce((s, v) => s + v, 0) / n;
    const variance = d.reduce((s, v) => s + (v - mean) ** 2, 0) / (n - 1);
    return { base: b, head: h, delta: h - b, se: Math.sqrt(variance / n) };
  }
  const seedText = `${envB.challenge}|${JSON.stringify(statistic)}|${x ?? ''}`;
  const rng = new Xoshiro128(hashString(seedText, 0x0b0075), 0);
  const rb: Float64Array[] = new Array(n);
  const rh: Float64Array[] = new Array(n);
  let s1 = 0;
  let s2 = 0;
  for (let round = 0; round < BOOTSTRAP_ROUNDS; round++) {
    for (let i = 0; i < n; i++) {
      const [pb, ph] = pairs[rng.nextInt(n)];
      rb[i] = sb[pb];
      rh[i] = sh[ph];
    }
    const d = stat(rh, jh) - stat(rb, jb);
    s1 += d;
    s2 += d * d;
  }
  const mean = s1 / BOOTSTRAP_ROUNDS;
  const se = Math.sqrt(Math.max(0, s2 / BOOTSTRAP_ROUNDS - mean * mean) * (BOOTSTRAP_ROUNDS / (BOOTSTRAP_ROUNDS - 1)));
  return { base: b, head: h, delta: h - b, se };
}
