// The confidence sequences of the sequential stopping rule (docs/METHODS.md §7.6): the
// normal-mixture boundary of Robbins (1970) in the form of Howard, Ramdas, McAuliffe & Sekhon
// (Ann. Statist. 49(2):1055–1080, 2021), and its time-uniform coverage checked by simulation.
import { describe, expect, it } from 'vitest';
import {
  meanBounds,
  meanRadius,
  mixingPrecision,
  mixtureBoundary,
  quantileBounds,
} from '../../src/envelope/confidence-sequence.js';
import { Xoshiro128 } from '../../src/random.js';

describe('the normal-mixture boundary', () => {
  it('is √((v + ρ) ln((v + ρ)/(ρ α²))) (hand check: v = 16, ρ = 2, α = 0.05 gives √(18 ln 3600) = 12.1407)', () => {
    expect(mixtureBoundary(16, 0.05, 2)).toBeCloseTo(Math.sqrt(18 * Math.log(3600)), 12);
    expect(mixtureBoundary(16, 0.05, 2)).toBeCloseTo(12.1407, 4);
  });

  it('ρ follows the approximation of Howard et al. §3.5 at v = 64/4 (hand check: α = 0.05 gives 16/(2 ln 20 + ln(1 + 2 ln 20)) = 2.016)', () => {
    const l = Math.log(20);
    expect(mixingPrecision(0.05)).toBeCloseTo(16 / (2 * l + Math.log(1 + 2 * l)), 12);
    expect(mixingPrecision(0.05)).toBeCloseTo(2.016, 3);
  });

  it('shrinks like √(log t / t) and is wider than a fixed-sample 95 % Hoeffding radius at every t (the price of looking at every batch)', () => {
    let last = Infinity;
    for (const t of [32, 64, 128, 256, 512, 1024]) {
      const r = meanRadius(t, 0.05);
      expect(r).toBeLessThan(last);
      // Hoeffding's fixed-n radius √(ln(2/α)/(2t)) (Hoeffding, JASA 58:13, 1963).
      expect(r).toBeGreaterThan(Math.sqrt(Math.log(2 / 0.05) / (2 * t)));
      last = r;
    }
  });
});

/** Fraction of seeded streams whose running estimate ever leaves its bounds at a batch end. */
function everMissed(
  streams: number,
  batches: number,
  draw: (rng: Xoshiro128) => number,
  bounds: (xs: number[]) => { lo: number; hi: number },
  truth: number,
): number {
  let missed = 0;
  for (let s = 0; s < streams; s++) {
    const rng = new Xoshiro128(1234, s);
    const xs: number[] = [];
    for (let b = 0; b < batches; b++) {
      for (let i = 0; i < 32; i++) xs.push(draw(rng));
      const { lo, hi } = bounds(xs);
      if (truth < lo || truth > hi) {
        missed++;
        break;
      }
    }
  }
  return missed / streams;
}

describe('time-uniform coverage (simulated, 400 seeded streams of 16 batches of 32)', () => {
  const uniform = (rng: Xoshiro128) => rng.nextInt(1 << 30) / (1 << 30);

  it('the mean of Bernoulli(0.3) values is never left at any batch in more than α = 5 % of the streams', () => {
    const bern = (rng: Xoshiro128) => (uniform(rng) < 0.3 ? 1 : 0);
    const cs = everMissed(400, 16, bern, (xs) => meanBounds(xs, 0.05), 0.3);
    expect(cs).toBeLessThanOrEqual(0.05);
    // A fixed-sample 95 % normal interval looked at after every batch leaves the truth far more
    // often than 5 % (optional stopping; Armitage, McPherson & Rowe, J. R. Stat. Soc. A 132:235, 1969, M).
    const naive = everMissed(
      400,
      16,
      bern,
      (xs) => {
        const n = xs.length;
        const m = xs.reduce((a, b) => a + b, 0) / n;
        const h = 1.96 * Math.sqrt((m * (1 - m)) / n);
        return { lo: m - h, hi: m + h };
      },
      0.3,
    );
    expect(naive).toBeGreaterThan(0.08);
  });

  it('the median of uniform values (true 0.5) and its 10 % quantile (true 0.1) stay within their quantile bounds', () => {
    const sorted = (xs: number[]) => Float64Array.from(xs).sort();
    expect(everMissed(400, 16, uniform, (xs) => quantileBounds(sorted(xs), 0.5, 0.05), 0.5)).toBeLessThanOrEqual(0.05);
    expect(everMissed(400, 16, uniform, (xs) => quantileBounds(sorted(xs), 0.1, 0.05), 0.1)).toBeLessThanOrEqual(0.05);
  });
});

describe('quantile bounds are order statistics (hand check)', () => {
  it('ten values 0.05, 0.15 … 0.95: the radius at t = 10 exceeds 0.5, so the median is bounded only by R’s own range [0, 1]', () => {
    const xs = Float64Array.from({ length: 10 }, (_, i) => 0.05 + i / 10);
    expect(meanRadius(10, 0.05)).toBeGreaterThan(0.5);
    expect(quantileBounds(xs, 0.5, 0.05)).toEqual({ lo: 0, hi: 1 });
  });

  it('1,000 values 0.0005 … 0.9995: ranks ⌈t(p − r)⌉ and ⌊t(p + r)⌋ + 1', () => {
    const t = 1000;
    const xs = Float64Array.from({ length: t }, (_, i) => (i + 0.5) / t);
    const r = meanRadius(t, 0.05);
    const b = quantileBounds(xs, 0.5, 0.05);
    expect(b.lo).toBe(xs[Math.ceil(t * (0.5 - r)) - 1]);
    expect(b.hi).toBe(xs[Math.floor(t * (0.5 + r))]);
    expect(b.lo).toBeLessThan(0.5);
    expect(b.hi).toBeGreaterThan(0.5);
  });
});
