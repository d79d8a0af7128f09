// Where the change is and what would mend it, for the pull-request summary and comment: the
// neighbourhood of the change as a Mermaid graph (GitHub draws Mermaid; it allows no SVG), and
// one paragraph naming the first suggestions of FileReport.mend. The sites and links the change adds or removes,
// its new bridges and cut sites, and their neighbours, while the picture stays legible
// (MAX_ELEMENTS sites + links); beyond that, one sentence points to the HTML report's map.
// Mermaid sees no user text as written: node ids are generated (n0, n1, …), and labels are
// the element ids reduced to letters, digits, spaces and . _ - (anything else becomes _),
// so an id cannot close a label, start a directive or inject a link.

import type { MapLink } from '../map/types.js';
import type { MendSuggestion } from '../mend/types.js';
import { markdownCode } from './escape.js';
import { formatValue } from './labels.js';
import type { FileReport } from './report.js';

/** Most sites + links drawn. */
export const MAX_ELEMENTS = 40;

const COLORS = { fail: '#a4161a', added: '#2d6a3e', removed: '#8a949a', cut: '#8f5200' } as const;

/** A label Mermaid shows literally. */
export function mermaidLabel(id: string): string {
  const safe = [...id]
    .map((c) => (/[\p{L}\p{N} ._-]/u.test(c) ? c : '_'))
    .join('')
    .replace(/\s+/g, ' ')
    .trim();
  const cut = safe.length > 40 ? `${safe.slice(0, 39)}_` : safe;
  return cut || '_';
}

export function neighbourhoodMermaid(f: FileReport): string {
  const map = f.map;
  if (!map || 'omitted' in map) return '';
  const newBridges = new Set(
    f.findings.filter((x) => x.rule === 'new-bridge').flatMap((x) => x.elements.map((e) => e.id)),
  );
  const newCuts = new Set(
    f.findings.filter((x) => x.rule === 'new-cut-node').flatMap((x) => x.elements.map((e) => e.id)),
  );
  const focusLinks = map.links.filter((l) => l.side !== 'both' || newBridges.has(l.id));
  const focus = new Set<string>();
  for (const n of map.nodes) if (n.side !== 'both' || newCuts.has(n.id)) focus.add(n.id);
  for (const l of focusLinks) {
    focus.add(l.source);
    focus.add(l.target);
  }
  if (focus.size === 0) return '';
  const linksAmong = (set: ReadonlySet<string>) => map.links.filter((l) => set.has(l.source) && set.has(l.target));
  if (focus.size + linksAmong(focus).length > MAX_ELEMENTS) {
    return `The change touches ${focus.size} sites and ${focusLinks.length} links: too many to draw legibly here. The HTML report has the map of the whole design.\n\n`;
  }
  // Grow by neighbours, nearest first (file order), while the picture stays within the limit.
  const chosen = new Set(focus);
  const adj = new Map<string, string[]>();
  for (const l of map.links) {
    adj.set(l.source, [...(adj.get(l.source) ?? []), l.target]);
    adj.set(l.target, [...(adj.get(l.target) ?? []), l.source]);
  }
  let frontier = [...focus];
  for (let ring = 0; ring < 2 && frontier.length; ring++) {
    const next: string[] = [];
    for (const v of frontier) {
      for (const w of adj.get(v) ?? []) {
        if (chosen.has(w)) continue;
        const trial = new Set(chosen).add(w);
        if (trial.size + linksAmong(trial).length > MAX_ELEMENTS) continue;
        chosen.add(w);
        next.push(w);
      }
    }
    frontier = next;
  }
  const nodes = map.nodes.filter((n) => chosen.has(n.id));
  const name = new Map(nodes.map((n, i) => [n.id, `n${i}`]));
  const lines: string[] = ['```mermaid', 'graph LR'];
  for (const n of nodes) {
    const label = mermaidLabel(n.label ?? n.id);
    const shape = newCuts.has(n.id)
      ? `{{"${label}"}}`
      : n.side === 'head'
        ? `(["${label}"])`
        : n.side === 'base'
          ? `[/"${label}"/]`
          : `("${label}")`;
    lines.push(`  ${name.get(n.id)}${shape}`);
  }
  const drawn: MapLink[] = linksAmong(chosen);
  const styles: string[] = [];
  drawn.forEach((l, i) => {
    const a = name.get(l.source)!;
    const b = name.get(l.target)!;
    if (l.side === 'base') {
      lines.push(`  ${a} -.-|removed| ${b}`);
      styles.push(`  linkStyle ${i} stroke:${COLORS.removed},stroke-dasharray:5 4`);
    } else if (newBridges.has(l.id)) {
      lines.push(`  ${a} ===|new bridge| ${b}`);
      styles.push(`  linkStyle ${i} stroke:${COLORS.fail},stroke-width:4px`);
    } else if (l.side === 'head') {
      lines.push(`  ${a} ---|added| ${b}`);
      styles.push(`  linkStyle ${i} stroke:${COLORS.added},stroke-width:3px`);
    } else {
      lines.push(`  ${a} --- ${b}`);
    }
  });
  lines.push(...styles);
  const weak = nodes.filter((n) => newCuts.has(n.id)).map((n) => name.get(n.id));
  if (weak.length) {
    lines.push(`  classDef weak fill:#f8dcdc,stroke:${COLORS.fail},stroke-width:2px`);
    lines.push(`  class ${weak.join(',')} weak`);
  }
  lines.push('```');
  const more = map.nodes.length - nodes.length;
  const legend =
    'Hexagons are new cut sites; thick links new bridges; dashed links removed, labelled ones added.' +
    (more > 0 ? ` ${more} more sites are not drawn; the HTML report has the whole map.` : '');
  return `**Where the change is**: the neighbourhood of the change.\n\n${lines.join('\n')}\n\n${legend}\n\n`;
}

