// The map of a design as SVG: sites and links at the positions of FileReport.map, base against
// head — removed links dashed, added links drawn as a double line, new bridges thick and
// marked, cut sites as diamonds (new ones filled), shared-risk groups whose loss strands sites
// under a wide band, the weakest removal sequence numbered, and the links of the first "what
// would mend it" suggestion dotted. Each element carries a <title> with its label, id and line
// (browsers show it on hover; screen readers read it). Our own colours, presentation
// attributes only: no script, no style sheet, no fonts, no links, so the file passes the
// HTML report's Content-Security-Policy and can stand alone (`netbrace map --svg`). Every
// distinction is also one of shape, width or dash, so it survives printing in black and white.

import type { DesignMap, MapLink, MapNode } from '../map/types.js';
import type { MendLink } from '../mend/types.js';
import { escapeHtml } from './escape.js';
import { weakestSequences } from './labels.js';
import type { FileReport } from './report.js';

const esc = (s: string | number) => escapeHtml(String(s));

export const MAP_COLORS = {
  paper: '#fbf9f3',
  ink: '#1e2a32',
  link: '#55636c',
  muted: '#8a949a',
  fail: '#a4161a',
  warn: '#8f5200',
  pass: '#2d6a3e',
  notice: '#1d5fa3',
  band: '#e3b34c',
  bandNew: '#c7741a',
  sea: '#e4efec',
} as const;

export interface MapHighlights {
  /** Link ids that are bridges at head, and those of them that are new. */
  bridges: Set<string>;
  newBridges: Set<string>;
  /** Node ids that are cut nodes at head, and the new ones. */
  cutNodes: Set<string>;
  newCutNodes: Set<string>;
  /** The weakest removal sequence: element ids in order (numbered 1, 2, …). */
  weakest: string[];
  weakestTitle?: string;
  /** Links of the first mend suggestion, drawn as proposed. */
  proposed: MendLink[];
}

/** Most numbered steps drawn. */
export const MAX_NUMBERED = 12;
/** Up to this many sites every site is labelled; above, only the marked ones. */
export const LABEL_ALL_LIMIT = 60;

/** What the report says about a design, as map highlights. */
export function mapHighlights(f: FileReport): MapHighlights {
  const bridges = new Set((f.head?.structure.bridges ?? []).map((e) => e.id));
  const cutNodes = new Set((f.head?.structure.cutNodes ?? []).map((e) => e.id));
  const newBridges = new Set(
    f.findings.filter((x) => x.rule === 'new-bridge').flatMap((x) => x.elements.map((e) => e.id)),
  );
  const newCutNodes = new Set(
    f.findings.filter((x) => x.rule === 'new-cut-node').flatMap((x) => x.elements.map((e) => e.id)),
  );
  const seq = weakestSequences(f)[0];
  const first =
    f.mend?.suggestions.find((s) => s.kind === 'links' && s.holds) ??
    f.mend?.suggestions.find((s) => s.kind === 'links');
  return {
    bridges,
    newBridges,
    cutNodes,
    newCutNodes,
    weakest: seq ? seq.ids.slice(0, MAX_NUMBERED) : [],
    ...(seq ? { weakestTitle: seq.title } : {}),
    proposed: first ? first.links : [],
  };
}

function nodeTitle(n: MapNode, h: MapHighlights, step: number | undefined): string {
  const name = n.label ? `${n.label} (${n.id})` : n.id;
  const parts = [`Site ${name}`, n.side === 'base' ? `base line ${n.line}` : `line ${n.line}`];
  if (n.side === 'head') parts.push('added by the change');
  if (n.side === 'base') parts.push('removed by the change');
  if (h.newCutNodes.has(n.id)) parts.push('new cut site: its loss alone splits the design');
  else if (h.cutNodes.has(n.id)) parts.push('cut site: its loss alone splits the design');
  if (n.hardened) parts.push('hardened');
  if (n.placed) parts.push('no coordinates: placed beside its neighbours');
  if (step !== undefined) parts.push(`step ${step} of the weakest removal sequence`);
  return parts.join(' \u2014 ');
}

