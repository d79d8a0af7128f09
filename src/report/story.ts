// What every view tells, in the order a reviewer and a planner read it: the verdict in one
// sentence of our own, the caution in one line, then per design what weakened (what losing an
// element costs, worst first), how much (one line per requirement) and the definitions of the
// words those lines use. View-neutral: sentences are lists of segments (plain text, code,
// element ids) so that each view escapes them its own way. Numbers are worded here from the
// report's data, never read back out of the gate's English messages. Pure.

import { formatDelta, formatError, formatFixed, formatValueAt } from './format.js';
import { rankFiles, SEVERITY_RANK } from './rank.js';
import type {
  Consequence,
  FileReport,
  Finding,
  PolicyChange,
  Report,
  ReportElement,
  RequirementResult,
  Severity,
} from './report.js';
import { FILE_STATUS_WORD, MARK, fileFails, fileWarns, judgedTitle, requirementMark } from './vocabulary.js';

/** text: our words or user text to escape; code: shown verbatim in monospace; id: an element's or requirement's id (monospace). */
export type SegmentKind = 'text' | 'code' | 'id';
export interface Segment {
  kind: SegmentKind;
  text: string;
  /** Text from a design or a message (a label, a reason): never merged with our words, so a view may set it apart. */
  user?: boolean;
}
export type Sentence = Segment[];

export const seg = {
  text: (text: string): Segment => ({ kind: 'text', text }),
  user: (text: string): Segment => ({ kind: 'text', text, user: true }),
  code: (text: string): Segment => ({ kind: 'code', text }),
  id: (text: string): Segment => ({ kind: 'id', text }),
};

/** A sentence as plain text (logs, annotations, SARIF): segments joined as they are. */
export function plainSentence(s: Sentence): string {
  return s.map((x) => x.text).join('');
}

/** Adjacent text segments merged, empty ones dropped: fewer, longer runs for views to escape. */
export function compact(s: Sentence): Sentence {
  const out: Sentence = [];
  for (const x of s) {
    if (x.text === '') continue;
    const last = out[out.length - 1];
    if (last && last.kind === 'text' && x.kind === 'text' && !last.user && !x.user) last.text += x.text;
    else out.push({ ...x });
  }
  return out;
}

/** The README section every definition links to (README.md, "Reading the report"). */
export const README_ANCHOR = 'reading-the-report';

/* ------------------------------------------------------------------ verdict and caution */

export interface VerdictStory {
  /** blocks: fails and blocks the merge; informs: fails, but inform mode does not block; part: one part of a split run (never blocks by itself); clear: nothing weakened. */
  tone: 'blocks' | 'informs' | 'part' | 'clear';
  mark: string;
  sentence: Sentence;
}

const FAIL_WORD: Partial<Record<FileReport['status'], [string, string]>> = {
  weakened: ['weakened', 'weakened'],
  'below-floor': ['below a floor', 'below a floor'],
  unreadable: ['could not be read', 'could not be read'],
  removed: ['removed', 'removed'],
};

/** "1 design weakened, 1 could not be read": the failing designs by what happened to them. */
export function failingCounts(files: readonly FileReport[]): string[] {
  const counts = new Map<string, number>();
  for (const f of files.filter(fileFails)) {
    const unevaluated =
      f.status === 'unreadable' &&
      !f.findings.some((x) => x.rule === 'parse-error') &&
      f.findings.some((x) => x.rule === 'not-computable');
    const word = unevaluated ? 'could not be evaluated' : (FAIL_WORD[f.status]?.[0] ?? 'failing');
    counts.set(word, (counts.get(word) ?? 0) + 1);
  }
  return [...counts].map(([word, n]) => `${n} design${n === 1 ? '' : 's'} ${word}`);
}

