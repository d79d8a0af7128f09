// New single points of failure, base against head: bridges (links), cut nodes (sites) and
// shared-risk groups whose loss strands sites (a duct that carries both ways out of a part of
// the network is one point of failure however many links run through it).
//
// "New" is read through the matching of base and head (rename.ts): an element renamed with
// its neighbourhood unchanged is the same element, so a renamed cut node is not a new one.
// Hardened elements never count, since challenges never remove them; but hardening is a
// claim in the file that the gate cannot check, so a weak point that the head would have
// without its hardened flags, that the base did not have (ignoring hardening there too), and
// that is hidden only by an element the change marks hardened, is a finding of its own
// (`hardened-weak-point`, at the policy's `hardened-weak-points` severity, warn by default).
// Each finding says what losing the element costs (consequence.ts).

import { spofRowParts, type SpofPart } from './describe.js';
import { linksByLine, nodesByLine, type CompactGraph } from '../graph/compact.js';
import { reportElement } from '../graph/element.js';
import type { Mask } from '../graph/mask.js';
import { findComponents, findCutElements, findStrandingGroups, groupLinkMask } from '../graph/structure.js';
import { formatElement } from '../report/labels.js';
import type { Finding, RequirementResult, Severity } from '../report/report.js';
import type { ReportElement } from '../graph/element.js';
import type { SpofRequirement } from '../policy/types.js';
import { costOf, MAX_COSTED } from './consequence.js';
import type { DesignSide } from './measure.js';
import type { Matching } from './rename.js';

/** Weak points of one design, by index. */
export interface WeakPoints {
  bridges: Set<number>;
  cutNodes: Set<number>;
  groups: Set<number>;
}

/** Bridges, cut nodes and stranding groups; honouring hardening leaves hardened ones out. */
export function weakPoints(g: CompactGraph, honourHardening: boolean): WeakPoints {
  const cuts = findCutElements(g);
  return {
    bridges: new Set(cuts.bridges.filter((e) => !honourHardening || !g.linkHardened[e])),
    cutNodes: new Set(cuts.cutNodes.filter((v) => !honourHardening || !g.nodeHardened[v])),
    groups: new Set(findStrandingGroups(g, honourHardening, cuts)),
  };
}

function finding(
  rule: Finding['rule'],
  severity: Severity,
  message: string,
  el: ReportElement,
  requirement: string,
  consequence: Finding['consequence'],
): Finding {
  const f: Finding = { rule, severity, message, elements: [el], line: el.line, requirement };
  if (consequence) f.consequence = consequence;
  return f;
}

/** A site's name in running text: its label, else its id. */
function siteName(g: CompactGraph, v: number): string {
  return g.nodeLabels[v] || g.nodeIds[v];
}

function linkWords(g: CompactGraph, e: number): string {
  return `link ${formatElement(reportElement(g, 'link', e))} between ${siteName(g, g.linkSource[e])} and ${siteName(g, g.linkTarget[e])}`;
}

function groupWords(g: CompactGraph, k: number, honourHardening: boolean): string {
  const members: string[] = [];
  for (let p = g.groupOffsets[k]; p < g.groupOffsets[k + 1]; p++) {
    const e = g.groupLinks[p];
    if (!honourHardening || !g.linkHardened[e]) members.push(formatElement(reportElement(g, 'link', e)));
  }
  const list =
    members.length > 1
      ? `${members.slice(0, -1).join(', ')} and ${members[members.length - 1]}`
      : (members[0] ?? 'no link');
  return `shared-risk group ${formatElement(reportElement(g, 'group', k))}, which carries ${list},`;
}

/** Whether head element `h` is marked hardened by this change (not hardened at base, or new there). */
function newlyHardened(flags: Uint8Array, baseFlags: Uint8Array, toBase: Int32Array, h: number): boolean {
  if (!flags[h]) return false;
  const b = toBase[h];
  return b < 0 || !baseFlags[b];
}

