// The report as GitHub-flavoured Markdown: the job summary and the body of the one living PR
// comment. Pure: report in, string out. The order is the story's (story.ts): the verdict in one
// sentence, the caution in one line, then per design what weakened, how much, and the detail
// folded away (chart, removal sequences, structure). Both views have hard size limits on
// GitHub (the summary is refused whole above 1 MiB, a comment above 65,536 characters), so
// both are assembled against a budget: worst designs first, each at the most detail that still
// fits, and a note saying what was left out and where it is. Charts are text: one named row of
// Unicode bars per line, in a code block, since GitHub Markdown allows neither inline SVG nor
// data: images. Ids go into code spans (shown verbatim); other user text is escaped prose.
// No user-controlled text enters Mermaid except the change's neighbourhood graph's labels,
// reduced to letters, digits and ". _ -" (mermaid-map.ts).

import type { Envelope } from '../envelope/types.js';
import { escapeProse, markdownCode, markerValue, oneLine } from './escape.js';
import { repoPath } from './finding-text.js';
import { stableHash } from '../random.js';
import { formatValue, shortRevision, utf8Length } from './format.js';
import { rangesText } from '../gate/split.js';
import {
  challengeLabel,
  configurationNotes,
  contingencyLabel,
  describeNotApplicable,
  kindPlural,
  knownElement,
  knownElements,
  weakestSequences,
  xAxisLabel,
} from './labels.js';
import { changeMapMarkdown, mendMarkdown } from './mermaid-map.js';
import type { FileReport, Report, ReportElement } from './report.js';
import {
  CAUTION_LINE,
  changeSentence,
  costSentence,
  designStories,
  elementSentence,
  modificationSentence,
  policyChangeSentence,
  verdictStory,
  type DesignStory,
  type Sentence,
} from './story.js';
import { MARK } from './vocabulary.js';

/** GitHub refuses a step summary over 1 MiB; stay well below (bytes of UTF-8). */
export const SUMMARY_BUDGET_BYTES = 900 * 1024;
/** GitHub refuses a comment body over 65,536 characters; keep a margin. */
export const COMMENT_BUDGET_CHARS = 60_000;
/** Points per chart line. */
export const CHART_POINTS = 21;

export interface MarkdownOptions {
  /** Shown in the verdict sentence, e.g. the project of a monorepo ("netbrace (metro)"). Plain text. */
  title?: string;
  /** The workflow run, where the artifacts (JSON, SARIF, HTML) can be downloaded. */
  runUrl?: string;
  /** Joined before report paths to make them repository-relative (the working directory). */
  pathPrefix?: string;
  /** Size budget: bytes for the summary, characters for the comment. */
  budget?: number;
  /** Maximum points per chart line. */
  chartPoints?: number;
  /** Artifact files this run wrote (repository-relative names), listed at the end. */
  artifacts?: string[];
  /** Extra lines (plain text) the shell wants the reader to see, e.g. "comment skipped". */
  notes?: string[];
  /** netbrace's README (http or https), which the definitions link to ("Reading the report"). */
  readmeUrl?: string;
}

export interface CommentOptions extends MarkdownOptions {
  /** The comment key (so several jobs keep separate comments). */
  key: string;
}

/** The hidden line that identifies the living comment of one key. */
export function commentMarker(key: string): string {
  return `<!-- netbrace:comment key=${markerValue(key)} -->`;
}

const DIGEST_RE = /<!-- netbrace:digest ([0-9a-f]{16}) -->/;

/** The digest recorded in a comment body by `renderComment`, if any. */
export function commentDigest(body: string): string | undefined {
  return DIGEST_RE.exec(body)?.[1];
}

/**
 * What the comment says, reduced to what matters for "did anything change": verdict,
 * statuses, findings and requirement outcomes — not the commit ids, which change every push.
 */
export function reportDigest(report: Report): string {
  const essence = {
    verdict: report.verdict,
    policyChanged: report.policy.changed ?? false,
    files: [...report.files]
      .sort((a, b) => (a.path < b.path ? -1 : a.path > b.path ? 1 : 0))
      .map((f) => ({
        path: f.path,
        status: f.status,
        findings: f.findings.map((x) => [x.rule, x.severity, x.message, x.line]),
        requirements: f.requirements.map((r) => [r.id, r.status, r.head === null ? null : Number(r.head.toFixed(3))]),
      })),
  };
  return stableHash(JSON.stringify(essence));
}

