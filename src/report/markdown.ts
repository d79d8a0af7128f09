// The report as GitHub-flavoured Markdown: the job summary and the body of the one living PR
// comment. Pure: report in, string out. Both have hard size limits on GitHub (the summary is
// refused whole above 1 MiB, a comment above 65,536 characters), so both are assembled
// against a budget: worst designs first, each at the most detail that still fits, and a note
// saying what was left out and where it is. Charts are Mermaid `xychart-beta` blocks (which
// GitHub renders in summaries and comments) with a Unicode sparkline table beside them, since
// GitHub Markdown allows neither inline SVG nor data: images. No user-controlled text enters
// Mermaid except the change's neighbourhood graph's labels, reduced to letters, digits and
// ". _ -" (mermaid-map.ts); everything user-controlled goes through escape.ts.

import type { Envelope } from '../envelope/types.js';
import { escapeHtml, escapeMarkdown, markdownCode, markerValue, oneLine } from './escape.js';
import { findingNumbers, repoPath } from './finding-text.js';
import { stableHash } from '../random.js';
import {
  REQUIREMENT_STATUS_WORD,
  STATUS_WORD,
  challengeLabel,
  configurationNotes,
  consequenceSentence,
  contingencyLabel,
  describeChanges,
  describeModifications,
  describeNotApplicable,
  fileStatusWord,
  findingTitle,
  formatElement,
  formatError,
  formatRequirementDelta,
  formatRequirementValue,
  formatValue,
  groupFindings,
  kindPlural,
  knownElement,
  knownElements,
  type GroupedFinding,
  weakestSequences,
  xAxisLabel,
} from './labels.js';
import { changeMapMarkdown } from './mermaid-map.js';
import { rankFiles, rankFindings, worstSeverity } from './rank.js';
import type { Consequence, FileReport, Finding, Report, ReportElement, RequirementResult, Severity } from './report.js';

/** GitHub refuses a step summary over 1 MiB; stay well below (bytes of UTF-8). */
export const SUMMARY_BUDGET_BYTES = 900 * 1024;
/** GitHub refuses a comment body over 65,536 characters; keep a margin. */
export const COMMENT_BUDGET_CHARS = 60_000;
/** Points per Mermaid line (Mermaid refuses sources over 50,000 characters; keep charts small). */
export const CHART_POINTS = 21;

export interface MarkdownOptions {
  /** Shown in the heading, e.g. the project of a monorepo ("netbrace — metro"). Plain text. */
  title?: string;
  /** The workflow run, where the artifacts (JSON, SARIF, HTML) can be downloaded. */
  runUrl?: string;
  /** Joined before report paths to make them repository-relative (the working directory). */
  pathPrefix?: string;
  /** Size budget: bytes for the summary, characters for the comment. */
  budget?: number;
  /** Maximum points per chart line. */
  chartPoints?: number;
  /** Artifact files this run wrote (repository-relative names), listed in the footer. */
  artifacts?: string[];
  /** Extra lines (plain text) the shell wants the reader to see, e.g. "comment skipped". */
  notes?: string[];
}

export interface CommentOptions extends MarkdownOptions {
  /** The comment key (so several jobs keep separate comments). */
  key: string;
}

const ICON: Record<Severity | 'ok', string> = { fail: '\u274C', warn: '\u26A0\uFE0F', notice: '\u2139\uFE0F', ok: '\u2705' };
const SEVERITY_WORD: Record<Severity, string> = { fail: 'failure', warn: 'warning', notice: 'notice' };
const RULE_WORD: Record<Finding['rule'], string> = {
  'r-threshold': 'r-threshold',
  'area-floor': 'area floor',
  'spread-ceiling': 'spread ceiling',
  'n-1': 'N\u22121 rule',
  'new-bridge': 'new bridge',
  'new-cut-node': 'new cut node',
  'new-stranding-group': 'new stranding shared-risk group',
  'hardened-weak-point': 'weak point hidden by hardening',
  regression: 'regression',
  'weakest-sequence': 'weakest sequence',
  'parse-error': 'unreadable design',
  'removed-design': 'removed design',
  'policy-changed': 'policy changed',
  degraded: 'reduced evaluation',
  'not-computable': 'value not computable',
};

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
    overviewRows: 1000,
    findingsFull: 200,
    findingsCompact: 20,
    charts: Number.MAX_SAFE_INTEGER,
    prefix: '',
    chartPoints: options.chartPoints ?? CHART_POINTS,
    envelopesPerDesign: 4,
  });
}

