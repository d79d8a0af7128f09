// The numbers a design gives netbrace to compute with, and the range each may take. Every
// format checks them here, at the line they are written on, so that no reader lets through a
// value the metrics cannot use: a subnormal length (1e-310) divides into Infinity and makes R
// NaN, a length near 1e308 overflows a sum of paths to Infinity. Zero stays allowed where it
// was (it means "no cost" and the metrics that divide by a cost then do not apply).
//
// The bounds are sanity limits, not physics: each is far beyond any real network and far
// inside what double precision sums over two million elements without overflow or loss.
//   length   1e-6 … 1e6 km: 1 mm to 25 times the Earth's circumference (40,075 km);
//            earth-scale sanity, common practice for geographic data.
//   latency  1e-6 … 1e6 ms: 1 ns to 1,000 s; a geostationary satellite hop is about 250 ms
//            one way (from memory).
//   capacity 1e-9 … 1e9 Gbit/s: 1 bit/s to 1 Zbit/s; single-fibre records are near 1 Pbit/s
//            = 1e6 Gbit/s (from memory).
//   weight   1e-9 … 1e9 (no unit): routing weights are 16-bit OSPF costs (RFC 2328, the
//            router-LSA metric) or 24-bit IS-IS wide metrics (RFC 5305, TLV 22), from memory;
//            both fit with room.
//   volume   1e-12 … 1e15 (any consistent unit): Pbit/s written in bit/s still fits.
// Coordinates keep their own ranges (±90°, ±180°); like every number, they must be normal.

/** Smallest positive normal double (2^-1022); anything non-zero and smaller is subnormal. */
export const MIN_NORMAL = 2.2250738585072014e-308;

export type Quantity = 'length' | 'latency' | 'capacity' | 'weight' | 'volume';

export interface QuantityRange {
  /** Smallest positive value accepted (0 itself is accepted too). */
  min: number;
  max: number;
  unit: string;
}

export const QUANTITY_RANGE: Readonly<Record<Quantity, QuantityRange>> = {
  length: { min: 1e-6, max: 1e6, unit: 'km' },
  latency: { min: 1e-6, max: 1e6, unit: 'ms' },
  capacity: { min: 1e-9, max: 1e9, unit: 'Gbit/s' },
  weight: { min: 1e-9, max: 1e9, unit: '' },
  volume: { min: 1e-12, max: 1e15, unit: '' },
};

/** Why `n` is not a number anyone computes with (non-finite or subnormal), else undefined. */
export function nonNormal(n: number): string | undefined {
  if (Number.isNaN(n)) return 'is not a number (NaN)';
  if (!Number.isFinite(n)) return 'is infinite (or too large for a number)';
  if (n !== 0 && Math.abs(n) < MIN_NORMAL)
    return 'is so close to 0 that it cannot be computed with (a subnormal number)';
  return undefined;
}

/** 1e9 rather than 1000000000, 0.5 as it is. */
/**
 * The first number in a parsed document (design or policy) that is NaN, infinite or
 * subnormal, with its path; top-level keys in `skip` (free-form metadata) are not searched.
 */
export function firstNonNormal(
  v: unknown,
  path: (string | number)[],
  skip?: ReadonlySet<string>,
): { path: (string | number)[]; why: string } | undefined {
  // One path array, extended and shortened in place: a large design has many numbers.
  if (typeof v === 'number') {
    const why = nonNormal(v);
    return why ? { path: [...path], why } : undefined;
  }
  if (v === null || typeof v !== 'object') return undefined;
  const entries: [string | number, unknown][] = Array.isArray(v) ? v.map((x, i) => [i, x]) : Object.entries(v);
  for (const [k, x] of entries) {
    if (typeof x !== 'number' && (x === null || typeof x !== 'object')) continue;
    if (path.length === 0 && typeof k === 'string' && skip?.has(k)) continue;
    path.push(k);
    const found = firstNonNormal(x, path);
    path.pop();
    if (found) return found;
  }
  return undefined;
}

export const fmt = (n: number): string =>
  Math.abs(n) >= 1e5 || (n !== 0 && Math.abs(n) < 1e-3) ? n.toExponential().replace('e+', 'e') : String(n);
const shown = (n: number, unit: string) => `${fmt(n)}${unit ? ` ${unit}` : ''}`;

/**
 * What is wrong with `value` as a `kind` (a sentence starting after its name, with a hint), or
 * undefined when it is fine. Negative values are refused; 0 is accepted.
 */
export function quantityProblem(
  kind: Quantity,
  value: number,
  written?: string,
): { message: string; hint: string } | undefined {
  const as =
    written !== undefined && written.trim() !== String(value) && written.trim() !== fmt(value)
      ? ` (written ${written.trim()})`
      : '';
  const bad = nonNormal(value);
  const r = QUANTITY_RANGE[kind];
  const range = `netbrace accepts 0 or ${shown(r.min, r.unit)} to ${shown(r.max, r.unit)}`;
  if (bad)
    return {
      message: `${bad}${as}`,
      hint: Number.isFinite(value) ? `${range}; write 0 for none` : `${range}; check the unit`,
    };
  if (value < 0) return { message: `must not be negative (${value})`, hint: range };
  if (value > r.max)
    return {
      message: `is ${fmt(value)}${as}, above the limit of ${shown(r.max, r.unit)}`,
      hint: `${range}; check the unit`,
    };
  if (value > 0 && value < r.min)
    return {
      message: `is ${fmt(value)}${as}, below the smallest value accepted (${shown(r.min, r.unit)})`,
      hint: `${range}; write 0 for none`,
    };
  return undefined;
}