/** The verdict in one sentence of our own: "netbrace blocks this merge: 1 design weakened". */
export function verdictStory(report: Report, title?: string): VerdictStory {
  const name = title ? `netbrace (${title})` : 'netbrace';
  const parts = failingCounts(report.files);
  if (report.configuration?.changes.some((c) => c.weakens))
    parts.push(`the change weakens netbrace\u2019s own settings in ${report.configuration.workflow}`);
  const what = parts.join(', ');
  const warned = report.files.filter(fileWarns).length;
  const warnTail = warned ? ` (${warned} with warnings)` : '';
  if (report.part) {
    const where = `${name}, part ${report.part.index} of ${report.part.total}`;
    const sentence =
      report.verdict === 'fail'
        ? `${where}: ${what} in this part; the joined report decides the merge`
        : `${where}: no design fails its policy in this part${warnTail}`;
    return { tone: 'part', mark: report.verdict === 'fail' ? MARK.warn : MARK.holds, sentence: [seg.text(sentence)] };
  }
  if (report.verdict === 'fail' && report.mode === 'block')
    return { tone: 'blocks', mark: MARK.fail, sentence: [seg.text(`${name} blocks this merge: ${what}`)] };
  if (report.verdict === 'fail')
    return {
      tone: 'informs',
      mark: MARK.warn,
      sentence: [seg.text(`${name}: ${what}; inform mode, so the merge is not blocked`)],
    };
  if (report.files.length === 0)
    return {
      tone: 'clear',
      mark: MARK.holds,
      sentence: [seg.text(`${name}: no design file changed, nothing to judge`)],
    };
  if (warned)
    return {
      tone: 'clear',
      mark: MARK.holds,
      sentence: [
        seg.text(`${name}: no design fails its policy; ${warned} design${warned === 1 ? ' has' : 's have'} warnings`),
      ],
    };
  return { tone: 'clear', mark: MARK.holds, sentence: [seg.text(`${name}: no design weakened`)] };
}

/** The caution in one line, under the verdict; the full text (report.caution) closes each view. */
export const CAUTION_LINE =
  'netbrace informs engineering judgement under the stated assumptions; it does not replace engineering studies (the full caution is at the end).';

/* ------------------------------------------------------------------ elements and costs */

const KIND_WORD: Record<ReportElement['kind'], string> = { node: 'site', link: 'link', group: 'shared-risk group' };

/** "Kaskeld (`kaskeld`, line 58)", "link `a-b` (line 12)", "site `x`" when the line is unknown. */
export function elementSentence(e: Pick<ReportElement, 'id' | 'kind' | 'line' | 'label'>): Sentence {
  const line = e.line > 0 ? `, line ${e.line}` : '';
  if (e.label) return [seg.user(e.label), seg.text(' ('), seg.id(e.id), seg.text(`${line})`)];
  return [seg.text(`${KIND_WORD[e.kind]} `), seg.id(e.id), seg.text(e.line > 0 ? ` (line ${e.line})` : '')];
}

function joinList(items: Sentence[], last = 'and'): Sentence {
  const out: Sentence = [];
  items.forEach((s, i) => {
    if (i > 0) out.push(seg.text(i === items.length - 1 ? ` ${last} ` : ', '));
    out.push(...s);
  });
  return out;
}

/** Stranded sites a sentence names before "and N more". */
const NAMED = 3;

function amount(x: number): string {
  return String(Number(x.toPrecision(6)));
}

/** "cuts off A, B and C from the largest part; 3 of 47 demands (volume 44 of 1096) lose every path" */
export function costSentence(c: Consequence, plural = false): Sentence {
  const verb = plural ? 'cut' : 'cuts';
  const out: Sentence = [];
  if (c.strandedCount === 0) out.push(seg.text(`${verb} no surviving site off from the largest part`));
  else {
    const named = c.stranded.slice(0, NAMED).map(elementSentence);
    const more = c.strandedCount - named.length;
    if (more > 0) named.push([seg.text(`${more} more (${c.strandedCount} sites)`)]);
    out.push(seg.text(`${verb} off `), ...joinList(named), seg.text(' from the largest part'));
  }
  if (c.demandsTotal !== undefined && c.demandsLost !== undefined) {
    if (c.demandsLost === 0) out.push(seg.text('; every demand keeps a path'));
    else {
      const total = `${c.demandsTotal} demand${c.demandsTotal === 1 ? '' : 's'}`;
      out.push(
        seg.text(
          `; ${c.demandsLost} of ${total} (volume ${amount(c.volumeLost ?? 0)} of ${amount(c.volumeTotal ?? 0)}) ${c.demandsLost === 1 ? 'loses' : 'lose'} every path`,
        ),
      );
    }
  }
  return out;
}