/** The job summary (GITHUB_STEP_SUMMARY), within `budget` UTF-8 bytes (default ~900 KiB). */
export function renderSummary(report: Report, options: MarkdownOptions = {}): string {
  return assemble(report, options, {
    budget: options.budget ?? SUMMARY_BUDGET_BYTES,
    measure: utf8Length,
    itemsFull: 200,
    itemsCompact: 20,
    charts: Number.MAX_SAFE_INTEGER,
    prefix: '',
    chartPoints: options.chartPoints ?? CHART_POINTS,
    envelopesPerDesign: 4,
    sequences: 6,
    chain: 12,
    structure: true,
    map: true,
  });
}

/** The PR comment body, with its hidden marker, under 65,536 characters (default 60,000). */
export function renderComment(report: Report, options: CommentOptions): string {
  const prefix = `${commentMarker(options.key)}\n<!-- netbrace:digest ${reportDigest(report)} -->\n`;
  return assemble(report, options, {
    budget: Math.min(options.budget ?? COMMENT_BUDGET_CHARS, 65_000),
    measure: (s) => s.length,
    itemsFull: 25,
    itemsCompact: 5,
    charts: 3,
    prefix,
    chartPoints: options.chartPoints ?? CHART_POINTS,
    envelopesPerDesign: 1,
    sequences: 1,
    chain: 5,
    structure: false,
    map: false,
  });
}

interface Layout {
  budget: number;
  measure: (s: string) => number;
  /** Consequences listed per design at full and at compact detail. */
  itemsFull: number;
  itemsCompact: number;
  /** How many designs get a chart at full detail. */
  charts: number;
  prefix: string;
  chartPoints: number;
  /** Envelopes charted per design at full detail. */
  envelopesPerDesign: number;
  /** Removal sequences listed per design at full detail. */
  sequences: number;
  /** Elements named per removal sequence before "… N more". */
  chain: number;
  /** The structure table (sites, links, bridges, cut sites at base and head). */
  structure: boolean;
  /** The Mermaid neighbourhood of the change (the mend line is always given). */
  map: boolean;
}

type Detail = 'full' | 'compact';

/* ------------------------------------------------------------------ Markdown of a sentence */

/**
 * A sentence as Markdown: ids and code in code spans (user text never leaves them), the rest
 * escaped prose. Text with a backtick of its own goes into a code span too, so that a line
 * never holds an escaped backtick beside a code span that a lenient reader could pair it with.
 */
function md(s: Sentence, max = 600): string {
  return s
    .map((x) =>
      x.kind === 'text' && !(x.user && x.text.includes('`'))
        ? escapeProse(x.text, max)
        : markdownCode(x.text, x.kind === 'text' ? max : 160),
    )
    .join('');
}

function mdElement(e: ReportElement): string {
  return md(elementSentence(e));
}

function definitionsUrl(options: MarkdownOptions): string | undefined {
  const url = options.readmeUrl;
  return url && /^https?:\/\/[^\s<>()]+$/.test(url) ? `${url.replace(/#.*$/, '')}#reading-the-report` : undefined;
}

/* ------------------------------------------------------------------ the whole view */

