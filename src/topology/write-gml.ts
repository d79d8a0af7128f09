// A Topology as GML (Himsholt, "GML: A portable Graph File Format", Universität Passau, 1997),
// the flat form gml.ts reads and the Topology Zoo publishes: `node [ id … label … Latitude …
// Longitude … ]` and `edge [ source … target … ]`. Strings are 7-bit ASCII with `&`, `"` and
// every other character written as HTML entities (as the format asks); ids that are whole
// numbers are written as numbers, any other id as a string. GML has no true/false: flags are
// 1/0. Keys are letters, digits and `_`: an attribute with another name cannot be written, and
// nor can a list of lists (a GeoJSON route), demands, risk group descriptions or the latency
// budget. A map becomes a nested list, a list of plain values a repeated key.

import type { Topology } from './model.js';
import { isLinkField, isNodeField } from './attributes.js';
import { derivedIds, designLosses, Losses, numberText, type Written } from './write-shared.js';

const KEY = /^[A-Za-z_][A-Za-z0-9_]*$/;
/** Whole numbers as a reader of GML writes them back (no sign, no leading zeros, no exponent). */
const WHOLE = /^(0|[1-9][0-9]{0,14})$/;

function gmlString(s: string): string {
  let out = '"';
  for (const ch of s) {
    const c = ch.codePointAt(0)!;
    if (ch === '&') out += '&amp;';
    else if (ch === '"') out += '&quot;';
    else if (c < 0x20 || c >= 0x7f) out += `&#${c};`;
    else out += ch;
  }
  return `${out}"`;
}

const id = (s: string) => (WHOLE.test(s) ? s : gmlString(s));

/** The lines of one `key value`, or undefined (with the reason) when GML cannot hold it. */
function pair(key: string, v: unknown, indent: string, depth = 0): { lines: string[] } | { why: string } {
  if (!KEY.test(key)) return { why: 'a name GML keys cannot have' };
  if (typeof v === 'number') return { lines: [`${indent}${key} ${numberText(v)}`] };
  if (typeof v === 'string') return { lines: [`${indent}${key} ${gmlString(v)}`] };
  if (typeof v === 'boolean') return { lines: [`${indent}${key} ${v ? 1 : 0}`] };
  if (Array.isArray(v)) {
    if (v.length < 2) return { why: 'a list of fewer than two values' };
    const lines: string[] = [];
    for (const x of v) {
      if (Array.isArray(x)) return { why: 'a list of lists' };
      const p = pair(key, x, indent, depth);
      if ('why' in p) return p;
      lines.push(...p.lines);
    }
    return { lines };
  }
  if (v !== null && typeof v === 'object') {
    if (key === 'graph' || depth > 20) return { why: 'a nested graph' };
    const lines = [`${indent}${key} [`];
    for (const [k, x] of Object.entries(v)) {
      if (k === 'graph') return { why: 'a nested graph' };
      const p = pair(k, x, `${indent}  `, depth + 1);
      if ('why' in p) return p;
      lines.push(...p.lines);
    }
    lines.push(`${indent}]`);
    return { lines };
  }
  return { why: 'an empty value' };
}

export function writeGml(t: Topology): Written {
  const losses = new Losses();
  designLosses(t, losses, { metadata: true, name: true });
  const out: string[] = ['graph ['];
  const flagsAsNumbers = new Set<string>();
  const put = (
    key: string,
    v: unknown,
    indent: string,
    what: string,
    written: Set<string>,
    mapped: (k: string) => boolean,
  ) => {
    if (written.has(key.toLowerCase()))
      return void losses.add(`${what} attribute "${key}" (the name of a field netbrace writes)`, what);
    // A repeated key that the reader maps would be refused there.
    if (Array.isArray(v) && mapped(key))
      return void losses.add(`${what} attribute "${key}" (a list under a name netbrace reads)`, what);
    const p = pair(key, v, indent);
    if ('why' in p) return void losses.add(`${what} attribute "${key}" (${p.why})`, what);
    if (typeof v === 'boolean') flagsAsNumbers.add(`${what} attribute "${key}"`);
    written.add(key.toLowerCase());
    out.push(...p.lines);
  };

  // Readers that build simple graphs drop parallel links unless the file says it has them.
  const pairs = new Set(
    t.links.map((l) => (l.source <= l.target ? `${l.source}\u0000${l.target}` : `${l.target}\u0000${l.source}`)),
  );
  if (pairs.size < t.links.length) out.push('  multigraph 1');
  const graphKeys = new Set(['node', 'edge', 'directed', 'multigraph']);
  if (t.name !== undefined) {
    out.push(`  label ${gmlString(t.name)}`);
    graphKeys.add('label');
  }
  if (t.description !== undefined) {
    out.push(`  description ${gmlString(t.description)}`);
    graphKeys.add('description');
  }
  for (const [k, v] of Object.entries(t.metadata)) {
    if (graphKeys.has(k.toLowerCase())) {
      if (!(k === 'label' && v === t.name) && !(k === 'description' && v === t.description))
        losses.add(`design metadata "${k}" (a key GML uses itself)`);
      continue;
    }
    put(k, v, '  ', 'design metadata', graphKeys, () => false);
  }

  for (const n of t.nodes) {
    out.push('  node [', `    id ${id(n.id)}`);
    const written = new Set(['id']);
    const field = (k: string, line: string) => {
      written.add(k.toLowerCase());
      out.push(`    ${line}`);
    };
    if (n.label !== undefined) field('label', `label ${gmlString(n.label)}`);
    if (n.kind !== undefined) {
      field('type', `type ${gmlString(n.kind)}`);
      written.add('kind');
    }
    if (n.lat !== undefined && n.lon !== undefined) {
      field('Latitude', `Latitude ${numberText(n.lat)}`);
      field('Longitude', `Longitude ${numberText(n.lon)}`);
    }
    if (n.hardened) field('hardened', 'hardened 1');
    for (const [k, v] of Object.entries(n.attrs)) put(k, v, '    ', 'node', written, isNodeField);
    out.push('  ]');
  }
  const derived = derivedIds(t);
  t.links.forEach((l, i) => {
    out.push('  edge [');
    const written = new Set(['id', 'source', 'target']);
    if (!derived[i]) out.push(`    id ${id(l.id)}`);
    out.push(`    source ${id(l.source)}`, `    target ${id(l.target)}`);
    const field = (k: string, v: string) => {
      written.add(k.toLowerCase());
      out.push(`    ${k} ${v}`);
    };
    if (l.length !== undefined) field('length_km', numberText(l.length));
    if (l.latency !== undefined) field('latency_ms', numberText(l.latency));
    if (l.capacity !== undefined) field('capacity_gbps', numberText(l.capacity));
    if (l.weight !== undefined) field('weight', numberText(l.weight));
    if (l.riskGroups.length > 0) {
      field('risk_groups', gmlString(l.riskGroups.join(';')));
      if (l.riskGroups.some((g) => g.includes(';')))
        losses.add('risk group ids that hold ";" (split when read back)', 'link');
    }
    if (l.hardened) field('hardened', '1');
    for (const [k, v] of Object.entries(l.attrs))
      put(k, v, '    ', 'link', written, (k) => isLinkField(k) || k === 'id' || k === 'source' || k === 'target');
    out.push('  ]');
  });
  out.push(']', '');
  for (const f of flagsAsNumbers) losses.add(`true/false of ${f} (written as 1/0)`);
  return { text: out.join('\n'), lost: losses.list() };
}
