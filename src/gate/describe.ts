// Plain words for requirements, numbers and changes, shared by the findings' messages and
// the report's "what the change does": elements added, removed, renamed, hardened, and the
// attributes changed on elements both sides have.

import type { CompactGraph } from '../graph/compact.js';
import { formatDelta, formatFixed } from '../report/format.js';
import { reportElement } from '../graph/element.js';
import type { ChallengeDef, Requirement } from '../policy/types.js';
import type { AttributeChange, FileReport } from '../report/report.js';
import type { ReportElement } from '../graph/element.js';
import type { TopoLink, TopoNode, Topology } from '../topology/model.js';
import type { Matching } from './rename.js';

const WHAT: Record<string, string> = { nodes: 'nodes', links: 'links', 'risk-groups': 'risk groups', region: 'region' };

/** Most decimals a message prints to show which side of a limit a value is on. */
const MAX_DECIMALS = 12;

/** R values and deltas: three decimals (or more when asked), a true minus sign, no "-0.000". */
export const formatR = formatFixed;

/**
 * The fewest decimals (at least `min`) at which `a` and `b` print differently, so that a message
 * shows the digits that decide (a drop of 0.0104 against an allowance of 0.010 prints as 0.0104
 * and 0.0100, never as "0.010, more than the allowed 0.010"). Rounding is monotone, so values
 * that print differently print in their true order. `min` when they are equal or not finite.
 */
export function decidingDecimals(a: number, b: number, min = 3): number {
  if (!Number.isFinite(a) || !Number.isFinite(b) || a === b) return min;
  for (let d = min; d <= MAX_DECIMALS; d++) if (formatR(a, d) !== formatR(b, d)) return d;
  return MAX_DECIMALS;
}

/**
 * Decimals for "dropped from B to H (Δ D), more than the allowed A": the fewest (at least 3)
 * at which the drop and the limit print differently and the drop between B and H as printed
 * lies on the same side of the printed limit as the true drop, so that nobody can subtract the
 * shown numbers and reach the opposite verdict. `drop` = base − head when higher is better.
 */
export function changeDecimals(base: number, head: number, higherIsBetter: boolean, limit: number): number {
  const drop = higherIsBetter ? base - head : head - base;
  if (![base, head, limit].every(Number.isFinite)) return 3;
  const beyond = drop > limit;
  for (let d = decidingDecimals(drop, limit); d <= MAX_DECIMALS; d++) {
    const b = Number(base.toFixed(d));
    const h = Number(head.toFixed(d));
    const shown = Number((higherIsBetter ? b - h : h - b).toFixed(d));
    const shownLimit = Number(limit.toFixed(d));
    if (beyond ? shown > shownLimit : shown <= shownLimit) return d;
  }
  return MAX_DECIMALS;
}

/** A signed delta with its standard error, both at `decimals` decimals: "−0.0104 ± 0.0020" (report/format.ts). */
export { formatDelta };

function percent(x: number): string {
  return `${Number((x * 100).toFixed(6))} %`;
}

function xWords(c: ChallengeDef | undefined, x: number): string {
  if (!c) return String(x);
  if (c.remove === 'region') return `radius ${x} km`;
  return `${percent(x)} of ${WHAT[c.remove]} removed`;
}

function challengeWords(c: ChallengeDef | undefined, name: string): string {
  if (!c) return `"${name}"`;
  const how = c.random ? 'random' : `${c.adaptive ? 'adaptive ' : ''}${c.order}`;
  return `"${name}" (${how} ${WHAT[c.remove]})`;
}