function assemble(report: Report, options: MarkdownOptions, layout: Layout): string {
  const path = (p: string) => repoPath(options.pathPrefix, p);
  const stories = designStories(report);
  const head = layout.prefix + header(report, options);
  if (report.part) return fit(head + partBody(stories, path) + footer(report, options, ''), layout);
  let body = '';
  let used = layout.measure(head);
  let charts = 0;
  let omitted: DesignStory[] = [];
  const reserve = 4096; // the end, the note on what was left out (at most 10 names) and a margin
  const footerSize = layout.measure(footer(report, options, ''));
  for (const s of stories) {
    if (omitted.length > 0) {
      omitted.push(s);
      continue;
    }
    let placed = false;
    for (const detail of ['full', 'compact'] as Detail[]) {
      const chart = detail === 'full' && charts < layout.charts;
      const section = designSection(s, detail, layout, path, chart, options);
      const size = layout.measure(section);
      if (used + size + reserve + footerSize <= layout.budget) {
        body += section;
        used += size;
        if (chart && s.file.head?.envelopes.length) charts++;
        placed = true;
        break;
      }
    }
    if (!placed) omitted = [s];
  }
  let note = '';
  if (omitted.length > 0) {
    const n = omitted.length;
    const list = omitted
      .slice(0, 10)
      .map((s) => `- ${s.mark} ${s.statusWord} \u00b7 ${markdownCode(path(s.file.path), 200)}`)
      .join('\n');
    note = `${MARK.notice} ${n} more design${n === 1 ? '' : 's'} (the least severe) did not fit within GitHub\u2019s size limit for this view; every finding is in the JSON report and the SARIF file:\n\n${list}${n > 10 ? `\n- \u2026 ${n - 10} more` : ''}\n\n`;
  }
  return fit(head + body + footer(report, options, note), layout);
}

/** The text itself when it fits (the reserve covers the end); a pathological title or notes list is cut. */
function fit(text: string, layout: Layout): string {
  if (layout.measure(text) <= layout.budget) return text;
  const tail = '\n\n\u2026 (cut to fit GitHub\u2019s size limit; the JSON report has everything)\n';
  let lo = 0;
  let hi = text.length;
  while (lo < hi) {
    const mid = Math.ceil((lo + hi) / 2);
    if (layout.measure(text.slice(0, mid) + tail) <= layout.budget) lo = mid;
    else hi = mid - 1;
  }
  // Never cut inside a surrogate pair.
  let cut = lo;
  if (cut > 0 && /[\uD800-\uDBFF]/.test(text[cut - 1] ?? '')) cut--;
  return text.slice(0, cut) + tail;
}

function header(report: Report, options: MarkdownOptions): string {
  const verdict = verdictStory(report, options.title ? oneLine(options.title, 120) : undefined);
  let text = `## ${verdict.mark} ${md(verdict.sentence, 400)}\n\n${escapeProse(CAUTION_LINE)}\n\n`;
  const facts: string[] = [`${report.mode} mode`];
  if (report.policy.source === 'builtin') facts.push('built-in default policy (no policy file)');
  else
    facts.push(
      `policy ${markdownCode(report.policy.path ?? '?')}${report.policy.revision ? ` at ${rev(report.policy.revision)}` : ''}`,
    );
  if (report.base && report.head) facts.push(`base ${rev(report.base)} \u2192 head ${rev(report.head)}`);
  else if (report.head) facts.push(`head ${rev(report.head)}, thresholds only (no base)`);
  facts.push(`seed ${report.seed}`);
  if (report.scope === 'all') facts.push('every design, thresholds only');
  if (report.part) facts.push(`part ${report.part.index} of ${report.part.total}`);
  if (report.parts) facts.push(`joined parts ${report.parts.joined.join(', ')} of ${report.parts.total}`);
  facts.push(`netbrace ${escapeProse(report.tool.version, 40)}`);
  text += `${facts.join(' \u00b7 ')}\n\n`;
  const policy = policyChangeSentence(report);
  if (policy) text += `${MARK.warn} ${md(policy, 1200)}\n\n`;
  else if (report.policy.note)
    text += `${MARK.notice} Policy: ${escapeProse(report.policy.note.replace(/\.\s*$/, ''), 600)}.\n\n`;
  for (const n of configurationNotes(report).filter((x) => x.file !== report.policy.path)) {
    text += `${n.weakens ? MARK.fail : MARK.notice} Settings: ${escapeProse(n.text, 600)}.\n\n`;
  }
  for (const n of options.notes ?? []) text += `${MARK.notice} Note: ${escapeProse(n, 500)}\n\n`;
  for (const d of report.split ?? []) {
    text += `${MARK.notice} ${markdownCode(d.path)} is split across the parts: this part ran realizations ${escapeProse(rangesText(d), 200)} of ${d.realizations}, and the join judges it.\n\n`;
  }
  if (report.files.length === 0)
    text += 'No design file changed between base and head, so there is nothing to judge.\n\n';
  return text;
}

