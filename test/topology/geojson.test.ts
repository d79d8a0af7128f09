// GeoJSON designs (RFC 7946). The fixture fixtures/designs/corrowen-fjord.geojson is an
// invented water utility's fibre network (in open ocean on purpose): sites as Points, links as
// routed LineStrings and one MultiLineString, ends matched by distance and by properties, and
// two links that cross the same causeway 20 m apart.
// Lengths are checked against closed forms on the sphere: an arc of a meridian is R·Δφ and an
// arc of the equator R·Δλ, R = 6,371.0088 km (the IUGG mean Earth radius R1 of GRS 80, Moritz,
// "Geodetic Reference System 1980", Bulletin Géodésique 54, 1980; the figure from memory).
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../src/topology/parse.js';
import { caught, fixture } from './helpers.js';

const R_KM = 6371.0088;
const RAD = Math.PI / 180;
const FJORD = 'corrowen-fjord.geojson';

const read = (text: string, file = 'plan.geojson') => parseDesign(text, file);

/** A FeatureCollection text with one feature per line (line 3 is the first feature). */
function collection(...features: object[]): string {
  return `{"type": "FeatureCollection",\n "features": [\n${features.map((f) => `  ${JSON.stringify(f)}`).join(',\n')}\n]}\n`;
}
const site = (id: string, lon: number, lat: number, properties: object = {}) => ({
  type: 'Feature',
  id,
  geometry: { type: 'Point', coordinates: [lon, lat] },
  properties,
});
const line = (coordinates: number[][], properties: object = {}) => ({
  type: 'Feature',
  geometry: { type: 'LineString', coordinates },
  properties,
});

