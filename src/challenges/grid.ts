// The x grid of a band: `points` evenly spaced values from 0 to `until`, plus any values the
// caller needs exactly (policy thresholds), sorted and de-duplicated. Values are rounded to 12
// decimals so that 3 × 0.1 is written (and matched) as 0.3.

export function makeGrid(until: number, points: number, at: readonly number[] = []): number[] {
  if (!(until >= 0) || !Number.isFinite(until)) throw new RangeError(`until must be a finite number ≥ 0, got ${until}`);
  if (!Number.isInteger(points) || points < 2) throw new RangeError(`points must be an integer ≥ 2, got ${points}`);
  const values = new Set<number>();
  for (let j = 0; j < points; j++) values.add(round12((until * j) / (points - 1)));
  for (const x of at) {
    if (!(x >= 0) || !Number.isFinite(x)) throw new RangeError(`grid point must be a finite number ≥ 0, got ${x}`);
    values.add(round12(x));
  }
  return [...values].sort((a, b) => a - b);
}

export function round12(x: number): number {
  return Number(x.toFixed(12));
}

/**
 * Index of x on a grid made by makeGrid, or −1: x is rounded as the grid's values were, then
 * matched exactly (the one lookup that pairing, measuring and deciding share).
 */
export function gridIndex(grid: readonly number[], x: number): number {
  return grid.indexOf(round12(x));
}
