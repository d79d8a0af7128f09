// GeoJSON designs (RFC 7946): Point features are sites, LineString and MultiLineString
// features are links between the sites at their two ends. A link's ends are the sites its
// properties name (`source`/`target`, or `from`/`to`), else the sites within `END_TOLERANCE_M`
// of its first and last positions. Its length is measured along its geometry (great-circle
// segments; the parts of a MultiLineString are summed, a gap between them is not counted)
// unless its properties give one. Properties become attributes through the same mapping as
// GraphML and GML (attributes.ts): `id`, `label`/`name`, `kind`, `hardened`, `risk_groups`
// (a list, or ids separated by `;`), `capacity_gbps`, `latency_ms`, … A link keeps its
// geometry in the attribute `route` (so a conversion back to GeoJSON keeps the drawing) and
// its measured length in `route_km`; `route_known: false` marks a line that only joins its two
// sites (no corridor is looked for along it). The collection's `name`, `description` and `metadata`
// (foreign members, RFC 7946 §6.1) describe the design.
//
// Routes that run side by side are reported as a possible shared-risk group the design does
// not declare (corridors.ts): a warning naming both links and where they run together.
//
// Read with the `yaml` package (JSON is a subset of YAML 1.2) for the source positions of every
// feature and coordinate, like our own format; ids are kept as written (`1.0` is not `1`).

import { isMap, isScalar, isSeq, LineCounter, parseDocument, type Node as YamlNode } from 'yaml';
import { DesignError, type Diagnostic } from '../errors.js';
import { mapLinkAttributes, mapNodeAttributes } from './attributes.js';
import { TopologyBuilder, type BuilderOptions } from './builder.js';
import { routeKm, sharedCorridors, type Route } from './corridors.js';
import { greatCircleKm } from './geodesy.js';
import type { SourcePos, Topology } from './model.js';
import { MAX_NESTING, positionOf, yamlNestingExceeded } from './nesting.js';
import { nonNormal, quantityProblem } from './quantities.js';

/**
 * A link property: `false` says the line only joins the two sites (netbrace convert draws such
 * lines when no route is known), so it takes no part in the search for shared corridors.
 */
export const ROUTE_KNOWN = 'route_known';

/** A line's end belongs to a site within this many metres (common practice for surveyed plans). */
export const END_TOLERANCE_M = 100;
/** END_TOLERANCE_M in degrees of latitude, rounded up (a prefilter: 1° of latitude is 111.2 km). */
const END_TOLERANCE_DEG = (END_TOLERANCE_M / 111_000) * 1.01;
/** Shared corridors: within this many metres ... */
export const CORRIDOR_WITHIN_M = 50;
/** ... for more than this many km. */
export const CORRIDOR_MIN_KM = 1;

/** Property names that would be read as coordinates elsewhere (attributes.ts); a site's geometry decides. */
const COORDINATE_NAMES = new Set(['lat', 'lon', 'lng', 'long', 'latitude', 'longitude', 'x', 'y']);

type Json = null | boolean | number | string | Json[] | { [k: string]: Json };
type Path = (string | number)[];

interface Feature {
  geometry: { type: string; coordinates: Json } | null;
  properties: Record<string, Json>;
  id?: Json;
  pos: SourcePos;
  node: YamlNode | undefined;
}