function rev(sha: string): string {
  return markdownCode(shortRevision(sha), 60);
}

/** A part's summary: one line per design; the joined summary carries the detail, once. */
function partBody(stories: DesignStory[], path: (p: string) => string): string {
  if (!stories.length) return '';
  const lines = stories
    .slice(0, 500)
    .map(
      (s) =>
        `- ${s.mark} ${s.statusWord} \u00b7 ${markdownCode(path(s.file.path), 200)}: ${escapeProse(s.headline, 300)}`,
    );
  const more = stories.length > 500 ? `\n- \u2026 ${stories.length - 500} more` : '';
  return `${lines.join('\n')}${more}\n\nThis part\u2019s designs in one line each; the joined summary tells what weakened and how much.\n\n`;
}

/* ------------------------------------------------------------------ one design */

const OUTCOME_WORD: Record<'fail' | 'warn' | 'notice', string> = { fail: 'fails', warn: 'warns', notice: 'note' };

function designSection(
  s: DesignStory,
  detail: Detail,
  layout: Layout,
  path: (p: string) => string,
  chart: boolean,
  options: MarkdownOptions,
): string {
  const f = s.file;
  const renamed = f.previousPath ? ` (renamed from ${markdownCode(path(f.previousPath))})` : '';
  let text = `### ${s.mark} ${s.statusWord} \u00b7 ${markdownCode(path(f.path))}${renamed}\n\n`;
  if (f.error && !s.weakened.some((x) => x.rule === 'parse-error' || x.rule === 'not-computable')) {
    const what = s.statusWord === 'could not be evaluated' ? 'Could not be evaluated' : 'Could not be read';
    text += `${what}: line ${f.error.line}, column ${f.error.column}: ${escapeProse(f.error.message, 500)}\n\n`;
  }
  const cap = detail === 'full' ? layout.itemsFull : layout.itemsCompact;
  if (s.weakened.length) {
    text += '**What weakened**, worst first:\n\n';
    for (const x of s.weakened.slice(0, cap))
      text += `- ${x.severity === 'fail' ? MARK.fail : MARK.warn} ${OUTCOME_WORD[x.severity]}: ${md(x.sentence)}\n`;
    if (s.weakened.length > cap)
      text += `- \u2026 ${s.weakened.length - cap} more in the JSON report and the SARIF file\n`;
    text += '\n';
  } else if (f.requirements.length) {
    text += `**What weakened**: ${s.outcome === 'holds' && !s.howMuch.some((l) => l.requirement.status === 'weakened' || l.requirement.status === 'short') ? 'nothing; every requirement holds' : 'no single element stands out; see the numbers below'}.\n\n`;
  }
  if (s.howMuch.length) {
    text += '**How much**, one line per requirement:\n\n';
    for (const l of s.howMuch) text += `- ${l.mark} ${md(l.sentence, 400)}\n`;
    text += '\n';
    const url = definitionsUrl(options);
    // Each definition on its own line (a hard line break), with the link; without a link the README's section is named once.
    const lines = s.definitions.map((d) => `${MARK.notice} ${md(d.sentence)}${url ? ` [more](${url})` : ''}`);
    if (lines.length)
      text += `${lines.join('\\\n')}${url ? '' : ' The README\u2019s \u201cReading the report\u201d says more.'}\n\n`;
  }
  const notApplicable = describeNotApplicable(f.head);
  if (notApplicable) text += `Not applicable to this design: ${escapeProse(notApplicable, 600)}\n\n`;
  const change = changeSentence(f);
  if (change) text += `**The change**: ${md(change, 1500)}\n\n`;
  if (detail === 'full') text += folded(s, layout, chart);
  return text;
}

