// The HTML report: one self-contained file (inline CSS and SVG; no scripts, no fonts, no
// fetches — a Content-Security-Policy meta tag forbids them) with, per design, the envelope
// charts, the requirement table, findings, weakest sequences and structural findings.
// Built for print and screen readers: landmarks, captions, scoped headers, chart titles and
// descriptions, and a data table behind every chart. Every string from the report is escaped.

import { attacksFor, envelopeChart, renderChartSvg, type EnvelopeChart } from './chart.js';
import {
  configurationNotes,
  consequenceSentence,
  contingencyLabel,
  describeChanges,
  describeModifications,
  describeNotApplicable,
  fileStatusWord,
  statusCounts,
  findingTitle,
  formatElement,
  kindSingular,
  knownElement,
  knownElements,
  fileFails,
  fileWarns,
  formatDelta,
  formatError,
  formatFraction,
  formatRequirementDelta,
  formatRequirementValue,
  formatValue,
  REQUIREMENT_STATUS_WORD,
  STATUS_WORD,
  bySeverity,
  groupFindings,
  shortRevision,
  weakestSequences,
  type GroupedFinding,
} from './labels.js';
import type { Consequence, Evaluation, FileReport, Finding, Report, ReportElement, RequirementResult } from './report.js';
import { escapeHtml } from './escape.js';
import { mapHtml } from './map-html.js';
import { mendHtml } from './mend-text.js';

const esc = (s: string | number) => escapeHtml(String(s));

