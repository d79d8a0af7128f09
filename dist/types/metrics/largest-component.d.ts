import type { Metric } from './types.js';
export declare const largestComponent: Metric;