/** The PR comment body, with its hidden marker, under 65,536 characters (default 60,000). */
export function renderComment(report: Report, options: CommentOptions): string {
  const prefix = `${commentMarker(options.key)}\n<!-- netbrace:digest ${reportDigest(report)} -->\n`;
  return assemble(report, options, {
    budget: Math.min(options.budget ?? COMMENT_BUDGET_CHARS, 65_000),
    measure: (s) => s.length,
    overviewRows: 100,
    findingsFull: 25,
    findingsCompact: 5,
    charts: 3,
    prefix,
    chartPoints: options.chartPoints ?? CHART_POINTS,
    envelopesPerDesign: 1,
  });
}

interface Layout {
  budget: number;
  measure: (s: string) => number;
  overviewRows: number;
  findingsFull: number;
  findingsCompact: number;
  /** How many designs get a chart at full detail. */
  charts: number;
  prefix: string;
  chartPoints: number;
  /** Envelopes charted per design at full detail. */
  envelopesPerDesign: number;
}

type Detail = 'full' | 'compact';

function assemble(report: Report, options: MarkdownOptions, layout: Layout): string {
  const files = rankFiles(report.files);
  const path = (p: string) => repoPath(options.pathPrefix, p);
  const head = layout.prefix + header(report, options) + overview(files, layout.overviewRows, path);
  let body = '';
  let used = layout.measure(head);
  let charts = 0;
  let omitted = 0;
  const reserve = 2048; // the footer, the truncation note and a margin
  const footerText = (note: string) => footer(report, options, note);
  const footerSize = layout.measure(footerText(''));
  for (const f of files) {
    if (omitted > 0) {
      omitted++;
      continue;
    }
    let placed = false;
    for (const detail of ['full', 'compact'] as Detail[]) {
      const section = fileSection(f, detail, layout, path, detail === 'full' && charts < layout.charts);
      const size = layout.measure(section);
      if (used + size + reserve + footerSize <= layout.budget) {
        body += section;
        used += size;
        if (detail === 'full' && charts < layout.charts && hasChart(f)) charts++;
        placed = true;
        break;
      }
    }
    if (!placed) omitted = 1;
  }
  const note =
    omitted > 0
      ? `${ICON.notice} ${omitted} more design${omitted === 1 ? '' : 's'} (the least severe) did not fit within GitHub's size limit for this view and ${omitted === 1 ? 'is' : 'are'} listed only in the table above; every finding is in the JSON report and the SARIF file.\n\n`
      : '';
  const text = head + body + footerText(note);
  // The budget reserve covers the footer; a pathological title or notes list cannot overflow.
  return layout.measure(text) <= layout.budget ? text : truncateTo(text, layout);
}