/* ------------------------------------------------------------------ what weakened */

export interface WeakenedItem {
  severity: Severity;
  rule: Finding['rule'];
  /** RULE_TITLE of the rule. */
  title: string;
  line: number;
  elements: ReportElement[];
  /** The consequence in one sentence, ending with a full stop. */
  sentence: Sentence;
  finding: Finding;
}

const WEAK_POINT: Partial<Record<Finding['rule'], string>> = {
  'new-bridge': ' is a new bridge; losing it ',
  'new-cut-node': ' is a new cut node; losing it ',
  'new-stranding-group': ' is a new shared-risk group whose loss strands sites; losing it ',
  'hardened-weak-point': ' would be a new weak point, but the change marks it hardened; losing it ',
};

function capitalized(s: Sentence): Sentence {
  const first = s[0];
  if (!first || first.kind !== 'text' || first.user) return s;
  return [{ ...first, text: first.text.charAt(0).toUpperCase() + first.text.slice(1) }, ...s.slice(1)];
}

function itemSentence(x: Finding): Sentence {
  const el = x.elements[0];
  const weak = WEAK_POINT[x.rule];
  if (weak && el && x.elements.length === 1) {
    const cost = x.consequence ? costSentence(x.consequence) : [seg.text('splits the design')];
    return compact(capitalized([...elementSentence(el), seg.text(weak), ...cost, seg.text('.')]));
  }
  if (x.rule === 'n-1' && el && x.status === 'short' && typeof x.head === 'number' && typeof x.threshold === 'number') {
    const d = x.decimals ?? 3;
    const cost = x.consequence ? [seg.text('; it '), ...costSentence(x.consequence)] : [];
    return compact([
      seg.text('Losing '),
      ...elementSentence(el),
      seg.text(` alone leaves R at ${formatFixed(x.head, d)}, below the N\u22121 floor ${x.threshold}`),
      ...cost,
      seg.text('.'),
    ]);
  }
  if (x.rule === 'parse-error' && x.severity === 'fail')
    return compact([
      seg.text(`Could not be read${x.line > 0 ? ` at line ${x.line}${x.column ? `, column ${x.column}` : ''}` : ''}: `),
      seg.user(x.message.replace(/\.\s*$/, '')),
      seg.text('.'),
    ]);
  const cost = x.consequence ? [seg.text('; losing it '), ...costSentence(x.consequence)] : [];
  return compact(capitalized([seg.user(x.message.replace(/\.\s*$/, '')), ...cost, seg.text('.')]));
}

/** How much an item costs, for worst-first order within a severity: demands, volume, sites. */
function weight(x: Finding): number[] {
  const c = x.consequence;
  return c ? [c.demandsLost ?? 0, c.volumeLost ?? 0, c.strandedCount] : [0, 0, 0];
}

/** Findings that are numbers of a requirement (told by its "how much" line), not consequences. */
function isNumberFinding(x: Finding, f: FileReport): boolean {
  if (
    x.rule === 'regression' ||
    x.rule === 'r-threshold' ||
    x.rule === 'area-floor' ||
    x.rule === 'spread-ceiling' ||
    (x.rule === 'n-1' && x.status !== 'short')
  ) {
    return x.requirement !== undefined && f.requirements.some((r) => r.id === x.requirement);
  }
  return false;
}

/* ------------------------------------------------------------------ how much */

export interface RequirementLine {
  requirement: RequirementResult;
  mark: string;
  /** "R at 10 % sites removed (q10)". */
  label: Sentence;
  /** "holds · R at 10 % sites removed (q10) 0.464 → 0.450 (−0.013 ± 0.005), floor 0.42". */
  sentence: Sentence;
}

const REMOVE_WORD: Record<string, [string, string]> = {
  nodes: ['site', 'sites'],
  links: ['link', 'links'],
  'risk-groups': ['shared-risk group', 'shared-risk groups'],
  region: ['region', 'regions'],
};

