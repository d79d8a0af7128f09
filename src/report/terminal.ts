// The terminal view of a report: the verdict per design, the requirement table (base → head,
// delta ± error), the findings, the weakest removal sequences by element and line, a compact
// Unicode envelope chart and the caution. Pure: colour is on or off by the caller's choice.

import { createColors } from 'picocolors';
import type { Colors } from 'picocolors/types.js';
import type { Envelope } from '../envelope/types.js';
import { envelopeChart, type ChartSeries, type EnvelopeChart } from './chart.js';
import {
  configurationNotes,
  consequenceSentence,
  describeChanges,
  describeModifications,
  describeNotApplicable,
  statusCounts,
  fileStatusWord,
  fileFails,
  formatElement,
  fileWarns,
  formatError,
  formatFraction,
  formatRequirementDelta,
  formatRequirementValue,
  formatValue,
  REQUIREMENT_STATUS_WORD,
  bySeverity,
  groupFindings,
  shortRevision,
  weakestSequences,
  type GroupedFinding,
} from './labels.js';
import type { Evaluation, FileReport, Report, RequirementResult } from './report.js';
import { oneLine } from './escape.js';

export interface TerminalOptions {
  /** ANSI colour (the shell decides: NO_COLOR, TTY, FORCE_COLOR). */
  color: boolean;
  /** Terminal width in columns; lines are kept within it where possible. */
  width: number;
}

const SYMBOL = { fail: '\u2717', warn: '\u25b2', notice: 'i', pass: '\u2713' } as const;

