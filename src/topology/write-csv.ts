// A Topology as a CSV edge list (the form edgelist.ts reads; quoting as RFC 4180): one row per
// link with source, target, id (where the reader would not derive it), length_km, latency_ms,
// capacity_gbps, weight, risk_groups (ids separated by ";"), hardened, and a column per other
// plain link attribute. A CSV edge list has no nodes of their own: labels, kinds, coordinates,
// hardened nodes, node attributes and nodes without links are lost, and so are demands, risk
// group descriptions, the latency budget, the name and the metadata. Every cell is text: a
// number attribute comes back as text, and a link without an attribute as an empty one.

import type { Topology } from './model.js';
import { derivedIds, designLosses, Losses, numberText, type Written } from './write-shared.js';

function cell(v: unknown): string {
  const s = typeof v === 'number' ? numberText(v) : typeof v === 'boolean' ? (v ? 'true' : 'false') : String(v);
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export function writeCsv(t: Topology): Written {
  const losses = new Losses();
  designLosses(t, losses);
  const linked = new Set(t.links.flatMap((l) => [l.source, l.target]));
  losses.add('nodes without links', 'node', t.nodes.filter((n) => !linked.has(n.id)).length);
  losses.add('node labels', 'node', t.nodes.filter((n) => n.label !== undefined).length);
  losses.add('node kinds', 'node', t.nodes.filter((n) => n.kind !== undefined).length);
  losses.add('site coordinates', 'node', t.nodes.filter((n) => n.lat !== undefined).length);
  losses.add('hardened nodes', 'node', t.nodes.filter((n) => n.hardened).length);
  losses.add('node attributes', 'node', t.nodes.filter((n) => Object.keys(n.attrs).length > 0).length);
  const order = firstAppearance(t);
  const kept = t.nodes.filter((n) => linked.has(n.id));
  if (kept.some((n, i) => n.id !== order[i]))
    losses.add('the order of the nodes (read back in order of first appearance)');
  for (const n of t.nodes) {
    if (n.id !== n.id.trim() || n.id === '')
      losses.add('node ids with spaces at either end (trimmed when read back)', 'node');
  }

  const derived = derivedIds(t);
  const fixed: [string, (i: number) => unknown][] = [];
  const col = (name: string, get: (i: number) => unknown) => {
    if (t.links.some((_, i) => get(i) !== undefined)) fixed.push([name, get]);
  };
  col('id', (i) => (derived[i] ? undefined : t.links[i].id));
  col('length_km', (i) => t.links[i].length);
  col('latency_ms', (i) => t.links[i].latency);
  col('capacity_gbps', (i) => t.links[i].capacity);
  col('weight', (i) => t.links[i].weight);
  col('risk_groups', (i) => (t.links[i].riskGroups.length > 0 ? t.links[i].riskGroups.join(';') : undefined));
  col('hardened', (i) => (t.links[i].hardened ? 'true' : undefined));
  for (const l of t.links)
    if (l.riskGroups.some((g) => g.includes(';')))
      losses.add('risk group ids that hold ";" (split when read back)', 'link');

  // Attribute columns: plain values only, one column per name (header names are matched
  // without case, so a second spelling of a name is left out).
  const taken = new Set(['source', 'target', ...fixed.map(([n]) => n)]);
  const extra: string[] = [];
  for (const l of t.links) {
    for (const [k, v] of Object.entries(l.attrs)) {
      if (extra.includes(k)) continue;
      if (v !== null && typeof v === 'object') continue;
      if (taken.has(k.toLowerCase())) continue;
      taken.add(k.toLowerCase());
      extra.push(k);
    }
  }
  let typed = false;
  for (const l of t.links) {
    for (const [k, v] of Object.entries(l.attrs)) {
      if (v !== null && typeof v === 'object') losses.add(`link attribute "${k}" (a list or map)`, 'link');
      else if (!extra.includes(k)) losses.add(`link attribute "${k}" (the name of a column netbrace writes)`, 'link');
      else if (typeof v !== 'string') typed = true;
    }
  }
  if (typed) losses.add('the types of link attributes (every cell is text)');

  const header = ['source', 'target', ...fixed.map(([n]) => n), ...extra];
  const rows = [header.map(cell).join(',')];
  t.links.forEach((l, i) => {
    const cells = [l.source, l.target, ...fixed.map(([, get]) => get(i)), ...extra.map((k) => l.attrs[k])];
    rows.push(cells.map((v) => (v === undefined || v === null ? '' : cell(v))).join(','));
  });
  return { text: `${rows.join('\n')}\n`, lost: losses.list() };
}

/** Node ids in the order a CSV reader meets them. */
function firstAppearance(t: Topology): string[] {
  const seen = new Set<string>();
  for (const l of t.links) for (const e of [l.source, l.target]) seen.add(e);
  return [...seen];
}
