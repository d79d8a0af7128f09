// "What would mend it", in words: the plain-text view `netbrace mend` prints and the HTML
// fragment the report shows for a failing design. Both come from FileReport.mend alone.
// User text (ids, paths) is made safe for each target by escape.ts.

import { stringify } from 'yaml';
import { linkEntry } from '../mend/apply.js';
import type { MendLink, MendReport, MendSuggestion, MendTarget } from '../mend/types.js';
import { escapeHtml, oneLine } from './escape.js';
import { formatValue } from './labels.js';
import type { FileReport } from './report.js';

const esc = (s: string | number) => escapeHtml(String(s));
const plain = (s: string) => oneLine(s, 300);

/** What a planner must keep in mind before acting on a suggestion. */
export const MEND_CAUTION =
  'Suggestions are topology-level: generated lengths are straight-line distances times a route factor, ' +
  'not surveyed routes; whether a link can be built (rights of way, ducts it would share, cost) is not known ' +
  'to netbrace, and a hardened element still fails in reality, only not in these challenges. Check each one ' +
  'with an engineering study before relying on it.';

/** A requirement value: whole numbers for counts (bridges, cut nodes), else three decimals. */
function value(id: string, v: number | null): string {
  return v !== null && /spof/.test(id) && Number.isInteger(v) ? String(v) : formatValue(v);
}

function unitWord(s: MendSuggestion): string {
  if (s.total === null) return '';
  if (s.unit === 'km') return `${s.total} km`;
  if (s.unit === 'cost') return `cost ${s.total}`;
  if (s.unit === 'element') return `${s.total} element${s.total === 1 ? '' : 's'}`;
  return `${s.total} link${s.total === 1 ? '' : 's'}`;
}

function perUnit(s: MendSuggestion): string {
  if (s.gainPerUnit === null) return '';
  const u = s.unit === 'km' ? 'km' : s.unit === 'cost' ? 'cost unit' : s.unit === 'element' ? 'element' : 'link';
  const v = s.gainPerUnit;
  const text = Math.abs(v) >= 0.001 ? v.toFixed(4) : v.toExponential(2);
  return `${v >= 0 ? '+' : ''}${text.replace(/^-/, '\u2212')} R\u0304 per ${u}`;
}

function linkWords(l: MendLink): string {
  const parts = [`${l.between[0]}\u2013${l.between[1]}`];
  if (l.lengthKm !== undefined) parts.push(`${l.lengthKm} km`);
  if (l.latencyMs !== undefined)
    parts.push(`latency ${l.latencyMs} ms${l.latencyEstimated ? ' (estimated from the design\u2019s links)' : ''}`);
  if (l.cost !== undefined) parts.push(`cost ${l.cost}`);
  if (l.riskGroups?.length) parts.push(`in ${l.riskGroups.join(', ')}`);
  parts.push(l.source === 'list' ? `from the candidate list${l.line ? `, line ${l.line}` : ''}` : 'generated');
  return parts.join(', ');
}

/** The YAML a planner adds under `links:` of a design in our format. */
export function linksYaml(links: readonly MendLink[]): string {
  return links
    .map(
      (l) =>
        `  - ${stringify(linkEntry(l), { collectionStyle: 'flow', flowCollectionPadding: false, lineWidth: 0 }).trim()}`,
    )
    .join('\n');
}

function targetSummary(targets: readonly MendTarget[]): string[] {
  const by = (rule: string) => targets.filter((t) => t.rule === rule);
  const out: string[] = [];
  const list = (ts: MendTarget[]) =>
    ts.map((t) => `${t.elements[0]?.id ?? '?'} (line ${t.elements[0]?.line ?? t.line})`).join(', ');
  if (by('new-bridge').length)
    out.push(
      `${by('new-bridge').length} new bridge${by('new-bridge').length === 1 ? '' : 's'}: ${list(by('new-bridge'))}`,
    );
  if (by('new-cut-node').length)
    out.push(
      `${by('new-cut-node').length} new cut site${by('new-cut-node').length === 1 ? '' : 's'}: ${list(by('new-cut-node'))}`,
    );
  for (const t of targets)
    if (t.rule !== 'new-bridge' && t.rule !== 'new-cut-node')
      out.push(`${t.severity === 'fail' ? 'failing' : 'warning'}: ${t.message}`);
  return out;
}

