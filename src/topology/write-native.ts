// A Topology written in our own format, as JSON (.net.json) or YAML (.net.yaml), for conversion
// and for gating designs that were built in code. Everything netbrace models is written: ids,
// labels, kinds, coordinates, hardened flags, lengths, latencies, capacities, weights, risk
// groups, demands, the latency budget, the network's name and description, its metadata, and
// every other attribute of a node or link under `attributes:`; reading the text back gives the
// same Topology (but for source positions).

import { Document, isMap, isPair, isScalar, isSeq, visit } from 'yaml';
import type { Topology } from './model.js';

/** Our format as a plain document (stable key order). */
export function nativeDocument(t: Topology): Record<string, unknown> {
  const doc: Record<string, unknown> = {};
  if (t.name !== undefined || t.description !== undefined) {
    doc.network = {
      ...(t.name !== undefined ? { name: t.name } : {}),
      ...(t.description !== undefined ? { description: t.description } : {}),
    };
  }
  if (t.latencyBudget !== undefined) doc.latency_budget = t.latencyBudget;
  doc.nodes = t.nodes.map((n) => ({
    id: n.id,
    ...(n.label !== undefined ? { label: n.label } : {}),
    ...(n.kind !== undefined ? { kind: n.kind } : {}),
    ...(n.lat !== undefined && n.lon !== undefined ? { site: { lat: n.lat, lon: n.lon } } : {}),
    ...(n.hardened ? { hardened: true } : {}),
    ...(Object.keys(n.attrs).length > 0 ? { attributes: n.attrs } : {}),
  }));
  doc.links = t.links.map((l) => ({
    between: [l.source, l.target],
    id: l.id,
    ...(l.length !== undefined ? { length_km: l.length } : {}),
    ...(l.latency !== undefined ? { latency_ms: l.latency } : {}),
    ...(l.capacity !== undefined ? { capacity_gbps: l.capacity } : {}),
    ...(l.weight !== undefined ? { weight: l.weight } : {}),
    ...(l.riskGroups.length > 0 ? { risk_groups: [...l.riskGroups] } : {}),
    ...(l.hardened ? { hardened: true } : {}),
    ...(Object.keys(l.attrs).length > 0 ? { attributes: l.attrs } : {}),
  }));
  if (t.riskGroups.length > 0)
    doc.risk_groups = t.riskGroups.map((r) => ({
      id: r.id,
      ...(r.description !== undefined ? { description: r.description } : {}),
    }));
  if (t.demands.length > 0) doc.demands = t.demands.map((d) => ({ between: [d.source, d.target], volume: d.volume }));
  if (Object.keys(t.metadata).length > 0) doc.metadata = t.metadata;
  return doc;
}

/** Our format as a JSON document (two-space indent, final newline). */
export function writeNativeJson(t: Topology): string {
  return `${JSON.stringify(nativeDocument(t), null, 2)}\n`;
}

/**
 * Our format as YAML: block style, with short lists of plain values (ends, risk groups,
 * positions) and sites written on one line, so that one element reads as a few lines.
 */
export function writeNativeYaml(t: Topology, comment?: string): string {
  const doc = new Document(nativeDocument(t));
  visit(doc, {
    Pair(_, pair) {
      if (isPair(pair) && isScalar(pair.key) && pair.key.value === 'site' && isMap(pair.value)) pair.value.flow = true;
    },
    Seq(_, seq) {
      if (
        seq.items.length <= 16 &&
        seq.items.every((i) => isScalar(i) || (isSeq(i) && i.items.every((j) => isScalar(j))))
      )
        seq.flow = true;
    },
  });
  if (comment !== undefined)
    doc.commentBefore = comment
      .split('\n')
      .map((s) => ` ${s}`)
      .join('\n');
  return doc.toString({ lineWidth: 0, flowCollectionPadding: false });
}