function percent(x: number): string {
  return `${Number((x * 100).toFixed(4))} %`;
}

function removals(s: NonNullable<RequirementResult['subject']>): string {
  const what = REMOVE_WORD[s.remove ?? 'nodes'] ?? ['element', 'elements'];
  if (s.order && s.order !== 'random') return `${s.adaptive ? 'adaptive ' : ''}${s.order} attack on ${what[1]}`;
  return s.remove === 'region' ? 'regional outages' : `random ${what[0]} removals`;
}

const SPOF_WORD: Record<string, string> = {
  'no-new-spof': 'bridges and cut nodes',
  'no-new-spof:bridges': 'bridges',
  'no-new-spof:cut-nodes': 'cut nodes',
  'no-new-spof:risk-groups': 'stranding shared-risk groups',
};

/** A requirement's short name, from its subject (its plain description for older reports). */
export function requirementLabel(r: RequirementResult): Sentence {
  const s = r.subject;
  if (!s) return [seg.text(r.description)];
  switch (s.kind) {
    case 'r-threshold': {
      const st = s.statistic ?? { kind: 'value' as const };
      const what = REMOVE_WORD[s.remove ?? 'nodes'] ?? ['element', 'elements'];
      const attack = s.order && s.order !== 'random' ? `, ${s.adaptive ? 'adaptive ' : ''}${s.order} attack` : '';
      if (st.kind === 'worst-case')
        return [seg.text(`R after the worst ${st.removals ?? '?'} ${what[0]} removals found`)];
      const where = s.remove === 'region' ? `at radius ${s.at ?? 0} km` : `at ${percent(s.at ?? 0)} ${what[1]} removed`;
      const lead =
        st.kind === 'median' ? 'median R' : st.kind === 'mean' ? 'mean R' : st.kind === 'min' ? 'least R' : 'R';
      const tag = st.kind === 'quantile' ? ` (q${Number(((st.q ?? 0) * 100).toFixed(4))})` : '';
      return [seg.text(`${lead} ${where}${tag}${attack}`)];
    }
    case 'area-floor':
      return [seg.text(`area, ${removals(s)}`)];
    case 'spread-ceiling':
      return [seg.text(`spread, ${removals(s)}`)];
    case 'n-1':
      return [seg.text(`R after any single ${s.remove === 'nodes' ? 'site' : 'link'} loss (N\u22121)`)];
    case 'no-new-spof':
      return [seg.text(SPOF_WORD[r.id] ?? r.description)];
  }
}

function isCount(r: RequirementResult): boolean {
  return (
    r.subject?.kind === 'no-new-spof' ||
    (r.se === 0 &&
      [r.base, r.head, r.delta].every((v) => v === null || Number.isInteger(v)) &&
      /spof|bridge|cut/.test(r.id))
  );
}

/** "0.464 → 0.450 (−0.013 ± 0.005), floor 0.42, allowed drop 0.010". */
export function requirementNumbers(r: RequirementResult, allowance?: number): string {
  const count = isCount(r);
  const d = r.decimals ?? 3;
  const v = (x: number | null) => (x === null ? '\u2013' : count ? String(x) : formatValueAt(x, d));
  let text = r.base !== null ? `${v(r.base)} \u2192 ${v(r.head)}` : v(r.head);
  if (r.delta !== null && r.base !== null) {
    const delta = count
      ? r.delta > 0
        ? `+${r.delta}`
        : r.delta < 0
          ? `\u2212${-r.delta}`
          : '0'
      : formatDelta(r.delta, null, d);
    const err = count ? '' : formatError(r.se, d);
    text += ` (${delta}${err ? ` ${err}` : ''})`;
  }
  const higher = r.subject?.higherIsBetter ?? !/spread/.test(r.id);
  if (r.threshold !== null) text += `, ${higher ? 'floor' : 'ceiling'} ${r.threshold}`;
  else if (r.subject?.kind === 'no-new-spof') text += ', no new one allowed';
  else text += ', tracked (no floor)';
  if (allowance !== undefined && allowance > 0)
    text += `, allowed ${higher ? 'drop' : 'rise'} ${formatFixed(allowance, d)}`;
  return text;
}