function linkTitle(
  l: MapLink,
  h: MapHighlights,
  step: number | undefined,
  stranding: ReadonlyMap<string, { strands: number; isNew: boolean }>,
): string {
  const parts = [
    `Link ${l.id} (${l.source}\u2013${l.target})`,
    l.side === 'base' ? `base line ${l.line}` : `line ${l.line}`,
  ];
  if (l.side === 'head') parts.push('added by the change');
  if (l.side === 'base') parts.push('removed by the change');
  if (h.newBridges.has(l.id)) parts.push('new bridge: its loss alone splits the design');
  else if (h.bridges.has(l.id) && l.side !== 'base') parts.push('bridge: its loss alone splits the design');
  for (const g of l.groups ?? []) {
    const s = stranding.get(g);
    parts.push(
      s
        ? `in shared-risk group ${g}, whose loss strands ${s.strands} site${s.strands === 1 ? '' : 's'}${s.isNew ? ' (new)' : ''}`
        : `in shared-risk group ${g}`,
    );
  }
  if (l.hardened) parts.push('hardened');
  if (step !== undefined) parts.push(`step ${step} of the weakest removal sequence`);
  return parts.join(' \u2014 ');
}

const LEGEND_ROW = 22;

interface LegendItem {
  key: string;
  label: string;
  draw: (x: number, y: number) => string;
}

