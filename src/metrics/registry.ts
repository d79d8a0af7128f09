// The metric registry: every metric netbrace can evaluate, in the order reports list them.

import { UsageError } from '../errors.js';
import { efficiency } from './efficiency.js';
import { largestComponent } from './largest-component.js';
import { pairConnectivity } from './pair-connectivity.js';
import type { Metric, MetricId } from './types.js';

export const metrics: Metric[] = [efficiency, largestComponent, pairConnectivity];

const byId = new Map<string, Metric>(metrics.map((m) => [m.id, m]));

export function isMetricId(s: string): s is MetricId {
  return byId.has(s);
}

/** The metric with this id; a UsageError naming the known ids otherwise. */
export function getMetric(id: string): Metric {
  const m = byId.get(id);
  if (!m) throw new UsageError(`unknown metric "${id}"`, `known metrics: ${metrics.map((x) => x.id).join(', ')}`);
  return m;
}