export function renderTerminal(input: Report, options: TerminalOptions): string {
  // Every string in a report may come from a design file (ids, paths, messages): strip control
  // characters and invisible reordering ones before any of it reaches a terminal, so a crafted
  // id cannot move the cursor, recolour or hide text.
  const report = JSON.parse(JSON.stringify(input), (_key, v: unknown) => (typeof v === 'string' ? oneLine(v) : v)) as Report;
  const c = createColors(options.color);
  const width = Math.max(60, Math.min(options.width || 100, 160));
  const out: string[] = [];
  out.push(headerLine(report, c));
  for (const note of policyNotes(report)) out.push(c.dim(note));
  if (report.files.length === 0) out.push('', 'No design files changed: nothing to judge.');
  for (const f of report.files) out.push('', ...renderFile(f, c, width));
  out.push('', ...verdictLines(report, c, width));
  out.push(...wrap(`Caution: ${report.caution}`, width).map((l) => c.dim(l)));
  // The terminal view is also a CI log: the runner reads `::` at a line start as a workflow
  // command, and wrapping can put an id's `::` there (after spaces or colour codes). Defuse
  // it as logText() does.
  return `${out.join('\n')}\n`.replace(/(^|\n)((?:\s|\u001b\[[0-9;]*m)*)::/g, '$1$2:\u200A:');
}

function headerLine(r: Report, c: Colors): string {
  const parts = [`netbrace ${r.tool.version}`];
  if (r.base || r.head) parts.push(`base ${shortRevision(r.base)} \u2192 head ${shortRevision(r.head)}`);
  parts.push(`seed ${r.seed}`);
  if (r.part) parts.push(`part ${r.part.index}/${r.part.total}`);
  return c.bold(parts.join(' \u00b7 '));
}

function policyNotes(r: Report): string[] {
  const notes: string[] = [];
  if (r.policy.source === 'builtin') notes.push('policy: none found \u2014 the built-in defaults for communication backbones were applied');
  else notes.push(`policy: ${r.policy.path ?? '(file)'}${r.policy.revision ? ` as of ${shortRevision(r.policy.revision)}` : ''}`);
  if (r.policy.note && !r.policy.changed) notes.push(`policy: ${r.policy.note}`);
  else if (r.policy.changed && !r.policy.path) notes.push('policy: this change edits the policy; the proposed policy was not applied to judge it');
  for (const n of configurationNotes(r)) notes.push(`configuration: ${n.text}`);
  if (r.scope === 'all') notes.push('scope: every design in the repository, judged against thresholds only');
  if (r.mode === 'inform') notes.push('mode: inform \u2014 failures are reported but do not fail the run');
  return notes;
}

function verdictLines(r: Report, c: Colors, width: number): string[] {
  const failed = r.files.filter(fileFails).length;
  const warned = r.files.filter(fileWarns).length;
  const counts = statusCounts(r).join(', ');
  const tail = `${r.files.length} design${r.files.length === 1 ? '' : 's'}${counts ? ` (${counts})` : ''}` +
    (failed ? `, ${failed} failing` : '') + (warned ? `, ${warned} with warnings` : '');
  const text = r.verdict === 'fail' ? `${SYMBOL.fail} Verdict: FAIL \u2014 ${tail}` : `${SYMBOL.pass} Verdict: PASS \u2014 ${tail}`;
  const paint = r.verdict === 'fail' ? c.red : c.green;
  return wrap(text, width).map((l) => c.bold(paint(l)));
}

function renderFile(f: FileReport, c: Colors, width: number): string[] {
  const out: string[] = [];
  const fails = fileFails(f);
  const warns = fileWarns(f);
  const mark = fails ? c.red(SYMBOL.fail) : warns ? c.yellow(SYMBOL.warn) : c.green(SYMBOL.pass);
  const word = fails ? c.red('FAIL') : warns ? c.yellow('PASS with warnings') : c.green('PASS');
  const renamed = f.previousPath ? ` (was ${f.previousPath})` : '';
  out.push(`${mark} ${c.bold(f.path)}${renamed} \u2014 ${word} \u00b7 ${fileStatusWord(f)}`);
  if (f.error) {
    out.push(...wrap(`${f.path}:${f.error.line || 1}:${f.error.column || 1}: ${f.error.message}`, width - 2).map((l) => `  ${l}`));
  }
  if (f.head) out.push(...wrap(describeEvaluation(f.head), width - 2).map((l) => c.dim(`  ${l}`)));
  const notApplicable = describeNotApplicable(f.head);
  if (notApplicable) out.push(...wrap(`not applicable: ${notApplicable}`, width - 2).map((l) => c.dim(`  ${l}`)));
  const changed = describeChanges(f);
  if (changed) out.push(...wrap(`changed: ${changed}`, width - 2).map((l) => `  ${l}`));
  const modified = describeModifications(f);
  if (modified.length) {
    out.push('  changed attributes:');
    for (const m of modified) out.push(...wrap(m, width - 6).map((l, i) => (i === 0 ? `    \u2022 ${l}` : `      ${l}`)));
  }
  if (f.requirements.length) out.push('', ...requirementTable(f.requirements, c, width));
  // The file's error is printed above: its finding is not repeated.
  const findings = f.findings.filter((x) => x.rule !== 'weakest-sequence' && x.rule !== 'parse-error' && !(f.error && x.rule === 'not-computable' && x.message === f.error.message));
  if (findings.length) {
    out.push('', c.bold('  Findings'));
    for (const x of groupFindings(bySeverity(findings))) out.push(...findingLines(x, c, width));
  }
  const sequences = weakestSequences(f);
  if (sequences.length) {
    out.push('', c.bold('  Weakest removal sequences'));
    for (const s of sequences) {
      const more = s.ids.length > MAX_CHAIN ? ` \u2192 \u2026 (${s.ids.length - MAX_CHAIN} more)` : '';
      const chain = s.elements.slice(0, MAX_CHAIN).map((e) => formatElement(e, NBSP)).join(' \u2192 ') + more;
      const v = s.values ?? [];
      const rs = !v.length ? '' : v.length === s.ids.length && v.length <= MAX_CHAIN ? v.map(formatValue).join(' \u2192 ') : `${formatValue(v[0])} \u2192 \u2026 \u2192 ${formatValue(v[v.length - 1])}`;
      out.push(...wrap(`${s.title}: ${chain}${rs ? ` \u00b7 R ${rs}` : ''}`, width - 4).map((l, i) => (i === 0 ? `  \u2022 ${l}` : `    ${l}`)));
      if (s.consequence) out.push(...wrap(consequenceSentence(s.consequence, 'These removals', NBSP), width - 4).map((l) => c.dim(`    ${l}`)));
    }
  }
  const env = f.head?.envelopes[0];
  if (env && f.head) out.push('', ...terminalChart(envelopeChart(env, f.head, f.base), env, c, width));
  return out;
}

function describeEvaluation(ev: Evaluation): string {
  const metrics = ev.r.metrics.map((m) => `${m.id} ${m.weight}`).join(', ');
  const s = ev.structure;
  const spof = `${s.bridges.length} bridge${s.bridges.length === 1 ? '' : 's'}, ${s.cutNodes.length} cut node${s.cutNodes.length === 1 ? '' : 's'}`;
  return `R = ${ev.r.combine === 'min' ? 'minimum' : 'weighted mean'} of ${metrics} \u00b7 ${s.nodes} sites, ${s.links} links, ${spof}`;
}

function requirementTable(rows: RequirementResult[], c: Colors, width: number): string[] {
  // indent, gaps and the base → head, delta and status columns ("x short of its floor" is 20 wide)
  const fixed = 2 + 2 + 6 + 3 + 6 + 2 + 17 + 2 + 20;
  const descWidth = Math.max(20, Math.min(56, width - fixed));
  const header = `  ${'Requirement'.padEnd(descWidth)}  ${'base'.padStart(6)}   ${'head'.padStart(6)}  ${'\u0394 \u00b1 error'.padEnd(17)}  status`;
  const out = [c.bold(header)];
  for (const r of rows) {
    const desc = wrap(r.description, descWidth);
    const delta = `${formatRequirementDelta(r)} ${formatError(r.se)}`.trim();
    const status = REQUIREMENT_STATUS_WORD[r.status];
    const bad = r.status === 'short' || r.status === 'weakened';
    const sev = bad ? (r.severity === 'fail' ? c.red : r.severity === 'warn' ? c.yellow : c.cyan) : r.status === 'holds' ? c.green : c.dim;
    const symbol = bad ? SYMBOL[r.severity] : r.status === 'holds' ? SYMBOL.pass : r.status === 'not-applicable' ? '\u2013' : '~';
    const first = `  ${desc[0].padEnd(descWidth)}  ${formatRequirementValue(r, r.base).padStart(6)} \u2192 ${formatRequirementValue(r, r.head).padStart(6)}  ${delta.padEnd(17)}  ${sev(`${symbol} ${status}`)}`;
    out.push(first, ...desc.slice(1).map((l) => `  ${l}`));
  }
  if (rows.some((r) => r.status === 'inside-error')) {
    const note = 'inside the error: the value dropped by less than its Monte Carlo error, which is never a failure';
    out.push(...wrap(note, width - 2).map((l) => c.dim(`  ${l}`)));
  }
  return out;
}

/** Element names keep "(line 14)" together when lines wrap. */
const NBSP = { space: '\u00a0' };
/** The finding's kind in the findings list: a drop that is not a regression is a "change". */
function findingTag(x: GroupedFinding): string {
  if (x.rule === 'regression' && x.status !== undefined && x.status !== 'weakened') return 'change';
  return x.rule;
}

/** Elements shown under a finding, and steps of a sequence, before "… N more". */
const MAX_ELEMENTS = 5;
const MAX_CHAIN = 8;

function findingLines(x: GroupedFinding, c: Colors, width: number): string[] {
  const paint = x.severity === 'fail' ? c.red : x.severity === 'warn' ? c.yellow : c.cyan;
  const where = x.line > 0 ? `line ${x.line}` : '';
  const head = `  ${paint(`${SYMBOL[x.severity]} ${x.severity.padEnd(6)}`)} ${findingTag(x).padEnd(16)} ${where.padEnd(10)} `;
  const room = Math.max(30, width - 39);
  if (x.severity === 'notice') {
    // Notices are context, not work: one line each.
    return [head + (x.message.length > room ? `${x.message.slice(0, room - 1)}\u2026` : x.message)];
  }
  const body = wrap(x.message, room);
  const out = [head + body[0], ...body.slice(1).map((l) => ' '.repeat(39) + l)];
  const named = x.elements.length === 1 && x.message.includes(x.elements[0].id);
  const indent = ' '.repeat(39);
  if (x.elements.length > 0 && !x.grouped && !named) {
    const shown = x.elements.slice(0, MAX_ELEMENTS).map((e) => formatElement(e, NBSP));
    const more = x.elements.length > MAX_ELEMENTS ? `, \u2026 ${x.elements.length - MAX_ELEMENTS} more` : '';
    out.push(...wrap(`at ${shown.join(', ')}${more}`, room).map((l) => indent + c.dim(l)));
  }
  // What each weak point costs: one sentence, or one line per member of a merged finding.
  if (x.grouped && x.members && x.members.length > 1) {
    for (const m of x.members) {
      if (!m.consequence) continue;
      out.push(...wrap(`${formatElement(m.elements[0], NBSP)}: ${consequenceSentence(m.consequence, '', NBSP)}`, room).map((l) => indent + c.dim(l)));
    }
  } else if (x.consequence) {
    out.push(...wrap(consequenceSentence(x.consequence, 'Losing it', NBSP), room).map((l) => indent + c.dim(l)));
  }
  return out;
}

// --- the chart ------------------------------------------------------------------------

const ROWS = 10;

function valueAt(points: { x: number; y: number }[], x: number): number | undefined {
  if (!points.length || x < points[0].x - 1e-12 || x > points[points.length - 1].x + 1e-12) return undefined;
  for (let i = 1; i < points.length; i++) {
    if (x <= points[i].x + 1e-12) {
      const a = points[i - 1];
      const b = points[i];
      const t = b.x === a.x ? 1 : (x - a.x) / (b.x - a.x);
      return a.y + t * (b.y - a.y);
    }
  }
  return points[points.length - 1].y;
}

const rowOf = (y: number) => Math.min(ROWS - 1, Math.max(0, Math.floor((1 - y) * ROWS)));

/** A grid chart: rows of 0.1 in R, one column per x step. Band ░, median ●, attacks 1 2 3…, worst ×, base ·. */
export function terminalChart(chart: EnvelopeChart, env: Envelope, c: Colors, width: number): string[] {
  const cols = Math.max(20, Math.min(64, width - 12));
  const cell: { ch: string; paint: (s: string) => string; rank: number }[][] = Array.from({ length: ROWS }, () =>
    Array.from({ length: cols }, () => ({ ch: ' ', paint: (s: string) => s, rank: 0 })),
  );
  const put = (row: number, col: number, ch: string, paint: (s: string) => string, rank: number) => {
    if (cell[row][col].rank <= rank) cell[row][col] = { ch, paint, rank };
  };
  const attackPaint = [c.yellow, c.magenta, c.blue, c.green, c.red];
  const legend: string[] = [];
  let attackNo = 0;
  for (const s of chart.series) {
    const style = seriesStyle(s, attackNo, c, attackPaint);
    if (s.role === 'attack') attackNo++;
    legend.push(`${style.paint(style.ch)} ${s.label}`);
    for (let col = 0; col < cols; col++) {
      const x = (chart.xMax * col) / (cols - 1);
      if (s.role === 'band') {
        const lo = valueAt(s.points, x);
        const hi = valueAt(s.upper ?? [], x);
        if (lo === undefined || hi === undefined) continue;
        for (let row = rowOf(hi); row <= rowOf(lo); row++) put(row, col, style.ch, style.paint, style.rank);
        continue;
      }
      const y = valueAt(s.points, x);
      if (y !== undefined) put(rowOf(y), col, style.ch, style.paint, style.rank);
    }
  }
  const xEnd = chart.xUnit === 'km' ? `${chart.xMax} km` : formatFraction(chart.xMax);
  const out = wrap(`${chart.title} (${chart.xLabel}, 0 to ${xEnd}; ${env.realizations} realizations)`, width - 2).map((l) => `  ${l}`);
  for (let row = 0; row < ROWS; row++) {
    const label = row === 0 ? '1.0' : row === ROWS / 2 ? '0.5' : row === ROWS - 1 ? '0.0' : '';
    // Our own frame: a dashed rail on the left (a dot marks the labelled rows) and a dotted floor.
    const axis = label ? '\u2022' : '\u254e';
    out.push(`  ${label.padStart(4)} ${axis}${cell[row].map((k) => k.paint(k.ch)).join('')}`);
  }
  out.push(`       \u2575${'\u2508'.repeat(cols)}`);
  out.push(`        ${'0'.padEnd(cols - xEnd.length)}${xEnd}`);
  out.push(...pack(legend, width - 4).map((l) => `  ${l}`));
  return out;
}

function seriesStyle(s: ChartSeries, attackNo: number, c: Colors, attackPaint: ((t: string) => string)[]) {
  switch (s.role) {
    case 'band':
      return { ch: '\u2591', paint: c.cyan, rank: 1 };
    case 'base-median':
      return { ch: '\u00b7', paint: c.gray, rank: 2 };
    case 'attack':
      return { ch: String((attackNo % 9) + 1), paint: attackPaint[attackNo % attackPaint.length], rank: 3 };
    case 'worst-case':
      return { ch: '\u00d7', paint: c.red, rank: 4 };
    default:
      return { ch: '\u25cf', paint: (t: string) => c.bold(c.cyan(t)), rank: 5 };
  }
}

// --- text helpers ---------------------------------------------------------------------

const ANSI = /\u001b\[[0-9;]*m/g;
const visible = (s: string) => s.replace(ANSI, '').length;

/** Greedy word wrap of plain text to a width. */
export function wrap(text: string, width: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const w of text.split(' ').filter((x) => x !== '')) {
    if (line && line.length + 1 + w.length > width) {
      lines.push(line);
      line = w;
    } else line = line ? `${line} ${w}` : w;
  }
  if (line) lines.push(line);
  return lines.length ? lines : [''];
}

/** Lay out (possibly coloured) items on lines of at most `width` visible columns. */
function pack(items: string[], width: number, sep = '   '): string[] {
  const lines: string[] = [];
  let line = '';
  for (const item of items) {
    if (line && visible(line) + sep.length + visible(item) > width) {
      lines.push(line);
      line = item;
    } else line = line ? line + sep + item : item;
  }
  if (line) lines.push(line);
  return lines;
}
