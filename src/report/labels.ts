// Words and numbers shared by the human views (terminal, HTML): how a challenge, a status or
// a number is written, and where an element's line is found. Pure; no colour, no markup.

import type { ChallengeName } from '../challenges/types.js';
import type { ElementKind } from '../graph/element.js';
import type {
  AttributeChange,
  Consequence,
  FileReport,
  FileStatus,
  Finding,
  ReportElement,
  Report,
  RequirementResult,
} from './report.js';
import { FILE_STATUS_WORD, JUDGED_TITLE } from './vocabulary.js';
import { formatDelta, formatValue } from './format.js';
import { plainSentence, policyChangeSentence } from './story.js';

// The shared words and numbers live in vocabulary.ts and format.ts; re-exported for the views.
export { formatDelta, formatError, formatValue, shortRevision } from './format.js';
export { REQUIREMENT_STATUS_WORD, fileFails, fileWarns } from './vocabulary.js';
export const STATUS_WORD = FILE_STATUS_WORD;

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

/** Whether a requirement counts things (bridges, cut nodes): shown as whole numbers. */
export function isCountRequirement(r: RequirementResult): boolean {
  const vals = [r.base, r.head, r.delta, r.threshold].filter((v): v is number => v !== null);
  return (
    r.se === 0 && vals.every(Number.isInteger) && (/spof|bridge|cut/.test(r.id) || vals.some((v) => Math.abs(v) > 1))
  );
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

export function formatFraction(x: number): string {
  return `${Math.round(x * 1000) / 10} %`;
}

/** A file's status in words; an error whose R cannot be computed is not "could not be read". */
export function fileStatusWord(f: FileReport): string {
  if (
    f.status === 'unreadable' &&
    !f.findings.some((x) => x.rule === 'parse-error') &&
    f.findings.some((x) => x.rule === 'not-computable')
  )
    return 'could not be evaluated';
  return STATUS_WORD[f.status];
}

/** "2 pass, 1 could not be read": the report's counts in words, errors told apart by fileStatusWord. */
export function statusCounts(r: { counts: Record<FileStatus, number>; files: FileReport[] }): string[] {
  const out: string[] = [];
  for (const [k, n] of Object.entries(r.counts) as [FileStatus, number][]) {
    if (n <= 0) continue;
    if (k !== 'unreadable') {
      out.push(`${n} ${STATUS_WORD[k]}`);
      continue;
    }
    const evaluated = r.files.filter(
      (f) => f.status === 'unreadable' && fileStatusWord(f) !== STATUS_WORD.unreadable,
    ).length;
    if (n - evaluated > 0) out.push(`${n - evaluated} ${STATUS_WORD.unreadable}`);
    if (evaluated > 0) out.push(`${evaluated} could not be evaluated`);
  }
  return out;
}

/** "regional (no site has coordinates (lat/lon))": the challenges that do not apply to a side. */
export function describeNotApplicable(
  ev: { notApplicable?: { challenge: ChallengeName; reason: string }[] } | undefined,
): string | undefined {
  const list = ev?.notApplicable ?? [];
  if (!list.length) return undefined;
  return list.map((x) => `${challengeLabel(x.challenge)} (${x.reason})`).join('; ');
}

/**
 * id → element (line, label) for every element the file's report names: findings first, then
 * structure, sequences and what they strand, then the change list. Keyed by kind and id.
 */
export function knownElements(f: FileReport): Map<string, ReportElement> {
  const known = new Map<string, ReportElement>();
  const add = (e: ReportElement) => {
    const key = `${e.kind}\u0000${e.id}`;
    if (e.line > 0 && !known.has(key)) known.set(key, e);
  };
  for (const finding of f.findings) {
    finding.elements.forEach(add);
    finding.consequence?.stranded.forEach(add);
  }
  for (const side of [f.head, f.base]) {
    if (!side) continue;
    side.structure.bridges.forEach(add);
    side.structure.cutNodes.forEach(add);
    for (const env of side.envelopes) {
      for (const seq of [...env.weakest, ...(env.worstCase ? [env.worstCase] : [])]) {
        seq.located?.forEach(add);
        seq.consequence?.stranded.forEach(add);
      }
    }
  }
  f.changes?.added.forEach(add);
  return known;
}

/** The element of this kind and id as the report names it, else the bare id (line 0). */
export function knownElement(
  known: ReadonlyMap<string, ReportElement>,
  kind: ReportElement['kind'],
  id: string,
): ReportElement {
  return known.get(`${kind}\u0000${id}`) ?? { id, kind, line: 0 };
}

/** How a view writes the parts of an element's name: ids (code), labels (text), the space that keeps "line 14" together. */
export interface ElementStyle {
  id?: (id: string) => string;
  text?: (label: string) => string;
  /** The parenthesised part, "(node 8, line 93)", whole (for muted styling). */
  meta?: (part: string) => string;
  space?: string;
}

/**
 * The one way an element is named in every view and message: "Bratislava (node 8, line 93)"
 * for a site with a label, "kaskeld (line 14)" without one, the bare id when the line is unknown.
 */
export function formatElement(
  e: Pick<ReportElement, 'id' | 'kind' | 'line' | 'label'>,
  style: ElementStyle = {},
): string {
  const id = style.id ?? ((x: string) => x);
  const text = style.text ?? ((x: string) => x);
  const sp = style.space ?? ' ';
  const meta = style.meta ?? ((x: string) => x);
  const line = e.line > 0 ? `line${sp}${e.line}` : '';
  if (e.label) return `${text(e.label)}${sp}${meta(`(${e.kind}${sp}${id(e.id)}${line ? `, ${line}` : ''})`)}`;
  return line ? `${id(e.id)}${sp}${meta(`(${line})`)}` : id(e.id);
}

/** A number of the design's own unit (volumes): up to six significant digits, no exponent for everyday sizes. */
function amount(x: number): string {
  return String(Number(x.toPrecision(6)));
}

/** Most stranded sites a sentence names before "and N more". */
const NAMED_STRANDED = 3;

/**
 * What a loss costs, in one short sentence: "Losing it cuts off Saltmere (node 0, line 6) from
 * the largest part; 1 of 3 demands (volume 10 of 17) loses every path." `subject` is who does
 * it ("Losing it", "These removals"; empty for a clause that follows an element's name).
 */
export function consequenceSentence(c: Consequence, subject = 'Losing it', style: ElementStyle = {}): string {
  const plural = / removals$/.test(subject);
  const verb = (one: string, many: string) => (plural ? many : one);
  const named = c.stranded.slice(0, NAMED_STRANDED).map((e) => formatElement(e, style));
  const more = c.strandedCount - named.length;
  let what: string;
  if (c.strandedCount === 0) what = `${verb('cuts', 'cut')} no surviving site off from the largest part`;
  else {
    const list =
      more > 0
        ? `${named.join(', ')} and ${more} more (${c.strandedCount} sites)`
        : named.length > 1
          ? `${named.slice(0, -1).join(', ')} and ${named[named.length - 1]}`
          : named[0];
    what = `${verb('cuts', 'cut')} off ${list} from the largest part`;
  }
  let demands = '';
  if (c.demandsTotal !== undefined && c.demandsLost !== undefined) {
    const total = `${c.demandsTotal} demand${c.demandsTotal === 1 ? '' : 's'}`;
    demands =
      c.demandsLost === 0
        ? `; every demand keeps a path`
        : `; ${c.demandsLost} of ${total} (volume ${amount(c.volumeLost ?? 0)} of ${amount(c.volumeTotal ?? 0)}) ${c.demandsLost === 1 ? 'loses' : 'lose'} every path`;
  }
  return `${subject ? `${subject} ` : ''}${what}${demands}.`;
}

export interface NamedSequence {
  /** "Worst case found under random site failures (exact search, 3 sites)". */
  title: string;
  ids: string[];
  /** The elements with their lines and labels, in order. */
  elements: ReportElement[];
  /** R after each step, when known. */
  values?: number[];
  /** What the whole sequence costs, when the report says. */
  consequence?: Consequence;
}

/**
 * The sequences a planner acts on, in this order and without repeats: each envelope's worst
 * case, the gate's weakest-sequence findings, then each envelope's weakest realization. Every
 * element carries its line (from the sequence itself, else from what the report names).
 */
export function weakestSequences(f: FileReport): NamedSequence[] {
  const seen = new Set<string>();
  const out: NamedSequence[] = [];
  const known = knownElements(f);
  const add = (
    title: string,
    seq: {
      kind: ReportElement['kind'];
      elements: string[];
      values?: number[];
      located?: ReportElement[];
      consequence?: Consequence;
    },
  ) => {
    const ids = seq.elements;
    const key = ids.join('\u0000');
    if (!ids.length || seen.has(key)) return;
    seen.add(key);
    const elements = ids.map((id, i) => seq.located?.[i] ?? knownElement(known, seq.kind, id));
    const named: NamedSequence = { title, ids, elements };
    if (seq.values && seq.values.length) named.values = seq.values;
    if (seq.consequence) named.consequence = seq.consequence;
    out.push(named);
  };
  for (const env of f.head?.envelopes ?? []) {
    const wc = env.worstCase;
    if (wc)
      add(
        `Worst case found under ${challengeLabel(env.challenge)} (${wc.method} search, ${wc.k} ${wc.k === 1 ? kindSingular(wc.kind) : kindPlural(wc.kind)})`,
        wc,
      );
  }
  for (const x of f.findings) {
    if (x.rule !== 'weakest-sequence') continue;
    add(x.message, {
      kind: x.elements[0]?.kind ?? 'node',
      elements: x.elements.map((e) => e.id),
      located: x.elements,
      ...(x.consequence ? { consequence: x.consequence } : {}),
    });
  }
  for (const env of f.head?.envelopes ?? []) {
    const w = env.weakest[0];
    if (w)
      add(
        `Weakest realization${w.realization !== undefined ? ` #${w.realization}` : ''} under ${challengeLabel(env.challenge)}`,
        w,
      );
  }
  return out;
}

/**
 * How a finding is titled, from its rule and what the judging found: a drop within the
 * allowance is not "weakened", a floor that was not settled is not "short". `names` gives
 * the view's word for each rule when the finding is what the rule is about.
 */
export function findingTitle(x: Finding, names: Readonly<Record<Finding['rule'], string>>): string {
  const subject = SUBJECT[x.rule as keyof typeof SUBJECT];
  const kind = x.rule === 'n-1' ? n1Kind(x) : undefined;
  switch (x.status) {
    case 'within-allowance':
    case 'inside-error':
      return JUDGED_TITLE[x.status];
    case 'unsettled':
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
  const kind = x.requirement?.endsWith(':node')
    ? 'node'
    : x.requirement?.endsWith(':link')
      ? 'link'
      : x.elements[0]?.kind;
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

/** "+1 site (saltmarrow, line 83), +2 links (…); −2 links (…); node a renamed b; now hardened: …": what the change did. */
export function describeChanges(f: FileReport, max = 4): string | undefined {
  const ch = f.changes;
  const renamed = ch?.renamed ?? [];
  const hardened = ch?.hardened ?? [];
  if (!ch || (ch.added.length === 0 && ch.removed.length === 0 && renamed.length === 0 && hardened.length === 0))
    return undefined;
  const cut = <T>(l: readonly T[]) => l.slice(0, max);
  const tail = (n: number) => (n > max ? `; \u2026 ${n - max} more` : '');
  const part = (sign: string, list: typeof ch.added, side: string) => {
    const byKind = (['node', 'link', 'group'] as const)
      .map((k) => list.filter((e) => e.kind === k))
      .filter((l) => l.length);
    return byKind.map((l) => {
      const n = l.length;
      const noun = n === 1 ? kindSingular(l[0].kind) : kindPlural(l[0].kind);
      const names = cut(l)
        .map((e) => (e.label ? `${e.label}, ${e.id}, ${side}line ${e.line}` : `${e.id}, ${side}line ${e.line}`))
        .join('; ');
      return `${sign}${n} ${noun} (${names}${tail(n)})`;
    });
  };
  const words = [...part('+', ch.added, ''), ...part('\u2212', ch.removed, 'base ')];
  for (const r of cut(renamed)) words.push(`${r.from.kind} ${r.from.id} renamed ${r.to.id} (line ${r.to.line})`);
  if (renamed.length > max) words.push(`\u2026 ${renamed.length - max} more renamed`);
  for (const [flag, word] of [
    [true, 'now hardened'],
    [false, 'no longer hardened'],
  ] as const) {
    const l = hardened.filter((e) => e.hardened === flag);
    if (l.length)
      words.push(
        `${word}: ${cut(l)
          .map((e) => formatElement(e))
          .join(', ')}${l.length > max ? `, \u2026 ${l.length - max} more` : ''}`,
      );
  }
  return words.join(', ');
}

/** A finding, or several new-bridge / new-cut-node / hardened-weak-point findings of one severity merged into one (`members` keeps them). */
export type GroupedFinding = Finding & { grouped?: boolean; members?: Finding[] };

const SEVERITY_ORDER = { fail: 0, warn: 1, notice: 2 } as const;

/** Findings in reading order: failures, then warnings, then notices (stable within each). */
export function bySeverity<T extends Finding>(findings: readonly T[]): T[] {
  return [...findings].sort((a, b) => SEVERITY_ORDER[a.severity] - SEVERITY_ORDER[b.severity]);
}

const GROUPABLE = new Set<Finding['rule']>(['new-bridge', 'new-cut-node', 'hardened-weak-point']);

/** New bridges and cut nodes (and weak points hidden by hardening) of one severity read best as one list: merge their findings. */
export function groupFindings(findings: readonly Finding[]): GroupedFinding[] {
  const out: GroupedFinding[] = [];
  for (const x of findings) {
    const groupable = GROUPABLE.has(x.rule) && x.elements.length === 1;
    const prev = out[out.length - 1];
    if (
      groupable &&
      prev &&
      prev.rule === x.rule &&
      prev.severity === x.severity &&
      prev.elements.length >= 1 &&
      prev.grouped
    ) {
      prev.elements.push(...x.elements);
      prev.members!.push(x);
      continue;
    }
    out.push(groupable ? { ...x, elements: [...x.elements], grouped: true, members: [x] } : x);
  }
  for (const x of out) {
    if (!x.grouped || x.elements.length < 2) continue;
    const what =
      x.rule === 'new-bridge'
        ? 'new bridges (links whose loss alone splits the design)'
        : x.rule === 'new-cut-node'
          ? 'new cut nodes (sites whose loss alone splits the design)'
          : 'new weak points hidden by hardening (the change marks them hardened; hardening is a claim netbrace cannot verify)';
    x.message = `${x.elements.length} ${what}: ${x.elements.map((e) => formatElement(e, { space: '\u00a0' })).join(', ')}`;
    delete x.consequence;
  }
  return out;
}

/**
 * The change edits the gate's own configuration: one sentence per setting of the workflow that
 * runs netbrace, and one for the policy files; shown at the top of every view.
 */
export function configurationNotes(r: Report): { text: string; weakens: boolean; file: string; line: number }[] {
  const out: { text: string; weakens: boolean; file: string; line: number }[] = [];
  const c = r.configuration;
  if (c) {
    for (const x of c.changes) {
      const tail = x.weakens ? '; it would weaken the check, so the base\u2019s setting applies and this fails' : '';
      out.push({
        text: `this change edits the workflow that runs netbrace (${c.workflow}, line ${x.line}): ${x.message}${tail}`,
        weakens: x.weakens,
        file: c.workflow,
        line: x.line,
      });
    }
  }
  const policy = policyChangeSentence(r);
  if (policy && r.policy.path) {
    // One sentence (story.ts), on the first line the head's policy changes, else its first line.
    const path = r.policy.path;
    const first = r.policy.changes?.find((c) => c.line > 0 && c.file === path);
    out.push({ text: plainSentence(policy).replace(/\.$/, ''), weakens: false, file: path, line: first?.line ?? 1 });
  }
  return out;
}
