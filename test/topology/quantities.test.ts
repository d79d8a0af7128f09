// Numbers the metrics compute with are refused at their line when no computation can use them:
// NaN, infinities, subnormals (1e-310: 1/x overflows and R becomes NaN) and values past the
// sanity limits of quantities.ts (1e308 overflows a sum of path lengths). Every format.
import { describe, expect, it } from 'vitest';
import schema from '../../src/topology/design.schema.json' with { type: 'json' };
import { parseDesign } from '../../src/topology/parse.js';
import { MIN_NORMAL, nonNormal, QUANTITY_RANGE, quantityProblem } from '../../src/topology/quantities.js';
import { caught } from './helpers.js';

const yamlLink = (field: string, value: string) =>
  `nodes:\n  - id: a\n  - id: b\nlinks:\n  - between: [a, b]\n    ${field}: ${value}\n`;
const HEAD = '<?xml version="1.0"?>\n<graphml xmlns="http://graphml.graphdrawing.org/xmlns">\n';
const graphmlEdge = (name: string, type: string, value: string) =>
  `${HEAD}<key id="k" for="edge" attr.name="${name}" attr.type="${type}"/>\n<graph>\n<node id="a"/><node id="b"/>\n<edge source="a" target="b">\n  <data key="k">${value}</data>\n</edge>\n</graph>\n</graphml>\n`;
const gmlEdge = (name: string, value: string) =>
  `graph [\n  node [ id 1 ]\n  node [ id 2 ]\n  edge [\n    source 1\n    target 2\n    ${name} ${value}\n  ]\n]\n`;
const csvRow = (name: string, value: string) => `source,target,${name}\na,b,${value}\n`;

describe('the rule (quantities.ts)', () => {
  it('non-normal numbers: NaN, ±Infinity and subnormals; 0 and the smallest normal are fine', () => {
    // IEEE 754 binary64: the smallest positive normal is 2^-1022 (≈ 2.2250738585072014e-308).
    expect(MIN_NORMAL).toBe(2 ** -1022);
    expect([NaN, Infinity, -Infinity, 1e-310, -5e-324].map((n) => nonNormal(n) !== undefined)).toEqual([
      true,
      true,
      true,
      true,
      true,
    ]);
    expect([0, -0, MIN_NORMAL, 1, 1e308].map((n) => nonNormal(n))).toEqual([
      undefined,
      undefined,
      undefined,
      undefined,
      undefined,
    ]);
  });

  it('each quantity accepts 0 and its range, bounds included, and nothing past them', () => {
    for (const [kind, r] of Object.entries(QUANTITY_RANGE) as [
      keyof typeof QUANTITY_RANGE,
      (typeof QUANTITY_RANGE)['length'],
    ][]) {
      for (const ok of [0, r.min, r.max, Math.sqrt(r.min * r.max)])
        expect(quantityProblem(kind, ok), `${kind} ${ok}`).toBeUndefined();
      for (const bad of [r.min / 2, r.max * 2, -1, 1e-310, Infinity, NaN])
        expect(quantityProblem(kind, bad), `${kind} ${bad}`).toBeDefined();
    }
  });

  it('the design schema states the same upper limits (editors show them)', () => {
    const link = schema.definitions.link.properties;
    expect([link.length_km.maximum, link.latency_ms.maximum, link.capacity_gbps.maximum, link.weight.maximum]).toEqual([
      QUANTITY_RANGE.length.max,
      QUANTITY_RANGE.latency.max,
      QUANTITY_RANGE.capacity.max,
      QUANTITY_RANGE.weight.max,
    ]);
    expect(schema.definitions.demand.properties.volume.maximum).toBe(QUANTITY_RANGE.volume.max);
  });
});

describe('our format (YAML and JSON)', () => {
  const err = (text: string, file = 'n.net.yaml') => caught(() => parseDesign(text, file)).format();

  it('a subnormal length, an infinite latency, a NaN: refused at the value', () => {
    expect(err(yamlLink('length_km', '1e-310'))).toBe(
      'n.net.yaml:6:16: links[0].length_km is so close to 0 that it cannot be computed with (a subnormal number) (written 1e-310) — write a plain decimal number',
    );
    expect(err(yamlLink('latency_ms', '.inf'))).toBe(
      'n.net.yaml:6:17: links[0].latency_ms is infinite (or too large for a number) (written .inf) — write a plain decimal number',
    );
    expect(err(yamlLink('latency_ms', '1e400'))).toContain('n.net.yaml:6:17: links[0].latency_ms is infinite');
    expect(err(yamlLink('capacity_gbps', '.nan'))).toContain(
      'n.net.yaml:6:20: links[0].capacity_gbps is not a number (NaN)',
    );
  });

  it('past the limits: above (schema) and below the smallest positive value', () => {
    expect(err(yamlLink('length_km', '1e308'))).toBe(
      'n.net.yaml:6:16: links[0].length_km must be at most 1000000 (found 1e+308)',
    );
    expect(err(yamlLink('length_km', '1e-7'))).toBe(
      'n.net.yaml:6:16: links[0].length_km is 1e-7, below the smallest value accepted (1e-6 km) — netbrace accepts 0 or 1e-6 km to 1e6 km; write 0 for none',
    );
    expect(err(yamlLink('capacity_gbps', '2e9'))).toContain(
      'n.net.yaml:6:20: links[0].capacity_gbps must be at most 1000000000',
    );
    expect(err('nodes:\n  - id: a\n  - id: b\ndemands:\n  - between: [a, b]\n    volume: 1e300\n')).toContain(
      'n.net.yaml:6:13: demands[0].volume must be at most',
    );
    expect(err('nodes:\n  - id: a\nlatency_budget: 1e9\n')).toContain(
      'n.net.yaml:3:17: latency_budget must be at most 1000',
    );
  });

  it('a subnormal coordinate is refused; NaN anywhere outside metadata too', () => {
    expect(err('nodes:\n  - id: a\n    site: {lat: 1e-310, lon: 0}\n')).toContain(
      'n.net.yaml:3:17: nodes[0].site.lat is so close to 0',
    );
    // Free-form metadata is not computed with; it is carried as written.
    expect(parseDesign('nodes:\n  - id: a\nmetadata:\n  budget: .inf\n', 'n.net.yaml').metadata).toEqual({
      budget: Infinity,
    });
  });

  it('JSON: a numeral too large for a double is refused where it is written', () => {
    const json =
      '{"nodes": [{"id": "a"}, {"id": "b"}],\n "links": [{"between": ["a", "b"],\n   "latency_ms": 1e400}]}\n';
    expect(err(json, 'n.net.json')).toContain(
      'n.net.json:3:18: links[0].latency_ms is infinite (or too large for a number) (written 1e400)',
    );
  });

  it('values at the limits are read as written', () => {
    const t = parseDesign(
      'nodes:\n  - id: a\n  - id: b\nlinks:\n  - between: [a, b]\n    length_km: 1e6\n    latency_ms: 0.000001\n    capacity_gbps: 0\n',
      'n.net.yaml',
    );
    expect(t.links[0]).toMatchObject({ length: 1e6, latency: 1e-6, capacity: 0 });
  });
});

