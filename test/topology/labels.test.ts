// Every reader fills TopoNode.label (reports name sites by it), and the attributes other parts
// of netbrace compute with — hardened, risk groups, lengths, latencies, capacities, coordinates
// — arrive the same from every format. The Internet Topology Zoo (Knight et al., IEEE JSAC
// 2011) names nodes with a `label` key in both its GML and its GraphML copies; zoo.test.ts
// checks those files node by node.
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../src/topology/parse.js';
import type { Topology } from '../../src/topology/model.js';

const HEAD = '<?xml version="1.0"?>\n<graphml xmlns="http://graphml.graphdrawing.org/xmlns">\n';

describe('labels', () => {
  it('our format: label (YAML and JSON)', () => {
    expect(parseDesign('nodes:\n  - id: a\n    label: Harbour exchange\n', 'l.net.yaml').nodes[0].label).toBe(
      'Harbour exchange',
    );
    expect(parseDesign('{"nodes": [{"id": "a", "label": "Harbour exchange"}]}', 'l.net.json').nodes[0].label).toBe(
      'Harbour exchange',
    );
  });

  it("GraphML: a key named label (the zoo's spelling) or name; label wins when both are there", () => {
    const doc = (keys: string[], data: string) =>
      `${HEAD}${keys.map((k, i) => `<key id="d${i}" for="node" attr.name="${k}" attr.type="string"/>`).join('')}\n<graph>\n<node id="a">${data}</node>\n</graph>\n</graphml>\n`;
    expect(parseDesign(doc(['label'], '<data key="d0">Harbour</data>'), 'l.graphml').nodes[0].label).toBe('Harbour');
    expect(parseDesign(doc(['name'], '<data key="d0">Harbour</data>'), 'l.graphml').nodes[0].label).toBe('Harbour');
    for (const data of [
      '<data key="d0">Harbour</data><data key="d1">hbr-01</data>',
      '<data key="d1">hbr-01</data><data key="d0">Harbour</data>',
    ]) {
      const n = parseDesign(doc(['label', 'name'], data), 'l.graphml').nodes[0];
      expect([n.label, n.attrs]).toEqual(['Harbour', { name: 'hbr-01' }]);
    }
  });

  it('GML: label or name, label winning; a number as a label keeps its text', () => {
    const node = (body: string) => parseDesign(`graph [\n  node [ id 1 ${body} ]\n]\n`, 'l.gml').nodes[0];
    expect(node('label "Harbour"').label).toBe('Harbour');
    expect(node('name "Harbour"').label).toBe('Harbour');
    expect([node('name "hbr-01" label "Harbour"').label, node('name "hbr-01" label "Harbour"').attrs]).toEqual([
      'Harbour',
      { name: 'hbr-01' },
    ]);
    expect(node('label 007').label).toBe('007');
  });

  it('CSV: an edge list has no node rows, so no labels (ids only)', () => {
    expect(parseDesign('source,target\na,b\n', 'l.csv').nodes.map((n) => n.label)).toEqual([undefined, undefined]);
  });
});

/** What the rest of netbrace reads from a design, format aside. */
function projection(t: Topology, withNodes = true) {
  return {
    nodes: withNodes
      ? t.nodes.map((n) => ({ id: n.id, label: n.label, hardened: n.hardened, lat: n.lat, lon: n.lon }))
      : t.nodes.map((n) => n.id),
    links: t.links.map((l) => ({
      key: l.key,
      length: l.length,
      latency: l.latency,
      capacity: l.capacity,
      riskGroups: l.riskGroups,
      hardened: l.hardened,
    })),
  };
}

