import type { Metric, MetricId } from '../types.js';
import { type CutSummary } from './cut-elements.js';
export declare function cutMetric(id: MetricId, description: string, normalization: string, pick: (s: CutSummary) => {
    count: number;
    protectedPairs: number;
}): Metric;
