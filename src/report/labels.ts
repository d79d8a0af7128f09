// Words and numbers shared by the human views (terminal, HTML): how a challenge, a status or
// a number is written, and where an element's line is found. Pure; no colour, no markup.

import type { ChallengeName, ElementKind } from '../envelope/types.js';
import type { AttributeChange, FileReport, FileStatus, Finding, RequirementResult } from './report.js';


const CHALLENGE_LABEL: Record<ChallengeName, string> = {
  'random-nodes': 'random site failures',
  'random-links': 'random link failures',
  degree: 'degree attack',
  'degree-adaptive': 'adaptive degree attack',
  betweenness: 'betweenness attack',
  'betweenness-adaptive': 'adaptive betweenness attack',
  eigenvector: 'eigenvector attack',
  closeness: 'closeness attack',
  'link-betweenness': 'link betweenness attack',
  'link-betweenness-adaptive': 'adaptive link betweenness attack',
  'risk-groups': 'random shared-risk group failures',
  'risk-groups-worst': 'worst-first shared-risk groups',
  regional: 'regional outages',
  'n-1': 'single element loss (N\u22121)',
  'n-2': 'double element loss (N\u22122)',
};

export function challengeLabel(c: ChallengeName): string {
  return CHALLENGE_LABEL[c] ?? c;
}

const KIND_PLURAL: Record<ElementKind, string> = { node: 'sites', link: 'links', group: 'shared-risk groups' };

export function kindPlural(k: ElementKind): string {
  return KIND_PLURAL[k] ?? k;
}

export function kindSingular(k: ElementKind): string {
  return k === 'node' ? 'site' : k === 'group' ? 'shared-risk group' : 'link';
}

/** The x-axis caption of an envelope chart. */
export function xAxisLabel(kind: ElementKind, xUnit: 'fraction' | 'km'): string {
  return xUnit === 'km' ? 'outage radius (km)' : `fraction of ${kindPlural(kind)} removed`;
}

/** A value of R or a metric: three decimals, a real minus sign, "–" when absent. */
export function formatValue(v: number | null | undefined): string {
  if (v === null || v === undefined || Number.isNaN(v)) return '\u2013';
  return minus(v.toFixed(3));
}

/** Whether a requirement counts things (bridges, cut nodes): shown as whole numbers. */
export function isCountRequirement(r: RequirementResult): boolean {
  const vals = [r.base, r.head, r.delta, r.threshold].filter((v): v is number => v !== null);
  return r.se === 0 && vals.every(Number.isInteger) && (/spof|bridge|cut/.test(r.id) || vals.some((v) => Math.abs(v) > 1));
}

/** A requirement's value: whole numbers for counts, else as formatValue. */
export function formatRequirementValue(r: RequirementResult, v: number | null): string {
  return v !== null && isCountRequirement(r) ? String(v) : formatValue(v);
}

/** A requirement's delta: signed whole numbers for counts, else as formatDelta. */
export function formatRequirementDelta(r: RequirementResult): string {
  if (r.delta === null || !isCountRequirement(r)) return formatDelta(r.delta);
  return r.delta > 0 ? `+${r.delta}` : r.delta < 0 ? `\u2212${-r.delta}` : '0';
}

/** A signed delta: "+0.012", "\u22120.040", "0.000" for an exact zero (never "\u22120.000"). */
export function formatDelta(v: number | null | undefined): string {
  if (v === null || v === undefined || Number.isNaN(v)) return '\u2013';
  const text = Math.abs(v).toFixed(3);
  if (Number(text) === 0) return '0.000';
  return (v > 0 ? '+' : '\u2212') + text;
}

/** "\u00b1 0.004" for a Monte Carlo error; empty for deterministic values (se 0) and absent ones. */
export function formatError(se: number | null | undefined): string {
  if (se === null || se === undefined || Number.isNaN(se) || se === 0) return '';
  return `\u00b1 ${se < 0.0005 ? '<0.001' : se.toFixed(3)}`;
}

export function formatFraction(x: number): string {
  return `${Math.round(x * 1000) / 10} %`;
}

function minus(text: string): string {
  return text.startsWith('-') ? `\u2212${text.slice(1)}` : text;
}

export const STATUS_WORD: Record<FileStatus, string> = {
  pass: 'pass',
  regressed: 'regressed',
  'below-threshold': 'below threshold',
  new: 'new design',
  removed: 'removed',
  renamed: 'renamed',
  error: 'could not be read',
};

export const REQUIREMENT_STATUS_WORD: Record<RequirementResult['status'], string> = {
  met: 'met',
  missed: 'missed',
  regressed: 'regressed',
  'within-noise': 'within noise',
  uncertain: 'uncertain',
  'not-applicable': 'not applicable',
};

/** A file's status in words; an error whose R cannot be computed is not "could not be read". */
export function fileStatusWord(f: FileReport): string {
  if (f.status === 'error' && !f.findings.some((x) => x.rule === 'parse-error') && f.findings.some((x) => x.rule === 'not-computable')) return 'could not be evaluated';
  return STATUS_WORD[f.status];
}