/** The map as a standalone SVG element. `idPrefix` keeps element ids unique within an HTML page. */
export function renderMapSvg(
  map: DesignMap,
  h: MapHighlights,
  options: { idPrefix?: string; title?: string } = {},
): string {
  const id = options.idPrefix ?? 'nb-map';
  const C = MAP_COLORS;
  const pos = new Map(map.nodes.map((n) => [n.id, n]));
  const stranding = new Map(map.strandingGroups.map((g) => [g.id, g]));
  const step = new Map<string, number>();
  h.weakest.forEach((el, i) => {
    if (!step.has(el)) step.set(el, i + 1);
  });
  const used = new Set<string>();
  const body: string[] = [];

  // Shared-risk groups that strand sites: a wide band under their links.
  for (const g of map.strandingGroups) {
    const members = map.links.filter((l) => l.side !== 'base' && (l.groups ?? []).includes(g.id));
    if (!members.length) continue;
    used.add(g.isNew ? 'group-new' : 'group');
    const segs = members.map((l) => seg(pos.get(l.source)!, pos.get(l.target)!)).join(' ');
    const n = step.get(g.id);
    body.push(
      `<g data-el="group" data-id="${esc(g.id)}"><title>${esc(`Shared-risk group ${g.id} (line ${g.line}): losing all its ${members.length} link${members.length === 1 ? '' : 's'} at once strands ${g.strands} site${g.strands === 1 ? '' : 's'}${g.isNew ? ', which the base did not' : ''}${n !== undefined ? ` \u2014 step ${n} of the weakest removal sequence` : ''}`)}</title>` +
        `<path d="${segs}" fill="none" stroke="${g.isNew ? C.bandNew : C.band}" stroke-opacity="${g.isNew ? 0.55 : 0.4}" stroke-width="11" stroke-linecap="round"${g.isNew ? ' stroke-dasharray="14 5"' : ''}/></g>`,
    );
  }

  // Links: removed (base only) first, then the others, bridges on top.
  const order = [...map.links].sort((a, b) => linkRank(a, h) - linkRank(b, h));
  for (const l of order) {
    const a = pos.get(l.source)!;
    const b = pos.get(l.target)!;
    const n = step.get(l.id);
    const title = `<title>${esc(linkTitle(l, h, n, stranding))}</title>`;
    const d = `M${a.x} ${a.y}L${b.x} ${b.y}`;
    let shape: string;
    if (l.side === 'base') {
      used.add('removed');
      shape = `<path d="${d}" stroke="${C.link}" stroke-width="1.8" stroke-dasharray="6 4" stroke-opacity="0.85"/>`;
    } else if (h.newBridges.has(l.id)) {
      used.add('new-bridge');
      const [mx, my] = mid(a, b);
      shape = `<path d="${d}" stroke="${C.fail}" stroke-width="4.2" stroke-linecap="round"/><rect x="${r1(mx - 4)}" y="${r1(my - 4)}" width="8" height="8" fill="${C.fail}" stroke="${C.paper}" stroke-width="1.2"/>`;
    } else if (l.side === 'head') {
      used.add('added');
      shape = `<path d="${d}" stroke="${C.pass}" stroke-width="5"/><path d="${d}" stroke="${C.paper}" stroke-width="1.6"/>`;
    } else if (h.bridges.has(l.id)) {
      used.add('bridge');
      shape = `<path d="${d}" stroke="${C.warn}" stroke-width="3"/>`;
    } else {
      used.add('link');
      shape = `<path d="${d}" stroke="${C.link}" stroke-width="${l.hardened ? 2.6 : 1.6}"/>`;
    }
    body.push(`<g data-el="link" data-id="${esc(l.id)}" data-side="${l.side}" fill="none">${title}${shape}</g>`);
  }

  // The links the first suggestion adds: dotted.
  h.proposed.forEach((l, i) => {
    const a = pos.get(l.between[0]);
    const b = pos.get(l.between[1]);
    if (!a || !b) return;
    used.add('proposed');
    const len = l.lengthKm !== undefined ? `, ${l.lengthKm} km` : '';
    body.push(
      `<g data-el="proposed" data-id="${esc(l.id)}" fill="none"><title>${esc(`Proposed link ${l.id} (${l.between[0]}\u2013${l.between[1]}${len}): suggestion 1 of "what would mend it"${i > 0 ? `, link ${i + 1}` : ''}`)}</title>` +
        `<path d="M${a.x} ${a.y}L${b.x} ${b.y}" stroke="${C.notice}" stroke-width="2.6" stroke-dasharray="1 5" stroke-linecap="round"/></g>`,
    );
  });

  // Sites.
  const labelAll = map.nodes.length <= LABEL_ALL_LIMIT;
  for (const n of map.nodes) {
    const k = step.get(n.id);
    const marked = h.cutNodes.has(n.id) || n.side !== 'both' || k !== undefined;
    const title = `<title>${esc(nodeTitle(n, h, k))}</title>`;
    let shape: string;
    if (h.newCutNodes.has(n.id)) {
      used.add('new-cut');
      shape = diamond(n.x, n.y, 7, `fill="${C.fail}" stroke="${C.ink}" stroke-width="1.2"`);
    } else if (h.cutNodes.has(n.id) && n.side !== 'base') {
      used.add('cut');
      shape = diamond(n.x, n.y, 6.5, `fill="${C.paper}" stroke="${C.warn}" stroke-width="2.2"`);
    } else if (n.side === 'base') {
      used.add('site-removed');
      shape = `<circle cx="${n.x}" cy="${n.y}" r="4.5" fill="${C.paper}" stroke="${C.muted}" stroke-width="1.4" stroke-dasharray="2 2"/>`;
    } else if (n.side === 'head') {
      used.add('site-added');
      shape = `<circle cx="${n.x}" cy="${n.y}" r="5.5" fill="${C.paper}" stroke="${C.pass}" stroke-width="2.6"/>`;
    } else {
      used.add(n.hardened ? 'site-hardened' : 'site');
      shape = `<circle cx="${n.x}" cy="${n.y}" r="4.2" fill="${n.hardened ? C.ink : C.paper}" stroke="${C.ink}" stroke-width="1.3"/>`;
    }
    const label =
      labelAll || marked
        ? `<text x="${r1(n.x + 7)}" y="${r1(n.y - 6)}" font-size="10.5" fill="${C.ink}" stroke="${C.paper}" stroke-width="3" paint-order="stroke">${esc(short(n.label ?? n.id))}</text>`
        : '';
    body.push(`<g data-el="site" data-id="${esc(n.id)}" data-side="${n.side}">${title}${shape}${label}</g>`);
  }

  // The weakest sequence, numbered at its elements (a link or group at its midpoint).
  const badges: string[] = [];
  h.weakest.forEach((el, i) => {
    if (step.get(el) !== i + 1) return;
    let at: { x: number; y: number } | undefined;
    const node = pos.get(el);
    if (node) at = { x: node.x - 10, y: node.y + 11 };
    else {
      const link =
        map.links.find((l) => l.id === el) ?? map.links.find((l) => l.side !== 'base' && (l.groups ?? []).includes(el));
      if (link) {
        const [mx, my] = mid(pos.get(link.source)!, pos.get(link.target)!);
        at = { x: mx, y: my - 10 };
      }
    }
    if (!at) return;
    used.add('step');
    badges.push(
      `<g data-el="step" data-step="${i + 1}"><title>${esc(`Step ${i + 1} of the weakest removal sequence: ${el}${h.weakestTitle ? ` (${h.weakestTitle})` : ''}`)}</title>` +
        `<circle cx="${r1(at.x)}" cy="${r1(at.y)}" r="8" fill="${C.ink}" stroke="${C.paper}" stroke-width="1.5"/>` +
        `<text x="${r1(at.x)}" y="${r1(at.y + 3.6)}" font-size="10" font-weight="700" text-anchor="middle" fill="${C.paper}">${i + 1}</text></g>`,
    );
  });

  // Legend: only what the map shows.
  const items = legend(C).filter((it) => used.has(it.key));
  const perRow = 2;
  const rows = Math.ceil(items.length / perRow);
  const height = map.height + (rows ? rows * LEGEND_ROW + 14 : 0);
  const colW = map.width / perRow;
  const legendOut = items.map((it, i) => {
    const x = 14 + (i % perRow) * colW;
    const y = map.height + 12 + Math.floor(i / perRow) * LEGEND_ROW;
    return `<g data-el="legend" data-key="${it.key}"><title>${esc(`Legend: ${it.label}`)}</title>${it.draw(x, y + 8)}<text x="${r1(x + 40)}" y="${r1(y + 12)}" font-size="11.5" fill="${C.ink}">${esc(it.label)}</text></g>`;
  });

  const title = options.title ?? `Map of the design: ${map.nodes.length} sites, ${map.links.length} links`;
  const desc = describeMap(map, h);
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" class="nb-map" viewBox="0 0 ${map.width} ${height}" width="${map.width}" height="${height}" role="img" aria-labelledby="${id}-title ${id}-desc" font-family="system-ui, -apple-system, 'Segoe UI', Roboto, sans-serif" data-layout="${map.layout}">`,
    `<title id="${id}-title">${esc(title)}</title>`,
    `<desc id="${id}-desc">${esc(desc)}</desc>`,
    `<g data-el="frame"><title>${esc(map.layout === 'geographic' ? 'Map area: sites at their coordinates' : 'Map area: positions from a force-directed layout, not geography')}</title><rect x="0" y="0" width="${map.width}" height="${map.height}" fill="${map.layout === 'geographic' ? C.sea : C.paper}" stroke="${C.muted}" stroke-width="0.8"/></g>`,
    ...body,
    ...badges,
    ...legendOut,
    '</svg>',
  ].join('\n');
}