function boundWords(m: MendReport): string[] {
  const out: string[] = [];
  const nb = m.bounds.newBridges;
  if (nb)
    out.push(
      `at least ${nb.links} link${nb.links === 1 ? '' : 's'} to remove the new bridges (their bridge tree has ${nb.leaves} leaves; Eswaran & Tarjan 1976)`,
    );
  const ab = m.bounds.allBridges;
  if (ab.links > 0)
    out.push(
      `at least ${ab.links} link${ab.links === 1 ? '' : 's'} to leave no bridge at all (${ab.leaves} leaves${ab.isolated ? `, ${ab.isolated} isolated parts` : ''})`,
    );
  return out;
}

function candidateWords(m: MendReport): string {
  const c = m.candidates;
  if (c.source === 'list')
    return `${c.count} candidate link${c.count === 1 ? '' : 's'} from ${c.path ?? 'the planner\u2019s list'}`;
  if (c.source === 'generated' && c.maxKm !== undefined) {
    return `${c.count} site pairs within ${c.maxKm} km (great circle), length = great-circle distance \u00d7 ${c.routeFactor} route factor (common practice)`;
  }
  if (c.source === 'generated') return `${c.count} site pairs (no coordinates: lengths unknown, priced per link)`;
  return 'no candidate links';
}

function headline(s: MendSuggestion, i: number): string {
  const what =
    s.kind === 'links'
      ? `add ${s.links.length} link${s.links.length === 1 ? '' : 's'}${s.total !== null && s.unit !== 'link' ? `, ${unitWord(s)}` : ''}`
      : `harden ${s.harden.length} element${s.harden.length === 1 ? '' : 's'}`;
  const verdict = s.holds ? 'holds' : `does not hold (${s.status})`;
  const r =
    s.rBefore !== null && s.rAfter !== null ? `R\u0304 ${formatValue(s.rBefore)} \u2192 ${formatValue(s.rAfter)}` : '';
  return `${i}. ${what} \u2014 ${verdict}${r ? `; ${r}` : ''}${perUnit(s) ? ` (${perUnit(s)})` : ''}`;
}

/** The mend part as plain text lines (no colour). */
export function renderMendText(f: FileReport): string {
  const m = f.mend;
  const out: string[] = [];
  out.push(`What would mend ${plain(f.path)}`);
  if (!m) {
    out.push(
      '  nothing was searched: the design does not fail, or the policy turns the search off (mend.evaluations: 0)',
    );
    return `${out.join('\n')}\n`;
  }
  if (m.targets.length) {
    out.push(`  Targets (${m.targets.length}):`);
    for (const t of targetSummary(m.targets)) out.push(`    - ${plain(t)}`);
  }
  for (const b of boundWords(m)) out.push(`  Bound: ${b}`);
  out.push(`  Candidates: ${plain(candidateWords(m))}`);
  out.push(`  ${m.rDefinition}; ${m.evaluations} engine evaluation${m.evaluations === 1 ? '' : 's'}`);
  out.push('');
  if (!m.targets.length)
    out.push('  Nothing to mend: no failing or warning finding that a change to the design can fix.');
  else if (!m.suggestions.length) out.push('  No suggestion: nothing tried removes a target.');
  m.suggestions.forEach((s, i) => {
    out.push(`  ${plain(headline(s, i + 1))}`);
    for (const l of s.links) out.push(`       + ${plain(l.id)}: ${plain(linkWords(l))}`);
    for (const e of s.harden)
      out.push(`       * harden ${e.kind === 'node' ? 'site' : e.kind} ${plain(e.id)} (line ${e.line})`);
    out.push(
      `       fixes ${s.fixes.length} of ${m.targets.length} targets${s.leaves.length ? `; still there: ${plain(s.leaves.join('; ').replace(/\|/g, ' '))}` : ''}`,
    );
    for (const r of s.requirements) {
      out.push(`       ${plain(r.description)}: ${value(r.id, r.before)} \u2192 ${value(r.id, r.after)} (${r.status})`);
    }
    out.push(`       how: ${plain(s.method)}`);
    if (s.links.length) {
      out.push('       in the design file, under links:');
      for (const line of linksYaml(s.links).split('\n')) out.push(`       ${oneLine(line, 400)}`);
    }
    out.push('');
  });
  for (const n of m.notes) if (m.targets.length || !n.startsWith('nothing to mend')) out.push(`  Note: ${plain(n)}`);
  out.push(`  Caution: ${MEND_CAUTION}`);
  return `${out.join('\n')}\n`;
}

