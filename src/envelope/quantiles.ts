// Sample quantiles and their distribution-free confidence intervals.
//
// Quantile definition (fixed for all of netbrace): Hyndman & Fan (Am. Stat. 50:361, 1996)
// type 7, the default of R and NumPy: for sorted x_1 ≤ … ≤ x_n, h = (n − 1)p and
// Q(p) = x_{⌊h⌋+1} + (h − ⌊h⌋)(x_{⌊h⌋+2} − x_{⌊h⌋+1}). It interpolates between neighbouring
// order statistics, so on discrete values (an LCC moves in steps of 1/N) it may return a value
// between two observed ones; the interval below is always made of observed values.
//
// Confidence interval (docs/METHODS.md §7.2): the order statistics [X_(r), X_(s)] cover the true
// p-quantile with probability Σ_{i=r}^{s−1} C(n,i) p^i (1−p)^{n−i}, whatever the distribution
// (for discrete distributions this is a lower bound). Ranks start at r, s = np ∓ z·√(np(1−p))
// (+1 for s) and are widened until the exact binomial coverage reaches the level. Where a rank
// falls outside 1..n the interval uses the a-priori bound of R instead (0 below, 1 above), which
// keeps the stated coverage honest for small samples.
// The standard error reported beside it is (X_(s) − X_(r)) / (2·z), the width of the interval
// in normal units; for a continuous distribution it estimates √(p(1−p)/n)/f(x_p).

export const DEFAULT_CONFIDENCE = 0.95;

/** Hyndman–Fan type 7 quantile of an ascending-sorted sample. Empty sample: NaN. */
export function quantileSorted(sorted: ArrayLike<number>, p: number): number {
  const n = sorted.length;
  if (n === 0) return Number.NaN;
  if (!(p >= 0 && p <= 1)) throw new RangeError(`quantile must be in [0, 1], got ${p}`);
  const h = (n - 1) * p;
  const lo = Math.floor(h);
  const frac = h - lo;
  const a = sorted[lo];
  if (frac === 0 || lo + 1 >= n) return a;
  return a + frac * (sorted[lo + 1] - a);
}

export interface QuantileInterval {
  /** 1-based ranks; 0 means "the lower bound of R", n + 1 "the upper bound". */
  r: number;
  s: number;
  /** Exact binomial coverage of [X_(r), X_(s)]. */
  coverage: number;
}

const rankCache = new Map<string, QuantileInterval>();

/** Order-statistic ranks for the p-quantile of n observations at the given confidence. */
export function quantileRanks(n: number, p: number, confidence = DEFAULT_CONFIDENCE): QuantileInterval {
  const cacheKey = `${n}:${p}:${confidence}`;
  const hit = rankCache.get(cacheKey);
  if (hit) return hit;
  const pmf = binomialPmf(n, p);
  const cover = (r: number, s: number) => {
    let sum = 0;
    for (let i = Math.max(r, 0); i <= Math.min(s - 1, n); i++) sum += pmf[i];
    return Math.min(1, sum);
  };
  const z = normalQuantile(0.5 + confidence / 2);
  const sd = Math.sqrt(n * p * (1 - p));
  let r = Math.max(0, Math.min(n, Math.floor(n * p - z * sd)));
  let s = Math.max(1, Math.min(n + 1, Math.ceil(n * p + z * sd) + 1));
  let coverage = cover(r, s);
  // Widen one rank at a time on the side that adds more probability, until covered.
  while (coverage < confidence && (r > 0 || s < n + 1)) {
    const gainLow = r > 0 ? pmf[r - 1] : -1;
    const gainHigh = s <= n ? pmf[s] : -1;
    if (gainLow >= gainHigh) r--;
    else s++;
    coverage = cover(r, s);
  }
  const result = { r, s, coverage };
  if (rankCache.size > 4096) rankCache.clear();
  rankCache.set(cacheKey, result);
  return result;
}

export interface QuantileEstimate {
  value: number;
  lo: number;
  hi: number;
  se: number;
}

/**
 * The p-quantile of an ascending-sorted sample with its order-statistic interval and standard
 * error. `bounds` are the a-priori limits of the variable (R lies in [0, 1]).
 */
export function quantileEstimate(
  sorted: ArrayLike<number>,
  p: number,
  confidence = DEFAULT_CONFIDENCE,
  bounds: readonly [number, number] = [0, 1],
): QuantileEstimate {
  const n = sorted.length;
  if (n === 0) return { value: Number.NaN, lo: Number.NaN, hi: Number.NaN, se: Number.NaN };
  const { r, s } = quantileRanks(n, p, confidence);
  const lo = r === 0 ? Math.min(bounds[0], sorted[0]) : sorted[r - 1];
  const hi = s === n + 1 ? Math.max(bounds[1], sorted[n - 1]) : sorted[s - 1];
  const z = normalQuantile(0.5 + confidence / 2);
  return { value: quantileSorted(sorted, p), lo, hi, se: (hi - lo) / (2 * z) };
}

/** Binomial(n, p) probabilities 0..n, computed in log space (no overflow for large n). */
export function binomialPmf(n: number, p: number): Float64Array {
  const out = new Float64Array(n + 1);
  if (p <= 0) {
    out[0] = 1;
    return out;
  }
  if (p >= 1) {
    out[n] = 1;
    return out;
  }
  const lp = Math.log(p);
  const lq = Math.log1p(-p);
  const logFact = new Float64Array(n + 1);
  for (let i = 2; i <= n; i++) logFact[i] = logFact[i - 1] + Math.log(i);
  for (let i = 0; i <= n; i++) out[i] = Math.exp(logFact[n] - logFact[i] - logFact[n - i] + i * lp + (n - i) * lq);
  return out;
}

/**
 * Standard normal quantile (P. J. Acklam's rational approximation, relative error < 1.2e-9;
 * from memory). Used only for ranks and the width → SE conversion.
 */
export function normalQuantile(p: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError(`normal quantile needs p in (0, 1), got ${p}`);
  const a = [
    -39.69683028665376, 220.9460984245205, -275.9285104469687, 138.357751867269, -30.66479806614716, 2.506628277459239,
  ];
  const b = [-54.47609879822406, 161.5858368580409, -155.6989798598866, 66.80131188771972, -13.28068155288572];
  const c = [
    -0.007784894002430293, -0.3223964580411365, -2.400758277161838, -2.549732539343734, 4.374664141464968,
    2.938163982698783,
  ];
  const d = [0.007784695709041462, 0.3224671290700398, 2.445134137142996, 3.754408661907416];
  const plow = 0.02425;
  let x: number;
  if (p < plow) {
    const q = Math.sqrt(-2 * Math.log(p));
    x =
      (((((c[0] * q + c[1]) * q + c[2]) * q + c[3]) * q + c[4]) * q + c[5]) /
      ((((d[0] * q + d[1]) * q + d[2]) * q + d[3]) * q + 1);
  } else if (p <= 1 - plow) {
    const q = p - 0.5;
    const r = q * q;
    x =
      ((((((a[0] * r + a[1]) * r + a[2]) * r + a[3]) * r + a[4]) * r + a[5]) * q) /
      (((((b[0] * r + b[1]) * r + b[2]) * r + b[3]) * r + b[4]) * r + 1);
  } else {
    const q = Math.sqrt(-2 * Math.log1p(-p));
    x =
      -(((((c[0] * q + c[1]) * q + c[2]) * q + c[3]) * q + c[4]) * q + c[5]) /
      ((((d[0] * q + d[1]) * q + d[2]) * q + d[3]) * q + 1);
  }
  return x;
}
