import type { Metric } from './types.js';
export declare const efficiency: Metric;