function suggestionWords(s: MendSuggestion): string {
  const what =
    s.kind === 'links'
      ? `add ${s.links
          .map(
            (l) =>
              `${markdownCode(l.id, 80)} (${markdownCode(`${l.between[0]}\u2013${l.between[1]}`, 120)}${l.lengthKm !== undefined ? `, ${l.lengthKm} km` : ''}${l.cost !== undefined ? `, cost ${l.cost}` : ''})`,
          )
          .join(' and ')}`
      : `harden ${s.harden.length} element${s.harden.length === 1 ? '' : 's'} (${s.harden
          .slice(0, 6)
          .map((e) => markdownCode(e.id, 80))
          .join(', ')}${s.harden.length > 6 ? ', \u2026' : ''})`;
  const r =
    s.rBefore !== null && s.rAfter !== null
      ? `, R\u0304 ${formatValue(s.rBefore)} \u2192 ${formatValue(s.rAfter)}`
      : '';
  return `${what}: ${s.holds ? 'holds' : 'does not hold on its own'}${r}`;
}

/** One paragraph: the best link suggestion and the hardening alternative, judged by the gate. */
export function mendMarkdown(f: FileReport): string {
  const m = f.mend;
  if (!m || m.targets.length === 0) return '';
  const links = m.suggestions.find((s) => s.kind === 'links');
  const harden = m.suggestions.find((s) => s.kind === 'harden');
  const parts = [
    links ? suggestionWords(links) : 'no link suggestion',
    ...(harden ? [`or ${suggestionWords(harden)}`] : []),
  ];
  return (
    `**What would mend it**, each judged again by the same check: ${parts.join('; ')}. ` +
    'The HTML report (or `netbrace mend`) has every suggestion, the YAML to add and the caution: a suggestion is a topology-level hint, not a route survey.\n\n'
  );
}

/** The section the summary shows per design: where the change is, and what would mend it. */
export function changeMapMarkdown(f: FileReport): string {
  return neighbourhoodMermaid(f) + mendMarkdown(f);
}