export function requirementLine(r: RequirementResult, findings: readonly Finding[] = []): RequirementLine {
  const allowance = findings.find((x) => x.requirement === r.id && x.allowance !== undefined)?.allowance;
  const label = requirementLabel(r);
  const why = r.status === 'unsettled' ? unsettledWhy(r, findings) : undefined;
  return {
    requirement: r,
    mark: requirementMark(r),
    label,
    sentence: compact([
      seg.text(`${r.status} \u00b7 `),
      ...label,
      seg.text(` ${requirementNumbers(r, allowance)}`),
      ...(why ? [seg.text(` \u2014 ${why}`)] : []),
    ]),
  };
}

/**
 * Why an unsettled requirement is unsettled, from its finding ("… meets it, but <why>"), so the
 * line that says "unsettled" also says what would settle it; undefined when no finding says.
 */
function unsettledWhy(r: RequirementResult, findings: readonly Finding[]): string | undefined {
  const f = findings.find((x) => x.requirement === r.id && x.status === 'unsettled');
  if (!f) return undefined;
  const but = /\bbut (.+)$/.exec(f.message);
  if (but) return but[1];
  const told = /, (within .+)$/.exec(f.message);
  return told ? told[1] : undefined;
}

/* ------------------------------------------------------------------ definitions */

export interface Definition {
  term: 'R' | 'area' | 'spread' | '\u00b1' | 'inside-error';
  sentence: Sentence;
  /** The README section that says more (README_ANCHOR). */
  anchor: string;
}

/** R, area, spread and ±, each in one line, for the words this design's lines use. */
export function definitions(f: FileReport): Definition[] {
  const out: Definition[] = [];
  const ev = f.head ?? f.base;
  const kinds = new Set(f.requirements.map((r) => r.subject?.kind ?? (r.id.split(':')[0] as string)));
  if (ev && f.requirements.some((r) => r.subject?.kind !== 'no-new-spof' && !r.id.startsWith('no-new-spof'))) {
    const metrics: Sentence = [];
    ev.r.metrics.forEach((m, i) => {
      if (i > 0) metrics.push(seg.text(', '));
      metrics.push(seg.code(m.id), seg.text(ev.r.combine === 'min' ? '' : ` ${m.weight}`));
    });
    const how = ev.r.combine === 'min' ? 'the least of ' : 'the weighted mean of ';
    const sampling = f.head?.sampling ?? f.base?.sampling;
    out.push({
      term: 'R',
      anchor: README_ANCHOR,
      sentence: compact([
        seg.text(`R: ${how}`),
        ...metrics,
        seg.text(', each metric scaled to 0\u20131 with 1 the intact design.'),
        ...(sampling
          ? [
              seg.text(
                ` Here ${sampling.metric} is estimated from ${sampling.sources.toLocaleString('en')} of ${sampling.nodes.toLocaleString('en')} sites as seeded sources (the same on base and head); that leaves R a standard error of up to ${sampling.se.toPrecision(2)}, part of every \u00b1.`,
              ),
            ]
          : []),
      ]),
    });
  }
  if (kinds.has('area-floor'))
    out.push({
      term: 'area',
      anchor: README_ANCHOR,
      sentence: [seg.text('area: the mean of the median R over the removal grid (netbrace\u2019s own summary).')],
    });
  if (kinds.has('spread-ceiling')) {
    const band = ev?.envelopes[0]?.band ?? [0.1, 0.9];
    out.push({
      term: 'spread',
      anchor: README_ANCHOR,
      sentence: [
        seg.text(
          `spread: the mean width of the band between the ${percent(band[0])} and ${percent(band[1])} quantiles of R (netbrace\u2019s own summary).`,
        ),
      ],
    });
  }
  if (f.requirements.some((r) => (r.se ?? 0) > 0)) {
    out.push({
      term: '\u00b1',
      anchor: README_ANCHOR,
      sentence: [
        seg.text(
          f.head?.sampling || f.base?.sampling
            ? '\u00b1: one standard error of the change: the same random removals on base and head (paired Monte Carlo) and the sampled sources\u2019 error together.'
            : '\u00b1: one standard error of the change, from the same random removals on base and head (paired Monte Carlo).',
        ),
      ],
    });
  }
  if (f.requirements.some((r) => r.status === 'inside-error')) {
    out.push({
      term: 'inside-error',
      anchor: README_ANCHOR,
      sentence: [
        seg.text('inside-error: the value dropped by less than its Monte Carlo error, which is never a failure.'),
      ],
    });
  }
  return out;
}

