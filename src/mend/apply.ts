// Applying a suggestion: to a parsed design (what the engine judges) and to the text of a
// design in our format (what the planner commits). Both must give the same compiled design,
// element for element, so that the verdict the search promises is the verdict `check` gives
// (a test parses the edited text and compares). New links go after the existing ones, in
// order; hardening sets `hardened: true` on the element. Pure.

import { isMap, isScalar, isSeq, parseDocument, type Node, type YAMLMap, type YAMLSeq } from 'yaml';
import { UsageError } from '../errors.js';
import { adjacency, type CompactGraph } from '../graph/compact.js';
import type { ReportElement } from '../graph/element.js';
import { linkKey, type DesignFormat, type TopoLink, type Topology } from '../topology/model.js';
import type { MendLink } from './types.js';

export interface Change {
  links: readonly MendLink[];
  harden: readonly ReportElement[];
}

/** The compact graph with extra links appended (structure only: no lengths, ids or lines for them). */
export function withExtraLinks(g: CompactGraph, extra: readonly (readonly [number, number])[]): CompactGraph {
  if (extra.length === 0) return g;
  const m = g.m + extra.length;
  const linkSource = new Int32Array(m);
  const linkTarget = new Int32Array(m);
  linkSource.set(g.linkSource);
  linkTarget.set(g.linkTarget);
  extra.forEach(([a, b], k) => {
    linkSource[g.m + k] = a;
    linkTarget[g.m + k] = b;
  });
  const degree = new Int32Array(g.n);
  for (let e = 0; e < m; e++) {
    degree[linkSource[e]]++;
    degree[linkTarget[e]]++;
  }
  const { offsets, neighbors, linkOf } = adjacency(g.n, linkSource, linkTarget, degree);
  const linkHardened = new Uint8Array(m);
  linkHardened.set(g.linkHardened);
  const linkLine = new Int32Array(m);
  linkLine.set(g.linkLine);
  return {
    ...g,
    m,
    offsets,
    neighbors,
    linkOf,
    linkSource,
    linkTarget,
    linkHardened,
    linkLine,
    length: null,
    latency: null,
    weight: null,
    linkIds: [...g.linkIds, ...extra.map((_, k) => `\u0000extra${k}`)],
    linkKeys: [...g.linkKeys, ...extra.map((_, k) => `\u0000extra${k}`)],
  };
}

/** The design with the change applied, as parsing the edited file would give it. */
export function applyToTopology(t: Topology, change: Change): Topology {
  const hardNodes = new Set(change.harden.filter((e) => e.kind === 'node').map((e) => e.id));
  const hardLinks = new Set(change.harden.filter((e) => e.kind === 'link').map((e) => e.id));
  const pairs = new Map<string, number>();
  for (const l of t.links) {
    const k = linkKey(l.source, l.target, 1);
    pairs.set(k, (pairs.get(k) ?? 0) + 1);
  }
  const added: TopoLink[] = change.links.map((l) => {
    const [source, target] = l.between;
    const k = linkKey(source, target, 1);
    const occurrence = (pairs.get(k) ?? 0) + 1;
    pairs.set(k, occurrence);
    const link: TopoLink = {
      id: l.id,
      key: linkKey(source, target, occurrence),
      source,
      target,
      riskGroups: [...(l.riskGroups ?? [])],
      hardened: false,
      pos: { line: 0, column: 0 },
      attrs: {},
    };
    if (l.lengthKm !== undefined) link.length = l.lengthKm;
    if (l.latencyMs !== undefined) link.latency = l.latencyMs;
    return link;
  });
  return {
    ...t,
    nodes: t.nodes.map((v) => (hardNodes.has(v.id) ? { ...v, hardened: true } : v)),
    links: [...t.links.map((l) => (hardLinks.has(l.id) ? { ...l, hardened: true } : l)), ...added],
  };
}

/** The entry a new link gets in our design format. */
export function linkEntry(l: MendLink): Record<string, unknown> {
  const entry: Record<string, unknown> = { id: l.id, between: [...l.between] };
  if (l.lengthKm !== undefined) entry.length_km = l.lengthKm;
  if (l.latencyMs !== undefined) entry.latency_ms = l.latencyMs;
  if (l.riskGroups && l.riskGroups.length) entry.risk_groups = [...l.riskGroups];
  return entry;
}

/**
 * The text of a design in our format (YAML or JSON) with the change applied; comments and
 * layout of YAML files are kept. `t` is the parsed design: it says which list item a link
 * is, even when the file names it only by its ends. Other formats: a UsageError (those are
 * edited by hand, as the suggestion lists the links).
 */
export function applyToText(text: string, format: DesignFormat, t: Topology, change: Change): string {
  const hardNodes = new Set(change.harden.filter((e) => e.kind === 'node').map((e) => e.id));
  const hardLinks = new Set(change.harden.filter((e) => e.kind === 'link').map((e) => e.id));
  if (format === 'native-json') {
    const data = JSON.parse(text) as { nodes: Record<string, unknown>[]; links?: Record<string, unknown>[] };
    for (const n of data.nodes) if (hardNodes.has(String(n.id))) n.hardened = true;
    const items = data.links ?? [];
    linkItemsOf(
      t,
      items.map((l) => l.between),
    ).forEach((i, e) => {
      if (hardLinks.has(t.links[e].id)) items[i].hardened = true;
    });
    data.links = [...items, ...change.links.map(linkEntry)];
    return `${JSON.stringify(data, null, 2)}\n`;
  }
  if (format !== 'native-yaml') {
    throw new UsageError(
      `a ${format} design cannot be edited by netbrace`,
      'add the links (or the hardened flags) by hand, as the suggestion lists them',
    );
  }
  const doc = parseDocument(text);
  const nodes = doc.get('nodes', true);
  const nodeItems = isSeq(nodes) ? (nodes.items as Node[]) : [];
  for (const n of nodeItems) {
    if (!isMap(n)) continue;
    const id = n.get('id', true);
    if (isScalar(id) && hardNodes.has(String(id.value))) n.set('hardened', true);
  }
  let links = doc.get('links', true) as YAMLSeq | undefined;
  const linkItems = isSeq(links) ? (links.items as Node[]) : [];
  const betweens = linkItems.map((n) => (isMap(n) ? (n.toJSON() as Record<string, unknown>).between : undefined));
  linkItemsOf(t, betweens).forEach((i, e) => {
    const item = linkItems[i];
    if (hardLinks.has(t.links[e].id) && isMap(item)) item.set('hardened', true);
  });
  if (change.links.length > 0) {
    if (!isSeq(links)) {
      links = doc.createNode([]) as YAMLSeq;
      doc.set('links', links);
    }
    for (const l of change.links) {
      const node = doc.createNode(linkEntry(l)) as YAMLMap;
      (node.get('between', true) as unknown as YAMLSeq).flow = true;
      const groups = node.get('risk_groups', true) as unknown as YAMLSeq | undefined;
      if (groups) groups.flow = true;
      links.items.push(node);
    }
  }
  return doc.toString({ flowCollectionPadding: false, lineWidth: 0 });
}

/** For each link of the parsed design (file order), the index of its item in the file's list: the reader drops self-loops. */
function linkItemsOf(t: Topology, betweens: unknown[]): number[] {
  const out: number[] = [];
  betweens.forEach((b, i) => {
    if (Array.isArray(b) && b.length === 2 && String(b[0]) !== String(b[1])) out.push(i);
  });
  return out.slice(0, t.links.length);
}