function truncateTo(text: string, layout: Layout): string {
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
  const name = options.title ? `netbrace \u2014 ${escapeMarkdown(options.title, 120)}` : 'netbrace';
  let verdict: string;
  if (report.files.length === 0) verdict = `${ICON.ok} ${name}: no design file changed \u2014 pass`;
  else if (report.verdict === 'pass') verdict = `${ICON.ok} ${name}: pass`;
  else if (report.mode === 'inform') verdict = `${ICON.warn} ${name}: would fail (inform mode, not blocking)`;
  else verdict = `${ICON.fail} ${name}: the gate failed`;
  const facts: string[] = [`${report.mode} mode`];
  if (report.policy.source === 'builtin') facts.push('built-in default policy (no policy file)');
  else {
    const where = report.policy.revision ? ` at ${shortSha(report.policy.revision)}` : '';
    facts.push(`policy ${markdownCode(report.policy.path ?? '?')}${where}`);
  }
  if (report.base && report.head) facts.push(`base ${shortSha(report.base)} \u2192 head ${shortSha(report.head)}`);
  else if (report.head) facts.push(`head ${shortSha(report.head)}, thresholds only (no base)`);
  facts.push(`seed ${report.seed}`);
  if (report.scope === 'all') facts.push('every design, thresholds only');
  if (report.part) facts.push(`part ${report.part.index} of ${report.part.total}`);
  if (report.parts) facts.push(`joined parts ${report.parts.joined.join(', ')} of ${report.parts.total}`);
  let text = `## ${verdict}\n\n${facts.join(' \u00b7 ')}\n\n`;
  if (report.policy.changed) {
    const said = report.policy.note
      ? `${escapeMarkdown(report.policy.note.replace(/\.\s*$/, ''), 600)}.`
      : 'The policy shown here was read from the base; the proposed policy applies once the change is merged.';
    text += `> ${ICON.warn} This change modifies the policy file. ${said}\n\n`;
  } else if (report.policy.note) {
    text += `> ${ICON.notice} ${escapeMarkdown(report.policy.note.replace(/\.\s*$/, ''), 600)}.\n\n`;
  }
  for (const n of configurationNotes(report).filter((x) => x.file !== report.policy.path)) {
    text += `> ${n.weakens ? ICON.fail : ICON.notice} ${escapeMarkdown(n.text, 600)}.\n\n`;
  }
  for (const n of options.notes ?? []) text += `> ${escapeMarkdown(n, 500)}\n\n`;
  return text;
}

function overview(files: FileReport[], maxRows: number, path: (p: string) => string): string {
  if (files.length === 0) return 'No design file changed between base and head, so there is nothing to judge.\n\n';
  const counts = new Map<string, number>();
  for (const f of files) counts.set(fileStatusWord(f), (counts.get(fileStatusWord(f)) ?? 0) + 1);
  const parts = [...counts.entries()].map(([s, n]) => `${n} ${s}`);
  let text = `${files.length} design${files.length === 1 ? '' : 's'} evaluated: ${parts.join(', ')}.\n\n`;
  text += '| | design | status | findings | worst finding |\n|---|---|---|---|---|\n';
  for (const f of files.slice(0, maxRows)) {
    const worst = rankFindings(f.findings)[0];
    const w = worstSeverity(f);
    const name = f.previousPath ? `${markdownCode(path(f.previousPath), 200, true)} \u2192 ${markdownCode(path(f.path), 200, true)}` : markdownCode(path(f.path), 200, true);
    const worstText = worst ? `${lineRef(worst)}${escapeMarkdown(worst.message, 160)}` : '';
    text += `| ${w ? ICON[w] : ICON.ok} | ${name} | ${fileStatusWord(f)} | ${findingCounts(f)} | ${worstText} |\n`;
  }
  if (files.length > maxRows) text += `\n\u2026 and ${files.length - maxRows} more designs, least severe last; see the JSON report.\n`;
  return `${text}\n`;
}

function findingCounts(f: FileReport): string {
  const n = { fail: 0, warn: 0, notice: 0 };
  for (const x of f.findings) n[x.severity]++;
  const parts = (['fail', 'warn', 'notice'] as Severity[]).filter((s) => n[s] > 0).map((s) => `${n[s]} ${SEVERITY_WORD[s]}${n[s] === 1 ? '' : 's'}`);
  return parts.length ? parts.join(', ') : 'none';
}

function lineRef(x: Finding): string {
  return x.line > 0 ? `line ${x.line}: ` : '';
}