/* ------------------------------------------------------------------ the design */

export interface DesignStory {
  file: FileReport;
  /** fails: blocks on its own; warns: passes with warnings; holds: passes (notices do not change that). */
  outcome: 'fails' | 'warns' | 'holds';
  mark: string;
  /** The file status in words (FILE_STATUS_WORD; "could not be evaluated" told apart). */
  statusWord: string;
  /** "4 new bridges, 4 new cut nodes; 3 requirements weakened" or "every requirement holds". */
  headline: string;
  /** Failures and warnings that name what weakened, worst first. */
  weakened: WeakenedItem[];
  /** Context (notices) that is not a requirement's number. */
  notices: WeakenedItem[];
  /** One line per requirement, in policy order. */
  howMuch: RequirementLine[];
  definitions: Definition[];
}

function statusWord(f: FileReport): string {
  if (
    f.status === 'unreadable' &&
    !f.findings.some((x) => x.rule === 'parse-error') &&
    f.findings.some((x) => x.rule === 'not-computable')
  )
    return 'could not be evaluated';
  return FILE_STATUS_WORD[f.status];
}

function headlineOf(items: readonly WeakenedItem[], lines: readonly RequirementLine[]): string {
  const counts = new Map<string, number>();
  for (const x of items) counts.set(x.title, (counts.get(x.title) ?? 0) + 1);
  const plural: Record<string, string> = {
    'new bridge': 'new bridges',
    'new cut node': 'new cut nodes',
    'weak point hidden by hardening': 'weak points hidden by hardening',
    'new stranding shared-risk group': 'new stranding shared-risk groups',
  };
  const parts = [...counts].map(([t, n]) => (n === 1 ? `1 ${t}` : `${n} ${plural[t] ?? t}`));
  const bad = lines.filter((l) => l.requirement.status === 'short' || l.requirement.status === 'weakened').length;
  const open = lines.filter((l) => l.requirement.status === 'unsettled').length;
  const worse = [
    ...(bad ? [`${bad} requirement${bad === 1 ? '' : 's'} weakened or short`] : []),
    ...(open ? [`${open} requirement${open === 1 ? '' : 's'} unsettled`] : []),
  ];
  if (!parts.length && !worse.length) return lines.length ? 'every requirement holds' : 'nothing to judge';
  return [parts.join(', '), ...worse].filter(Boolean).join('; ');
}

/**
 * The finding an unreadable file is told by in every view (its located reading error, as a
 * failure), unless its findings already say it; undefined for any other file.
 */
export function unreadableFinding(f: FileReport): Finding | undefined {
  if (f.status !== 'unreadable' || !f.error) return undefined;
  if (f.findings.some((x) => x.rule === 'parse-error' || x.rule === 'not-computable')) return undefined;
  return {
    rule: 'parse-error',
    severity: 'fail',
    message: f.error.message,
    elements: [],
    line: f.error.line,
    column: f.error.column,
  };
}

