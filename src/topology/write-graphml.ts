// A Topology as GraphML (the format graphml.ts reads; Brandes et al., Graph Drawing 2001):
// one undirected graph, a <key> per attribute name and domain with its attr.type, node
// coordinates as the Topology Zoo writes them (Latitude/Longitude), links with length_km,
// latency_ms, capacity_gbps, weight, risk_groups (ids separated by ";") and hardened.
// GraphML holds only plain values: attributes that are lists or maps (a GeoJSON route) are
// left out, and so are demands, risk group descriptions and the latency budget.

import type { Topology } from './model.js';
import {
  attributeColumns,
  derivedIds,
  designLosses,
  Losses,
  numberText,
  type ValueKind,
  type Written,
} from './write-shared.js';

const XML_ESCAPES: Readonly<Record<string, string>> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&apos;',
};
/** Characters XML 1.0 cannot hold at all, even escaped (§2.2). */
const NOT_XML = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\ufffe\uffff]/;

/** Text for element content or an attribute value (where XML turns raw line breaks and tabs into spaces). */
function esc(s: string): string {
  return s.replace(/[&<>"'\r\n\t]/g, (c) => XML_ESCAPES[c] ?? `&#${c.charCodeAt(0)};`);
}

function attrType(kinds: ReadonlySet<ValueKind>): string {
  if ([...kinds].every((k) => k === 'boolean')) return 'boolean';
  if ([...kinds].every((k) => k === 'integer')) return 'long';
  if ([...kinds].every((k) => k === 'integer' || k === 'number')) return 'double';
  return 'string';
}

function valueText(v: unknown): string {
  return typeof v === 'number' ? numberText(v) : String(v);
}

interface Column {
  id: string;
  name: string;
  type: string;
}

export function writeGraphml(t: Topology): Written {
  const losses = new Losses();
  designLosses(t, losses, { metadata: true, name: true });
  const plain = (v: unknown) => v === null || (typeof v !== 'object' && typeof v !== 'function');

  // Model fields first, under the names the readers map; then the attributes as they came.
  const nodeRows = t.nodes.map((n) => {
    const row: Record<string, unknown> = {};
    if (n.label !== undefined) row.label = n.label;
    if (n.kind !== undefined) row.type = n.kind;
    if (n.lat !== undefined && n.lon !== undefined) [row.Latitude, row.Longitude] = [n.lat, n.lon];
    if (n.hardened) row.hardened = true;
    return row;
  });
  const linkRows = t.links.map((l) => {
    const row: Record<string, unknown> = {};
    if (l.length !== undefined) row.length_km = l.length;
    if (l.latency !== undefined) row.latency_ms = l.latency;
    if (l.capacity !== undefined) row.capacity_gbps = l.capacity;
    if (l.weight !== undefined) row.weight = l.weight;
    if (l.riskGroups.length > 0) row.risk_groups = l.riskGroups.join(';');
    if (l.hardened) row.hardened = true;
    return row;
  });
  const addAttrs = (rows: Record<string, unknown>[], attrs: Readonly<Record<string, unknown>>[], what: string) => {
    rows.forEach((row, i) => {
      const taken = new Set(Object.keys(row).map((k) => k.toLowerCase()));
      if (what === 'node' && 'type' in row) taken.add('kind'); // both spell the kind
      for (const [k, v] of Object.entries(attrs[i])) {
        if (!plain(v)) losses.add(`${what} attribute "${k}" (a list or map)`, what);
        else if (v === null) losses.add(`${what} attribute "${k}" (empty)`, what);
        else if (taken.has(k.toLowerCase()))
          losses.add(`${what} attribute "${k}" (the name of a field netbrace writes)`, what);
        else row[k] = v;
      }
    });
  };
  addAttrs(
    nodeRows,
    t.nodes.map((n) => n.attrs),
    'node',
  );
  addAttrs(
    linkRows,
    t.links.map((l) => l.attrs),
    'link',
  );
  for (const l of t.links)
    if (l.riskGroups.some((g) => g.includes(';')))
      losses.add('risk group ids that hold ";" (split when read back)', 'link');

  const graphRow: Record<string, unknown> = {};
  if (t.name !== undefined) graphRow.label = t.name;
  if (t.description !== undefined) graphRow.description = t.description;
  for (const [k, v] of Object.entries(t.metadata)) {
    if (!plain(v) || v === null) losses.add(`design metadata "${k}" (a list or map)`);
    else if (k in graphRow) {
      if (graphRow[k] !== v)
        losses.add(`design metadata "${k}" (the network's ${k === 'label' ? 'name' : k} is written there)`);
    } else graphRow[k] = v;
  }

  const keys: string[] = [];
  const columns = (domain: 'graph' | 'node' | 'edge', prefix: string, rows: Record<string, unknown>[]): Column[] =>
    [...attributeColumns(rows)].map(([name, kinds], i) => {
      const c = { id: `${prefix}${i}`, name, type: attrType(kinds) };
      keys.push(`  <key id="${c.id}" for="${domain}" attr.name="${esc(name)}" attr.type="${c.type}"/>`);
      if (c.type === 'string' && [...kinds].some((k) => k !== 'string'))
        losses.add(`the type of ${domain} attribute "${name}" (numbers and text mixed: all written as text)`);
      return c;
    });
  const gCols = columns('graph', 'g', [graphRow]);
  const nCols = columns('node', 'n', nodeRows);
  const eCols = columns('edge', 'e', linkRows);

  const body: string[] = [];
  const data = (cols: Column[], row: Record<string, unknown>, indent: string) => {
    for (const c of cols) {
      if (!(c.name in row)) continue;
      const text = valueText(row[c.name]);
      if (NOT_XML.test(text)) {
        losses.add(`values with control characters XML cannot hold`, 'value');
        continue;
      }
      body.push(`${indent}<data key="${c.id}">${esc(text)}</data>`);
    }
  };
  const header = `<graph edgedefault="undirected">`;
  data(gCols, graphRow, '    ');
  t.nodes.forEach((n, i) => {
    const inner: string[] = [];
    const mark = body.length;
    data(nCols, nodeRows[i], '      ');
    inner.push(...body.splice(mark));
    body.push(
      inner.length > 0
        ? `    <node id="${esc(n.id)}">\n${inner.join('\n')}\n    </node>`
        : `    <node id="${esc(n.id)}"/>`,
    );
  });
  const derived = derivedIds(t);
  t.links.forEach((l, i) => {
    const mark = body.length;
    data(eCols, linkRows[i], '      ');
    const inner = body.splice(mark);
    const open = `    <edge${derived[i] ? '' : ` id="${esc(l.id)}"`} source="${esc(l.source)}" target="${esc(l.target)}"`;
    body.push(inner.length > 0 ? `${open}>\n${inner.join('\n')}\n    </edge>` : `${open}/>`);
  });
  const text = [
    '<?xml version="1.0" encoding="UTF-8"?>',
    '<graphml xmlns="http://graphml.graphdrawing.org/xmlns" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance" xsi:schemaLocation="http://graphml.graphdrawing.org/xmlns http://graphml.graphdrawing.org/xmlns/1.0/graphml.xsd">',
    ...keys,
    `  ${header}`,
    ...body,
    '  </graph>',
    '</graphml>',
    '',
  ].join('\n');
  return { text, lost: losses.list() };
}
