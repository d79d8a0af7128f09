import type { Metric } from './types.js';
export declare const spectralRadius: Metric;