/** "2 pass, 1 could not be read": the report's counts in words, errors told apart by fileStatusWord. */
export function statusCounts(r: { counts: Record<FileStatus, number>; files: FileReport[] }): string[] {
  const out: string[] = [];
  for (const [k, n] of Object.entries(r.counts) as [FileStatus, number][]) {
    if (n <= 0) continue;
    if (k !== 'error') {
      out.push(`${n} ${STATUS_WORD[k]}`);
      continue;
    }
    const evaluated = r.files.filter((f) => f.status === 'error' && fileStatusWord(f) !== STATUS_WORD.error).length;
    if (n - evaluated > 0) out.push(`${n - evaluated} ${STATUS_WORD.error}`);
    if (evaluated > 0) out.push(`${evaluated} could not be evaluated`);
  }
  return out;
}

/** "regional (no site has coordinates (lat/lon))": the challenges that do not apply to a side. */
export function describeNotApplicable(ev: { notApplicable?: { challenge: ChallengeName; reason: string }[] } | undefined): string | undefined {
  const list = ev?.notApplicable ?? [];
  if (!list.length) return undefined;
  return list.map((x) => `${challengeLabel(x.challenge)} (${x.reason})`).join('; ');
}

/** Whether a file, on its own, fails the gate: any fail-severity finding, or an error. */
export function fileFails(f: FileReport): boolean {
  return f.status === 'error' || f.findings.some((x) => x.severity === 'fail');
}

/** Whether a file has warnings (and no failure). */
export function fileWarns(f: FileReport): boolean {
  return !fileFails(f) && f.findings.some((x) => x.severity === 'warn');
}

/** id → line for every element the file's report names (findings first, then structure). */
export function elementLines(f: FileReport): Map<string, number> {
  const lines = new Map<string, number>();
  const add = (id: string, line: number) => {
    if (line > 0 && !lines.has(id)) lines.set(id, line);
  };
  for (const finding of f.findings) for (const e of finding.elements) add(e.id, e.line);
  for (const side of [f.head, f.base]) {
    if (!side) continue;
    for (const e of side.structure.bridges) add(e.id, e.line);
    for (const e of side.structure.cutNodes) add(e.id, e.line);
  }
  return lines;
}

/** "kaskeld (line 14)", or the bare id when its line is unknown. */
export function elementWithLine(id: string, lines: ReadonlyMap<string, number>): string {
  const line = lines.get(id);
  return line ? `${id}\u00a0(line\u00a0${line})` : id;
}

export interface NamedSequence {
  /** "Worst case found under random site failures (exact search, 3 sites)". */
  title: string;
  ids: string[];
  /** R after each step, when known. */
  values?: number[];
}

/**
 * The sequences a planner acts on, in this order and without repeats: each envelope's worst
 * case, the gate's weakest-sequence findings, then each envelope's weakest realization.
 */