function hasChart(f: FileReport): boolean {
  return Boolean(f.head?.envelopes.length);
}

function fileSection(f: FileReport, detail: Detail, layout: Layout, path: (p: string) => string, chart: boolean): string {
  const w = worstSeverity(f);
  const renamed = f.previousPath ? ` (renamed from ${markdownCode(path(f.previousPath))})` : '';
  let text = `### ${w ? ICON[w] : ICON.ok} ${markdownCode(path(f.path))} \u2014 ${fileStatusWord(f)}${renamed}\n\n`;
  if (f.error) {
    const what = fileStatusWord(f) === STATUS_WORD.unreadable ? 'Could not be read' : 'Could not be evaluated';
    text += `${what}: line ${f.error.line}, column ${f.error.column}: ${escapeMarkdown(f.error.message, 500)}\n\n`;
  }
  if (f.requirements.length) text += requirementTable(f.requirements);
  const notApplicable = describeNotApplicable(f.head);
  if (notApplicable) text += `Not applicable to this design: ${escapeMarkdown(notApplicable, 600)}\n\n`;
  const changes = describeChanges(f);
  const modified = describeModifications(f, detail === 'full' ? 50 : 10);
  if (changes || modified.length) {
    text += '**What the change does**:\n\n';
    if (changes) text += `- ${escapeMarkdown(changes, 1500)}\n`;
    for (const m of modified) text += `- ${escapeMarkdown(m, 300)}\n`;
    text += '\n';
  }
  // New bridges and cut nodes of one severity read best as one line each.
  const findings = groupFindings(rankFindings(f.findings));
  const cap = detail === 'full' ? layout.findingsFull : layout.findingsCompact;
  if (findings.length) {
    text += '**Findings**, worst first:\n\n';
    for (const x of findings.slice(0, cap)) text += `- ${findingLine(x)}\n`;
    if (findings.length > cap) text += `- \u2026 ${findings.length - cap} more in the JSON report and the SARIF file\n`;
    text += '\n';
  }
  if (detail === 'full') {
    if (chart) for (const env of (f.head?.envelopes ?? []).slice(0, layout.envelopesPerDesign)) text += chartSection(f, env, layout.chartPoints);
    text += changeMapMarkdown(f);
    text += weakestSection(f);
    text += structureSection(f);
  }
  return text;
}

function requirementTable(rows: RequirementResult[]): string {
  let text = '| requirement | base | head | \u0394 \u00b1 error | status |\n|---|---:|---:|---:|---|\n';
  let noise = false;
  for (const r of rows) {
    const icon =
      r.status === 'holds' ? ICON.ok : r.status === 'inside-error' ? '\u3030\uFE0F' : r.status === 'unsettled' ? '\u2754' : r.status === 'not-applicable' ? '\u2796' : ICON[r.severity];
    if (r.status === 'inside-error') noise = true;
    const err = formatError(r.se);
    const delta = r.delta === null ? '\u2013' : `${formatRequirementDelta(r)}${err ? ` ${err}` : ''}`;
    text += `| ${escapeMarkdown(r.description, 200)} | ${formatRequirementValue(r, r.base)} | ${formatRequirementValue(r, r.head)} | ${delta} | ${icon} ${REQUIREMENT_STATUS_WORD[r.status]} |\n`;
  }
  if (noise) text += '\n\u3030\uFE0F *inside the error*: the value dropped by less than its Monte Carlo error, which is never a failure.\n';
  return `${text}\n`;
}