/** One line naming what a requirement judges, e.g. `10 % quantile of R at 20 % of nodes removed, "fail" (random nodes) ≥ 0.6`. */
export function describeRequirement(r: Requirement, challenges: readonly ChallengeDef[]): string {
  const c = 'challenge' in r ? challenges.find((x) => x.name === r.challenge) : undefined;
  switch (r.kind) {
    case 'r-threshold': {
      const on = challengeWords(c, r.challenge);
      const s = r.statistic;
      if (s.kind === 'worst-case') return `R after the worst ${s.removals} removals found, ${on} \u2265 ${r.min}`;
      const stat =
        s.kind === 'quantile' ? `${percent(s.q)} quantile of R` : s.kind === 'value' ? 'R' : `${s.kind} of R`;
      return `${stat} at ${xWords(c, r.at ?? 0)}, ${on} \u2265 ${r.min}`;
    }
    case 'area-floor':
      return `area of ${challengeWords(c, r.challenge)}${r.min === undefined ? ' (tracked)' : ` \u2265 ${r.min}`}`;
    case 'spread-ceiling':
      return `spread of ${challengeWords(c, r.challenge)} \u2264 ${r.max}`;
    case 'n-1':
      return `N\u22121 (${r.element}s): R after any single ${r.element} removal \u2265 ${r.min}`;
    case 'no-new-spof': {
      const parts = [
        r.bridges ? 'bridges' : '',
        r.cutNodes ? 'cut nodes' : '',
        r.riskGroups ? 'shared-risk groups that strand sites' : '',
      ].filter(Boolean);
      const what = parts.length > 1 ? `${parts.slice(0, -1).join(', ')} or ${parts[parts.length - 1]}` : parts[0];
      return `no new ${what}`;
    }
  }
}

export type ElementChanges = NonNullable<FileReport['changes']>;

/**
 * What the change does to the design's elements, read through the matching of base and head:
 * nodes, links and shared-risk groups without a counterpart are removed (base line) or added
 * (head line); matched nodes and groups whose id changed are renamed; matched elements whose
 * hardened flag changed are listed with the flag they have now (see hardenedChanges).
 */
export function elementChanges(base: CompactGraph, head: CompactGraph, m: Matching): ElementChanges {
  const unmatched = (
    g: CompactGraph,
    toOther: { node: Int32Array; link: Int32Array; group: Int32Array },
  ): ReportElement[] => {
    const out: ReportElement[] = [];
    for (let v = 0; v < g.n; v++) if (toOther.node[v] < 0) out.push(reportElement(g, 'node', v));
    for (let e = 0; e < g.m; e++) if (toOther.link[e] < 0) out.push(reportElement(g, 'link', e));
    for (let k = 0; k < g.groupIds.length; k++) if (toOther.group[k] < 0) out.push(reportElement(g, 'group', k));
    // As the file lists them (the graph is numbered in id order).
    return out.sort((a, b) => a.line - b.line);
  };
  const changes: ElementChanges = {
    added: unmatched(head, { node: m.nodeToBase, link: m.linkToBase, group: m.groupToBase }),
    removed: unmatched(base, { node: m.nodeToHead, link: m.linkToHead, group: m.groupToHead }),
  };
  const renamed = [
    ...m.renamedNodes.map(([b, h]) => ({ from: reportElement(base, 'node', b), to: reportElement(head, 'node', h) })),
    ...m.renamedGroups.map(([b, h]) => ({
      from: reportElement(base, 'group', b),
      to: reportElement(head, 'group', h),
    })),
  ];
  if (renamed.length) changes.renamed = renamed;
  const hardened = hardenedChanges(base, head, m);
  if (hardened.length) changes.hardened = hardened;
  return changes;
}

/**
 * Matched nodes and links whose hardened flag the change set or cleared, in head file order
 * (nodes, then links), each with the flag it has at head. Hardening changes what the
 * challenges may remove, so it is a change to the design even when no element moved.
 */
export function hardenedChanges(
  base: CompactGraph,
  head: CompactGraph,
  m: Matching,
): (ReportElement & { hardened: boolean })[] {
  const out: (ReportElement & { hardened: boolean })[] = [];
  for (let v = 0; v < head.n; v++) {
    const b = m.nodeToBase[v];
    if (b >= 0 && base.nodeHardened[b] !== head.nodeHardened[v])
      out.push({ ...reportElement(head, 'node', v), hardened: head.nodeHardened[v] === 1 });
  }
  for (let e = 0; e < head.m; e++) {
    const b = m.linkToBase[e];
    if (b >= 0 && base.linkHardened[b] !== head.linkHardened[e])
      out.push({ ...reportElement(head, 'link', e), hardened: head.linkHardened[e] === 1 });
  }
  // Sites first, then links, each as the file lists them.
  return out.sort((a, b) => (a.kind === b.kind ? a.line - b.line : a.kind === 'node' ? -1 : 1));
}