describe('GeoJSON: the invented fjord network', () => {
  const t = read(fixture(FJORD), FJORD);

  it('reads Points as sites with their labels, kinds, flags, coordinates, attributes and lines', () => {
    expect(t.format).toBe('geojson');
    expect(t.name).toBe('Corrowen Fjord utility fibre');
    expect(t.description).toContain('Invented example');
    expect(t.nodes.map((n) => [n.id, n.label, n.kind, n.hardened, n.lon, n.lat, n.pos.line])).toEqual([
      ['harnvale', 'Harnvale exchange', 'exchange', true, -22.6, -38.4, 6],
      ['oskerby', undefined, 'pop', false, -22.6, -38.3, 8],
      ['tulliver', 'Tulliver Point', 'pop', false, -22.45, -38.35, 10],
      ['maddrel', undefined, 'pop', false, -22.45, -38.47, 12],
      ['quenby', 'Quenby Cross', 'pop', false, -22.7, -38.48, 14],
      ['sallowmere', 'Sallowmere pumping station', 'substation', false, -22.32, -38.42, 16],
    ]);
    expect(t.nodes[4].attrs).toEqual({ Owner: 'Fjord Water Board' });
  });

  it('matches link ends by distance (within 100 m) and by the sites the properties name', () => {
    expect(t.links.map((l) => [l.id, l.source, l.target, l.pos.line])).toEqual([
      ['hv-os', 'harnvale', 'oskerby', 18],
      // drawn from about 40 m off each site
      ['os-tu', 'oskerby', 'tulliver', 20],
      // drawn from the building entries about 300 m away: only the properties tell
      ['tu-sa', 'tulliver', 'sallowmere', 22],
      ['hv-ma', 'harnvale', 'maddrel', 24],
      ['qu-tu', 'quenby', 'tulliver', 26],
      ['ma-sa-1', 'maddrel', 'sallowmere', 28],
      ['ma-sa-2', 'maddrel', 'sallowmere', 30],
      // the Feature's own id
      ['qu-hv', 'quenby', 'harnvale', 32],
    ]);
    // parallel links keep distinct stable keys
    expect(t.links[6].key).toBe('maddrel\u2014sallowmere#2');
  });

  it('reads risk groups (a list, or ids separated by ";"), hardened, capacity and latency', () => {
    const byId = new Map(t.links.map((l) => [l.id, l]));
    expect(byId.get('ma-sa-1')!.riskGroups).toEqual(['duct-harbour']);
    expect(byId.get('ma-sa-2')!.riskGroups).toEqual(['duct-harbour', 'bridge-9']);
    expect(byId.get('ma-sa-2')!.hardened).toBe(true);
    expect([byId.get('hv-os')!.capacity, byId.get('hv-os')!.latency]).toEqual([100, 0.06]);
    expect(byId.get('tu-sa')!.latency).toBe(0.4);
    // the id and the ends are not attributes; the route and its length are
    for (const l of t.links) expect(Object.keys(l.attrs).sort(), l.id).toEqual(['route', 'route_km']);
  });

  it('measures a link along its geometry: the meridian link is R·Δφ (closed form)', () => {
    const hvOs = t.links[0];
    expect(hvOs.length).toBeCloseTo(R_KM * 0.1 * RAD, 9);
    expect(hvOs.attrs.route_km).toBe(Math.round(R_KM * 0.1 * RAD * 1000) / 1000);
    // a routed line is longer than the great-circle chord between its ends (triangle inequality)
    const chord = (a: number, b: number) => {
      const [p, q] = [t.nodes[a], t.nodes[b]];
      const h =
        Math.sin(((q.lat! - p.lat!) * RAD) / 2) ** 2 +
        Math.cos(p.lat! * RAD) * Math.cos(q.lat! * RAD) * Math.sin(((q.lon! - p.lon!) * RAD) / 2) ** 2;
      return 2 * R_KM * Math.asin(Math.sqrt(h));
    };
    expect(t.links[3].length!).toBeGreaterThan(chord(0, 3));
  });

  it('warns of the one undeclared shared corridor (the causeway) and not of the declared duct', () => {
    const corridors = t.warnings.filter((w) => w.message.includes('run within'));
    expect(corridors).toHaveLength(1);
    const w = corridors[0];
    expect([w.file, w.line, w.column]).toEqual([FJORD, 24, 5]);
    expect(w.message).toMatch(
      /^links "hv-ma" \(line 24\) and "qu-tu" \(line 26\) run within 50 m of each other for (\d+\.\d) km, from \[-22\.56\d+, -38\.42\d+\] to \[-22\.5\d+, -38\.43\d+\]: a possible shared-risk group the design does not declare$/,
    );
    // The causeway is 0.04° of longitude at 38.43° S: R·cos φ·Δλ = 3.48 km (an arc of a parallel,
    // which the straight causeway follows to 1 m); the lines converge a little before it.
    const km = Number(/for (\d+\.\d) km/.exec(w.message)![1]);
    const causeway = R_KM * Math.cos(38.43 * RAD) * 0.04 * RAD;
    expect(causeway).toBeCloseTo(3.48, 2);
    expect(km).toBeGreaterThanOrEqual(3.5);
    expect(km).toBeLessThanOrEqual(3.7);
    expect(t.warnings).toHaveLength(1);
  });

  it('reports the duct pair once the shared group is taken away', () => {
    const text = fixture(FJORD)
      .replace('"risk_groups": ["duct-harbour"]', '"risk_groups": []')
      .replace('"duct-harbour;bridge-9"', '"bridge-9"');
    const corridors = read(text, FJORD).warnings.filter((w) => w.message.includes('run within'));
    expect(corridors.map((w) => /links "([^"]+)".*"([^"]+)" \(line/.exec(w.message)!.slice(1))).toEqual([
      ['ma-sa-1', 'ma-sa-2'],
      ['hv-ma', 'qu-tu'],
    ]);
    // both fibres run the whole 12.6 km together, 5 m apart, across the two lines of ma-sa-1
    expect(corridors[0].message).toContain('for 12.6 km');
  });
});

describe('GeoJSON: lengths along the geometry', () => {
  it('an arc of the equator is R·Δλ', () => {
    const t = read(
      collection(
        site('a', 10, 0),
        site('b', 12, 0),
        line([
          [10, 0],
          [11, 0],
          [12, 0],
        ]),
      ),
    );
    expect(t.links[0].length).toBeCloseTo(R_KM * 2 * RAD, 9);
  });

  it('a MultiLineString counts its lines and not the gap between them (with a warning)', () => {
    const multi = {
      type: 'Feature',
      geometry: {
        type: 'MultiLineString',
        coordinates: [
          [
            [5, 40],
            [5, 40.5],
          ],
          [
            [5.2, 40.7],
            [5.2, 41],
          ],
        ],
      },
      properties: { id: 'm' },
    };
    const t = read(collection(site('a', 5, 40), site('b', 5.2, 41), multi));
    // two meridian arcs, 0.5° and 0.3°: R·0.8°
    expect(t.links[0].length).toBeCloseTo(R_KM * 0.8 * RAD, 9);
    expect(t.warnings.map((w) => [w.line, w.message])).toEqual([
      [
        5,
        expect.stringMatching(
          /^link features\[2\] has a gap of 2\d\.\d{3} km between lines 1 and 2 of its MultiLineString; the length counts the lines only$/,
        ),
      ],
    ]);
  });

  it('a length in the properties wins over the geometry (which stays in route_km)', () => {
    const t = read(
      collection(
        site('a', 10, 0),
        site('b', 11, 0),
        line(
          [
            [10, 0],
            [11, 0],
          ],
          { length_km: 140 },
        ),
      ),
    );
    expect(t.links[0].length).toBe(140);
    expect(t.links[0].attrs.route_km).toBe(Math.round(R_KM * RAD * 1000) / 1000);
  });
});

describe('GeoJSON: ids, ends and odd features', () => {
  it('keeps ids and named ends as written, numbers included', () => {
    const t = read(`{"type": "FeatureCollection", "features": [
  {"type": "Feature", "id": 1.0, "geometry": {"type": "Point", "coordinates": [0, 0]}, "properties": {}},
  {"type": "Feature", "properties": {"id": 12345678901234567890}, "geometry": {"type": "Point", "coordinates": [1, 0]}},
  {"type": "Feature", "geometry": {"type": "LineString", "coordinates": [[0, 0], [1, 0]]}, "properties": {"source": 1.0, "target": 12345678901234567890, "risk_groups": [10, "d"]}}
]}`);
    expect(t.nodes.map((n) => n.id)).toEqual(['1.0', '12345678901234567890']);
    expect([t.links[0].source, t.links[0].target, t.links[0].riskGroups]).toEqual([
      '1.0',
      '12345678901234567890',
      ['10', 'd'],
    ]);
  });

  it('a feature without geometry is skipped with a warning at its line', () => {
    const t = read(collection(site('a', 0, 0), { type: 'Feature', geometry: null, properties: { id: 'b' } }));
    expect(t.nodes).toHaveLength(1);
    expect(t.warnings.map((w) => [w.line, w.column, w.message])).toEqual([
      [4, 3, 'features[1] has no geometry (null); skipped'],
    ]);
  });

  it('warns when the named sites are not the ones the line is drawn between', () => {
    const t = read(
      collection(
        site('a', 0, 0),
        site('b', 1, 0),
        site('c', 2, 0),
        line(
          [
            [0, 0],
            [1, 0],
          ],
          { source: 'a', target: 'c' },
        ),
      ),
    );
    expect([t.links[0].source, t.links[0].target]).toEqual(['a', 'c']);
    expect(t.warnings.map((w) => [w.line, w.message])).toEqual([
      [
        6,
        'link features[3] names the sites "a" and "c", but its line is drawn between "a" and "b"; the named sites are used',
      ],
    ]);
  });
});

describe('GeoJSON: errors point at the line to fix', () => {
  const fails = (text: string) => caught(() => read(text)).format();

  it('a line that ends far from every site', () => {
    // 0.01° of latitude is 1.1 km from site b
    expect(
      fails(
        collection(
          site('a', 0, 0),
          site('b', 0, 1),
          line([
            [0, 0],
            [0, 0.99],
          ]),
        ),
      ),
    ).toBe(
      'plan.geojson:5:3: link features[2] ends at [0, 0.99], more than 100 m from every site — move the line\u2019s end onto its site, or name the sites in properties.source and properties.target',
    );
  });

  it('a Polygon', () => {
    const area = {
      type: 'Feature',
      geometry: {
        type: 'Polygon',
        coordinates: [
          [
            [0, 0],
            [1, 0],
            [1, 1],
            [0, 0],
          ],
        ],
      },
      properties: {},
    };
    expect(fails(collection(site('a', 0, 0), area))).toBe(
      'plan.geojson:4:3: features[1] is a Polygon: only Point (sites) and LineString or MultiLineString (links) are read — keep areas and other shapes in another file',
    );
  });

  it('coordinates out of range, at the position itself (latitude first is the usual slip)', () => {
    const text = `{"type": "FeatureCollection", "features": [
  {"type": "Feature", "id": "a", "properties": {},
   "geometry": {"type": "Point", "coordinates": [45.45, -35.2]}},
  {"type": "Feature", "id": "b", "properties": {},
   "geometry": {"type": "Point", "coordinates": [46.0, 120.5]}}
]}`;
    expect(fails(text)).toBe(
      'plan.geojson:5:49: site features[1] [46, 120.5] is outside longitude −180…180 / latitude −90…90 — GeoJSON writes longitude first, in degrees of WGS 84 (RFC 7946 §3.1.1)',
    );
  });

  it('a position that is not two numbers, inside a line', () => {
    const text = `{"type": "FeatureCollection", "features": [
  {"type": "Feature", "id": "a", "properties": {}, "geometry": {"type": "Point", "coordinates": [0, 0]}},
  {"type": "Feature", "id": "b", "properties": {}, "geometry": {"type": "Point", "coordinates": [1, 0]}},
  {"type": "Feature", "properties": {}, "geometry": {"type": "LineString", "coordinates": [
    [0, 0],
    ["0.5", 0],
    [1, 0]]}}
]}`;
    expect(fails(text)).toBe(
      'plan.geojson:6:5: position 1 of link features[2] is not a [longitude, latitude] position — a position is two numbers, e.g. [-35.2, 45.45]',
    );
  });

  it('a line with one position, a site without id, an unknown named site, a projected file', () => {
    expect(fails(collection(site('a', 0, 0), line([[0, 0]])))).toBe(
      'plan.geojson:4:67: link features[1] has a line with fewer than two positions — a line needs at least its two ends',
    );
    expect(
      fails(collection({ type: 'Feature', geometry: { type: 'Point', coordinates: [0, 0] }, properties: {} })),
    ).toBe('plan.geojson:3:3: site features[0] has no id — give the feature an "id", or properties.id');
    expect(
      fails(
        collection(
          site('a', 0, 0),
          site('b', 1, 0),
          line(
            [
              [0, 0],
              [1, 0],
            ],
            { source: 'a', target: 'bb' },
          ),
        ),
      ),
    ).toBe('plan.geojson:5:3: link features[2] refers to unknown node "bb" — did you mean "b"?');
    const projected = `{"type": "FeatureCollection",\n "crs": {"type": "name", "properties": {"name": "urn:ogc:def:crs:EPSG::3857"}},\n "features": []}`;
    expect(fails(projected)).toBe(
      'plan.geojson:2:9: the coordinates are in another reference system (urn:ogc:def:crs:EPSG::3857) — RFC 7946 GeoJSON is WGS 84 longitude/latitude: export the layer as EPSG:4326',
    );
    expect(read(projected.replace('EPSG::3857', 'OGC:1.3:CRS84')).nodes).toEqual([]);
  });

  it('not a FeatureCollection, and broken JSON', () => {
    expect(fails('{"type": "Feature"}')).toBe(
      'plan.geojson:1:1: a GeoJSON design is a FeatureCollection with a "features" list — points are sites, lines are links',
    );
    expect(fails('{"type": "FeatureCollection",\n "features": [}')).toMatch(
      /^plan\.geojson:2:\d+: GeoJSON syntax error: /,
    );
  });
});
