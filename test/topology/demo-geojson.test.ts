// The GeoJSON version of the invented demo backbone (fixtures/demo/geojson/, written by
// `netbrace convert` and fixtures/demo/tools/route-geojson.mjs): the same network as the YAML
// design, and the shared corridors it reports.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { compileTopology } from '../../src/graph/compact.js';
import { findCutElements } from '../../src/graph/structure.js';
import { parseDesign } from '../../src/topology/parse.js';
import { repoRoot } from './helpers.js';

const demo = (p: string) => readFileSync(path.join(repoRoot, 'fixtures', 'demo', p), 'utf8');
const GEO = 'geojson/lunmere-backbone.geojson';
const R_KM = 6371.0088;
const RAD = Math.PI / 180;

/** Haversine distance, written out here rather than taken from the code under test. */
function km(a: readonly [number, number], b: readonly [number, number]): number {
  const h =
    Math.sin(((b[1] - a[1]) * RAD) / 2) ** 2 +
    Math.cos(a[1] * RAD) * Math.cos(b[1] * RAD) * Math.sin(((b[0] - a[0]) * RAD) / 2) ** 2;
  return 2 * R_KM * Math.asin(Math.sqrt(h));
}

describe('the demo backbone as GeoJSON', () => {
  const yaml = parseDesign(demo('base/designs/lunmere-backbone.net.yaml'), 'lunmere-backbone.net.yaml');
  const geo = parseDesign(demo(GEO), GEO);

  it('is the same network as the YAML design', () => {
    expect(geo.nodes.map((n) => [n.id, n.label, n.kind, n.lat, n.lon, n.hardened])).toEqual(
      yaml.nodes.map((n) => [n.id, n.label, n.kind, n.lat, n.lon, n.hardened]),
    );
    expect(geo.links.map((l) => [l.id, l.key, l.length, l.latency, l.capacity, l.riskGroups, l.hardened])).toEqual(
      yaml.links.map((l) => [l.id, l.key, l.length, l.latency, l.capacity, l.riskGroups, l.hardened]),
    );
    const cuts = (t: typeof geo) => {
      const g = compileTopology(t);
      const c = findCutElements(g);
      return [c.bridges.map((e) => g.linkIds[e]), c.cutNodes.map((v) => g.nodeIds[v])];
    };
    expect(cuts(geo)).toEqual(cuts(yaml));
    // Four links have drawn routes; the other 78 are straight lines that say so.
    expect(geo.links.filter((l) => l.attrs.route_known !== false).map((l) => l.id)).toEqual([
      'tessaway-orrowin',
      'orrowin-velmoss',
      'lunmere-quarnell',
      'lunmere-hesketter',
    ]);
  });

  it('reports one shared corridor: Lunmere–Quarnell and Lunmere–Hesketter up the north road', () => {
    const corridors = geo.warnings.filter((w) => w.message.includes('run within'));
    expect(
      corridors.map((w) => [w.line, /^links "([^"]+)" \(line \d+\) and "([^"]+)"/.exec(w.message)!.slice(1)]),
    ).toEqual([[121, ['lunmere-quarnell', 'lunmere-hesketter']]]);
    // The stretch they share, Lunmere to the fork at 45.49° N, 35.21° W, by the haversine
    // formula (closed form on the sphere): 4.52 km; the lines stay within 50 m a little past it.
    const shared = km([-35.2, 45.45], [-35.205, 45.47]) + km([-35.205, 45.47], [-35.21, 45.49]);
    expect(shared).toBeCloseTo(4.52, 2);
    const reported = Number(/for (\d+\.\d) km/.exec(corridors[0].message)![1]);
    expect(reported).toBeGreaterThanOrEqual(4.5);
    expect(reported).toBeLessThanOrEqual(4.8);
    expect(geo.warnings).toHaveLength(1);
  });

  it('the railway pair is in the duct it declares; without the duct it is reported too', () => {
    const text = demo(GEO).replace(/,"risk_groups":\["duct-eastern-trunk"\]/g, '');
    const corridors = parseDesign(text, GEO).warnings.filter((w) => w.message.includes('run within'));
    expect(corridors.map((w) => /^links "([^"]+)" \(line \d+\) and "([^"]+)"/.exec(w.message)!.slice(1))).toEqual([
      ['tessaway-orrowin', 'orrowin-velmoss'],
      ['lunmere-quarnell', 'lunmere-hesketter'],
    ]);
    // 0.07° of longitude along 45.4° N: R·cos φ·Δλ = 5.47 km (an arc of a parallel; the railway is straight to 1 m)
    expect(R_KM * Math.cos(45.4 * RAD) * 0.07 * RAD).toBeCloseTo(5.47, 2);
    expect(corridors[0].message).toMatch(/for 5\.[4-7] km/);
  });
});
