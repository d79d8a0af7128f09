export { utf8Length } from '../decode.js';
/** `x` at `decimals` decimals with a real minus sign and no "−0.000". */
export declare function formatFixed(x: number, decimals?: number): string;
/** A value of R or a metric: three decimals, "–" when absent (one argument, so `.map(formatValue)` is safe). */
export declare function formatValue(v: number | null | undefined): string;
/** A value at `decimals` decimals, "–" when absent. */
export declare function formatValueAt(v: number | null | undefined, decimals: number): string;
/**
 * A signed delta, "+0.012", "−0.040", "0.000" for anything that prints as zero (never
 * "−0.000"), with its standard error at the same decimals when one is given and positive:
 * "−0.0104 ± 0.0020". "–" when absent.
 */
export declare function formatDelta(delta: number | null | undefined, se?: number | null, decimals?: number): string;
/** "± 0.004" for a Monte Carlo error; empty for deterministic values (se 0) and absent ones. */
export declare function formatError(se: number | null | undefined, decimals?: number): string;
/** Hex digits a full commit id is shortened to in every view. */
export declare const REVISION_DIGITS = 12;
/** A revision for display: a full commit id (SHA-1 or SHA-256) shortened to 12 hex digits, anything else as given. */
export declare function shortRevision(rev: string | undefined): string;