function findingLine(x: GroupedFinding): string {
  const where = x.line > 0 ? ` (line ${x.line}${x.column ? `, column ${x.column}` : ''})` : '';
  const text = `${ICON[x.severity]} **${RULE_WORD[x.rule] ? findingTitle(x, RULE_WORD) : escapeMarkdown(x.rule, 40)}**${where}: ${escapeMarkdown(x.message, 600)}${findingNumbers(x)}`;
  // What each weak point costs: one sentence, or one sub-item per member of a merged finding
  // (escaped as plain text, like the message it follows).
  const members = x.grouped && x.members && x.members.length > 1 ? x.members.filter((m) => m.consequence) : [];
  const plain = (t: string) => escapeMarkdown(t, 1200);
  if (members.length) return `${text}\n${members.map((m) => `  - ${plain(`${formatElement(m.elements[0])}: ${consequenceSentence(m.consequence!, '')}`)}`).join('\n')}`;
  return x.consequence ? `${text} ${plain(consequenceSentence(x.consequence))}` : text;
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
  return values
    .map((v) => (Number.isFinite(v) ? BARS[Math.min(7, Math.max(0, Math.round(v * 7)))] : ' '))
    .join('');
}

function chartNumber(v: number): string {
  return Number.isFinite(v) ? String(Math.round(v * 1000) / 1000) : '0';
}

function chartSection(f: FileReport, head: Envelope, points: number): string {
  const base = f.base?.envelopes.find((e) => e.challenge === head.challenge && e.kind === head.kind && sameGrid(e, head));
  const idx = sampleIndices(head.x.length, points);
  const pick = (v: readonly number[]) => idx.map((i) => v[i] ?? 0);
  const [qlo, qhi] = head.band;
  const lo = head.quantiles[String(qlo)]?.value;
  const series: { name: string; values: number[] }[] = [{ name: 'head median', values: pick(head.median) }];
  if (base) series.push({ name: 'base median', values: pick(base.median) });
  if (lo) series.push({ name: `head ${Math.round(qlo * 100)} % quantile (band low)`, values: pick(lo) });
  const hi = head.quantiles[String(qhi)]?.value;
  if (hi) series.push({ name: `head ${Math.round(qhi * 100)} % quantile (band high)`, values: pick(hi) });
  const xs = pick(head.x);
  const caption = challengeLabel(head.challenge);
  // Only our own words and numbers enter Mermaid: no user-controlled text.
  let text = `**Head envelope against the base** \u2014 ${caption}, R against ${xAxisLabel(head.kind, head.xUnit)}:\n\n`;
  text += '```mermaid\nxychart-beta\n';
  text += `  title "${mermaidSafe(caption)}"\n`;
  text += `  x-axis "${mermaidSafe(xAxisLabel(head.kind, head.xUnit))}" [${xs.map((x) => `"${chartNumber(x)}"`).join(', ')}]\n`;
  text += '  y-axis "R" 0 --> 1\n';
  for (const s of series) text += `  line [${s.values.map(chartNumber).join(', ')}]\n`;
  text += '```\n\n';
  const end = head.x[head.x.length - 1] ?? 0;
  const range = head.xUnit === 'km' ? `0 to ${chartNumber(end)} km` : `0 to ${Math.round(end * 100)} % ${kindPlural(head.kind)} removed`;
  text += `| line (in drawing order) | R over ${range} | start | end |\n|---|---|---:|---:|\n`;
  for (const s of series) {
    text += `| ${s.name} | ${sparkline(s.values)} | ${formatValue(s.values[0])} | ${formatValue(s.values[s.values.length - 1])} |\n`;
  }
  const areas = `area ${formatValue(head.area)}${base ? ` (base ${formatValue(base.area)})` : ''}, spread ${formatValue(head.spread)}${base ? ` (base ${formatValue(base.spread)})` : ''}`;
  return `${text}\n${head.realizations} realizations, seed ${head.seed}; ${areas}.\n\n`;
}

function sameGrid(a: Envelope, b: Envelope): boolean {
  return a.x.length === b.x.length && a.x.every((v, i) => Math.abs(v - (b.x[i] ?? NaN)) < 1e-12);
}