function linkRank(l: MapLink, h: MapHighlights): number {
  if (l.side === 'base') return 0;
  if (h.newBridges.has(l.id)) return 4;
  if (h.bridges.has(l.id)) return 3;
  if (l.side === 'head') return 2;
  return 1;
}

function legend(C: typeof MAP_COLORS): LegendItem[] {
  const line = (attrs: string) => (x: number, y: number) => `<path d="M${r1(x)} ${r1(y)}h30" fill="none" ${attrs}/>`;
  return [
    {
      key: 'site',
      label: 'site',
      draw: (x, y) =>
        `<circle cx="${r1(x + 15)}" cy="${r1(y)}" r="4.2" fill="${C.paper}" stroke="${C.ink}" stroke-width="1.3"/>`,
    },
    {
      key: 'site-hardened',
      label: 'hardened site',
      draw: (x, y) =>
        `<circle cx="${r1(x + 15)}" cy="${r1(y)}" r="4.2" fill="${C.ink}" stroke="${C.ink}" stroke-width="1.3"/>`,
    },
    {
      key: 'site-added',
      label: 'site added by the change',
      draw: (x, y) =>
        `<circle cx="${r1(x + 15)}" cy="${r1(y)}" r="5.5" fill="${C.paper}" stroke="${C.pass}" stroke-width="2.6"/>`,
    },
    {
      key: 'site-removed',
      label: 'site removed by the change',
      draw: (x, y) =>
        `<circle cx="${r1(x + 15)}" cy="${r1(y)}" r="4.5" fill="${C.paper}" stroke="${C.muted}" stroke-width="1.4" stroke-dasharray="2 2"/>`,
    },
    {
      key: 'cut',
      label: 'cut site (single point of failure)',
      draw: (x, y) => diamond(x + 15, y, 6.5, `fill="${C.paper}" stroke="${C.warn}" stroke-width="2.2"`),
    },
    {
      key: 'new-cut',
      label: 'new cut site',
      draw: (x, y) => diamond(x + 15, y, 7, `fill="${C.fail}" stroke="${C.ink}" stroke-width="1.2"`),
    },
    { key: 'link', label: 'link', draw: line(`stroke="${C.link}" stroke-width="1.6"`) },
    {
      key: 'added',
      label: 'link added by the change',
      draw: (x, y) =>
        line(`stroke="${C.pass}" stroke-width="5"`)(x, y) + line(`stroke="${C.paper}" stroke-width="1.6"`)(x, y),
    },
    {
      key: 'removed',
      label: 'link removed by the change',
      draw: line(`stroke="${C.link}" stroke-width="1.8" stroke-dasharray="6 4"`),
    },
    { key: 'bridge', label: 'bridge (single point of failure)', draw: line(`stroke="${C.warn}" stroke-width="3"`) },
    {
      key: 'new-bridge',
      label: 'new bridge',
      draw: (x, y) =>
        line(`stroke="${C.fail}" stroke-width="4.2" stroke-linecap="round"`)(x, y) +
        `<rect x="${r1(x + 11)}" y="${r1(y - 4)}" width="8" height="8" fill="${C.fail}" stroke="${C.paper}" stroke-width="1.2"/>`,
    },
    {
      key: 'group',
      label: 'shared-risk group whose loss strands sites',
      draw: line(`stroke="${C.band}" stroke-opacity="0.4" stroke-width="11" stroke-linecap="round"`),
    },
    {
      key: 'group-new',
      label: 'the same, new with this change',
      draw: line(`stroke="${C.bandNew}" stroke-opacity="0.55" stroke-width="11" stroke-dasharray="14 5"`),
    },
    {
      key: 'proposed',
      label: 'link the first suggestion adds',
      draw: line(`stroke="${C.notice}" stroke-width="2.6" stroke-dasharray="1 5" stroke-linecap="round"`),
    },
    {
      key: 'step',
      label: 'weakest removal sequence, in order',
      draw: (x, y) =>
        `<circle cx="${r1(x + 15)}" cy="${r1(y)}" r="8" fill="${C.ink}"/><text x="${r1(x + 15)}" y="${r1(y + 3.6)}" font-size="10" font-weight="700" text-anchor="middle" fill="${C.paper}">1</text>`,
    },
  ];
}