export function designStory(f: FileReport): DesignStory {
  const items: WeakenedItem[] = [];
  const notices: WeakenedItem[] = [];
  const findings = [...f.findings];
  const unread = unreadableFinding(f);
  if (unread) findings.push(unread);
  for (const x of findings) {
    if (isNumberFinding(x, f)) continue;
    // A weakest sequence that is only context is told with the other sequences (detail).
    if (x.rule === 'weakest-sequence' && x.severity === 'notice') continue;
    const item: WeakenedItem = {
      severity: x.severity,
      rule: x.rule,
      title: judgedTitle(x),
      line: x.line,
      elements: x.elements,
      sentence: itemSentence(x),
      finding: x,
    };
    (x.severity === 'notice' ? notices : items).push(item);
  }
  const order = items.map((x, i) => ({ x, i, w: weight(x.finding) }));
  order.sort(
    (a, b) =>
      SEVERITY_RANK[a.x.severity] - SEVERITY_RANK[b.x.severity] ||
      b.w[0] - a.w[0] ||
      b.w[1] - a.w[1] ||
      b.w[2] - a.w[2] ||
      a.i - b.i,
  );
  const weakened = order.map((o) => o.x);
  const howMuch = f.requirements.map((r) => requirementLine(r, f.findings));
  const outcome = fileFails(f) ? 'fails' : fileWarns(f) ? 'warns' : 'holds';
  return {
    file: f,
    outcome,
    mark: outcome === 'fails' ? MARK.fail : outcome === 'warns' ? MARK.warn : MARK.holds,
    statusWord: statusWord(f),
    headline: headlineOf(weakened, howMuch),
    weakened,
    notices,
    howMuch,
    definitions: definitions(f),
  };
}

/** For a design with no element to name whose requirements fell: what "what weakened" says instead of "nothing". */
export function numbersOnly(d: Pick<DesignStory, 'howMuch'>): string | undefined {
  const bad = d.howMuch.filter((l) => l.requirement.status === 'short' || l.requirement.status === 'weakened').length;
  return bad
    ? `no single element to name; ${bad} requirement${bad === 1 ? '' : 's'} weakened or short (how much, below)`
    : undefined;
}

/** Every design's story, worst first (rank.ts). */
export function designStories(report: Pick<Report, 'files'>): DesignStory[] {
  return rankFiles(report.files).map(designStory);
}

/* ------------------------------------------------------------------ the policy change */

const KEY_WORD: Record<string, string> = {
  min: 'the floor of',
  max: 'the ceiling of',
  severity: 'the severity of',
  'hardened-weak-points': 'hardened weak points of',
  bridges: 'the bridge rule of',
  'cut-nodes': 'the cut-node rule of',
  'risk-groups': 'the shared-risk-group rule of',
};

const RULE_KEY_WORD: Record<string, string> = {
  'allowed-drop': 'the allowed drop',
  'allowed-relative-drop': 'the allowed relative drop',
  'error-multiple': 'the error multiple',
  severity: 'the severity of a weakening',
};

function changePart(c: PolicyChange): Sentence {
  const value = (v: string | number | null) => (v === null ? 'none' : String(v));
  if (c.key === 'requirement')
    return c.head === null ? [seg.text('drop '), seg.id(c.subject)] : [seg.text('add '), seg.id(c.subject)];
  const fromTo = seg.text(` from ${value(c.base)} to ${value(c.head)}`);
  if (c.subject === 'weakening') return [seg.text(RULE_KEY_WORD[c.key] ?? c.key), fromTo];
  if (c.subject === 'removed-designs') return [seg.text('the severity of removed designs'), fromTo];
  return [seg.text(`${KEY_WORD[c.key] ?? `${c.key} of`} `), seg.id(c.subject), fromTo];
}

/**
 * The policy change in one sentence: "This change edits the policy: the head's version would
 * loosen the floor of `r-threshold:…` from 0.42 to 0.4 and tighten …; the base's version judges
 * this change." Undefined when the change leaves the policy alone.
 */
export function policyChangeSentence(report: Pick<Report, 'policy' | 'base'>): Sentence | undefined {
  const p = report.policy;
  if (!p.changed) return undefined;
  const judgedByBase = p.revision !== undefined && p.revision === report.base;
  const tail = judgedByBase
    ? '; the base\u2019s version judges this change, and the head\u2019s applies once merged.'
    : '; the head\u2019s version judges this change (policy-source: head).';
  if (!p.changes)
    return p.note
      ? [seg.text('Policy: '), seg.user(p.note.replace(/\.\s*$/, '')), seg.text('.')]
      : [seg.text(`This change edits the policy${tail}`)];
  const would = judgedByBase ? 'would ' : '';
  const loosen = p.changes.filter((c) => c.effect === 'loosens').map(changePart);
  const tighten = p.changes.filter((c) => c.effect === 'tightens').map(changePart);
  const clauses: Sentence[] = [];
  if (loosen.length) clauses.push([seg.text(`${would}loosen `), ...joinList(loosen)]);
  if (tighten.length) clauses.push([seg.text(`${loosen.length ? '' : would}tighten `), ...joinList(tighten)]);
  if (!clauses.length)
    return compact([seg.text('This change edits the policy without changing any floor or rule'), seg.text(tail)]);
  const both = clauses.length === 2 ? [...clauses[0], seg.text(', and '), ...clauses[1]] : clauses[0];
  return compact([seg.text('This change edits the policy: the head\u2019s version '), ...both, seg.text(tail)]);
}

