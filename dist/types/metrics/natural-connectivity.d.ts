import type { Metric } from './types.js';
/** λ̄ of the complete graph K_N, in log space. */
export declare function naturalConnectivityOfComplete(n: number): number;
export declare const naturalConnectivity: Metric;