/** A finding's title by rule, refined by its status (labels.ts, findingTitle). */
const RULE_TITLE: Record<Finding['rule'], string> = {
  'r-threshold': 'r-threshold not held',
  'area-floor': 'area below its floor',
  'spread-ceiling': 'spread above its ceiling',
  'n-1': 'N\u22121 rule broken',
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

/** A JSON number as an attribute value (exact, so tests can compare with the report). */
const dataValue = (v: number | null | undefined) => (v === null || v === undefined ? '' : String(v));

const CSS = `
:root{--paper:#f6f3ec;--card:#fffdf8;--ink:#1e2a32;--muted:#5d6870;--rule:#d9d4c7;--teal:#0d4f5c;
--sea:#a9d3cb;--fail:#a4161a;--warn:#8f5200;--pass:#2d6a3e;--notice:#1d5fa3}
*{box-sizing:border-box}
html{background:var(--paper);color:var(--ink)}
body{margin:0 auto;max-width:1120px;padding:24px 28px 48px;font:15px/1.5 system-ui,-apple-system,"Segoe UI",Roboto,"Noto Sans",sans-serif}
h1,h2,h3{line-height:1.25;margin:0}
h1{font-size:1.55rem;letter-spacing:.01em}
h2{font-size:1.2rem;word-break:break-all}
h3{font-size:.95rem;text-transform:uppercase;letter-spacing:.08em;color:var(--muted);margin:22px 0 8px}
.mast{display:flex;flex-wrap:wrap;gap:18px;align-items:flex-end;justify-content:space-between;border-bottom:3px double var(--ink);padding-bottom:14px}
.brand{font-weight:800;font-size:.8rem;letter-spacing:.32em;text-transform:uppercase;color:var(--teal)}
.verdict{font-size:1.05rem;font-weight:700;padding:8px 16px;border:2px solid currentColor;border-radius:2px}
.verdict.fail{color:var(--fail)}.verdict.pass{color:var(--pass)}
dl.meta{display:grid;grid-template-columns:max-content 1fr;gap:2px 14px;margin:14px 0;font-size:.9rem}
dl.meta dt{color:var(--muted)}dl.meta dd{margin:0}
.caution{border-left:6px solid var(--teal);background:var(--card);padding:10px 16px;margin:18px 0;font-size:.92rem}
.caution strong{color:var(--teal)}
nav ol{margin:6px 0 0;padding-left:22px;columns:2;column-gap:32px}
nav a{color:var(--ink)}
.design{background:var(--card);border:1px solid var(--rule);border-left:8px solid var(--pass);margin:28px 0;padding:18px 22px 20px}
.design.fail{border-left-color:var(--fail)}.design.warn{border-left-color:var(--warn)}
.design header{display:flex;flex-wrap:wrap;gap:10px 16px;align-items:baseline}
.chip{display:inline-block;font-size:.78rem;font-weight:700;letter-spacing:.06em;text-transform:uppercase;padding:1px 8px;border:1.5px solid currentColor}
.chip.fail{color:var(--fail)}.chip.warn{color:var(--warn)}.chip.pass{color:var(--pass)}
.chip.notice{color:var(--notice)}
.facts{color:var(--muted);font-size:.9rem;margin:6px 0 0}
.charts{display:grid;grid-template-columns:repeat(auto-fill,minmax(440px,1fr));gap:18px;margin-top:10px}
figure{margin:0}
figure svg{width:100%;height:auto;display:block}
figcaption{font-size:.85rem;color:var(--muted);margin-top:4px}
table{border-collapse:collapse;width:100%;font-size:.9rem;font-variant-numeric:tabular-nums}
caption{text-align:left;font-size:.85rem;color:var(--muted);padding-bottom:4px}
th,td{padding:5px 8px;border-bottom:1px solid var(--rule);text-align:left;vertical-align:top}
th{font-weight:600;background:#efeadf}
td.num,th.num{text-align:right;white-space:nowrap}
.st-short,.st-weakened{font-weight:700}
.sev-fail{color:var(--fail)}.sev-warn{color:var(--warn)}.sev-notice{color:var(--notice)}
.st-holds{color:var(--pass)}.st-inside-error,.st-unsettled{color:var(--muted)}
ul.findings{list-style:none;padding:0;margin:0}
ul.findings li{padding:6px 0 6px 12px;border-left:3px solid var(--rule);margin:6px 0}
ul.findings li.fail{border-left-color:var(--fail)}ul.findings li.warn{border-left-color:var(--warn)}
ul.findings li.notice{border-left-color:var(--notice)}
.rule{font-family:ui-monospace,"SFMono-Regular",Menlo,Consolas,monospace;font-size:.85em;color:var(--muted)}
code,.el{font-family:ui-monospace,"SFMono-Regular",Menlo,Consolas,monospace;font-size:.88em}
ol.seq{margin:4px 0 10px;padding-left:26px}
.line{color:var(--muted);font-size:.85em}
details{margin-top:8px;font-size:.88rem}
summary{cursor:pointer;color:var(--teal)}
.error{color:var(--fail);font-weight:600}
footer{margin-top:32px;color:var(--muted);font-size:.82rem;border-top:1px solid var(--rule);padding-top:10px}
.vh{position:absolute;width:1px;height:1px;overflow:hidden;clip:rect(0 0 0 0);white-space:nowrap}
@media (max-width:640px){body{padding:14px}.charts{grid-template-columns:1fr}nav ol{columns:1}}
@media print{
html,body{background:#fff}
body{max-width:none;padding:0;font-size:10.5pt}
.design{border:1px solid #999;border-left-width:6px;break-inside:avoid-page;page-break-inside:avoid}
.charts{grid-template-columns:1fr 1fr}
nav,details{display:none}
a{color:inherit;text-decoration:none}
.caution{border:1px solid #999;border-left:6px solid #000}
}
`;

export function renderHtml(report: Report): string {
  const title = `netbrace report \u2014 ${report.verdict === 'fail' ? 'gate failed' : 'gate passed'}`;
  const parts: string[] = [];
  parts.push('<!DOCTYPE html>');
  parts.push('<html lang="en">');
  parts.push('<head>');
  parts.push('<meta charset="utf-8">');
  parts.push(`<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:">`);
  parts.push('<meta name="viewport" content="width=device-width, initial-scale=1">');
  parts.push(`<meta name="generator" content="netbrace ${esc(report.tool.version)}">`);
  parts.push(`<title>${esc(title)}</title>`);
  parts.push(`<style>${CSS}</style>`);
  parts.push('</head>');
  parts.push(`<body data-report-version="${report.version}" data-verdict="${report.verdict}">`);
  parts.push(masthead(report));
  parts.push('<main>');
  parts.push(
    `<aside class="caution" role="note" aria-label="Caution"><p><strong>Caution.</strong> ${esc(report.caution)}</p></aside>`,
  );
  if (report.files.length > 1) parts.push(contents(report));
  if (report.files.length === 0) parts.push('<p>No design files changed: nothing to judge.</p>');
  report.files.forEach((f, i) => parts.push(designSection(f, i)));
  parts.push('</main>');
  parts.push(
    `<footer><p>Written by netbrace ${esc(report.tool.version)} from report format version ${report.version}. ` +
      `Every number here is in the JSON report of the same run. Seed ${report.seed}; the same inputs and seed give the same numbers.</p></footer>`,
  );
  parts.push('</body>');
  parts.push('</html>');
  return parts.join('\n') + '\n';
}

function masthead(r: Report): string {
  const failed = r.files.filter(fileFails).length;
  const verdict =
    r.verdict === 'fail'
      ? `Gate failed: ${failed} of ${r.files.length} design${r.files.length === 1 ? '' : 's'} failing`
      : `Gate passed${r.files.some(fileWarns) ? ' with warnings' : ''}`;
  const meta: [string, string][] = [];
  if (r.base || r.head) meta.push(['Compared', `base <code title="${esc(r.base ?? '')}">${esc(shortRevision(r.base))}</code> \u2192 head <code title="${esc(r.head ?? '')}">${esc(shortRevision(r.head))}</code>`]);
  meta.push([
    'Policy',
    r.policy.source === 'builtin'
      ? 'no policy file: the built-in defaults for communication backbones were applied'
      : `<code>${esc(r.policy.path ?? 'policy file')}</code>${r.policy.revision ? ` as of <code>${esc(shortRevision(r.policy.revision))}</code>` : ''}` +
        (r.policy.note ? `. ${esc(r.policy.note)}` : r.policy.changed ? ' (this change edits the policy; the proposed policy was not applied)' : ''),
  ]);
  const own = configurationNotes(r).filter((x) => x.file !== r.policy.path);
  if (own.length) meta.push(['Configuration', own.map((x) => `${x.weakens ? '<strong>' : ''}${esc(x.text)}${x.weakens ? '</strong>' : ''}`).join('<br>')]);
  if (r.scope === 'all') meta.push(['Scope', 'every design in the repository, judged against thresholds only']);
  meta.push(['Mode', r.mode === 'inform' ? 'inform: failures are reported, the run does not fail' : 'block: failures fail the check']);
  meta.push(['Seed', String(r.seed)]);
  if (r.part) meta.push(['Part', `${r.part.index} of ${r.part.total}`]);
  const counts = statusCounts(r).map(esc).join(', ');
  meta.push(['Designs', `${r.files.length}${counts ? ` (${counts})` : ''}`]);
  return [
    '<header class="mast">',
    '<div>',
    '<div class="brand" aria-hidden="true">netbrace</div>',
    '<h1>Robustness report</h1>',
    '</div>',
    `<p class="verdict ${r.verdict}" role="status" data-verdict="${r.verdict}">${esc(verdict)}</p>`,
    '</header>',
    `<dl class="meta">${meta.map(([k, v]) => `<dt>${esc(k)}</dt><dd>${v}</dd>`).join('')}</dl>`,
  ].join('\n');
}

function contents(r: Report): string {
  const items = r.files.map((f, i) => {
    const tone = fileTone(f);
    return `<li><a href="#design-${i}">${esc(f.path)}</a> <span class="chip ${tone}">${esc(toneWord(f))}</span></li>`;
  });
  return `<nav aria-label="Designs in this report"><h3>Designs</h3><ol>${items.join('')}</ol></nav>`;
}

const fileTone = (f: FileReport) => (fileFails(f) ? 'fail' : fileWarns(f) ? 'warn' : 'pass');
const toneWord = (f: FileReport) => (fileFails(f) ? 'fail' : fileWarns(f) ? 'pass, warnings' : 'pass');

function designSection(f: FileReport, index: number): string {
  const tone = fileTone(f);
  const id = `design-${index}`;
  const out: string[] = [];
  out.push(
    `<section class="design ${tone}" id="${id}" aria-labelledby="${id}-h" data-path="${esc(f.path)}" data-status="${esc(f.status)}" data-tone="${tone}">`,
  );
  out.push('<header>');
  out.push(`<h2 id="${id}-h">${esc(f.path)}</h2>`);
  out.push(`<span class="chip ${tone}">${esc(toneWord(f))}</span>`);
  out.push(`<span class="chip notice">${esc(fileStatusWord(f))}</span>`);
  out.push('</header>');
  if (f.previousPath) out.push(`<p class="facts">Renamed from <code>${esc(f.previousPath)}</code>; compared with its old self.</p>`);
  if (f.error) {
    out.push(
      `<p class="error">${fileStatusWord(f) === STATUS_WORD.unreadable ? 'Could not be read' : 'Could not be evaluated'}: <code>${esc(f.path)}:${f.error.line || 1}:${f.error.column || 1}</code> ${esc(f.error.message)}</p>`,
    );
  }
  if (f.head) out.push(`<p class="facts">${esc(facts(f.head))}</p>`);
  const notApplicable = describeNotApplicable(f.head);
  if (notApplicable) out.push(`<p class="facts not-applicable"><strong>Not applicable to this design:</strong> ${esc(notApplicable)}</p>`);
  const changed = describeChanges(f);
  const modified = describeModifications(f, 200);
  if (changed || modified.length) {
    const items = [...(changed ? [changed] : []), ...modified].map((l) => `<li>${esc(l)}</li>`).join('');
    out.push(`<div class="facts changes"><strong>What the change does:</strong><ul>${items}</ul></div>`);
  }
  if (f.head && f.head.envelopes.length) out.push(charts(f, id));
  out.push(mapHtml(f, id));
  if (f.requirements.length) out.push(requirementTable(f.requirements, id));
  const findings = groupFindings(bySeverity(f.findings.filter((x) => x.rule !== 'weakest-sequence')));
  const work = findings.filter((x) => x.severity !== 'notice');
  const notices = findings.filter((x) => x.severity === 'notice');
  if (findings.length) out.push('<h3>Findings</h3>');
  if (work.length) out.push(`<ul class="findings">${work.map(findingItem).join('')}</ul>`);
  if (notices.length) {
    out.push(
      `<details class="notices"><summary>${notices.length} notice${notices.length === 1 ? '' : 's'} (within allowances, or context)</summary><ul class="findings">${notices.map(findingItem).join('')}</ul></details>`,
    );
  }
  out.push(weakest(f));
  out.push(structure(f));
  out.push(mendHtml(f, id));
  out.push('</section>');
  return out.filter(Boolean).join('\n');
}

function facts(ev: Evaluation): string {
  const metrics = ev.r.metrics.map((m) => `${m.id} (weight ${m.weight})`).join(', ');
  const s = ev.structure;
  const combine = ev.r.combine === 'min' ? 'the minimum' : 'the weighted mean';
  const text = `${s.nodes} sites, ${s.links} links, ${s.components} component${s.components === 1 ? '' : 's'}. R is ${combine} of ${metrics}.`;
  return ev.degraded.length ? `${text} Reduced by budgets: ${ev.degraded.join('; ')}.` : text;
}

function charts(f: FileReport, id: string): string {
  const head = f.head as Evaluation;
  const figs = head.envelopes.map((env, i) => {
    const chart = envelopeChart(env, head, f.base);
    const cid = `${id}-chart-${i}`;
    const attacks = attacksFor(env, head).length;
    return [
      `<figure class="chart" data-challenge="${esc(env.challenge)}" data-kind="${esc(env.kind)}" data-attacks="${attacks}">`,
      renderChartSvg(chart, { idPrefix: cid }),
      `<figcaption>${esc(chart.title)}: ${env.realizations} realizations, ${Math.round(env.band[0] * 100)}\u2013${Math.round(env.band[1] * 100)} % band; area ${formatValue(env.area)}, spread ${formatValue(env.spread)}.` +
        `${env.degraded ? ` Reduced: ${esc(env.degraded)}.` : ''}</figcaption>`,
      chartData(chart, cid),
      '</figure>',
    ].join('\n');
  });
  return `<h3>Envelopes</h3><div class="charts">${figs.join('\n')}</div>`;
}

/** The numbers behind a chart, for screen readers and anyone who wants them. */
function chartData(chart: EnvelopeChart, id: string): string {
  const xs = [...new Set(chart.series.flatMap((s) => s.points.map((p) => p.x)))].sort((a, b) => a - b);
  const lookup = (pts: { x: number; y: number }[], x: number) => pts.find((p) => Math.abs(p.x - x) < 1e-12)?.y;
  const cols = chart.series.flatMap((s) =>
    s.role === 'band'
      ? [
          { name: `${s.label}, low`, pts: s.points },
          { name: `${s.label}, high`, pts: s.upper ?? [] },
        ]
      : [{ name: s.label, pts: s.points }],
  );
  const xName = chart.xUnit === 'km' ? 'radius (km)' : 'removed';
  const head = `<tr><th scope="col">${xName}</th>${cols.map((c) => `<th scope="col" class="num">${esc(c.name)}</th>`).join('')}</tr>`;
  const rows = xs.map((x) => {
    const label = chart.xUnit === 'km' ? String(x) : formatFraction(x);
    return `<tr><th scope="row">${esc(label)}</th>${cols.map((c) => `<td class="num">${esc(formatValue(lookup(c.pts, x)))}</td>`).join('')}</tr>`;
  });
  return `<details><summary>Chart data</summary><table id="${id}-data"><caption>${esc(chart.title)}: values of R</caption><thead>${head}</thead><tbody>${rows.join('')}</tbody></table></details>`;
}

function requirementTable(rows: RequirementResult[], id: string): string {
  const body = rows.map((r) => {
    const bad = r.status === 'short' || r.status === 'weakened';
    const cls = `st-${r.status}${bad ? ` sev-${r.severity}` : ''}`;
    return (
      `<tr data-requirement="${esc(r.id)}">` +
      `<th scope="row">${esc(r.description)}<div class="rule">${esc(r.id)}</div></th>` +
      `<td>${esc(r.severity)}</td>` +
      `<td class="num" data-field="base" data-value="${dataValue(r.base)}">${esc(formatRequirementValue(r, r.base))}</td>` +
      `<td class="num" data-field="head" data-value="${dataValue(r.head)}">${esc(formatRequirementValue(r, r.head))}</td>` +
      `<td class="num" data-field="delta" data-value="${dataValue(r.delta)}">${esc(formatRequirementDelta(r))}` +
      `${formatError(r.se) ? ` <span class="line" data-field="se" data-value="${dataValue(r.se)}">${esc(formatError(r.se))}</span>` : ''}</td>` +
      `<td class="num" data-field="threshold" data-value="${dataValue(r.threshold)}">${esc(formatRequirementValue(r, r.threshold))}</td>` +
      `<td class="${cls}" data-field="status">${esc(REQUIREMENT_STATUS_WORD[r.status])}</td>` +
      '</tr>'
    );
  });
  const noise = rows.some((r) => r.status === 'inside-error')
    ? '<p class="facts">Inside the error: the value dropped by less than its Monte Carlo error, which is never a failure.</p>'
    : '';
  return [
    '<h3>Requirements</h3>',
    `<table class="requirements" id="${id}-requirements">`,
    '<caption>Each requirement of the policy, base \u2192 head; \u0394 is the paired difference with its standard error.</caption>',
    '<thead><tr><th scope="col">Requirement</th><th scope="col">Severity</th><th scope="col" class="num">Base</th><th scope="col" class="num">Head</th><th scope="col" class="num">\u0394 \u00b1 error</th><th scope="col" class="num">Threshold</th><th scope="col">Status</th></tr></thead>',
    `<tbody>${body.join('')}</tbody>`,
    '</table>',
    noise,
  ].join('\n');
}

const MAX_ELEMENTS = 8;

/** An element as the HTML names it: formatElement with its label and id marked up, the parenthesis muted. */
function htmlElement(e: ReportElement): string {
  const el = (x: string) => `<span class="el">${esc(x)}</span>`;
  return formatElement(e, { id: el, text: el, meta: (x) => `<span class="line">${x}</span>` });
}

function elementList(elements: ReportElement[]): string {
  const shown = elements.slice(0, MAX_ELEMENTS).map(htmlElement);
  const more = elements.length > MAX_ELEMENTS ? `, \u2026 ${elements.length - MAX_ELEMENTS} more` : '';
  return shown.join(', ') + more;
}

function costItem(c: Consequence | undefined, subject: string): string {
  return c ? `<p class="cost">${esc(consequenceSentence(c, subject))}</p>` : '';
}

function findingItem(x: GroupedFinding): string {
  const where = x.line > 0 ? ` <span class="line">line ${x.line}${x.column ? `:${x.column}` : ''}</span>` : '';
  // The gate's messages usually state the values already; repeat them only when they do not.
  const values =
    x.head !== undefined && x.head !== null && !x.message.includes(formatValue(x.head))
      ? ` <span class="line">(base ${esc(formatValue(x.base))}, head ${esc(formatValue(x.head))}${x.delta !== undefined && x.delta !== null ? `, \u0394 ${esc(`${formatDelta(x.delta)} ${formatError(x.se)}`.trim())}` : ''})</span>`
      : '';
  const named = x.elements.length === 1 && x.message.includes(x.elements[0].id);
  const els = x.elements.length && !named && !x.grouped ? `<div>${elementList(x.elements)}</div>` : '';
  const members = x.grouped && x.members && x.members.length > 1 ? x.members.filter((m) => m.consequence) : [];
  const cost = members.length
    ? `<ul class="costs">${members.map((m) => `<li>${htmlElement(m.elements[0])}: ${esc(consequenceSentence(m.consequence!, ''))}</li>`).join('')}</ul>`
    : costItem(x.consequence, 'Losing it');
  return `<li class="${x.severity}" data-rule="${esc(x.rule)}"${x.status ? ` data-status="${esc(x.status)}"` : ''}><span class="chip ${x.severity}">${esc(x.severity)}</span> <span class="rule">${esc(findingTitle(x, RULE_TITLE))}</span>${where}<div>${esc(x.message)}${values}</div>${els}${cost}</li>`;
}

function weakest(f: FileReport): string {
  const known = knownElements(f);
  const items = weakestSequences(f).map((s) => {
    const steps = s.elements
      .map((e, i) => `<li>${htmlElement(e)}${s.values && s.values[i] !== undefined ? ` \u2014 R ${esc(formatValue(s.values[i]))}` : ''}</li>`)
      .join('');
    return `<div class="sequence"><p>${esc(s.title)}</p><ol class="seq">${steps}</ol>${costItem(s.consequence, 'These removals')}</div>`;
  });
  for (const c of f.head?.contingencies ?? []) {
    const worst = c.worst[0];
    if (worst) {
      const what = worst.elements.map((id, i) => htmlElement(worst.located?.[i] ?? knownElement(known, c.kind, id))).join(' + ');
      items.push(
        `<div class="sequence"><p>${esc(contingencyLabel(c.challenge, c.kind))}: the ${esc(c.challenge === 'n-1' ? 'single' : 'double')} ${esc(kindSingular(c.kind))} loss that hurts most (${c.evaluated} of ${c.total} cases evaluated): <span class="el">${esc(what)}</span> leaves R ${esc(formatValue(worst.value))}</p></div>`,
      );
    }
  }
  return items.length ? `<h3>Weakest removal sequences</h3>${items.join('')}` : '';
}

function structure(f: FileReport): string {
  const head = f.head?.structure;
  if (!head) return '';
  const baseIds = new Set([...(f.base?.structure.bridges ?? []), ...(f.base?.structure.cutNodes ?? [])].map((e) => e.id));
  const row = (label: string, list: ReportElement[]) => {
    if (!list.length) return `<tr><th scope="row">${esc(label)}</th><td>none</td></tr>`;
    const items = list.map((e) => {
      const isNew = f.base !== undefined && !baseIds.has(e.id);
      return `${htmlElement(e)}${isNew ? ' <strong class="sev-fail">new</strong>' : ''}`;
    });
    return `<tr><th scope="row">${esc(label)}</th><td>${items.join(', ')}</td></tr>`;
  };
  return [
    '<h3>Structure</h3>',
    '<table class="structure">',
    '<caption>Single points of failure in the head design: a bridge is a link, a cut node a site, whose loss alone splits the network.</caption>',
    '<tbody>',
    row('Bridges', head.bridges),
    row('Cut nodes', head.cutNodes),
    `<tr><th scope="row">Components</th><td>${head.components}</td></tr>`,
    '</tbody></table>',
  ].join('\n');
}
