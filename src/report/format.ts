// How numbers and revisions are written, once for every view and for the gate's messages:
// fixed decimals with a real minus sign, signed deltas, the Monte Carlo error, short
// revisions, UTF-8 sizes. Pure.

// Counting UTF-8 bytes lives at the bottom layer (the design reader needs it too).
export { utf8Length } from '../decode.js';

/** `x` at `decimals` decimals with a real minus sign and no "−0.000". */
export function formatFixed(x: number, decimals = 3): string {
  if (!Number.isFinite(x)) return String(x);
  const s = x.toFixed(decimals);
  if (/^-0\.?0*$/.test(s)) return s.slice(1);
  return s.replace(/^-/, '\u2212');
}

/** A value of R or a metric: three decimals, "–" when absent (one argument, so `.map(formatValue)` is safe). */
export function formatValue(v: number | null | undefined): string {
  return formatValueAt(v, 3);
}

/** A value at `decimals` decimals, "–" when absent. */
export function formatValueAt(v: number | null | undefined, decimals: number): string {
  if (v === null || v === undefined || Number.isNaN(v)) return '\u2013';
  return formatFixed(v, decimals);
}

/**
 * A signed delta, "+0.012", "−0.040", "0.000" for anything that prints as zero (never
 * "−0.000"), with its standard error at the same decimals when one is given and positive:
 * "−0.0104 ± 0.0020". "–" when absent.
 */
export function formatDelta(delta: number | null | undefined, se: number | null = null, decimals = 3): string {
  if (delta === null || delta === undefined || Number.isNaN(delta)) return '\u2013';
  const text = formatFixed(delta, decimals);
  const zero = formatFixed(0, decimals);
  const sign = delta > 0 && text !== zero ? '+' : '';
  const err = se !== null && se > 0 ? ` \u00b1 ${Number.isFinite(se) ? se.toFixed(decimals) : 'unknown'}` : '';
  return `${sign}${text === `\u2212${zero}` ? zero : text}${err}`;
}

/** "± 0.004" for a Monte Carlo error; empty for deterministic values (se 0) and absent ones. */
export function formatError(se: number | null | undefined, decimals = 3): string {
  if (se === null || se === undefined || Number.isNaN(se) || se === 0) return '';
  const floor = 0.5 * 10 ** -decimals;
  return `\u00b1 ${se < floor ? `<${(10 ** -decimals).toFixed(decimals)}` : se.toFixed(decimals)}`;
}

/** Hex digits a full commit id is shortened to in every view. */
export const REVISION_DIGITS = 12;

/** A revision for display: a full commit id (SHA-1 or SHA-256) shortened to 12 hex digits, anything else as given. */
export function shortRevision(rev: string | undefined): string {
  if (rev === undefined) return '\u2013';
  return /^[0-9a-f]{40}([0-9a-f]{24})?$/i.test(rev) ? rev.slice(0, REVISION_DIGITS) : rev;
}