/* ------------------------------------------------------------------ what the change does */

function plural(kind: ReportElement['kind'], n: number): string {
  const w = KIND_WORD[kind];
  return n === 1 ? w : kind === 'group' ? 'shared-risk groups' : `${w}s`;
}

/**
 * "+1 site (Saltmarrow, `saltmarrow`, line 210); −2 links (`a-b`, base line 214; …); site `a`
 * renamed `b` (line 3); now hardened: …": what the change did to the design's elements.
 */
export function changeSentence(f: FileReport, max = 4): Sentence | undefined {
  const ch = f.changes;
  const renamed = ch?.renamed ?? [];
  const hardened = ch?.hardened ?? [];
  if (!ch || (ch.added.length === 0 && ch.removed.length === 0 && renamed.length === 0 && hardened.length === 0))
    return undefined;
  const parts: Sentence[] = [];
  const side = (sign: string, list: readonly ReportElement[], where: string) => {
    for (const kind of ['node', 'link', 'group'] as const) {
      const l = list.filter((e) => e.kind === kind);
      if (!l.length) continue;
      const items = l
        .slice(0, max)
        .map((e): Sentence => [
          ...(e.label ? [seg.user(e.label), seg.text(', ')] : []),
          seg.id(e.id),
          seg.text(`, ${where}line ${e.line}`),
        ]);
      const out: Sentence = [seg.text(`${sign}${l.length} ${plural(kind, l.length)} (`)];
      items.forEach((x, i) => out.push(...(i ? [seg.text('; ')] : []), ...x));
      out.push(seg.text(`${l.length > max ? `; \u2026 ${l.length - max} more` : ''})`));
      parts.push(out);
    }
  };
  side('+', ch.added, '');
  side('\u2212', ch.removed, 'base ');
  for (const r of renamed.slice(0, max))
    parts.push([
      seg.text(`${KIND_WORD[r.from.kind]} `),
      seg.id(r.from.id),
      seg.text(' renamed '),
      seg.id(r.to.id),
      seg.text(` (line ${r.to.line})`),
    ]);
  if (renamed.length > max) parts.push([seg.text(`\u2026 ${renamed.length - max} more renamed`)]);
  for (const [flag, word] of [
    [true, 'now hardened: '],
    [false, 'no longer hardened: '],
  ] as const) {
    const l = hardened.filter((e) => e.hardened === flag);
    if (l.length)
      parts.push([
        seg.text(word),
        ...joinList(l.slice(0, max).map(elementSentence), 'and'),
        seg.text(l.length > max ? `, \u2026 ${l.length - max} more` : ''),
      ]);
  }
  const out: Sentence = [];
  parts.forEach((p, i) => out.push(...(i ? [seg.text('; ')] : []), ...p));
  return compact(out);
}

/** "link `a—b`: length 24 km → 30 km (base line 12, head line 13)": one attribute the change altered. */
export function modificationSentence(c: NonNullable<NonNullable<FileReport['changes']>['modified']>[number]): Sentence {
  const lines = c.baseLine === c.headLine ? `line ${c.headLine}` : `base line ${c.baseLine}, head line ${c.headLine}`;
  return [
    seg.text(`${KIND_WORD[c.kind]} `),
    seg.id(c.id),
    seg.text(`: ${c.attribute} `),
    seg.user(c.before),
    seg.text(' \u2192 '),
    seg.user(c.after),
    seg.text(` (${lines})`),
  ];
}
