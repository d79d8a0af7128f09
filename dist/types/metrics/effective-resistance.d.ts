import type { Metric } from './types.js';
/** Largest banded factorisation (N·b² operations) done exactly above the dense limit. */
export declare const DEFAULT_EXACT_WORK = 50000000;
export declare const effectiveResistance: Metric;