/** One plain sentence for screen readers: what the map shows. */
export function describeMap(map: DesignMap, h: MapHighlights): string {
  const removed = map.links.filter((l) => l.side === 'base').length;
  const added = map.links.filter((l) => l.side === 'head').length;
  const parts = [`${map.nodes.length} sites and ${map.links.length} links (base and head together)`];
  if (added || removed) parts.push(`${added} link${added === 1 ? '' : 's'} added and ${removed} removed by the change`);
  if (h.newBridges.size) parts.push(`new bridges: ${[...h.newBridges].join(', ')}`);
  if (h.newCutNodes.size) parts.push(`new cut sites: ${[...h.newCutNodes].join(', ')}`);
  const strand = map.strandingGroups.map((g) => g.id);
  if (strand.length) parts.push(`shared-risk groups whose loss strands sites: ${strand.join(', ')}`);
  if (h.weakest.length) parts.push(`weakest removal sequence numbered: ${h.weakest.join(', ')}`);
  if (h.proposed.length)
    parts.push(`proposed: ${h.proposed.map((l) => `${l.between[0]}\u2013${l.between[1]}`).join(', ')}`);
  return `${parts.join('; ')}. ${map.method}.`;
}

function seg(a: MapNode, b: MapNode): string {
  return `M${a.x} ${a.y}L${b.x} ${b.y}`;
}

function mid(a: { x: number; y: number }, b: { x: number; y: number }): [number, number] {
  return [(a.x + b.x) / 2, (a.y + b.y) / 2];
}

function diamond(x: number, y: number, r: number, attrs: string): string {
  return `<path d="M${r1(x)} ${r1(y - r)}L${r1(x + r)} ${r1(y)}L${r1(x)} ${r1(y + r)}L${r1(x - r)} ${r1(y)}Z" ${attrs}/>`;
}

function r1(v: number): number {
  const r = Math.round(v * 10) / 10;
  return Object.is(r, -0) ? 0 : r;
}

function short(s: string): string {
  return s.length > 28 ? `${s.slice(0, 27)}\u2026` : s;
}
