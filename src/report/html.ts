// The HTML report: one self-contained file (inline CSS and SVG; no scripts, no fonts, no
// fetches — a Content-Security-Policy meta tag forbids them). It tells what story.ts tells, in
// the same order as every view: the verdict sentence and the caution in one line; then per
// design, worst first, what weakened (the consequences), how much (one line per requirement,
// with the definitions of R, area, spread and ±), and the detail (charts, map, sequences,
// structure, mending); the caution in full at the end. Built for print and screen readers:
// landmarks, chart titles and descriptions, a data table behind every chart. Every string
// from the report is escaped.

import { attacksFor, envelopeChart, renderChartSvg, type EnvelopeChart } from './chart.js';
import {
  configurationNotes,
  consequenceSentence,
  contingencyLabel,
  describeChanges,
  describeModifications,
  describeNotApplicable,
  statusCounts,
  formatElement,
  kindSingular,
  knownElement,
  knownElements,
  formatFraction,
  formatValue,
  shortRevision,
  weakestSequences,
} from './labels.js';
import type { Consequence, Evaluation, FileReport, Report, ReportElement } from './report.js';
import { escapeHtml } from './escape.js';
import { mapHtml } from './map-html.js';
import { mendHtml } from './mend-text.js';
import {
  CAUTION_LINE,
  README_ANCHOR,
  designStories,
  numbersOnly,
  plainSentence,
  policyChangeSentence,
  verdictStory,
  type DesignStory,
  type Sentence,
  type WeakenedItem,
} from './story.js';
import { MARK, SEVERITY_WORD } from './vocabulary.js';

const esc = (s: string | number) => escapeHtml(String(s));

/** A JSON number as an attribute value (exact, so tests can compare with the report). */
const dataValue = (v: number | null | undefined) => (v === null || v === undefined ? '' : String(v));

