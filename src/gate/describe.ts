// Plain words for requirements and numbers, shared by the findings' messages; and what a
// change does to a design, element by element (added, removed, renamed, hardened).

import type { CompactGraph } from '../graph/compact.js';
import { reportElement } from '../graph/element.js';
import type { ChallengeDef, Requirement } from '../policy/types.js';
import type { FileReport, ReportElement } from '../report/report.js';
import type { Matching } from './rename.js';

const WHAT: Record<string, string> = { nodes: 'nodes', links: 'links', 'risk-groups': 'risk groups', region: 'region' };

/** R values and deltas: three decimals, a true minus sign, no "-0.000". */
export function formatR(x: number): string {
  const s = x.toFixed(3);
  if (/^-0\.0+$/.test(s)) return s.slice(1);
  return s.replace(/^-/, '\u2212');
}

export function formatDelta(delta: number, se: number | null): string {
  const sign = delta > 0 && formatR(delta) !== '0.000' ? '+' : '';
  return `${sign}${formatR(delta)}${se !== null && se > 0 ? ` \u00b1 ${se.toFixed(3)}` : ''}`;
}

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
      return `R after any single ${r.element} removal \u2265 ${r.min}`;
    case 'no-new-spof': {
      const parts = [r.bridges ? 'bridges' : '', r.cutNodes ? 'cut nodes' : '', r.riskGroups ? 'shared-risk groups that strand sites' : ''].filter(Boolean);
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
  const unmatched = (g: CompactGraph, toOther: { node: Int32Array; link: Int32Array; group: Int32Array }): ReportElement[] => {
    const out: ReportElement[] = [];
    for (let v = 0; v < g.n; v++) if (toOther.node[v] < 0) out.push(reportElement(g, 'node', v));
    for (let e = 0; e < g.m; e++) if (toOther.link[e] < 0) out.push(reportElement(g, 'link', e));
    for (let k = 0; k < g.groupIds.length; k++) if (toOther.group[k] < 0) out.push(reportElement(g, 'group', k));
    return out;
  };
  const changes: ElementChanges = {
    added: unmatched(head, { node: m.nodeToBase, link: m.linkToBase, group: m.groupToBase }),
    removed: unmatched(base, { node: m.nodeToHead, link: m.linkToHead, group: m.groupToHead }),
  };
  const renamed = [
    ...m.renamedNodes.map(([b, h]) => ({ from: reportElement(base, 'node', b), to: reportElement(head, 'node', h) })),
    ...m.renamedGroups.map(([b, h]) => ({ from: reportElement(base, 'group', b), to: reportElement(head, 'group', h) })),
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
export function hardenedChanges(base: CompactGraph, head: CompactGraph, m: Matching): (ReportElement & { hardened: boolean })[] {
  const out: (ReportElement & { hardened: boolean })[] = [];
  for (let v = 0; v < head.n; v++) {
    const b = m.nodeToBase[v];
    if (b >= 0 && base.nodeHardened[b] !== head.nodeHardened[v]) out.push({ ...reportElement(head, 'node', v), hardened: head.nodeHardened[v] === 1 });
  }
  for (let e = 0; e < head.m; e++) {
    const b = m.linkToBase[e];
    if (b >= 0 && base.linkHardened[b] !== head.linkHardened[e]) out.push({ ...reportElement(head, 'link', e), hardened: head.linkHardened[e] === 1 });
  }
  return out;
}