/** Charts, sequences, structure, attribute changes and notices, behind one <details>. */
function folded(s: DesignStory, layout: Layout, chart: boolean): string {
  const f = s.file;
  let inner = '';
  const modified = f.changes?.modified ?? [];
  if (modified.length) {
    const max = layout.structure ? 50 : 10;
    inner += `**Attributes the change altered**:\n\n${modified
      .slice(0, max)
      .map((c) => `- ${md(modificationSentence(c), 300)}`)
      .join('\n')}\n`;
    inner +=
      modified.length > max ? `- \u2026 ${modified.length - max} more attribute changes in the JSON report\n\n` : '\n';
  }
  if (chart)
    for (const env of (f.head?.envelopes ?? []).slice(0, layout.envelopesPerDesign))
      inner += chartSection(f, env, layout.chartPoints);
  inner += layout.map ? changeMapMarkdown(f) : mendMarkdown(f);
  inner += sequencesSection(f, layout.sequences, layout.chain);
  if (layout.structure) inner += structureSection(f);
  if (s.notices.length) {
    inner += `**Notices**:\n\n${s.notices
      .slice(0, layout.itemsFull)
      .map((x) => `- ${MARK.notice} ${md(x.sentence)}`)
      .join('\n')}\n`;
    inner +=
      s.notices.length > layout.itemsFull
        ? `- \u2026 ${s.notices.length - layout.itemsFull} more in the JSON report\n\n`
        : '\n';
  }
  if (!inner) return '';
  const what = [
    chart && f.head?.envelopes.length ? 'chart' : '',
    weakestSequences(f).length || f.head?.contingencies.length ? 'removal sequences' : '',
    layout.structure && f.head ? 'structure' : '',
    s.notices.length ? `${s.notices.length} notice${s.notices.length === 1 ? '' : 's'}` : '',
  ].filter(Boolean);
  // One line: a line break (a blank line above all) would end the HTML block early.
  return `<details><summary>Detail${what.length ? `: ${what.join(', ')}` : ''}</summary>\n\n${inner}</details>\n\n`;
}

/** Evenly spaced indices, first and last included, at most `max` of them. */
export function sampleIndices(length: number, max: number): number[] {
  if (length <= max) return Array.from({ length }, (_, i) => i);
  const out: number[] = [];
  for (let i = 0; i < max; i++) out.push(Math.round((i * (length - 1)) / (max - 1)));
  return [...new Set(out)];
}

const BARS = '\u2581\u2582\u2583\u2584\u2585\u2586\u2587\u2588';

/** Unicode sparkline of values in [0, 1] on a fixed scale, so two lines compare by eye. */
export function sparkline(values: readonly number[]): string {
  return values.map((v) => (Number.isFinite(v) ? BARS[Math.min(7, Math.max(0, Math.round(v * 7)))] : ' ')).join('');
}

/**
 * One envelope as a text chart: each line is a named row of bars on the same 0–1 scale, with
 * its first and last value, so every line is named where it is drawn. Our words and numbers only.
 */
function chartSection(f: FileReport, head: Envelope, points: number): string {
  const base = f.base?.envelopes.find(
    (e) => e.challenge === head.challenge && e.kind === head.kind && sameGrid(e, head),
  );
  const idx = sampleIndices(head.x.length, points);
  const pick = (v: readonly number[]) => idx.map((i) => v[i] ?? 0);
  const [qlo, qhi] = head.band;
  const series: { name: string; values: number[] }[] = [];
  const hi = head.quantiles[String(qhi)]?.value;
  if (hi) series.push({ name: `head ${Math.round(qhi * 100)} % quantile`, values: pick(hi) });
  series.push({ name: 'head median', values: pick(head.median) });
  if (base) series.push({ name: 'base median', values: pick(base.median) });
  const lo = head.quantiles[String(qlo)]?.value;
  if (lo) series.push({ name: `head ${Math.round(qlo * 100)} % quantile`, values: pick(lo) });
  const end = head.x[head.x.length - 1] ?? 0;
  const range =
    head.xUnit === 'km'
      ? `0 to ${formatValue(end)} km`
      : `0 to ${Math.round(end * 100)} % ${kindPlural(head.kind)} removed`;
  const width = Math.max(...series.map((s) => s.name.length));
  let text = `**${challengeLabel(head.challenge)}**: R (bars on a 0\u20131 scale) against ${xAxisLabel(head.kind, head.xUnit)}, ${range}:\n\n\`\`\`text\n`;
  for (const s of series)
    text += `${s.name.padEnd(width)}  ${sparkline(s.values)}  ${formatValue(s.values[0])} \u2192 ${formatValue(s.values[s.values.length - 1])}\n`;
  text += '```\n\n';
  const areas = `area ${formatValue(head.area)}${base ? ` (base ${formatValue(base.area)})` : ''}, spread ${formatValue(head.spread)}${base ? ` (base ${formatValue(base.spread)})` : ''}`;
  return `${text}${head.realizations} realizations, seed ${head.seed}; ${areas}.\n\n`;
}