const CSS = `
:root{--paper:#f6f3ec;--card:#fffdf8;--ink:#1e2a32;--muted:#5d6870;--rule:#d9d4c7;--teal:#0d4f5c;
--fail:#a4161a;--warn:#8f5200;--holds:#2f5d73;--notice:#5d6870}
*{box-sizing:border-box}
html{background:var(--paper);color:var(--ink)}
body{margin:0 auto;max-width:1120px;padding:24px 28px 48px;font:15px/1.5 system-ui,-apple-system,"Segoe UI",Roboto,"Noto Sans",sans-serif}
h1,h2,h3{line-height:1.25;margin:0}
h1{font-size:1.45rem}
h2{font-size:1.2rem;word-break:break-all}
h3{font-size:.95rem;letter-spacing:.04em;color:var(--teal);margin:20px 0 6px}
.mast{border-bottom:3px double var(--ink);padding-bottom:12px}
.brand{font-weight:800;font-size:.78rem;letter-spacing:.3em;text-transform:uppercase;color:var(--teal);margin-bottom:6px}
.mark{margin-right:.35em}
.verdict.blocks .mark{color:var(--fail)}.verdict.informs .mark,.verdict.part .mark{color:var(--warn)}.verdict.clear .mark{color:var(--holds)}
.caution-line{margin:6px 0 0;color:var(--muted);font-size:.92rem}
dl.meta{display:grid;grid-template-columns:max-content 1fr;gap:2px 14px;margin:12px 0 0;font-size:.88rem}
dl.meta dt{color:var(--muted)}dl.meta dd{margin:0}
nav ol{margin:6px 0 0;padding-left:22px;columns:2;column-gap:32px}
nav a{color:var(--ink)}
.design{background:var(--card);border:1px solid var(--rule);border-top:5px solid var(--holds);margin:28px 0;padding:16px 22px 20px}
.design.fails{border-top-color:var(--fail)}.design.warns{border-top-color:var(--warn)}
.outcome{margin:4px 0 0;font-weight:600}
.mark{font-family:ui-monospace,"SFMono-Regular",Menlo,Consolas,monospace}
.sev-fail .mark,.outcome.fails .mark{color:var(--fail)}.sev-warn .mark,.outcome.warns .mark{color:var(--warn)}
.sev-notice .mark{color:var(--notice)}.outcome.holds .mark,.st-holds .mark{color:var(--holds)}
.facts{color:var(--muted);font-size:.9rem;margin:6px 0 0}
ul.weakened,ul.how-much{list-style:none;padding:0;margin:0}
ul.weakened li{padding:4px 0 4px 10px;border-left:3px solid var(--rule);margin:4px 0}
ul.weakened li.sev-fail{border-left-color:var(--fail)}ul.weakened li.sev-warn{border-left-color:var(--warn)}
ul.how-much li{padding:3px 0;font-variant-numeric:tabular-nums}
ul.how-much .status{font-weight:700}
.title{font-weight:600}
dl.definitions{margin:10px 0 0;font-size:.86rem;color:var(--muted)}
dl.definitions dt{display:none}dl.definitions dd{margin:0}
.charts{display:grid;grid-template-columns:repeat(auto-fill,minmax(440px,1fr));gap:18px;margin-top:10px}
figure{margin:0}
figure svg{width:100%;height:auto;display:block}
figcaption{font-size:.85rem;color:var(--muted);margin-top:4px}
table{border-collapse:collapse;width:100%;font-size:.9rem;font-variant-numeric:tabular-nums}
caption{text-align:left;font-size:.85rem;color:var(--muted);padding-bottom:4px}
th,td{padding:5px 8px;border-bottom:1px solid var(--rule);text-align:left;vertical-align:top}
th{font-weight:600;background:#efeadf}
td.num,th.num{text-align:right;white-space:nowrap}
.sev-fail{color:var(--fail)}
code,.el{font-family:ui-monospace,"SFMono-Regular",Menlo,Consolas,monospace;font-size:.88em}
ol.seq{margin:4px 0 10px;padding-left:26px}
.line{color:var(--muted);font-size:.85em}
details{margin-top:8px;font-size:.88rem}
summary{cursor:pointer;color:var(--teal)}
.caution{border-top:1px solid var(--rule);margin:28px 0 0;padding-top:10px;font-size:.92rem}
footer{margin-top:18px;color:var(--muted);font-size:.82rem}
@media (max-width:640px){body{padding:14px}.charts{grid-template-columns:1fr}nav ol{columns:1}}
@media print{
html,body{background:#fff}
body{max-width:none;padding:0;font-size:10.5pt}
.design{border:1px solid #999;border-top-width:5px;break-inside:avoid-page;page-break-inside:avoid}
.charts{grid-template-columns:1fr 1fr}
nav,details{display:none}
a{color:inherit;text-decoration:none}
}
`;

/** A story sentence as HTML: our words and user text escaped, ids and code in monospace. */
function sentenceHtml(s: Sentence): string {
  return s.map((x) => (x.kind === 'text' ? esc(x.text) : `<code>${esc(x.text)}</code>`)).join('');
}

const markHtml = (mark: string) => `<span class="mark" aria-hidden="true">${esc(mark)}</span>`;

export interface HtmlOptions {
  /** netbrace's README (http or https), which the definitions link to ("Reading the report"); without it the section is named. */
  readmeUrl?: string;
}

