// A Topology as GeoJSON (RFC 7946), the form geojson.ts reads: each node a Point feature (its
// id the Feature's id), each link a LineString feature whose properties name its two sites
// (`source`, `target`), so the ends never depend on distances. A link drawn before (the `route`
// attribute a GeoJSON file gave it) keeps its drawing; any other link is drawn as a straight line
// between its sites, which says nothing about where the cable runs (so it is marked
// `route_known: false`). Every site needs coordinates: without them there is nothing to draw,
// and the writer refuses. Demands, risk group descriptions and the latency budget cannot be
// held; the name, description and metadata are foreign members of the collection (RFC 7946 §6.1).

import { DesignError } from '../errors.js';
import { isLinkField } from './attributes.js';
import { ROUTE_KNOWN } from './geojson.js';
import type { Topology } from './model.js';
import { derivedIds, designLosses, Losses, type Written } from './write-shared.js';

type Position = [number, number];

/** Property names the reader takes for itself: an attribute of that name cannot be written. */
const NODE_RESERVED = new Set(['id', 'label', 'type', 'kind', 'hardened']);
const LINK_RESERVED = new Set(['id', 'source', 'target', 'from', 'to']);
/** A link attribute the reader would take for a field (the zoo's raw speed stays beside its capacity). */
const linkReserved = (k: string) =>
  LINK_RESERVED.has(k.toLowerCase()) || (isLinkField(k) && k.toLowerCase() !== 'linkspeedraw');

const isPosition = (p: unknown): p is Position =>
  Array.isArray(p) &&
  p.length >= 2 &&
  typeof p[0] === 'number' &&
  typeof p[1] === 'number' &&
  Math.abs(p[0]) <= 180 &&
  Math.abs(p[1]) <= 90;

/** A link's drawn route (a LineString or MultiLineString geometry), if it has a usable one. */
function routeOf(v: unknown): { type: string; coordinates: unknown } | undefined {
  if (v === null || typeof v !== 'object') return undefined;
  const g = v as { type?: unknown; coordinates?: unknown };
  const line = (c: unknown) => Array.isArray(c) && c.length >= 2 && c.every(isPosition);
  if (g.type === 'LineString' && line(g.coordinates)) return { type: 'LineString', coordinates: g.coordinates };
  if (
    g.type === 'MultiLineString' &&
    Array.isArray(g.coordinates) &&
    g.coordinates.length > 0 &&
    g.coordinates.every(line)
  )
    return { type: 'MultiLineString', coordinates: g.coordinates };
  return undefined;
}

export function writeGeojson(t: Topology): Written {
  const missing = t.nodes.filter((n) => n.lat === undefined || n.lon === undefined);
  if (missing.length > 0) {
    const shown =
      missing
        .slice(0, 5)
        .map((n) => `"${n.id}"`)
        .join(', ') + (missing.length > 5 ? `, and ${missing.length - 5} more` : '');
    throw new DesignError(
      `cannot write GeoJSON: ${missing.length} of ${t.nodes.length} node${t.nodes.length === 1 ? '' : 's'} ha${missing.length === 1 ? 's' : 've'} no coordinates (${shown})`,
      { file: t.file, line: missing[0].pos.line, column: missing[0].pos.column },
      'GeoJSON places every site on the map: give each node a site (lat, lon; Latitude/Longitude in GraphML and GML), or convert to another format',
    );
  }
  const losses = new Losses();
  designLosses(t, losses, { metadata: true, name: true });
  const where = new Map(t.nodes.map((n) => [n.id, [n.lon!, n.lat!] as Position]));
  const features: string[] = [];
  const feature = (id: string | undefined, properties: Record<string, unknown>, geometry: object) =>
    features.push(
      `    {"type": "Feature", ${id !== undefined ? `"id": ${JSON.stringify(id)}, ` : ''}"properties": ${JSON.stringify(properties)},\n     "geometry": ${JSON.stringify(geometry)}}`,
    );

  for (const n of t.nodes) {
    const p: Record<string, unknown> = {};
    if (n.label !== undefined) p.label = n.label;
    if (n.kind !== undefined) p.kind = n.kind;
    if (n.hardened) p.hardened = true;
    for (const [k, v] of Object.entries(n.attrs)) {
      if (NODE_RESERVED.has(k.toLowerCase()) || (k.toLowerCase() === 'name' && n.label === undefined))
        losses.add(`node attribute "${k}" (a name the GeoJSON reader takes for a field)`, 'node');
      else p[k] = v;
    }
    feature(n.id, p, { type: 'Point', coordinates: where.get(n.id) });
  }
  const derived = derivedIds(t);
  let straight = 0;
  t.links.forEach((l, i) => {
    const p: Record<string, unknown> = {};
    if (!derived[i]) p.id = l.id;
    p.source = l.source;
    p.target = l.target;
    if (l.length !== undefined) p.length_km = l.length;
    if (l.latency !== undefined) p.latency_ms = l.latency;
    if (l.capacity !== undefined) p.capacity_gbps = l.capacity;
    if (l.weight !== undefined) p.weight = l.weight;
    if (l.riskGroups.length > 0) p.risk_groups = [...l.riskGroups];
    if (l.hardened) p.hardened = true;
    for (const [k, v] of Object.entries(l.attrs)) {
      if (k === 'route' || k === 'route_km') continue; // the geometry itself, and what the reader measures on it
      if (linkReserved(k)) losses.add(`link attribute "${k}" (a name the GeoJSON reader takes for a field)`, 'link');
      else p[k] = v;
    }
    const route = routeOf(l.attrs.route);
    if (route === undefined) {
      straight++;
      p[ROUTE_KNOWN] = false;
    }
    feature(undefined, p, route ?? { type: 'LineString', coordinates: [where.get(l.source), where.get(l.target)] });
    if (l.length === undefined)
      losses.add(
        'unknown lengths (the reader measures every line: a link without a length gets the length of its line)',
        'link',
      );
  });
  const notes =
    straight > 0
      ? [
          `${straight} link${straight === 1 ? ' is' : 's are'} drawn as straight lines between their sites (no route was known): they do not show where the cables run, are marked ${ROUTE_KNOWN}: false and take no part in the search for shared corridors`,
        ]
      : [];

  const head: string[] = ['{', '  "type": "FeatureCollection",'];
  if (t.name !== undefined) head.push(`  "name": ${JSON.stringify(t.name)},`);
  if (t.description !== undefined) head.push(`  "description": ${JSON.stringify(t.description)},`);
  if (Object.keys(t.metadata).length > 0) head.push(`  "metadata": ${JSON.stringify(t.metadata)},`);
  const text = `${head.join('\n')}\n  "features": [\n${features.join(',\n')}\n  ]\n}\n`;
  return { text, lost: losses.list(), notes };
}