describe('attributes survive parsing in every format', () => {
  // One invented design: a hardened hub, a hardened link, a shared duct, measured spans.
  const yaml = [
    'nodes:',
    '  - id: hub',
    '    label: Hub',
    '    hardened: true',
    '    site: {lat: 46.5, lon: 7.25}',
    '  - id: edge',
    '    label: Edge',
    '    site: {lat: -33.9, lon: 151.2}',
    'links:',
    '  - between: [hub, edge]',
    '    length_km: 12.5',
    '    latency_ms: 0.07',
    '    capacity_gbps: 400',
    '    risk_groups: [duct-1, duct-2]',
    '    hardened: true',
    '  - between: [edge, hub]',
    '    length_km: 0',
    '    risk_groups: [duct-1]',
    '',
  ].join('\n');
  const json = JSON.stringify({
    nodes: [
      { id: 'hub', label: 'Hub', hardened: true, site: { lat: 46.5, lon: 7.25 } },
      { id: 'edge', label: 'Edge', site: { lat: -33.9, lon: 151.2 } },
    ],
    links: [
      {
        between: ['hub', 'edge'],
        length_km: 12.5,
        latency_ms: 0.07,
        capacity_gbps: 400,
        risk_groups: ['duct-1', 'duct-2'],
        hardened: true,
      },
      { between: ['edge', 'hub'], length_km: 0, risk_groups: ['duct-1'] },
    ],
  });
  const graphml =
    `${HEAD}<key id="l" for="node" attr.name="label" attr.type="string"/><key id="h" for="all" attr.name="hardened" attr.type="boolean"/>` +
    '<key id="y" for="node" attr.name="Latitude" attr.type="double"/><key id="x" for="node" attr.name="Longitude" attr.type="double"/>' +
    '<key id="len" for="edge" attr.name="length" attr.type="double"/><key id="lat" for="edge" attr.name="latency" attr.type="double"/>' +
    '<key id="cap" for="edge" attr.name="capacity" attr.type="double"/><key id="g" for="edge" attr.name="risk_groups" attr.type="string"/>\n<graph>\n' +
    '<node id="hub"><data key="l">Hub</data><data key="h">true</data><data key="y">46.5</data><data key="x">7.25</data></node>\n' +
    '<node id="edge"><data key="l">Edge</data><data key="y">-33.9</data><data key="x">151.2</data></node>\n' +
    '<edge source="hub" target="edge"><data key="len">12.5</data><data key="lat">0.07</data><data key="cap">400</data><data key="g">duct-1;duct-2</data><data key="h">1</data></edge>\n' +
    '<edge source="edge" target="hub"><data key="len">0</data><data key="g">duct-1</data></edge>\n</graph>\n</graphml>\n';
  const gml =
    'graph [\n  node [ id "hub" label "Hub" hardened 1 Latitude 46.5 Longitude 7.25 ]\n  node [ id "edge" label "Edge" Latitude -33.9 Longitude 151.2 ]\n' +
    '  edge [ source "hub" target "edge" length 12.5 latency 0.07 capacity 400 risk_groups "duct-1;duct-2" hardened 1 ]\n' +
    '  edge [ source "edge" target "hub" length 0 risk_groups "duct-1" ]\n]\n';
  const csv =
    'source,target,length,latency,capacity,risk_groups,hardened\nhub,edge,12.5,0.07,400,duct-1;duct-2,yes\nedge,hub,0,,,duct-1,\n';

  const expected = projection(parseDesign(yaml, 'd.net.yaml'));

  it('our YAML reads every attribute (the reference for the others)', () => {
    expect(expected).toEqual({
      nodes: [
        { id: 'hub', label: 'Hub', hardened: true, lat: 46.5, lon: 7.25 },
        { id: 'edge', label: 'Edge', hardened: false, lat: -33.9, lon: 151.2 },
      ],
      links: [
        {
          key: 'edge\u2014hub',
          length: 12.5,
          latency: 0.07,
          capacity: 400,
          riskGroups: ['duct-1', 'duct-2'],
          hardened: true,
        },
        {
          key: 'edge\u2014hub#2',
          length: 0,
          latency: undefined,
          capacity: undefined,
          riskGroups: ['duct-1'],
          hardened: false,
        },
      ],
    });
  });

  it('JSON, GraphML and GML give the same nodes and links', () => {
    expect(projection(parseDesign(json, 'd.net.json'))).toEqual(expected);
    expect(projection(parseDesign(graphml, 'd.graphml'))).toEqual(expected);
    expect(projection(parseDesign(gml, 'd.gml'))).toEqual(expected);
  });

  it('CSV gives the same links (it has no node attributes)', () => {
    expect(projection(parseDesign(csv, 'd.csv'), false)).toEqual({ nodes: ['hub', 'edge'], links: expected.links });
  });
});
