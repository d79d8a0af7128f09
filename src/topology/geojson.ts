// GeoJSON designs (RFC 7946): Point features are sites, LineString and MultiLineString
// features are links between the sites at their two ends. A link's ends are the sites its
// properties name (`source`/`target`, or `from`/`to`), else the sites within `END_TOLERANCE_M`
// of its first and last positions. Its length is measured along its geometry (great-circle
// segments) unless its properties give one. Properties become attributes through the same
// mapping as GraphML and GML (attributes.ts): `id`, `label`/`name`, `kind`, `hardened`,
// `risk_groups` (a list or ids separated by `;`), `capacity_gbps`, `latency_ms`, …
//
// Routes that run side by side are reported as a possible shared-risk group the design does
// not declare (corridors.ts): a warning naming both links and where they run together.
//
// Read with the `yaml` package (JSON is a subset of YAML 1.2) for the source positions of every
// feature, like our own format.

import { isMap, isSeq, LineCounter, parseDocument, type Node as YamlNode } from 'yaml';
import { DesignError } from '../errors.js';
import { mapLinkAttributes, mapNodeAttributes } from './attributes.js';
import { TopologyBuilder, type BuilderOptions } from './builder.js';
import { routeKm, sharedCorridors, type Route } from './corridors.js';
import { greatCircleKm } from './geodesy.js';
import type { SourcePos, Topology } from './model.js';
import { MAX_NESTING, positionOf, yamlNestingExceeded } from './nesting.js';
import { nonNormal } from './quantities.js';

/** A line's end belongs to a site within this many metres (common practice for surveyed plans). */
export const END_TOLERANCE_M = 100;
/** Shared corridors: within this many metres ... */
export const CORRIDOR_WITHIN_M = 50;
/** ... for more than this many km. */
export const CORRIDOR_MIN_KM = 1;

type Json = null | boolean | number | string | Json[] | { [k: string]: Json };

interface Feature {
  geometry: { type: string; coordinates: Json } | null;
  properties: Record<string, Json>;
  id?: Json;
  pos: SourcePos;
}

