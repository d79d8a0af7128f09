// The terminal view of a report, in the order every view tells it (story.ts): the verdict
// sentence and the caution in one line; the run's facts; then per design, worst first, what
// weakened (the consequences, worst first), how much (one line per requirement, with R, area,
// spread and ± defined), and the detail (the design's own warnings, what the change does,
// weakest removal sequences, a compact envelope chart, notices); the caution in full last.
// Pure: colour is on or off by the caller's choice.

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
  formatElement,
  formatFraction,
  formatValue,
  shortRevision,
  weakestSequences,
} from './labels.js';
import type { Evaluation, Report } from './report.js';
import { oneLine } from './escape.js';
import {
  CAUTION_LINE,
  designStories,
  numbersOnly,
  plainSentence,
  policyChangeSentence,
  verdictStory,
  type DesignStory,
  type WeakenedItem,
} from './story.js';
import { MARK } from './vocabulary.js';

export interface TerminalOptions {
  /** ANSI colour (the shell decides: NO_COLOR, TTY, FORCE_COLOR). */
  color: boolean;
  /** Terminal width in columns; lines are kept within it where possible. */
  width: number;
}

export function renderTerminal(input: Report, options: TerminalOptions): string {
  // Every string in a report may come from a design file (ids, paths, messages): strip control
  // characters and invisible reordering ones before any of it reaches a terminal, so a crafted
  // id cannot move the cursor, recolour or hide text.
  const report = JSON.parse(JSON.stringify(input), (_key, v: unknown) =>
    typeof v === 'string' ? oneLine(v) : v,
  ) as Report;
  const c = createColors(options.color);
  const width = Math.max(60, Math.min(options.width || 100, 160));
  const out: string[] = [];
  out.push(...verdictLines(report, c, width));
  out.push(...wrap(CAUTION_LINE, width - 2).map((l) => c.dim(`  ${l}`)));
  out.push('', ...wrap(headerLine(report), width).map((l) => c.dim(l)));
  for (const note of policyNotes(report)) out.push(c.dim(note));
  if (report.files.length === 0) out.push('', 'No design files changed: nothing to judge.');
  for (const d of designStories(report)) out.push('', ...renderDesign(d, c, width));
  out.push('', ...wrap(`Caution: ${report.caution}`, width).map((l) => c.dim(l)));
  // The terminal view is also a CI log: the runner reads `::` at a line start as a workflow
  // command, and wrapping can put an id's `::` there (after spaces or colour codes). Defuse
  // it as logText() does.
  return `${out.join('\n')}\n`.replace(/(^|\n)((?:\s|\u001b\[[0-9;]*m)*)::/g, '$1$2:\u200A:');
}

function headerLine(r: Report): string {
  const parts = [`netbrace ${r.tool.version}`];
  if (r.base || r.head) parts.push(`base ${shortRevision(r.base)} \u2192 head ${shortRevision(r.head)}`);
  parts.push(`seed ${r.seed}`);
  if (r.part) parts.push(`part ${r.part.index}/${r.part.total}`);
  const counts = statusCounts(r).join(', ');
  parts.push(`${r.files.length} design${r.files.length === 1 ? '' : 's'}${counts ? ` (${counts})` : ''}`);
  return parts.join(' \u00b7 ');
}

function policyNotes(r: Report): string[] {
  const notes: string[] = [];
  if (r.policy.source === 'builtin')
    notes.push('policy: none found \u2014 the built-in defaults for communication backbones were applied');
  else
    notes.push(
      `policy: ${r.policy.path ?? '(file)'}${r.policy.revision ? ` as of ${shortRevision(r.policy.revision)}` : ''}`,
    );
  const change = policyChangeSentence(r);
  if (change) notes.push(`policy: ${plainSentence(change)}`);
  else if (r.policy.note) notes.push(`policy: ${r.policy.note}`);
  for (const n of configurationNotes(r)) notes.push(`configuration: ${n.text}`);
  if (r.scope === 'all') notes.push('scope: every design in the repository, judged against thresholds only');
  if (r.mode === 'inform') notes.push('mode: inform \u2014 failures are reported but do not fail the run');
  return notes;
}

function verdictLines(r: Report, c: Colors, width: number): string[] {
  const v = verdictStory(r);
  const paint = v.tone === 'blocks' ? c.red : v.tone === 'clear' ? c.cyan : c.yellow;
  return wrap(`${v.mark} ${plainSentence(v.sentence)}`, width).map((l) => c.bold(paint(l)));
}

const severityPaint = (c: Colors, severity: 'fail' | 'warn' | 'notice') =>
  severity === 'fail' ? c.red : severity === 'warn' ? c.yellow : c.dim;
const severityMark = (severity: 'fail' | 'warn' | 'notice') =>
  severity === 'fail' ? MARK.fail : severity === 'warn' ? MARK.warn : MARK.notice;

function renderDesign(d: DesignStory, c: Colors, width: number): string[] {
  const f = d.file;
  const out: string[] = [];
  const paint = d.outcome === 'fails' ? c.red : d.outcome === 'warns' ? c.yellow : c.cyan;
  const renamed = f.previousPath ? ` (was ${f.previousPath})` : '';
  out.push(
    ...wrap(`${d.mark} ${f.path}${renamed} \u2014 ${d.statusWord} \u00b7 ${d.headline}`, width - 2).map((l, i) =>
      i === 0 ? c.bold(paint(l)) : c.bold(`  ${l}`),
    ),
  );

  // 1. What weakened: the consequences, worst first.
  out.push(c.bold('  What weakened'));
  // A file that could not be read or evaluated says where, as every located error does: file:line:col.
  const located = (x: WeakenedItem) =>
    f.error !== undefined &&
    (x.rule === 'parse-error' || (x.rule === 'not-computable' && x.finding.message === f.error.message));
  if (f.error) {
    const e = f.error;
    out.push(
      ...wrap(`${d.statusWord}: ${f.path}:${e.line || 1}:${e.column || 1}: ${e.message}`, width - 6).map((l, i) =>
        i === 0 ? `    ${c.red(MARK.fail)} ${l}` : `      ${l}`,
      ),
    );
  }
  const items = d.weakened.filter((x) => !located(x));
  if (!items.length && !f.error) out.push(`    ${numbersOnly(d) ?? 'nothing weakened'}`);
  for (const x of items) out.push(...itemLines(x, c, width));

  // 2. How much: one line per requirement, then the words those lines use.
  if (d.howMuch.length) {
    out.push(c.bold('  How much'));
    for (const l of d.howMuch) {
      const r = l.requirement;
      const bad = r.status === 'short' || r.status === 'weakened';
      const tone = bad ? severityPaint(c, r.severity) : r.status === 'holds' ? c.cyan : c.dim;
      const lines = wrap(plainSentence(l.sentence), width - 6);
      out.push(`    ${tone(l.mark)} ${lines[0]}`, ...lines.slice(1).map((x) => `      ${x}`));
    }
    for (const def of d.definitions)
      out.push(...wrap(plainSentence(def.sentence), width - 4).map((x) => c.dim(`    ${x}`)));
    if (d.definitions.length) out.push(c.dim('    (README: "Reading the report")'));
  }

  // 3. The detail.
  const detail = detailLines(d, c, width);
  if (detail.length) out.push(c.bold('  Detail'), ...detail);
  return out;
}

function itemLines(x: WeakenedItem, c: Colors, width: number): string[] {
  const where = x.line > 0 ? ` (line ${x.line})` : '';
  const body = wrap(`${x.title}${where}: ${plainSentence(x.sentence)}`, width - 6);
  return [
    `    ${severityPaint(c, x.severity)(severityMark(x.severity))} ${body[0]}`,
    ...body.slice(1).map((l) => `      ${l}`),
  ];
}

function detailLines(d: DesignStory, c: Colors, width: number): string[] {
  const f = d.file;
  const out: string[] = [];
  const indent = (lines: string[], paint: (s: string) => string = (s) => s) => lines.map((l) => paint(`    ${l}`));
  if (f.head) out.push(...indent(wrap(describeEvaluation(f.head), width - 4), c.dim));
  for (const w of f.warnings ?? []) {
    out.push(
      ...wrap(
        `design warning: ${f.path}:${w.line || 1}:${w.column || 1}: ${w.message}${w.hint ? ` \u2014 ${w.hint}` : ''}`,
        width - 6,
      ).map((l, i) => (i === 0 ? `    ${c.yellow(MARK.warn)} ${l}` : `      ${l}`)),
    );
  }
  const notApplicable = describeNotApplicable(f.head);
  if (notApplicable) out.push(...indent(wrap(`not applicable: ${notApplicable}`, width - 4), c.dim));
  const changed = describeChanges(f);
  if (changed) out.push(...indent(wrap(`changed: ${changed}`, width - 4)));
  const modified = describeModifications(f);
  if (modified.length) {
    out.push('    changed attributes:');
    for (const m of modified)
      out.push(...wrap(m, width - 8).map((l, i) => (i === 0 ? `      \u2022 ${l}` : `        ${l}`)));
  }
  const sequences = weakestSequences(f);
  if (sequences.length) {
    out.push('    weakest removal sequences:');
    for (const s of sequences) {
      const more = s.ids.length > MAX_CHAIN ? ` \u2192 \u2026 (${s.ids.length - MAX_CHAIN} more)` : '';
      const chain =
        s.elements
          .slice(0, MAX_CHAIN)
          .map((e) => formatElement(e, NBSP))
          .join(' \u2192 ') + more;
      const v = s.values ?? [];
      const rs = !v.length
        ? ''
        : v.length === s.ids.length && v.length <= MAX_CHAIN
          ? v.map(formatValue).join(' \u2192 ')
          : `${formatValue(v[0])} \u2192 \u2026 \u2192 ${formatValue(v[v.length - 1])}`;
      out.push(
        ...wrap(`${s.title}: ${chain}${rs ? ` \u00b7 R ${rs}` : ''}`, width - 8).map((l, i) =>
          i === 0 ? `      \u2022 ${l}` : `        ${l}`,
        ),
      );
      if (s.consequence)
        out.push(
          ...wrap(consequenceSentence(s.consequence, 'These removals', NBSP), width - 8).map((l) =>
            c.dim(`        ${l}`),
          ),
        );
    }
  }
  const env = f.head?.envelopes[0];
  if (env && f.head) out.push('', ...terminalChart(envelopeChart(env, f.head, f.base), env, c, width));
  if (d.notices.length) {
    out.push(`    notices (context, within allowances):`);
    const room = width - 8;
    for (const x of d.notices) {
      // Notices are context, not work: one line each.
      const t = `${x.title}${x.line > 0 ? ` (line ${x.line})` : ''}: ${plainSentence(x.sentence)}`;
      out.push(`    ${c.dim(MARK.notice)} ${t.length > room ? `${t.slice(0, room - 1)}\u2026` : t}`);
    }
  }
  return out;
}

function describeEvaluation(ev: Evaluation): string {
  const metrics = ev.r.metrics.map((m) => `${m.id} ${m.weight}`).join(', ');
  const s = ev.structure;
  const spof = `${s.bridges.length} bridge${s.bridges.length === 1 ? '' : 's'}, ${s.cutNodes.length} cut node${s.cutNodes.length === 1 ? '' : 's'}`;
  return `R = ${ev.r.combine === 'min' ? 'minimum' : 'weighted mean'} of ${metrics} \u00b7 ${s.nodes} sites, ${s.links} links, ${spof}`;
}

/** Element names keep "(line 14)" together when lines wrap. */
const NBSP = { space: '\u00a0' };
/** Steps of a sequence shown before "… N more". */
const MAX_CHAIN = 8;

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
  const out = wrap(`${chart.title} (${chart.xLabel}, 0 to ${xEnd}; ${env.realizations} realizations)`, width - 2).map(
    (l) => `  ${l}`,
  );
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