/** The kinds of weak point a no-new-spof requirement counts, each in a row of its own. */
export type SpofPart = 'bridges' | 'cut-nodes' | 'risk-groups';

/** The rows of a no-new-spof requirement: bridges, cut nodes and stranding groups are counted apart, never added. */
export function spofRowParts(
  r: Requirement & { kind: 'no-new-spof' },
): { id: string; description: string; kind: SpofPart }[] {
  const parts: { kind: SpofPart; words: string }[] = [];
  if (r.bridges) parts.push({ kind: 'bridges', words: 'no new bridges' });
  if (r.cutNodes) parts.push({ kind: 'cut-nodes', words: 'no new cut nodes' });
  if (r.riskGroups) parts.push({ kind: 'risk-groups', words: 'no new shared-risk groups that strand sites' });
  return parts.map((p) => ({ id: parts.length > 1 ? `${r.id}/${p.kind}` : r.id, description: p.words, kind: p.kind }));
}

// --- what the change does ----------------------------------------------------------------

const NONE = '\u2013';

function num(v: number | undefined, unit: string): string {
  return v === undefined ? NONE : `${v} ${unit}`.trim();
}

function yesNo(v: boolean): string {
  return v ? 'yes' : 'no';
}

function place(v: TopoNode): string {
  return v.lat === undefined || v.lon === undefined ? NONE : `${v.lat}, ${v.lon}`;
}

function groupsOf(l: TopoLink): string {
  return l.riskGroups.length ? [...new Set(l.riskGroups)].sort().join(', ') : 'none';
}

const NODE_ATTRIBUTES: { attribute: string; value: (v: TopoNode) => string }[] = [
  { attribute: 'label', value: (v) => v.label ?? NONE },
  { attribute: 'kind', value: (v) => v.kind ?? NONE },
  { attribute: 'coordinates', value: place },
  { attribute: 'hardened', value: (v) => yesNo(v.hardened) },
];

const LINK_ATTRIBUTES: { attribute: string; value: (l: TopoLink) => string }[] = [
  { attribute: 'risk groups', value: groupsOf },
  { attribute: 'hardened', value: (l) => yesNo(l.hardened) },
  { attribute: 'length', value: (l) => num(l.length, 'km') },
  { attribute: 'latency', value: (l) => num(l.latency, 'ms') },
  { attribute: 'capacity', value: (l) => num(l.capacity, 'Gbit/s') },
  { attribute: 'weight', value: (l) => num(l.weight, '') },
];

/**
 * The attributes the change alters on nodes (by id) and links (by stable key: their ends) that
 * both sides have — labels, kinds, coordinates, hardening, risk-group membership, lengths,
 * latencies, capacities, weights — with the element's line on each side. Elements added,
 * removed or renamed are elementChanges' part.
 */
export function attributeChanges(base: Topology, head: Topology): AttributeChange[] {
  const modified: AttributeChange[] = [];
  const baseNodes = new Map(base.nodes.map((v) => [v.id, v]));
  const baseLinks = new Map(base.links.map((l) => [l.key, l]));
  for (const h of head.nodes) {
    const b = baseNodes.get(h.id);
    if (!b) continue;
    for (const a of NODE_ATTRIBUTES) {
      const before = a.value(b);
      const after = a.value(h);
      if (before !== after)
        modified.push({
          id: h.id,
          kind: 'node',
          attribute: a.attribute,
          before,
          after,
          baseLine: b.pos.line,
          headLine: h.pos.line,
        });
    }
  }
  for (const h of head.links) {
    const b = baseLinks.get(h.key);
    if (!b) continue;
    for (const a of LINK_ATTRIBUTES) {
      const before = a.value(b);
      const after = a.value(h);
      if (before !== after)
        modified.push({
          id: h.id,
          kind: 'link',
          attribute: a.attribute,
          before,
          after,
          baseLine: b.pos.line,
          headLine: h.pos.line,
        });
    }
  }
  return modified;
}
