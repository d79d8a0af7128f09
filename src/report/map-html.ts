// The HTML report's map of one design: the SVG (map-svg.ts) in a figure with its caption.

import { escapeHtml } from './escape.js';
import { mapHighlights, renderMapSvg } from './map-svg.js';
import type { FileReport } from './report.js';

const esc = (s: string | number) => escapeHtml(String(s));

export function mapHtml(f: FileReport, id: string): string {
  const out: string[] = [];
  const map = f.map;
  if (map && 'omitted' in map) {
    out.push(`<h3>Map</h3><p class="facts">No map: ${esc(map.omitted)}.</p>`);
  } else if (map) {
    const h = mapHighlights(f);
    out.push('<h3>Map</h3>');
    out.push(
      `<figure class="map" data-layout="${map.layout}" data-nodes="${map.nodes.length}" data-links="${map.links.length}">`,
    );
    out.push(renderMapSvg(map, h, { idPrefix: `${id}-map`, title: `Map of ${f.path}` }));
    const caption = [
      map.layout === 'geographic'
        ? 'Sites at their coordinates.'
        : 'Positions from a force-directed layout: they show how sites are linked, not where they are.',
      f.base ? 'Base and head together: removed links dashed, added links doubled.' : '',
      h.weakest.length
        ? `Numbers: the weakest removal sequence${h.weakestTitle ? `, ${h.weakestTitle.charAt(0).toLowerCase()}${h.weakestTitle.slice(1)}` : ''}.`
        : '',
      h.proposed.length ? 'Dotted: the links of the first suggestion below.' : '',
      'Hover an element for its name, id and line.',
    ].filter(Boolean);
    out.push(`<figcaption>${esc(caption.join(' '))}</figcaption>`);
    out.push('</figure>');
  }
  return out.filter(Boolean).join('\n');
}