/** The mend part of the HTML report (empty when there is none). */
export function mendHtml(f: FileReport, id: string): string {
  const m = f.mend;
  if (!m) return '';
  const parts: string[] = [];
  parts.push(`<h3 id="${id}-mend">What would mend it</h3>`);
  const facts = [...boundWords(m).map((b) => `Bound: ${b}.`), `Candidates: ${candidateWords(m)}.`, `${m.rDefinition}.`];
  parts.push(`<p class="facts">${facts.map(esc).join(' ')}</p>`);
  if (m.suggestions.length) {
    const rows = m.suggestions.map((s, i) => {
      const change =
        s.kind === 'links'
          ? s.links
              .map((l) => `<span class="el">+ ${esc(l.id)}</span> <span class="line">${esc(linkWords(l))}</span>`)
              .join('<br>')
          : s.harden
              .map(
                (e) =>
                  `<span class="el">harden ${esc(e.id)}</span> <span class="line">(${esc(e.kind)}, line ${e.line})</span>`,
              )
              .join('<br>');
      const req = s.requirements
        .map(
          (r) =>
            `${esc(r.description)}: ${esc(value(r.id, r.before))} \u2192 ${esc(value(r.id, r.after))} (${esc(r.status)})`,
        )
        .join('<br>');
      return (
        `<tr data-suggestion="${i + 1}" data-kind="${s.kind}" data-holds="${s.holds}">` +
        `<th scope="row">${i + 1}</th>` +
        `<td>${change}</td>` +
        `<td class="num">${esc(unitWord(s) || '\u2013')}</td>` +
        `<td class="num">${esc(formatValue(s.rBefore))} \u2192 ${esc(formatValue(s.rAfter))}${perUnit(s) ? `<div class="line">${esc(perUnit(s))}</div>` : ''}</td>` +
        `<td>${s.fixes.length} of ${m.targets.length}${s.leaves.length ? `<div class="line">still: ${esc(s.leaves.join('; ').replace(/\|/g, ' '))}</div>` : ''}<div class="line">${req}</div></td>` +
        `<td class="${s.holds ? 'st-holds' : 'sev-fail'}">${s.holds ? 'holds' : esc(`does not hold (${s.status})`)}</td>` +
        '</tr>'
      );
    });
    parts.push(
      `<table class="mend" id="${id}-mend-table"><caption>Each suggestion applied to the head design and judged again by the same engine, policy and seed (common random numbers with the base). Best first.</caption>` +
        '<thead><tr><th scope="col">#</th><th scope="col">Change</th><th scope="col" class="num">Length or cost</th><th scope="col" class="num">R\u0304 before \u2192 after</th><th scope="col">Fixes</th><th scope="col">Check</th></tr></thead>' +
        `<tbody>${rows.join('')}</tbody></table>`,
    );
    const first = m.suggestions.find((s) => s.kind === 'links');
    if (first) {
      parts.push(
        `<details><summary>Suggestion ${m.suggestions.indexOf(first) + 1} in the design file (under <code>links:</code>)</summary><pre><code>${esc(linksYaml(first.links))}</code></pre></details>`,
      );
    }
  } else {
    parts.push('<p class="facts">No suggestion: nothing tried removes a target.</p>');
  }
  for (const n of m.notes) parts.push(`<p class="facts">Note: ${esc(n)}</p>`);
  parts.push(`<p class="facts"><strong>Caution.</strong> ${esc(MEND_CAUTION)}</p>`);
  return parts.join('\n');
}
