import type { Metric } from './types.js';
export declare const nodeConnectivity: Metric;
