// Which link attribute the weighted metrics use as the link's cost: latency (ms) if every
// link has one, else length (km) if every link has one, else the generic weight. Mixed
// columns are not combined (ms and km do not add up); a column with a missing, zero or
// negative entry does not count as present, because a shortest path over it would be
// meaningless (a zero-cost link makes two sites coincide).

import type { CompactGraph } from '../../graph/compact.js';

export { greatCircleKm } from '../../topology/geodesy.js';

export interface LinkCost {
  kind: 'latency' | 'length' | 'weight';
  /** Unit of the cost, for reports. */
  unit: 'ms' | 'km' | '';
  values: Float64Array;
  /** Smallest cost of any link. */
  min: number;
}

function complete(values: Float64Array | null): boolean {
  if (!values || values.length === 0) return false;
  for (let e = 0; e < values.length; e++) if (!(values[e] > 0 && Number.isFinite(values[e]))) return false;
  return true;
}

export function chooseLinkCost(g: CompactGraph): LinkCost | null {
  const pick = (kind: LinkCost['kind'], unit: LinkCost['unit'], values: Float64Array | null): LinkCost | null => {
    if (!complete(values)) return null;
    let min = Infinity;
    for (let e = 0; e < values!.length; e++) min = Math.min(min, values![e]);
    return { kind, unit, values: values!, min };
  };
  return pick('latency', 'ms', g.latency) ?? pick('length', 'km', g.length) ?? pick('weight', '', g.weight);
}

/** One-way propagation delay of light in optical fibre, ms per km (≈ c / 1.47; common practice). */
export const FIBRE_MS_PER_KM = 0.0049;
