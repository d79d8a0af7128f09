// A Topology written in our own format (the JSON spelling of .net.yaml), for conversion and
// for gating designs that were built in code. Everything netbrace models is written: ids,
// labels, kinds, coordinates, hardened flags, lengths, latencies, capacities, weights, risk
// groups, demands, the latency budget and the network's name; other attributes are not.

import type { Topology } from './model.js';

/** Our format as a JSON document (stable key order, two-space indent, final newline). */
export function writeNativeJson(t: Topology): string {
  const doc: Record<string, unknown> = {};
  if (t.name !== undefined || t.description !== undefined) {
    doc.network = { ...(t.name !== undefined ? { name: t.name } : {}), ...(t.description !== undefined ? { description: t.description } : {}) };
  }
  doc.nodes = t.nodes.map((n) => ({
    id: n.id,
    ...(n.label !== undefined ? { label: n.label } : {}),
    ...(n.kind !== undefined ? { kind: n.kind } : {}),
    ...(n.lat !== undefined && n.lon !== undefined ? { site: { lat: n.lat, lon: n.lon } } : {}),
    ...(n.hardened ? { hardened: true } : {}),
  }));
  doc.links = t.links.map((l) => ({
    between: [l.source, l.target],
    id: l.id,
    ...(l.length !== undefined ? { length_km: l.length } : {}),
    ...(l.weight !== undefined ? { weight: l.weight } : {}),
    ...(l.latency !== undefined ? { latency_ms: l.latency } : {}),
    ...(l.capacity !== undefined ? { capacity_gbps: l.capacity } : {}),
    ...(l.riskGroups.length > 0 ? { risk_groups: [...l.riskGroups] } : {}),
    ...(l.hardened ? { hardened: true } : {}),
  }));
  if (t.riskGroups.length > 0) doc.risk_groups = t.riskGroups.map((r) => ({ id: r.id, ...(r.description !== undefined ? { description: r.description } : {}) }));
  if (t.demands.length > 0) doc.demands = t.demands.map((d) => ({ between: [d.source, d.target], volume: d.volume }));
  if (t.latencyBudget !== undefined) doc.latency_budget = t.latencyBudget;
  return `${JSON.stringify(doc, null, 2)}\n`;
}