describe('interchange formats (GraphML, GML, CSV)', () => {
  it('GraphML: a subnormal weight, a length of 1e308, an infinite latency, each at its <data>', () => {
    expect(caught(() => parseDesign(graphmlEdge('weight', 'double', '1e-310'), 'w.graphml')).format()).toBe(
      'w.graphml:7:3: link weight is so close to 0 that it cannot be computed with (a subnormal number) — netbrace accepts 0 or 1e-9 to 1e9; write 0 for none',
    );
    expect(caught(() => parseDesign(graphmlEdge('length', 'double', '1e308'), 'w.graphml')).format()).toBe(
      'w.graphml:7:3: link length is 1e308, above the limit of 1e6 km — netbrace accepts 0 or 1e-6 km to 1e6 km; check the unit',
    );
    expect(caught(() => parseDesign(graphmlEdge('LinkLatency', 'double', '1e999'), 'w.graphml')).format()).toContain(
      'w.graphml:7:3: link LinkLatency is infinite (or too large for a number) (written 1e999)',
    );
  });

  it('GraphML: a subnormal latitude is refused; a raw link speed out of range is kept as written, not read as a capacity', () => {
    const node = `${HEAD}<key id="y" for="node" attr.name="Latitude" attr.type="double"/><key id="x" for="node" attr.name="Longitude" attr.type="double"/>\n<graph>\n<node id="a">\n  <data key="y">1e-310</data><data key="x">8</data>\n</node>\n</graph>\n</graphml>\n`;
    expect(caught(() => parseDesign(node, 'n.graphml')).format()).toBe(
      'n.graphml:6:3: node coordinate "Latitude" is so close to 0 that it cannot be computed with (a subnormal number) ("1e-310") — write a plain decimal number of degrees',
    );
    const t = parseDesign(graphmlEdge('LinkSpeedRaw', 'double', '1e30'), 's.graphml');
    expect(t.links[0].capacity).toBeUndefined();
    expect(t.links[0].attrs).toEqual({ LinkSpeedRaw: 1e30 });
    expect(t.warnings.map((w) => [w.line, w.message])).toEqual([
      [7, 'link LinkSpeedRaw "1e30" is not a speed in bit/s that netbrace accepts; not read as the capacity'],
    ]);
  });

  it('GML: the same rules, at the key', () => {
    expect(caught(() => parseDesign(gmlEdge('weight', '1e-310'), 'w.gml')).format()).toContain(
      'w.gml:7:5: link weight is so close to 0',
    );
    expect(caught(() => parseDesign(gmlEdge('length', '1e999'), 'w.gml')).format()).toContain(
      'w.gml:7:5: link length is infinite (or too large for a number) (written 1e999)',
    );
    expect(caught(() => parseDesign(gmlEdge('capacity', '5e9'), 'w.gml')).format()).toBe(
      'w.gml:7:5: link capacity is 5e9, above the limit of 1e9 Gbit/s — netbrace accepts 0 or 1e-9 Gbit/s to 1e9 Gbit/s; check the unit',
    );
    expect(
      caught(() => parseDesign('graph [\n  node [ id 1 Latitude 1e999 Longitude 8 ]\n]\n', 'c.gml')).format(),
    ).toContain('c.gml:2:15: node coordinate "Latitude" is infinite');
  });

  it('CSV: the same rules, at the cell', () => {
    expect(caught(() => parseDesign(csvRow('weight', '1e-310'), 'l.csv')).format()).toContain(
      'l.csv:2:5: link weight is so close to 0',
    );
    expect(caught(() => parseDesign(csvRow('latency', '1e308'), 'l.csv')).format()).toContain(
      'l.csv:2:5: link latency is 1e308, above the limit of 1e6 ms',
    );
    expect(caught(() => parseDesign(csvRow('length', 'Infinity'), 'l.csv')).format()).toContain(
      'l.csv:2:5: link length must be a number, not "Infinity"',
    );
    expect(parseDesign(csvRow('weight', '0.000000001'), 'l.csv').links[0].weight).toBe(1e-9);
  });
});