export function weakestSequences(f: FileReport): NamedSequence[] {
  const seen = new Set<string>();
  const out: NamedSequence[] = [];
  const add = (title: string, ids: string[], values?: number[]) => {
    const key = ids.join('\u0000');
    if (!ids.length || seen.has(key)) return;
    seen.add(key);
    out.push(values && values.length ? { title, ids, values } : { title, ids });
  };
  for (const env of f.head?.envelopes ?? []) {
    const wc = env.worstCase;
    if (wc) add(`Worst case found under ${challengeLabel(env.challenge)} (${wc.method} search, ${wc.k} ${wc.k === 1 ? kindSingular(wc.kind) : kindPlural(wc.kind)})`, wc.elements, wc.values);
  }
  for (const x of f.findings) if (x.rule === 'weakest-sequence') add(x.message, x.elements.map((e) => e.id));
  for (const env of f.head?.envelopes ?? []) {
    const w = env.weakest[0];
    if (w) add(`Weakest realization${w.realization !== undefined ? ` #${w.realization}` : ''} under ${challengeLabel(env.challenge)}`, w.elements, w.values);
  }
  return out;
}

/**
 * How a finding is titled, from its rule and what the judging found: a drop within the
 * allowance is not "regressed", a floor that was not settled is not "missed". `names` gives
 * the view's word for each rule when the finding is what the rule is about.
 */
export function findingTitle(x: Finding, names: Readonly<Record<Finding['rule'], string>>): string {
  const subject = SUBJECT[x.rule as keyof typeof SUBJECT];
  const kind = x.rule === 'n-1' ? n1Kind(x) : undefined;
  switch (x.status) {
    case 'within-allowance':
      return 'robustness dropped within the allowance';
    case 'within-noise':
      return 'change within Monte Carlo noise';
    case 'uncertain':
      return x.rule === 'regression' ? 'change could not be judged' : `${subject ?? x.rule}${kind ?? ''} not settled`;
    case 'reduced-work':
      return `${subject ?? x.rule}${kind ?? ''} judged on reduced work`;
    case 'not-computable':
      return names['not-computable'];
    default:
      // Reports written before findings carried a status: a notice regression is not a regression.
      if (x.status === undefined && x.rule === 'regression' && x.severity === 'notice') return 'robustness changed';
      if (kind !== undefined) return names[x.rule].replace('N\u22121', `N\u22121${kind}`);
      return names[x.rule] ?? x.rule;
  }
}

const SUBJECT = {
  'r-threshold': 'r-threshold',
  'area-floor': 'envelope area floor',
  'spread-ceiling': 'envelope spread ceiling',
  'n-1': 'N\u22121 rule',
} as const;

/** " (links)" or " (sites)" for an N−1 finding, from its requirement id or its elements. */
function n1Kind(x: Finding): string | undefined {
  const kind = x.requirement?.endsWith(':node') ? 'node' : x.requirement?.endsWith(':link') ? 'link' : x.elements[0]?.kind;
  return kind === 'node' || kind === 'link' ? ` (${kindPlural(kind)})` : undefined;
}

/** "N−1 (links)", "N−2 (sites)": a contingency table's name with the element kind it removes. */
export function contingencyLabel(challenge: ChallengeName, kind: ElementKind): string {
  return `${challenge === 'n-2' ? 'N\u22122' : 'N\u22121'} (${kindPlural(kind)})`;
}

/** "link a—b: length 24 km → 30 km (base line 12, head line 13)": one attribute the change altered. */
export function describeModification(c: AttributeChange): string {
  const lines = c.baseLine === c.headLine ? `line ${c.headLine}` : `base line ${c.baseLine}, head line ${c.headLine}`;
  return `${kindSingular(c.kind)} ${c.id}: ${c.attribute} ${c.before} \u2192 ${c.after} (${lines})`;
}

/** Every attribute change of a file, one line each, at most `max` and a "… N more" line. */
export function describeModifications(f: FileReport, max = 20): string[] {
  const list = f.changes?.modified ?? [];
  const out = list.slice(0, max).map(describeModification);
  if (list.length > max) out.push(`\u2026 ${list.length - max} more attribute changes in the JSON report`);
  return out;
}

/** "+1 site (saltmarrow, line 83), +2 links (…); −2 links (…)": what the change added and removed. */
export function describeChanges(f: FileReport, max = 4): string | undefined {
  const ch = f.changes;
  if (!ch || (ch.added.length === 0 && ch.removed.length === 0)) return undefined;
  const part = (sign: string, list: typeof ch.added, side: string) => {
    const byKind = (['node', 'link', 'group'] as const).map((k) => list.filter((e) => e.kind === k)).filter((l) => l.length);
    return byKind.map((l) => {
      const n = l.length;
      const noun = n === 1 ? kindSingular(l[0].kind) : kindPlural(l[0].kind);
      const names = l.slice(0, max).map((e) => `${e.id}, ${side}line ${e.line}`).join('; ');
      return `${sign}${n} ${noun} (${names}${n > max ? `; \u2026 ${n - max} more` : ''})`;
    });
  };
  return [...part('+', ch.added, ''), ...part('\u2212', ch.removed, 'base ')].join(', ');
}

/** A finding, or several new-bridge / new-cut-node findings of one severity merged into one. */
export type GroupedFinding = Finding & { grouped?: boolean };

const SEVERITY_ORDER = { fail: 0, warn: 1, notice: 2 } as const;

/** Findings in reading order: failures, then warnings, then notices (stable within each). */
export function bySeverity<T extends Finding>(findings: readonly T[]): T[] {
  return [...findings].sort((a, b) => SEVERITY_ORDER[a.severity] - SEVERITY_ORDER[b.severity]);
}

/** New bridges and cut nodes of one severity read best as one list: merge their findings. */
export function groupFindings(findings: readonly Finding[]): GroupedFinding[] {
  const out: GroupedFinding[] = [];
  for (const x of findings) {
    const groupable = (x.rule === 'new-bridge' || x.rule === 'new-cut-node') && x.elements.length === 1;
    const prev = out[out.length - 1];
    if (groupable && prev && prev.rule === x.rule && prev.severity === x.severity && prev.elements.length >= 1 && (prev as GroupedFinding).grouped) {
      prev.elements.push(...x.elements);
      continue;
    }
    out.push(groupable ? ({ ...x, elements: [...x.elements], grouped: true } as GroupedFinding) : x);
  }
  for (const x of out as GroupedFinding[]) {
    if (!x.grouped || x.elements.length < 2) continue;
    const what = x.rule === 'new-bridge' ? 'new bridges (links whose loss alone splits the design)' : 'new cut nodes (sites whose loss alone splits the design)';
    x.message = `${x.elements.length} ${what}: ${x.elements.map((e) => `${e.id}\u00a0(line\u00a0${e.line})`).join(', ')}`;
  }
  return out;
}



/** A revision for display: a full commit id shortened to 12 hex digits, anything else as given. */
export function shortRevision(rev: string | undefined): string {
  if (rev === undefined) return '\u2013';
  return /^[0-9a-f]{40}([0-9a-f]{24})?$/.test(rev) ? rev.slice(0, 12) : rev;
}