function isObject(v: Json | undefined): v is { [k: string]: Json } {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** The YAML node at `path` below `from`, or undefined. */
function nodeAt(from: YamlNode | null | undefined, path: Path): YamlNode | undefined {
  let cur: unknown = from ?? undefined;
  for (const k of path) {
    if (isMap(cur)) cur = cur.get(k, true);
    else if (isSeq(cur) && typeof k === 'number') cur = cur.items[k];
    else return undefined;
  }
  return (cur ?? undefined) as YamlNode | undefined;
}

/**
 * Coordinates beyond the range of degrees: RFC 7946 allows only WGS 84 longitude/latitude,
 * and a file in a projected system (a `crs` member from GeoJSON 2008) cannot be read.
 */
function crsProblem(crs: Json | undefined): string | undefined {
  if (crs === undefined || crs === null) return undefined;
  const name = isObject(crs) && isObject(crs.properties) ? crs.properties.name : undefined;
  const text = typeof name === 'string' ? name : JSON.stringify(crs);
  return /CRS84|EPSG:+4326\b|EPSG::?4979\b/i.test(text) ? undefined : text;
}

export function parseGeojson(text: string, file: string, options: BuilderOptions = {}): Topology {
  const deep = yamlNestingExceeded(text);
  if (deep >= 0)
    throw new DesignError(
      `the GeoJSON nests deeper than ${MAX_NESTING} levels`,
      { file, ...positionOf(text, deep) },
      'a FeatureCollection needs a few levels only',
    );
  const lines = new LineCounter();
  const doc = parseDocument(text, { lineCounter: lines, uniqueKeys: true, prettyErrors: false });
  const at = (offset: number): SourcePos => {
    const p = lines.linePos(offset);
    return { line: p.line, column: p.col };
  };
  const where = (n: YamlNode | null | undefined, fallback: SourcePos = { line: 1, column: 1 }): SourcePos =>
    n?.range ? at(n.range[0]) : fallback;
  if (doc.errors.length > 0) {
    const e = doc.errors[0];
    throw new DesignError(
      `GeoJSON syntax error: ${e.message.split('\n')[0]}`,
      { file, ...at(e.pos[0]) },
      'fix the JSON at this point',
    );
  }
  const root = doc.toJS({ maxAliasCount: 0 }) as Json;
  const b = new TopologyBuilder(file, 'geojson', options);
  const fail =
    (pos: SourcePos) =>
    (message: string, hint = ''): never => {
      throw b.error(message, pos, hint);
    };
  if (!isObject(root) || root.type !== 'FeatureCollection' || !Array.isArray(root.features)) {
    fail({ line: 1, column: 1 })(
      'a GeoJSON design is a FeatureCollection with a "features" list',
      'points are sites, lines are links',
    );
  }
  const rootMap = root as { [k: string]: Json };
  const crs = crsProblem(rootMap.crs);
  if (crs !== undefined) {
    fail(where(nodeAt(doc.contents, ['crs'])))(
      `the coordinates are in another reference system (${crs.slice(0, 80)})`,
      'RFC 7946 GeoJSON is WGS 84 longitude/latitude: export the layer as EPSG:4326',
    );
  }
  const featureNodes = nodeAt(doc.contents, ['features']);
  const features: Feature[] = (rootMap.features as Json[]).map((f, i) => {
    const node = nodeAt(featureNodes, [i]);
    const pos = where(node);
    if (!isObject(f) || f.type !== 'Feature') fail(pos)(`features[${i}] is not a Feature`);
    const g = (f as { geometry?: Json }).geometry;
    if (g !== null && !(isObject(g) && typeof g.type === 'string'))
      fail(pos)(
        `features[${i}] has no geometry object`,
        'a Feature has "geometry": a Point (a site) or a LineString (a link)',
      );
    const props = (f as { properties?: Json }).properties;
    return {
      geometry: g as Feature['geometry'],
      properties: isObject(props) ? props : {},
      ...((f as { id?: Json }).id !== undefined ? { id: (f as { id?: Json }).id } : {}),
      pos,
      node,
    };
  });

  /** A value as written: a number keeps its digits (`1.0`, `12345678901234567890`). */
  const written = (f: Feature, path: Path, v: Json): string => {
    if (typeof v !== 'number') return String(v);
    const n = nodeAt(f.node, path);
    return isScalar(n) && typeof n.source === 'string' ? n.source : String(v);
  };
  /** The feature's id (properties.id, else the Feature's own id), as written. */
  const idOf = (f: Feature): string | undefined => {
    const raw = f.properties.id ?? f.id;
    if (raw === undefined || raw === null || raw === '') return undefined;
    return written(f, f.properties.id !== undefined && f.properties.id !== null ? ['properties', 'id'] : ['id'], raw);
  };
  /** A [longitude, latitude] position, refused at its own line when it is not one. */
  const position = (f: Feature, path: Path, v: Json, what: string): [number, number] => {
    const here = fail(where(nodeAt(f.node, path), f.pos));
    if (!Array.isArray(v) || v.length < 2 || typeof v[0] !== 'number' || typeof v[1] !== 'number') {
      here(`${what} is not a [longitude, latitude] position`, 'a position is two numbers, e.g. [-35.2, 45.45]');
    }
    const [lon, lat] = v as [number, number];
    const bad = nonNormal(lon) ?? nonNormal(lat);
    if (bad) here(`${what} ${bad}`, 'write plain decimal degrees');
    if (lon < -180 || lon > 180 || lat < -90 || lat > 90) {
      here(
        `${what} [${lon}, ${lat}] is outside longitude −180…180 / latitude −90…90`,
        'GeoJSON writes longitude first, in degrees of WGS 84 (RFC 7946 §3.1.1)',
      );
    }
    return [lon, lat];
  };

  // Sites first: links name them.
  const sites: { id: string; lon: number; lat: number }[] = [];
  features.forEach((f, i) => {
    if (f.geometry === null) {
      b.warn(`features[${i}] has no geometry (null); skipped`, f.pos, 'give a site a Point and a link a LineString');
      return;
    }
    if (f.geometry.type !== 'Point') return;
    const [lon, lat] = position(f, ['geometry', 'coordinates'], f.geometry.coordinates, `site features[${i}]`);
    const id = idOf(f);
    if (id === undefined) fail(f.pos)(`site features[${i}] has no id`, 'give the feature an "id", or properties.id');
    // The geometry places the site: coordinates among the properties are only attributes.
    const rest: Record<string, Json> = {};
    const asWritten: Record<string, Json> = {};
    for (const [k, v] of Object.entries(f.properties)) {
      if (k === 'id') continue;
      if (COORDINATE_NAMES.has(k.toLowerCase())) asWritten[k] = v;
      else rest[k] = v;
    }
    const mapped = mapNodeAttributes(rest, b, {
      pos: (k) => where(nodeAt(f.node, ['properties', k]), f.pos),
      text: (k) => (typeof rest[k] === 'number' ? written(f, ['properties', k], rest[k]) : undefined),
    });
    b.addNode({ id: id!, pos: f.pos, ...mapped, attrs: { ...mapped.attrs, ...asWritten }, lat, lon });
    sites.push({ id: id!, lon, lat });
  });

  /** The site within END_TOLERANCE_M of a position (the nearest), if any. */
  const nearest = (p: readonly [number, number]): string | undefined => {
    let best: string | undefined;
    let bestM = Infinity;
    for (const s of sites) {
      // 100 m is under 0.001° of latitude anywhere: most sites are ruled out without trigonometry.
      if (Math.abs(s.lat - p[1]) > END_TOLERANCE_DEG) continue;
      const m = greatCircleKm(p[1], p[0], s.lat, s.lon) * 1000;
      if (m < bestM) [best, bestM] = [s.id, m];
    }
    return bestM <= END_TOLERANCE_M ? best : undefined;
  };

  const routes: { parts: Route[]; linkIndex: number; groups: string[]; pos: SourcePos }[] = [];
  let linkCount = 0;
  features.forEach((f, i) => {
    if (f.geometry === null || f.geometry.type === 'Point') return;
    const type = f.geometry.type;
    const here = fail(f.pos);
    if (type !== 'LineString' && type !== 'MultiLineString') {
      here(
        `features[${i}] is a ${type}: only Point (sites) and LineString or MultiLineString (links) are read`,
        'keep areas and other shapes in another file',
      );
    }
    const coords = f.geometry.coordinates;
    const partList: Json[] = type === 'LineString' ? [coords] : Array.isArray(coords) ? coords : [];
    if (partList.length === 0) here(`link features[${i}] has no line`, 'a MultiLineString holds a list of lines');
    const parts: [number, number][][] = partList.map((part, k) => {
      const base: Path = type === 'LineString' ? ['geometry', 'coordinates'] : ['geometry', 'coordinates', k];
      if (!Array.isArray(part) || part.length < 2) {
        fail(where(nodeAt(f.node, base), f.pos))(
          `link features[${i}] has a line with fewer than two positions`,
          'a line needs at least its two ends',
        );
      }
      return (part as Json[]).map((p, j) => position(f, [...base, j], p, `position ${j} of link features[${i}]`));
    });
    const first = parts[0][0];
    const last = parts[parts.length - 1][parts[parts.length - 1].length - 1];
    for (let k = 1; k < parts.length; k++) {
      const [a, c] = [parts[k - 1][parts[k - 1].length - 1], parts[k][0]];
      const gapM = greatCircleKm(a[1], a[0], c[1], c[0]) * 1000;
      if (gapM > END_TOLERANCE_M) {
        b.warn(
          `link features[${i}] has a gap of ${(gapM / 1000).toFixed(3)} km between lines ${k} and ${k + 1} of its MultiLineString; the length counts the lines only`,
          where(nodeAt(f.node, ['geometry', 'coordinates', k]), f.pos),
          'join the lines, or give the length in properties.length_km',
        );
      }
    }
    const raw = f.properties;
    const named = (a: string, c: string): [string, Json] | undefined => {
      for (const k of [a, c]) if (raw[k] !== undefined && raw[k] !== null && raw[k] !== '') return [k, raw[k]];
      return undefined;
    };
    const nameOf = (n: [string, Json] | undefined) => (n ? written(f, ['properties', n[0]], n[1]) : undefined);
    const ends = [nameOf(named('source', 'from')) ?? nearest(first), nameOf(named('target', 'to')) ?? nearest(last)];
    for (const [k, e] of ends.entries()) {
      if (e === undefined) {
        const p = k === 0 ? first : last;
        here(
          `link features[${i}] ${k === 0 ? 'starts' : 'ends'} at [${p[0]}, ${p[1]}], more than ${END_TOLERANCE_M} m from every site`,
          'move the line\u2019s end onto its site, or name the sites in properties.source and properties.target',
        );
      }
    }
    // Named ends whose line runs between two other sites: most likely a copied line.
    const drawn = [nearest(first), nearest(last)];
    if (
      named('source', 'from') &&
      named('target', 'to') &&
      drawn.every((d) => d !== undefined) &&
      [...drawn].sort().join('\0') !== [...ends].sort().join('\0')
    ) {
      b.warn(
        `link features[${i}] names the sites "${ends[0]}" and "${ends[1]}", but its line is drawn between "${drawn[0]}" and "${drawn[1]}"; the named sites are used`,
        f.pos,
        'check that the properties and the drawing describe the same link',
      );
    }
    // A list of risk groups is read item by item (ids as written); a string is split at ";".
    const { source: _s, target: _t, from: _f, to: _to, id: _id, risk_groups: groupsRaw, ...rest } = raw;
    const listedGroups = Array.isArray(groupsRaw)
      ? groupsRaw.map((g, k) => written(f, ['properties', 'risk_groups', k], g)).filter((g) => g !== '')
      : undefined;
    const mapped = mapLinkAttributes(
      listedGroups === undefined && groupsRaw !== undefined ? { ...rest, risk_groups: groupsRaw } : rest,
      b,
      {
        pos: (k) => where(nodeAt(f.node, ['properties', k]), f.pos),
        text: (k) => (typeof raw[k] === 'number' ? written(f, ['properties', k], raw[k]) : undefined),
      },
    );
    if (listedGroups !== undefined) mapped.riskGroups = listedGroups;
    const measured = parts.reduce((s, p) => s + routeKm(p), 0);
    if (mapped.length === undefined) {
      const problem = quantityProblem('length', measured);
      if (problem) here(`the line of link features[${i}] ${problem.message}`, 'check the coordinates');
    }
    const id = idOf(f);
    const added = b.addLink({
      ...(id !== undefined ? { id } : {}),
      source: ends[0]!,
      target: ends[1]!,
      pos: f.pos,
      ...mapped,
      ...(mapped.length === undefined ? { length: measured } : {}),
      attrs: {
        ...mapped.attrs,
        route_km: Math.round(measured * 1000) / 1000,
        route: { type, coordinates: type === 'LineString' ? parts[0] : parts },
      },
      what: `link features[${i}]`,
    });
    // A line drawn only to join two sites (route_known: false) says nothing about where the cable runs.
    if (added && mapped.attrs[ROUTE_KNOWN] !== false)
      routes.push({ parts, linkIndex: linkCount, groups: mapped.riskGroups ?? [], pos: f.pos });
    if (added) linkCount++;
  });

  const meta = rootMap.metadata;
  const t = b.finish({
    ...(typeof rootMap.name === 'string' ? { name: rootMap.name } : {}),
    ...(isObject(meta) ? { metadata: meta } : {}),
  });
  if (typeof rootMap.description === 'string') t.description = rootMap.description;

  // Routes side by side that share no declared group: a shared risk the design does not say.
  // Each line of a MultiLineString is a route of its own (the gap between them is no route).
  const flat: Route[] = [];
  const owner: number[] = [];
  routes.forEach((r, k) => {
    for (const p of r.parts) {
      flat.push(p);
      owner.push(k);
    }
  });
  const seen = new Map<
    string,
    { a: number; b: number; km: number; from: readonly [number, number]; to: readonly [number, number] }
  >();
  for (const c of sharedCorridors(flat, { withinM: CORRIDOR_WITHIN_M, minKm: 0 })) {
    const [a, z] = [owner[c.a], owner[c.b]];
    if (a === z) continue;
    const key = `${a}\0${z}`;
    const prev = seen.get(key);
    if (prev) prev.km += c.km;
    else seen.set(key, { a, b: z, km: c.km, from: c.from, to: c.to });
  }
  const found = [...seen.values()]
    .filter((c) => c.km > CORRIDOR_MIN_KM)
    .sort((x, y) => y.km - x.km || x.a - y.a || x.b - y.b);
  for (const c of found) {
    const [ra, rb] = [routes[c.a], routes[c.b]];
    if (ra.groups.some((g) => rb.groups.includes(g))) continue;
    const [la, lb] = [t.links[ra.linkIndex], t.links[rb.linkIndex]];
    const d: Diagnostic = {
      file,
      line: ra.pos.line,
      column: ra.pos.column,
      severity: 'warning',
      message:
        `links "${la.id}" (line ${ra.pos.line}) and "${lb.id}" (line ${rb.pos.line}) run within ${CORRIDOR_WITHIN_M} m of each other for ${c.km.toFixed(1)} km, ` +
        `from [${c.from[0].toFixed(5)}, ${c.from[1].toFixed(5)}] to [${c.to[0].toFixed(5)}, ${c.to[1].toFixed(5)}]: a possible shared-risk group the design does not declare`,
      hint: 'if they share a duct, trench or bridge, give both the same risk_groups entry; otherwise this warning can stand',
    };
    t.warnings.push(d);
  }
  return t;
}
