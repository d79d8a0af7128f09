import type { Metric } from './types.js';
/** Components up to this many nodes are solved exactly (dense) by default. */
export declare const NATURAL_DENSE_LIMIT = 2000;
/** The stated error (2 se, about 95 %) aimed at, relative to λ̄. */
export declare const STATED_ERROR = 0.001;
/** λ̄ of the complete graph K_N, in log space. */
export declare function naturalConnectivityOfComplete(n: number): number;
export declare const naturalConnectivity: Metric;
