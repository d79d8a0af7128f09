import { describe, expect, it } from 'vitest';
import {
  binomialPmf,
  normalQuantile,
  quantileEstimate,
  quantileRanks,
  quantileSorted,
} from '../../src/envelope/quantiles.js';
import { Xoshiro128 } from '../../src/random.js';

describe('type 7 quantiles (Hyndman & Fan 1996)', () => {
  it('match numpy.quantile (method "linear", NumPy 1.24.2) on 1..10', () => {
    // numpy.quantile(numpy.arange(1, 11), [0, 0.1, 0.25, 0.5, 0.9, 1]) = 1, 1.9, 3.25, 5.5, 9.1, 10
    const x = Float64Array.from({ length: 10 }, (_, i) => i + 1);
    expect([0, 0.1, 0.25, 0.5, 0.9, 1].map((p) => quantileSorted(x, p))).toEqual([1, 1.9, 3.25, 5.5, 9.1, 10]);
    expect(quantileSorted([7], 0.3)).toBe(7);
    expect(quantileSorted([], 0.3)).toBeNaN();
  });
});

describe('order-statistic confidence intervals (docs/METHODS.md §7.2, V)', () => {
  it('give ranks [81, 120] with coverage 0.960 for n = 1000, p = 0.1', () => {
    const { r, s, coverage } = quantileRanks(1000, 0.1);
    expect([r, s]).toEqual([81, 120]);
    expect(coverage).toBeCloseTo(0.96, 3);
  });

  it('give ranks [941, 1060] with coverage 0.953 for n = 10,000, p = 0.1', () => {
    const { r, s, coverage } = quantileRanks(10_000, 0.1);
    expect([r, s]).toEqual([941, 1060]);
    expect(coverage).toBeCloseTo(0.953, 3);
  });

  it('fall back on the a-priori bounds of R when a rank leaves the sample (n = 20, p = 0.1)', () => {
    const { r, s, coverage } = quantileRanks(20, 0.1);
    expect(r).toBe(0);
    expect(coverage).toBeGreaterThanOrEqual(0.95);
    const sorted = Float64Array.from({ length: 20 }, (_, i) => 0.5 + i / 100);
    const est = quantileEstimate(sorted, 0.1);
    expect(est.lo).toBe(0);
    expect(est.hi).toBe(sorted[s - 1]);
  });

  it('binomial probabilities sum to 1; the normal quantile matches scipy.stats.norm.ppf (SciPy 1.10.1)', () => {
    expect(binomialPmf(500, 0.3).reduce((a, b) => a + b, 0)).toBeCloseTo(1, 10);
    expect(normalQuantile(0.975)).toBeCloseTo(1.959963984540054, 8);
    expect(normalQuantile(0.001)).toBeCloseTo(-3.090232306167813, 8);
  });

  // The validation of the error bars: repeat an experiment whose true quantile is known many
  // times and count how often the interval covers it. Uniform(0,1): the p-quantile is p.
  // 2,000 repetitions → the observed coverage has SD √(0.95·0.05/2000) = 0.0049; the exact
  // coverage of the chosen ranks is ≥ 0.95, so we accept ≥ 0.95 − 3·0.0049.
  it.each([
    [200, 0.1, true],
    [200, 0.5, true],
    [50, 0.9, false],
  ])(
    'cover the true quantile of Uniform(0,1) in at least 93.5 percent of 2000 trials (n = %i, p = %s)',
    (n, p, checkSe) => {
      const rng = new Xoshiro128(2024, n * 10 + p * 10);
      const sample = new Float64Array(n);
      let covered = 0;
      let seSum = 0;
      const trials = 2000;
      for (let t = 0; t < trials; t++) {
        for (let i = 0; i < n; i++) sample[i] = rng.nextFloat();
        sample.sort();
        const est = quantileEstimate(sample, p);
        if (est.lo <= p && p <= est.hi) covered++;
        seSum += est.se;
      }
      const coverage = covered / trials;
      expect(coverage, `observed coverage ${coverage}`).toBeGreaterThanOrEqual(0.95 - 3 * 0.0049);
      expect(coverage, `observed coverage ${coverage}`).toBeLessThanOrEqual(0.995);
      // The SE from the interval width agrees with the asymptotic √(p(1−p)/n)/f(x_p), f = 1, within
      // 15 % (only where both ranks fall inside the sample; at n = 50, p = 0.9 the upper end is R's bound).
      if (!checkSe) return;
      const asymptotic = Math.sqrt((p * (1 - p)) / n);
      expect(Math.abs(seSum / trials / asymptotic - 1), `mean SE ${seSum / trials} vs ${asymptotic}`).toBeLessThan(
        0.15,
      );
    },
  );

  it('stay conservative on a discrete distribution with ties (LCC-like values in steps of 1/34)', () => {
    // Binomial(34, 0.8)/34: the true 0.1-quantile is the smallest v with F(v) ≥ 0.1.
    const pmf = binomialPmf(34, 0.8);
    let cdf = 0;
    let truth = 0;
    for (let k = 0; k <= 34; k++) {
      cdf += pmf[k];
      if (cdf >= 0.1) {
        truth = k / 34;
        break;
      }
    }
    const rng = new Xoshiro128(99);
    const n = 100;
    const sample = new Float64Array(n);
    let covered = 0;
    for (let t = 0; t < 1000; t++) {
      for (let i = 0; i < n; i++) {
        let k = 0;
        for (let j = 0; j < 34; j++) if (rng.nextFloat() < 0.8) k++;
        sample[i] = k / 34;
      }
      sample.sort();
      const est = quantileEstimate(sample, 0.1);
      if (est.lo <= truth && truth <= est.hi) covered++;
    }
    expect(covered / 1000).toBeGreaterThanOrEqual(0.95);
  });
});