export function renderHtml(report: Report, options: HtmlOptions = {}): string {
  const readme =
    options.readmeUrl && /^https?:\/\//.test(options.readmeUrl) ? `${options.readmeUrl}#${README_ANCHOR}` : undefined;
  const verdict = verdictStory(report);
  const stories = designStories(report);
  const parts: string[] = [];
  parts.push('<!DOCTYPE html>');
  parts.push('<html lang="en">');
  parts.push('<head>');
  parts.push('<meta charset="utf-8">');
  parts.push(
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:">`,
  );
  parts.push('<meta name="viewport" content="width=device-width, initial-scale=1">');
  parts.push(`<meta name="generator" content="netbrace ${esc(report.tool.version)}">`);
  parts.push(`<title>${esc(`netbrace report \u2014 ${plainSentence(verdict.sentence)}`)}</title>`);
  parts.push(`<style>${CSS}</style>`);
  parts.push('</head>');
  parts.push(`<body data-report-version="${report.version}" data-verdict="${report.verdict}">`);
  parts.push('<header class="mast">');
  parts.push('<div class="brand" aria-hidden="true">netbrace \u00b7 robustness report</div>');
  parts.push(
    `<h1 class="verdict ${verdict.tone}" id="verdict" role="status" data-tone="${verdict.tone}">${markHtml(verdict.mark)}${sentenceHtml(verdict.sentence)}</h1>`,
  );
  parts.push(
    `<p class="caution-line" id="caution-line">${esc(CAUTION_LINE.replace(/ \(the full caution is at the end\)\./, ''))} (<a href="#caution">the full caution is at the end</a>).</p>`,
  );
  parts.push(meta(report));
  parts.push('</header>');
  parts.push('<main>');
  if (stories.length > 1) parts.push(contents(stories));
  if (stories.length === 0) parts.push('<p>No design files changed: nothing to judge.</p>');
  stories.forEach((d, i) => parts.push(designSection(d, i, readme)));
  parts.push(
    `<aside class="caution" id="caution" role="note" aria-label="Caution"><h2>Caution</h2><p>${esc(report.caution)}</p></aside>`,
  );
  parts.push('</main>');
  parts.push(
    `<footer><p>Written by netbrace ${esc(report.tool.version)} from report format version ${report.version}. ` +
      `Every number here is in the JSON report of the same run. Seed ${report.seed}; the same inputs and seed give the same numbers. ` +
      `The words R, area, spread and \u00b1 are defined beside the numbers that use them, and in netbrace\u2019s README, section \u201cReading the report\u201d.</p></footer>`,
  );
  parts.push('</body>');
  parts.push('</html>');
  return parts.join('\n') + '\n';
}

function meta(r: Report): string {
  const rows: [string, string][] = [];
  if (r.base || r.head)
    rows.push([
      'Compared',
      `base <code title="${esc(r.base ?? '')}">${esc(shortRevision(r.base))}</code> \u2192 head <code title="${esc(r.head ?? '')}">${esc(shortRevision(r.head))}</code>`,
    ]);
  const change = policyChangeSentence(r);
  rows.push([
    'Policy',
    (r.policy.source === 'builtin'
      ? 'no policy file: the built-in defaults for communication backbones were applied'
      : `<code>${esc(r.policy.path ?? 'policy file')}</code>${r.policy.revision ? ` as of <code>${esc(shortRevision(r.policy.revision))}</code>` : ''}` +
        (r.policy.note && !change ? `. ${esc(r.policy.note)}` : '')) + (change ? `. ${sentenceHtml(change)}` : ''),
  ]);
  const own = configurationNotes(r).filter((x) => x.file !== r.policy.path);
  if (own.length)
    rows.push([
      'Configuration',
      own.map((x) => `${x.weakens ? '<strong>' : ''}${esc(x.text)}${x.weakens ? '</strong>' : ''}`).join('<br>'),
    ]);
  if (r.scope === 'all') rows.push(['Scope', 'every design in the repository, judged against thresholds only']);
  rows.push([
    'Mode',
    r.mode === 'inform' ? 'inform: failures are reported, the run does not fail' : 'block: failures fail the check',
  ]);
  rows.push(['Seed', String(r.seed)]);
  if (r.part) rows.push(['Part', `${r.part.index} of ${r.part.total}`]);
  const counts = statusCounts(r).map(esc).join(', ');
  rows.push(['Designs', `${r.files.length}${counts ? ` (${counts})` : ''}`]);
  return `<dl class="meta">${rows.map(([k, v]) => `<dt>${esc(k)}</dt><dd>${v}</dd>`).join('')}</dl>`;
}

function contents(stories: DesignStory[]): string {
  const items = stories.map(
    (d, i) =>
      `<li><a href="#design-${i}">${esc(d.file.path)}</a> <span class="outcome ${d.outcome}">${markHtml(d.mark)}${esc(d.statusWord)}</span></li>`,
  );
  return `<nav aria-label="Designs in this report"><h3>Designs, worst first</h3><ol>${items.join('')}</ol></nav>`;
}