export function judgeSpof(
  r: SpofRequirement,
  description: string,
  head: DesignSide,
  base: DesignSide | undefined,
  matching: Matching | undefined,
): { rows: RequirementResult[]; findings: Finding[] } {
  const g = head.graph;
  const now = weakPoints(g, true);
  const before = base ? weakPoints(base.graph, true) : undefined;
  // One row per kind of weak point: a count of bridges and a count of cut nodes are never added.
  const parts = spofRowParts(r);
  const sizeOf = (s: WeakPoints, kind: SpofPart) =>
    kind === 'bridges' ? s.bridges.size : kind === 'cut-nodes' ? s.cutNodes.size : s.groups.size;
  const rows: RequirementResult[] = parts.map((part) => ({
    id: part.id,
    description: part.description,
    severity: r.severity,
    base: before ? sizeOf(before, part.kind) : null,
    head: sizeOf(now, part.kind),
    delta: before ? sizeOf(now, part.kind) - sizeOf(before, part.kind) : null,
    se: before ? 0 : null,
    threshold: null,
    status: 'holds',
    subject: { kind: 'no-new-spof', higherIsBetter: false },
  }));
  const findings: Finding[] = [];
  if (!base || !before || !matching) return { rows, findings };
  const b = base.graph;
  const isNew = (set: Set<number>, toBase: Int32Array, h: number, baseSet: Set<number>) => {
    const k = toBase[h];
    return set.has(h) && (k < 0 || !baseSet.has(k));
  };
  const intact = findComponents(g);
  let costed = 0;
  const cost = (remove: (m: Mask) => void) => (costed++ < MAX_COSTED ? costOf(g, remove, intact) : undefined);
  const linkCost = (e: number) => cost((m) => (m.link[e] = 1));
  const nodeCost = (v: number) => cost((m) => (m.node[v] = 1));
  const groupCost = (k: number, honour: boolean) => cost((m) => void groupLinkMask(g, k, honour, m));

  if (r.bridges) {
    for (const e of linksByLine(g, now.bridges)) {
      if (!isNew(now.bridges, matching.linkToBase, e, before.bridges)) continue;
      const message = `${linkWords(g, e)} is a new bridge: losing it splits the design, which the base did not`;
      findings.push(finding('new-bridge', r.severity, message, reportElement(g, 'link', e), r.id, linkCost(e)));
    }
  }
  if (r.cutNodes) {
    for (const v of nodesByLine(g, now.cutNodes)) {
      if (!isNew(now.cutNodes, matching.nodeToBase, v, before.cutNodes)) continue;
      const el = reportElement(g, 'node', v);
      const message = `site ${formatElement(el)} is a new cut node: losing it splits the design, which the base did not`;
      findings.push(finding('new-cut-node', r.severity, message, el, r.id, nodeCost(v)));
    }
  }
  if (r.riskGroups) {
    for (const k of [...now.groups].sort((x, y) => x - y)) {
      if (!isNew(now.groups, matching.groupToBase, k, before.groups)) continue;
      const message = `${groupWords(g, k, true)} is a new single point of failure: losing it cuts sites off, which the base did not`;
      findings.push(
        finding('new-stranding-group', r.severity, message, reportElement(g, 'group', k), r.id, groupCost(k, true)),
      );
    }
  }

  // Weak points that only the head's new hardened flags hide.
  if (r.hardenedWeakPoints !== 'ignore') {
    const severity = r.hardenedWeakPoints;
    const raw = weakPoints(g, false);
    const rawBefore = weakPoints(b, false);
    const claim =
      'the change marks it hardened, so netbrace does not count it; hardening is a claim netbrace cannot verify';
    if (r.bridges) {
      for (const e of linksByLine(g, raw.bridges)) {
        if (now.bridges.has(e) || !isNew(raw.bridges, matching.linkToBase, e, rawBefore.bridges)) continue;
        if (!newlyHardened(g.linkHardened, b.linkHardened, matching.linkToBase, e)) continue;
        const message = `${linkWords(g, e)} would be a new bridge (losing it splits the design), but ${claim}`;
        findings.push(
          finding('hardened-weak-point', severity, message, reportElement(g, 'link', e), r.id, linkCost(e)),
        );
      }
    }
    if (r.cutNodes) {
      for (const v of nodesByLine(g, raw.cutNodes)) {
        if (now.cutNodes.has(v) || !isNew(raw.cutNodes, matching.nodeToBase, v, rawBefore.cutNodes)) continue;
        if (!newlyHardened(g.nodeHardened, b.nodeHardened, matching.nodeToBase, v)) continue;
        const el = reportElement(g, 'node', v);
        const message = `site ${formatElement(el)} would be a new cut node (losing it splits the design), but ${claim}`;
        findings.push(finding('hardened-weak-point', severity, message, el, r.id, nodeCost(v)));
      }
    }
    if (r.riskGroups) {
      for (const k of [...raw.groups].sort((x, y) => x - y)) {
        if (now.groups.has(k) || !isNew(raw.groups, matching.groupToBase, k, rawBefore.groups)) continue;
        let hidden = false;
        for (let p = g.groupOffsets[k]; p < g.groupOffsets[k + 1]; p++) {
          if (newlyHardened(g.linkHardened, b.linkHardened, matching.linkToBase, g.groupLinks[p])) hidden = true;
        }
        if (!hidden) continue;
        const message = `${groupWords(g, k, false)} would cut sites off if lost, but the change marks links of it hardened, so netbrace does not count it; hardening is a claim netbrace cannot verify`;
        findings.push(
          finding('hardened-weak-point', severity, message, reportElement(g, 'group', k), r.id, groupCost(k, false)),
        );
      }
    }
  }
  if (costed > MAX_COSTED) {
    findings.push({
      rule: 'degraded',
      severity: 'notice',
      message: `${description}: what losing them costs is given for the first ${MAX_COSTED} of ${costed} weak points only (work limit)`,
      elements: [],
      line: 0,
      requirement: r.id,
    });
  }
  // Each finding marks the row of its kind. Hidden weak points cannot be judged (the claim is
  // unchecked): unsettled, unless the policy fails them.
  const partOf = (x: Finding): SpofPart =>
    x.rule === 'new-bridge'
      ? 'bridges'
      : x.rule === 'new-cut-node'
        ? 'cut-nodes'
        : x.rule === 'new-stranding-group'
          ? 'risk-groups'
          : x.elements[0]?.kind === 'link'
            ? 'bridges'
            : x.elements[0]?.kind === 'node'
              ? 'cut-nodes'
              : 'risk-groups';
  parts.forEach((part, i) => {
    const mine = findings.filter((x) => x.rule !== 'degraded' && partOf(x) === part.kind);
    const weakHere = mine.some((x) => x.rule !== 'hardened-weak-point');
    if (weakHere || (mine.length > 0 && r.hardenedWeakPoints === 'fail')) rows[i].status = 'weakened';
    else if (mine.length > 0) rows[i].status = 'unsettled';
  });
  for (const x of findings) {
    const i = parts.findIndex((p) => p.kind === partOf(x));
    if (x.rule !== 'degraded' && i >= 0 && parts.length > 1) x.requirement = parts[i].id;
  }
  return { rows, findings };
}
