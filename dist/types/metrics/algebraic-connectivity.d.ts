import type { Metric } from './types.js';
export declare const algebraicConnectivity: Metric;