function weakenedItem(x: WeakenedItem): string {
  const mark = x.severity === 'fail' ? MARK.fail : x.severity === 'warn' ? MARK.warn : MARK.notice;
  const where = x.line > 0 ? ` <span class="line">line ${x.line}</span>` : '';
  return (
    `<li class="sev-${x.severity}" data-rule="${esc(x.rule)}" data-severity="${x.severity}">` +
    `${markHtml(mark)}<span class="title">${esc(x.title)}</span> <span class="line">(${esc(SEVERITY_WORD[x.severity])})</span>${where}` +
    `<div>${sentenceHtml(x.sentence)}</div></li>`
  );
}

function designSection(d: DesignStory, index: number, readme: string | undefined): string {
  const f = d.file;
  const id = `design-${index}`;
  const out: string[] = [];
  out.push(
    `<section class="design ${d.outcome}" id="${id}" aria-labelledby="${id}-h" data-path="${esc(f.path)}" data-status="${esc(f.status)}" data-outcome="${d.outcome}">`,
  );
  out.push('<header>');
  out.push(`<h2 id="${id}-h">${esc(f.path)}</h2>`);
  out.push(`<p class="outcome ${d.outcome}">${markHtml(d.mark)}${esc(d.statusWord)} \u2014 ${esc(d.headline)}</p>`);
  if (f.previousPath)
    out.push(`<p class="facts">Renamed from <code>${esc(f.previousPath)}</code>; compared with its old self.</p>`);
  out.push('</header>');

  // 1. What weakened: the consequences, worst first.
  out.push(`<div class="part consequences" data-part="consequences"><h3 id="${id}-weakened">What weakened</h3>`);
  if (d.weakened.length) out.push(`<ul class="weakened">${d.weakened.map(weakenedItem).join('')}</ul>`);
  else out.push(`<p class="facts">${esc(numbersOnlyHtml(d))}</p>`);
  out.push('</div>');

  // 2. How much: one line per requirement, and the words those lines use.
  if (d.howMuch.length) {
    out.push(
      `<div class="part numbers" data-part="numbers"><h3 id="${id}-how-much">How much</h3><ul class="how-much">`,
    );
    for (const l of d.howMuch) {
      const r = l.requirement;
      const sev = r.status === 'short' || r.status === 'weakened' ? ` sev-${r.severity}` : '';
      out.push(
        `<li class="st-${r.status}${sev}" data-requirement="${esc(r.id)}" data-status="${r.status}" data-base="${dataValue(r.base)}" data-head="${dataValue(r.head)}" data-delta="${dataValue(r.delta)}" data-se="${dataValue(r.se)}" data-threshold="${dataValue(r.threshold)}">` +
          `${markHtml(l.mark)}${statusFirst(sentenceHtml(l.sentence))}</li>`,
      );
    }
    out.push('</ul>');
    if (d.definitions.length) {
      const defs = d.definitions.map(
        (x) =>
          `<dt>${esc(x.term)}</dt><dd data-term="${esc(x.term)}">${sentenceHtml(x.sentence)} <a href="${esc(readme ?? `#${id}-about-${README_ANCHOR}`)}" class="more">More in the README</a></dd>`,
      );
      out.push(`<dl class="definitions" aria-label="What these words mean">${defs.join('')}</dl>`);
    }
    out.push('</div>');
  }

  // 3. The detail: what the change does, charts, map, sequences, structure, notices, mending.
  const detailAt = out.length;
  if (f.head) out.push(`<p class="facts">${esc(facts(f.head))}</p>`);
  if (f.warnings?.length) {
    const items = f.warnings.map(
      (w) =>
        `<li><code>${esc(`${f.path}:${w.line || 1}:${w.column || 1}`)}</code> ${esc(w.message)}${w.hint ? ` \u2014 ${esc(w.hint)}` : ''}</li>`,
    );
    out.push(
      `<div class="facts design-warnings"><strong>What reading the design warned of:</strong><ul>${items.join('')}</ul></div>`,
    );
  }
  const notApplicable = describeNotApplicable(f.head);
  if (notApplicable)
    out.push(
      `<p class="facts not-applicable"><strong>Not applicable to this design:</strong> ${esc(notApplicable)}</p>`,
    );
  const changed = describeChanges(f);
  const modified = describeModifications(f, 200);
  if (changed || modified.length) {
    const items = [...(changed ? [changed] : []), ...modified].map((l) => `<li>${esc(l)}</li>`).join('');
    out.push(`<div class="facts changes"><strong>What the change does:</strong><ul>${items}</ul></div>`);
  }
  if (f.head && f.head.envelopes.length) out.push(charts(f, id));
  out.push(mapHtml(f, id));
  out.push(weakest(f));
  out.push(structure(f));
  if (d.notices.length) {
    out.push(
      `<details class="notices"><summary>${d.notices.length} notice${d.notices.length === 1 ? '' : 's'} (context, within allowances)</summary><ul class="weakened">${d.notices.map(weakenedItem).join('')}</ul></details>`,
    );
  }
  out.push(mendHtml(f, id));
  if (d.definitions.length && !readme) out.push(readmePointer(`${id}-about-${README_ANCHOR}`));
  // The detail part only when there is detail (an unreadable file has none).
  if (out.slice(detailAt).some(Boolean)) {
    out.splice(detailAt, 0, `<div class="part detail" data-part="detail"><h3 id="${id}-detail">Detail</h3>`);
    out.push('</div>');
  }
  out.push('</section>');
  return out.filter(Boolean).join('\n');
}

