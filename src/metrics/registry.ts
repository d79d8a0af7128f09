// The metric registry: every metric netbrace can evaluate, in the order reports list them.

import { UsageError } from '../errors.js';
import { algebraicConnectivity } from './algebraic-connectivity.js';
import { averageHop } from './average-hop.js';
import { bridges } from './bridges.js';
import { cutNodes } from './cut-nodes.js';
import { demandServed } from './demand-served.js';
import { diameter } from './diameter.js';
import { effectiveResistance } from './effective-resistance.js';
import { efficiency } from './efficiency.js';
import { largestComponent } from './largest-component.js';
import { linkConnectivity } from './link-connectivity.js';
import { naturalConnectivity } from './natural-connectivity.js';
import { nodeConnectivity } from './node-connectivity.js';
import { pairConnectivity } from './pair-connectivity.js';
import { spectralRadius } from './spectral-radius.js';
import type { Metric, MetricId } from './types.js';
import { weightedEfficiency } from './weighted-efficiency.js';

export const metrics: Metric[] = [
  efficiency,
  weightedEfficiency,
  largestComponent,
  pairConnectivity,
  averageHop,
  diameter,
  algebraicConnectivity,
  effectiveResistance,
  naturalConnectivity,
  spectralRadius,
  nodeConnectivity,
  linkConnectivity,
  bridges,
  cutNodes,
  demandServed,
];

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