function sameGrid(a: Envelope, b: Envelope): boolean {
  return a.x.length === b.x.length && a.x.every((v, i) => Math.abs(v - (b.x[i] ?? NaN)) < 1e-12);
}

function elementChain(elements: readonly ReportElement[], max = 12): string {
  const shown = elements.slice(0, max).map(mdElement);
  return shown.join(' \u2192 ') + (elements.length > max ? ` \u2192 \u2026 (${elements.length - max} more)` : '');
}

function elementList(elements: readonly ReportElement[], max = 20): string {
  const shown = elements.slice(0, max).map(mdElement);
  return shown.join(', ') + (elements.length > max ? `, \u2026 (${elements.length - max} more)` : '');
}

function sequencesSection(f: FileReport, max: number, chain: number): string {
  const head = f.head;
  if (!head) return '';
  const known = knownElements(f);
  const items: string[] = [];
  for (const seq of weakestSequences(f).slice(0, max)) {
    const r =
      seq.values && seq.values.length
        ? `; R ${formatValue(seq.values[0])} \u2192 ${formatValue(seq.values[seq.values.length - 1])}`
        : '';
    const cost = seq.consequence ? ` These removals ${md(costSentence(seq.consequence, true))}.` : '';
    items.push(`- ${escapeProse(seq.title, 300)}: ${elementChain(seq.elements, chain)}${r}.${cost}`);
  }
  for (const c of head.contingencies) {
    const worst = c.worst[0];
    if (worst) {
      items.push(
        `- ${contingencyLabel(c.challenge, c.kind)}, ${c.evaluated} of ${c.total} cases: the worst, ${elementList(worst.elements.map((id, i) => worst.located?.[i] ?? knownElement(known, c.kind, id)))}, leaves R ${formatValue(worst.value)}`,
      );
    }
  }
  if (!items.length) return '';
  return `**Weakest removal sequences at head**:\n\n${items.join('\n')}\n\n`;
}

function structureSection(f: FileReport): string {
  const h = f.head?.structure;
  if (!h) return '';
  const b = f.base?.structure;
  const list = (els: ReportElement[]) => (els.length ? elementList(els) : 'none');
  const rows = [
    `| sites | ${b ? b.nodes : '\u2013'} | ${h.nodes} |`,
    `| links | ${b ? b.links : '\u2013'} | ${h.links} |`,
    `| components | ${b ? b.components : '\u2013'} | ${h.components} |`,
    `| bridges | ${b ? b.bridges.length : '\u2013'} | ${h.bridges.length} |`,
    `| cut sites | ${b ? b.cutNodes.length : '\u2013'} | ${h.cutNodes.length} |`,
  ];
  let text = `**Structure** of ${markdownCode(f.path, 300)}:\n\n| | base | head |\n|---|---:|---:|\n${rows.join('\n')}\n\n`;
  text += `Bridges at head: ${list(h.bridges)}\n\nCut sites at head: ${list(h.cutNodes)}\n\n`;
  const degraded = f.head?.degraded ?? [];
  if (degraded.length) text += `Reduced evaluation: ${degraded.map((d) => escapeProse(d, 200)).join('; ')}\n\n`;
  return text;
}

function footer(report: Report, options: MarkdownOptions, note: string): string {
  let text = note;
  const artifacts = options.artifacts ?? [];
  if (artifacts.length || options.runUrl) {
    const list = artifacts.map((a) => markdownCode(a, 200)).join(', ');
    const run =
      options.runUrl && /^https?:\/\/[^\s<>()]+$/.test(options.runUrl)
        ? `[the workflow run](${options.runUrl})`
        : 'the workflow run';
    text += `Full detail${list ? ` (${list})` : ''} is in the artifacts of ${run}.\n\n`;
  }
  text += `**Caution.** ${escapeProse(report.caution, 1000)}\n`;
  return text;
}
