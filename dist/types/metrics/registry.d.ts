import type { Metric, MetricId } from './types.js';
export declare const metrics: Metric[];
export declare function isMetricId(s: string): s is MetricId;
/** The metric with this id; a UsageError naming the known ids otherwise. */
export declare function getMetric(id: string): Metric;