function isObject(v: Json | undefined): v is { [k: string]: Json } {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function position(v: Json, what: string, fail: (m: string, hint?: string) => never): [number, number] {
  if (!Array.isArray(v) || v.length < 2 || typeof v[0] !== 'number' || typeof v[1] !== 'number') fail(`${what} is not a [longitude, latitude] position`);
  const [lon, lat] = v as [number, number];
  if (nonNormal(lon) || nonNormal(lat) || lon < -180 || lon > 180 || lat < -90 || lat > 90) {
    fail(`${what} [${lon}, ${lat}] is outside longitude −180…180 / latitude −90…90`, 'GeoJSON writes longitude first (RFC 7946 §3.1.1)');
  }
  return [lon, lat];
}

export function parseGeojson(text: string, file: string, options: BuilderOptions = {}): Topology {
  const deep = yamlNestingExceeded(text);
  if (deep >= 0) throw new DesignError(`the GeoJSON nests deeper than ${MAX_NESTING} levels`, { file, ...positionOf(text, deep) }, 'a FeatureCollection needs a few levels only');
  const lines = new LineCounter();
  const doc = parseDocument(text, { lineCounter: lines, uniqueKeys: true, prettyErrors: false });
  const at = (offset: number): SourcePos => {
    const p = lines.linePos(offset);
    return { line: p.line, column: p.col };
  };
  const where = (n: YamlNode | null | undefined): SourcePos => (n?.range ? at(n.range[0]) : { line: 1, column: 1 });
  if (doc.errors.length > 0) {
    const e = doc.errors[0];
    throw new DesignError(`GeoJSON syntax error: ${e.message.split('\n')[0]}`, { file, ...at(e.pos[0]) }, 'fix the JSON at this point');
  }
  const root = doc.toJS({ maxAliasCount: 0 }) as Json;
  const b = new TopologyBuilder(file, 'geojson', options);
  const fail = (pos: SourcePos) => (message: string, hint = ''): never => {
    throw b.error(message, pos, hint);
  };
  if (!isObject(root) || root.type !== 'FeatureCollection' || !Array.isArray(root.features)) {
    fail({ line: 1, column: 1 })('a GeoJSON design is a FeatureCollection with a "features" list', 'points are sites, lines are links');
  }
  const rootNode = doc.contents;
  const featureNodes = isMap(rootNode) ? rootNode.get('features', true) : undefined;
  const features: Feature[] = ((root as { features: Json[] }).features).map((f, i) => {
    const node = isSeq(featureNodes) ? (featureNodes.items[i] as YamlNode | undefined) : undefined;
    const pos = where(node);
    if (!isObject(f) || f.type !== 'Feature') fail(pos)(`features[${i}] is not a Feature`);
    const g = (f as { geometry?: Json }).geometry;
    if (g !== null && !(isObject(g) && typeof g.type === 'string')) fail(pos)(`features[${i}] has no geometry object`);
    const props = (f as { properties?: Json }).properties;
    return {
      geometry: g as Feature['geometry'],
      properties: isObject(props) ? props : {},
      ...((f as { id?: Json }).id !== undefined ? { id: (f as { id?: Json }).id } : {}),
      pos,
    };
  });

  // Sites first: links name them.
  const sites: { id: string; lon: number; lat: number }[] = [];
  features.forEach((f, i) => {
    if (f.geometry?.type !== 'Point') return;
    const [lon, lat] = position(f.geometry.coordinates, `site features[${i}]`, fail(f.pos));
    const raw = f.properties;
    const id = raw.id ?? f.id;
    if (id === undefined || id === null || id === '') fail(f.pos)(`site features[${i}] has no id`, 'give the feature an "id", or properties.id');
    const { id: _drop, lat: _lat, lon: _lon, latitude: _la, longitude: _lo, ...rest } = raw as Record<string, Json>;
    const mapped = mapNodeAttributes(rest, b, () => f.pos);
    b.addNode({ id: String(id), pos: f.pos, ...mapped, lat, lon });
    sites.push({ id: String(id), lon, lat });
  });

  const nearest = (p: [number, number]): string | undefined => {
    let best: string | undefined;
    let bestM = Infinity;
    for (const s of sites) {
      const m = greatCircleKm(p[1], p[0], s.lat, s.lon) * 1000;
      if (m < bestM) [best, bestM] = [s.id, m];
    }
    return bestM <= END_TOLERANCE_M ? best : undefined;
  };

  const routes: { route: Route; linkIndex: number; id: string; pos: SourcePos; groups: string[] }[] = [];
  let linkCount = 0;
  features.forEach((f, i) => {
    const type = f.geometry?.type;
    if (type === 'Point' || f.geometry === null) return;
    const here = fail(f.pos);
    if (type !== 'LineString' && type !== 'MultiLineString') {
      here(`features[${i}] is a ${type}: only Point (sites) and LineString or MultiLineString (links) are read`, 'draw areas in another layer');
    }
    const parts: Json[] = type === 'LineString' ? [f.geometry!.coordinates] : Array.isArray(f.geometry!.coordinates) ? f.geometry!.coordinates : [];
    const route: [number, number][] = [];
    for (const part of parts) {
      if (!Array.isArray(part) || part.length < 2) here(`link features[${i}] has a line with fewer than two positions`);
      for (const p of part as Json[]) route.push(position(p, `a position of link features[${i}]`, here));
    }
    if (route.length < 2) here(`link features[${i}] has no line`);
    const raw = f.properties;
    const named = (a: string, c: string) => (raw[a] ?? raw[c]) as Json | undefined;
    const source = named('source', 'from');
    const target = named('target', 'to');
    const ends = [source !== undefined && source !== null ? String(source) : nearest(route[0]), target !== undefined && target !== null ? String(target) : nearest(route[route.length - 1])];
    for (const [k, e] of ends.entries()) {
      if (e === undefined) {
        const p = k === 0 ? route[0] : route[route.length - 1];
        here(`link features[${i}] ${k === 0 ? 'starts' : 'ends'} at [${p[0]}, ${p[1]}], more than ${END_TOLERANCE_M} m from every site`, 'move the line\u2019s end onto its site, or name the sites in properties.source and properties.target');
      }
    }
    const { source: _s, target: _t, from: _f, to: _to, ...rest } = raw as Record<string, Json>;
    const mapped = mapLinkAttributes(rest, b, () => f.pos);
    const measured = routeKm(route);
    const id = raw.id ?? f.id;
    const added = b.addLink({
      ...(id !== undefined && id !== null && id !== '' ? { id: String(id) } : {}),
      source: ends[0]!,
      target: ends[1]!,
      pos: f.pos,
      ...mapped,
      ...(mapped.length === undefined ? { length: measured } : {}),
      attrs: { ...mapped.attrs, route_km: Math.round(measured * 1000) / 1000 },
      what: `link features[${i}]`,
    });
    if (added) {
      routes.push({ route, linkIndex: linkCount, id: id !== undefined && id !== null ? String(id) : `${ends[0]}\u2014${ends[1]}`, pos: f.pos, groups: mapped.riskGroups ?? [] });
      linkCount++;
    }
  });

  // Routes side by side that share no declared group: a shared risk the design does not say.
  for (const c of sharedCorridors(routes.map((r) => r.route), { withinM: CORRIDOR_WITHIN_M, minKm: CORRIDOR_MIN_KM })) {
    const [ra, rb] = [routes[c.a], routes[c.b]];
    if (ra.groups.some((g) => rb.groups.includes(g))) continue;
    b.warn(
      `links "${ra.id}" (line ${ra.pos.line}) and "${rb.id}" (line ${rb.pos.line}) run within ${CORRIDOR_WITHIN_M} m of each other for ${c.km.toFixed(1)} km, from [${c.from[0].toFixed(5)}, ${c.from[1].toFixed(5)}] to [${c.to[0].toFixed(5)}, ${c.to[1].toFixed(5)}]: a possible shared-risk group the design does not declare`,
      ra.pos,
      'if they share a duct, trench or bridge, give both the same risk_groups entry; otherwise this warning can stand',
    );
  }
  const name = isObject(root) && typeof (root as Record<string, Json>).name === 'string' ? String((root as Record<string, Json>).name) : undefined;
  return b.finish(name !== undefined ? { name } : {});
}
