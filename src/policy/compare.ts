// What a proposed policy would judge differently from the one that judges the change: for
// each requirement (by id, so equal ids are the same floor) its floor or ceiling, severity and
// switches, requirements added or dropped, and the weakening and removed-design rules. The
// report states it in one sentence and annotates the lines. Scopes are compared through the
// requirements they resolve to only at the top level; a scope's own floors are not listed.
// Pure.

import type { PolicyChange } from '../report/report.js';
import type { Policy, RemovedSeverity, Requirement, Where } from './types.js';

const RANK: Record<RemovedSeverity, number> = { ignore: 0, notice: 1, warn: 2, fail: 3 };

/** `judging` → `proposed`: every difference that loosens or tightens, in the proposed file's order. */
export function policyChanges(judging: Policy, proposed: Policy): PolicyChange[] {
  const out: PolicyChange[] = [];
  const add = (
    subject: string,
    key: string,
    loosens: boolean,
    base: string | number | null,
    head: string | number | null,
    where: Where | undefined,
  ) =>
    out.push({
      subject,
      key,
      effect: loosens ? 'loosens' : 'tightens',
      base,
      head,
      file: where?.file ?? proposed.files[0] ?? '',
      line: where?.line ?? 0,
    });
  const before = new Map(judging.requirements.map((r) => [r.id, r]));
  const after = new Map(proposed.requirements.map((r) => [r.id, r]));
  for (const next of proposed.requirements) {
    const prev = before.get(next.id);
    if (!prev) {
      add(next.id, 'requirement', false, null, next.severity, next.where);
      continue;
    }
    if (prev.severity !== next.severity)
      add(next.id, 'severity', RANK[next.severity] < RANK[prev.severity], prev.severity, next.severity, next.where);
    compareValues(prev, next, add);
  }
  for (const prev of judging.requirements) {
    if (!after.has(prev.id))
      add(prev.id, 'requirement', true, prev.severity, null, {
        file: proposed.files[0] ?? prev.where.file,
        line: 0,
        column: 0,
      });
  }
  const a = judging.weakening;
  const b = proposed.weakening;
  const num = (key: string, x: number | undefined, y: number | undefined, field: keyof typeof b.fieldWhere) => {
    if (x === y) return;
    // An absent allowance allows nothing extra; a larger one (or error multiple) tolerates more.
    add('weakening', key, (y ?? 0) > (x ?? 0), x ?? null, y ?? null, b.fieldWhere[field] ?? b.where);
  };
  num('allowed-drop', a.allowedDrop, b.allowedDrop, 'allowedDrop');
  num('allowed-relative-drop', a.allowedRelativeDrop, b.allowedRelativeDrop, 'allowedRelativeDrop');
  num('error-multiple', a.errorMultiple, b.errorMultiple, 'errorMultiple');
  if (a.severity !== b.severity)
    add(
      'weakening',
      'severity',
      RANK[b.severity] < RANK[a.severity],
      a.severity,
      b.severity,
      b.fieldWhere.severity ?? b.where,
    );
  const ra = judging.removedDesigns;
  const rb = proposed.removedDesigns;
  if (ra.severity !== rb.severity)
    add('removed-designs', 'severity', RANK[rb.severity] < RANK[ra.severity], ra.severity, rb.severity, rb.where);
  return out;
}

type Add = (
  subject: string,
  key: string,
  loosens: boolean,
  base: string | number | null,
  head: string | number | null,
  where: Where | undefined,
) => void;

function compareValues(prev: Requirement, next: Requirement, add: Add): void {
  if (prev.kind === 'spread-ceiling' && next.kind === 'spread-ceiling') {
    if (prev.max !== next.max) add(next.id, 'max', next.max > prev.max, prev.max, next.max, next.valueWhere);
    return;
  }
  if (prev.kind === 'no-new-spof' && next.kind === 'no-new-spof') {
    for (const [key, x, y] of [
      ['bridges', prev.bridges, next.bridges],
      ['cut-nodes', prev.cutNodes, next.cutNodes],
      ['risk-groups', prev.riskGroups, next.riskGroups],
    ] as const) {
      if (x !== y) add(next.id, key, x && !y, x ? 'on' : 'off', y ? 'on' : 'off', next.where);
    }
    if (prev.hardenedWeakPoints !== next.hardenedWeakPoints) {
      add(
        next.id,
        'hardened-weak-points',
        RANK[next.hardenedWeakPoints] < RANK[prev.hardenedWeakPoints],
        prev.hardenedWeakPoints,
        next.hardenedWeakPoints,
        next.hardenedWhere ?? next.where,
      );
    }
    return;
  }
  const floor = (r: Requirement): number | undefined => ('min' in r ? (r.min as number | undefined) : undefined);
  const x = floor(prev);
  const y = floor(next);
  if (x === y) return;
  // A floor removed (a tracked value) or lowered loosens; one added or raised tightens.
  add(next.id, 'min', y === undefined || (x !== undefined && y < x), x ?? null, y ?? null, next.valueWhere);
}
