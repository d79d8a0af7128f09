// Statistics of an envelope at each grid point, and netbrace's own summaries (docs/METHODS.md §5.4 —
// these are netbrace's definitions, not published indices). With grid points x_0 = 0 < x_1 <
// … < x_K the summaries average over x_1..x_K (the intact point is left out, as in Schneider's
// R = (1/N) Σ_{Q=1..N} s(Q)):
//   area   A = mean over the grid of the median R(x_k)            (higher is better)
//   spread W = mean over the grid of q_hi(x_k) − q_lo(x_k)        (smaller is better)
//   attack gap G = mean over the grid of q_lo(x_k) − R_attack(x_k), for the most harmful
//          targeted attack of the same element kind (small: no single weak direction)
// Sums run in realization order so results are bit-for-bit reproducible.

import type { QuantileBand } from './types.js';
import { quantileEstimate, quantileSorted } from './quantiles.js';
import { valueAtCount } from '../challenges/units.js';

export interface GridStats {
  min: number[];
  max: number[];
  mean: number[];
  median: number[];
  quantiles: Record<string, QuantileBand>;
}

/** The quantile key as written in reports: 0.1 → "0.1". */
export function quantileKey(q: number): string {
  return String(q);
}

/** Column j of the realizations' grid values, sorted ascending. */
export function sortedColumn(
  samples: readonly Float64Array[],
  j: number,
  out = new Float64Array(samples.length),
): Float64Array {
  for (let i = 0; i < samples.length; i++) out[i] = samples[i][j];
  return out.sort();
}

export function gridStats(
  samples: readonly Float64Array[],
  points: number,
  band: readonly [number, number],
): GridStats {
  const qs = [...new Set([band[0], 0.5, band[1]])].sort((a, b) => a - b);
  const stats: GridStats = { min: [], max: [], mean: [], median: [], quantiles: {} };
  for (const q of qs) stats.quantiles[quantileKey(q)] = { value: [], lo: [], hi: [], se: [] };
  const col = new Float64Array(samples.length);
  for (let j = 0; j < points; j++) {
    let sum = 0;
    for (let i = 0; i < samples.length; i++) sum += samples[i][j];
    sortedColumn(samples, j, col);
    stats.min.push(col[0]);
    stats.max.push(col[col.length - 1]);
    stats.mean.push(sum / samples.length);
    stats.median.push(quantileSorted(col, 0.5));
    for (const q of qs) {
      const e = quantileEstimate(col, q);
      const b = stats.quantiles[quantileKey(q)];
      b.value.push(e.value);
      b.lo.push(e.lo);
      b.hi.push(e.hi);
      b.se.push(e.se);
    }
  }
  return stats;
}

/** Mean over the grid points after the first (x = 0): the common form of area and spread. */
export function gridMean(values: ArrayLike<number>): number {
  if (values.length === 0) return Number.NaN;
  if (values.length === 1) return values[0];
  let sum = 0;
  for (let j = 1; j < values.length; j++) sum += values[j];
  return sum / (values.length - 1);
}

export function area(median: ArrayLike<number>): number {
  return gridMean(median);
}

export function spread(lo: ArrayLike<number>, hi: ArrayLike<number>): number {
  const w = new Float64Array(lo.length);
  for (let j = 0; j < lo.length; j++) w[j] = hi[j] - lo[j];
  return gridMean(w);
}

/**
 * Area of an attack curve (values[k] = R after k removals) up to a real count c of removals:
 * the right-endpoint sum Σ_{k=1..⌊c⌋} R(k) + (c − ⌊c⌋)·R(c), over c, with R(c) interpolated
 * between ⌊c⌋ and ⌈c⌉. For whole c it is the mean of values[1..c] (Schneider's R when c = N and
 * R is the LCC share: Schneider et al., PNAS 108:3838, 2011); between whole counts it moves
 * continuously with c instead of jumping by a whole step. c = 0: R of the intact design.
 */
export function attackArea(values: ArrayLike<number>, c: number): number {
  if (values.length === 0) return Number.NaN;
  if (!(c > 0)) return values[0];
  const lo = Math.floor(c);
  let sum = 0;
  for (let k = 1; k <= lo; k++) sum += values[k];
  if (c === lo) return sum / c;
  return (sum + (c - lo) * valueAtCount(values, c)) / c;
}

/** Attack gap over the grid points x_1..x_K the attack reaches: mean of q_lo − R_attack. */
export function attackGap(lo: ArrayLike<number>, attackAtGrid: ArrayLike<number | null>): number | null {
  let sum = 0;
  let count = 0;
  for (let j = 1; j < lo.length; j++) {
    const a = attackAtGrid[j];
    if (a === null) continue;
    sum += lo[j] - a;
    count++;
  }
  return count > 0 ? sum / count : null;
}