function mermaidSafe(text: string): string {
  return text.replace(/["\n\r\\`<>]/g, ' ');
}

/**
 * An element as Markdown names it: formatElement with its id and label in code spans. A line
 * holds user text either in code spans or escaped, never both, so no escaped backtick of one
 * can be read as pairing with a code span of the other.
 */
function mdElement(e: ReportElement): string {
  return formatElement(e, MD_STYLE);
}

function elementChain(elements: readonly ReportElement[], max = 12): string {
  const shown = elements.slice(0, max).map(mdElement);
  return shown.join(' \u2192 ') + (elements.length > max ? ` \u2192 \u2026 (${elements.length - max} more)` : '');
}

function elementList(elements: readonly ReportElement[], max = 20): string {
  const shown = elements.slice(0, max).map(mdElement);
  return shown.join(', ') + (elements.length > max ? `, \u2026 (${elements.length - max} more)` : '');
}

function mdCost(c: Consequence | undefined, subject: string): string {
  return c ? ` ${consequenceSentence(c, subject, MD_STYLE)}` : '';
}

const MD_STYLE = { id: (x: string) => markdownCode(x, 120), text: (x: string) => markdownCode(x, 120) };

function weakestSection(f: FileReport): string {
  const head = f.head;
  if (!head) return '';
  const known = knownElements(f);
  const items: string[] = [];
  for (const seq of weakestSequences(f).slice(0, 6)) {
    const r = seq.values && seq.values.length ? `; R ${formatValue(seq.values[0])} \u2192 ${formatValue(seq.values[seq.values.length - 1])}` : '';
    items.push(`- ${escapeMarkdown(seq.title, 300)}: ${elementChain(seq.elements)}${r}.${mdCost(seq.consequence, 'These removals')}`);
  }
  for (const c of head.contingencies) {
    const worst = c.worst[0];
    if (worst) {
      items.push(`- ${contingencyLabel(c.challenge, c.kind)}, ${c.evaluated} of ${c.total} cases: the worst, ${elementList(worst.elements.map((id, i) => worst.located?.[i] ?? knownElement(known, c.kind, id)))}, leaves R ${formatValue(worst.value)}`);
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
  // One line: a line break (a blank line above all) would end the HTML block early.
  let text = `<details><summary>Structure of ${escapeHtml(oneLine(f.path, 300))}</summary>\n\n| | base | head |\n|---|---:|---:|\n${rows.join('\n')}\n\n`;
  text += `Bridges at head: ${list(h.bridges)}\n\nCut sites at head: ${list(h.cutNodes)}\n\n`;
  const degraded = f.head?.degraded ?? [];
  if (degraded.length) text += `Reduced evaluation: ${degraded.map((d) => escapeMarkdown(d, 200)).join('; ')}\n\n`;
  return `${text}</details>\n\n`;
}

function footer(report: Report, options: MarkdownOptions, note: string): string {
  let text = note;
  const artifacts = options.artifacts ?? [];
  if (artifacts.length || options.runUrl) {
    const list = artifacts.map((a) => markdownCode(a, 200)).join(', ');
    const run = options.runUrl && /^https?:\/\/[^\s<>()]+$/.test(options.runUrl) ? `[the workflow run](${options.runUrl})` : 'the workflow run';
    text += `Full detail${list ? ` (${list})` : ''} is in the artifacts of ${run}.\n\n`;
  }
  text += `<sub>${escapeMarkdown(report.caution, 1000)} netbrace ${escapeMarkdown(report.tool.version, 40)}.</sub>\n`;
  return text;
}

function shortSha(sha: string): string {
  return markdownCode(/^[0-9a-f]{40}$/i.test(sha) ? sha.slice(0, 7) : sha, 60);
}


function utf8Length(s: string): number {
  let n = 0;
  for (let i = 0; i < s.length; i++) {
    const c = s.charCodeAt(i);
    if (c < 0x80) n += 1;
    else if (c < 0x800) n += 2;
    else if (c >= 0xd800 && c <= 0xdbff) {
      n += 4;
      i++;
    } else n += 3;
  }
  return n;
}