function numbersOnlyHtml(d: DesignStory): string {
  const said = numbersOnly(d);
  return said ? `${said.charAt(0).toUpperCase()}${said.slice(1)}.` : 'Nothing weakened.';
}

/** The requirement line's leading status word ("weakened · …") set in bold. */
function statusFirst(html: string): string {
  const i = html.indexOf(' \u00b7 ');
  return i > 0 ? `<span class="status">${html.slice(0, i)}</span>${html.slice(i)}` : html;
}

/** Where the definitions point: the README section, named (the report is read offline, away from any repository). */
function readmePointer(anchor: string): string {
  return `<p class="facts" id="${anchor}">More on R, area, spread and \u00b1: netbrace\u2019s README, section \u201cReading the report\u201d (<code>README.md#${esc(README_ANCHOR)}</code>).</p>`;
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

/** An element as the HTML names it: formatElement with its label and id marked up, the parenthesis muted. */
function htmlElement(e: ReportElement): string {
  const el = (x: string) => `<span class="el">${esc(x)}</span>`;
  return formatElement(e, { id: el, text: el, meta: (x) => `<span class="line">${x}</span>` });
}

function costItem(c: Consequence | undefined, subject: string): string {
  return c ? `<p class="cost">${esc(consequenceSentence(c, subject))}</p>` : '';
}

function weakest(f: FileReport): string {
  const known = knownElements(f);
  const items = weakestSequences(f).map((s) => {
    const steps = s.elements
      .map(
        (e, i) =>
          `<li>${htmlElement(e)}${s.values && s.values[i] !== undefined ? ` \u2014 R ${esc(formatValue(s.values[i]))}` : ''}</li>`,
      )
      .join('');
    return `<div class="sequence"><p>${esc(s.title)}</p><ol class="seq">${steps}</ol>${costItem(s.consequence, 'These removals')}</div>`;
  });
  for (const c of f.head?.contingencies ?? []) {
    const worst = c.worst[0];
    if (worst) {
      const what = worst.elements
        .map((id, i) => htmlElement(worst.located?.[i] ?? knownElement(known, c.kind, id)))
        .join(' + ');
      items.push(
        `<div class="sequence"><p>${esc(contingencyLabel(c.challenge, c.kind))}: the ${esc(c.challenge === 'n-1' ? 'single' : 'double')} ${esc(kindSingular(c.kind))} loss that hurts most (${c.evaluated} of ${c.total} cases evaluated): ${what} leaves R ${esc(formatValue(worst.value))}</p></div>`,
      );
    }
  }
  return items.length ? `<h3>Weakest removal sequences</h3>${items.join('')}` : '';
}

function structure(f: FileReport): string {
  const head = f.head?.structure;
  if (!head) return '';
  const baseIds = new Set(
    [...(f.base?.structure.bridges ?? []), ...(f.base?.structure.cutNodes ?? [])].map((e) => e.id),
  );
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
