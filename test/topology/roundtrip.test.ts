// Round trips through every format on real networks of the Internet Topology Zoo (S. Knight,
// H. X. Nguyen, N. Falkner, R. Bowden, M. Roughan, "The Internet Topology Zoo", IEEE JSAC
// 29(9):1765–1775, 2011; CC BY 4.0; fixtures/topology-zoo): a sample of GML and GraphML files is
// converted to each format and back, and what comes back must equal what went in wherever the
// format can hold it (ids, labels, coordinates, links with their parallel copies, attributes),
// what it could not hold must be the losses the writer declared, and the structure (bridges,
// cut nodes) must be the source's.
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { compileTopology } from '../../src/graph/compact.js';
import { findCutElements } from '../../src/graph/structure.js';
import { convertDesign, writeDesign } from '../../src/topology/convert.js';
import type { DesignFormat, Topology } from '../../src/topology/model.js';
import { parseDesign } from '../../src/topology/parse.js';
import { writeNativeJson } from '../../src/topology/write-native.js';
import { caught, fixture, repoRoot } from './helpers.js';

const ZOO = path.join(repoRoot, 'fixtures', 'topology-zoo');
const FILE: Readonly<Record<DesignFormat, string>> = {
  'native-yaml': 'x.net.yaml',
  'native-json': 'x.net.json',
  graphml: 'x.graphml',
  gml: 'x.gml',
  csv: 'x.csv',
  geojson: 'x.geojson',
};
const FORMATS = Object.keys(FILE) as DesignFormat[];

/** Every 12th network (23 of 276), GML from the first, GraphML from the seventh, plus a few chosen for what they hold. */
function sample(format: 'gml' | 'graphml'): string[] {
  const all = readdirSync(path.join(ZOO, format))
    .filter((f) => f.endsWith(`.${format}`))
    .sort();
  const picked = all.filter((_, i) => i % 12 === (format === 'gml' ? 0 : 6));
  // Kdl: the largest; Cogentco: parallel links and nodes without coordinates; Abilene: every site placed.
  for (const extra of ['Kdl', 'Cogentco', 'Abilene'])
    if (!picked.includes(`${extra}.${format}`)) picked.push(`${extra}.${format}`);
  return picked;
}

const zoo = (format: 'gml' | 'graphml', name: string) =>
  parseDesign(readFileSync(path.join(ZOO, format, name), 'utf8'), name);

/** Attribute names a writer says it left out (or changed the type of). */
function lostNames(lost: readonly string[]): Set<string> {
  return new Set(
    lost.flatMap((s) => [...s.matchAll(/attribute "([^"]+)"|metadata "([^"]+)"/g)].map((m) => m[1] ?? m[2])),
  );
}

function without(attrs: Readonly<Record<string, unknown>>, drop: ReadonlySet<string>): Record<string, unknown> {
  return Object.fromEntries(Object.entries(attrs).filter(([k]) => !drop.has(k)));
}

/** What a Topology says, without where it was read from. */
function nodesOf(t: Topology, drop: ReadonlySet<string> = new Set()) {
  return t.nodes.map((n) => ({
    id: n.id,
    label: n.label,
    kind: n.kind,
    lat: n.lat,
    lon: n.lon,
    hardened: n.hardened,
    attrs: without(n.attrs, drop),
  }));
}
function linksOf(t: Topology, drop: ReadonlySet<string> = new Set()) {
  return t.links.map((l) => ({
    id: l.id,
    key: l.key,
    ends: [l.source, l.target],
    length: l.length,
    latency: l.latency,
    capacity: l.capacity,
    weight: l.weight,
    riskGroups: l.riskGroups,
    hardened: l.hardened,
    attrs: without(l.attrs, drop),
  }));
}
function designOf(t: Topology) {
  return {
    name: t.name,
    description: t.description,
    metadata: t.metadata,
    riskGroups: t.riskGroups.map((g) => [g.id, g.description]),
    demands: t.demands.map((d) => [d.source, d.target, d.volume]),
    budget: t.latencyBudget,
  };
}
function structureOf(t: Topology) {
  const g = compileTopology(t);
  const c = findCutElements(g);
  return { bridges: c.bridges.map((e) => g.linkIds[e]).sort(), cutNodes: c.cutNodes.map((v) => g.nodeIds[v]).sort() };
}

/** Compares `back` (read from `format`) with `source`, as far as `format` holds things. */
function expectHeld(
  source: Topology,
  back: Topology,
  format: DesignFormat,
  lost: readonly string[],
  what: string,
): void {
  const drop = lostNames(lost);
  expect(structureOf(back), `${what}: structure`).toEqual(structureOf(source));
  if (format === 'csv') {
    // Links only, every cell text; a link without an attribute reads back as an empty one.
    const text = (a: Record<string, unknown>, names: string[]) =>
      Object.fromEntries(names.map((k) => [k, a[k] === undefined ? '' : String(a[k])]));
    const names = [...new Set(source.links.flatMap((l) => Object.keys(l.attrs)))].filter((k) => !drop.has(k));
    expect(
      linksOf(back).map((l) => ({ ...l, attrs: text(l.attrs, names) })),
      `${what}: links`,
    ).toEqual(linksOf(source).map((l) => ({ ...l, attrs: text(l.attrs, names) })));
    const linked = new Set(source.links.flatMap((l) => [l.source, l.target]));
    expect(back.nodes.map((n) => n.id).sort(), `${what}: nodes`).toEqual(
      source.nodes
        .filter((n) => linked.has(n.id))
        .map((n) => n.id)
        .sort(),
    );
    return;
  }
  expect(nodesOf(back, drop), `${what}: nodes`).toEqual(nodesOf(source, drop));
  if (format === 'geojson') {
    // GeoJSON draws every link and so measures it: a length the source lacked is the line's;
    // a link without a route is drawn straight and marked so.
    const route = new Set([...drop, 'route', 'route_km', 'route_known']);
    expect(
      linksOf(back, route).map((l, i) => ({
        ...l,
        length: source.links[i].length === undefined ? undefined : l.length,
      })),
      `${what}: links`,
    ).toEqual(linksOf(source, route));
  } else {
    expect(linksOf(back, drop), `${what}: links`).toEqual(linksOf(source, drop));
  }
  if (format === 'native-yaml' || format === 'native-json')
    expect(designOf(back), `${what}: design`).toEqual(designOf(source));
  else {
    expect(back.name, `${what}: name`).toBe(source.name);
    expect(without(back.metadata, drop), `${what}: metadata`).toEqual(without(source.metadata, drop));
  }
}

const reads = (text: string, format: DesignFormat) => parseDesign(text, FILE[format]);

describe.each(['gml', 'graphml'] as const)('zoo %s networks through every format and back', (source) => {
  const names = sample(source);

  it(`samples at least 20 networks (${names.length})`, () => {
    expect(names.length).toBeGreaterThanOrEqual(20);
  });

  it.each(names)('%s', (name) => {
    const t0 = zoo(source, name);
    const srcFormat: DesignFormat = source;
    const sourceText = writeDesign(t0, srcFormat).text;
    for (const format of FORMATS) {
      const placed = t0.nodes.every((n) => n.lat !== undefined);
      if (format === 'geojson' && !placed) {
        const missing = t0.nodes.filter((n) => n.lat === undefined);
        expect(caught(() => writeDesign(t0, format)).message, name).toBe(
          `cannot write GeoJSON: ${missing.length} of ${t0.nodes.length} nodes ha${missing.length === 1 ? 's' : 've'} no coordinates (${missing
            .slice(0, 5)
            .map((n) => `"${n.id}"`)
            .join(', ')}${missing.length > 5 ? `, and ${missing.length - 5} more` : ''})`,
        );
        continue;
      }
      const there = writeDesign(t0, format);
      const t1 = reads(there.text, format);
      expectHeld(t0, t1, format, there.lost, `${name} → ${format}`);
      // The zoo knows no routes: every link is drawn straight, and says so.
      if (format === 'geojson')
        expect(
          t1.links.filter((l) => l.attrs.route_known !== false),
          name,
        ).toEqual([]);
      // And back into the source's format: what the first step kept comes back unchanged.
      const back = writeDesign(t1, srcFormat);
      const t2 = reads(back.text, srcFormat);
      expectHeld(t0, t2, format, [...there.lost, ...back.lost], `${name} → ${format} → ${source}`);
      // Through a format that holds everything, the source's format is written byte for byte the same.
      if (format === 'native-yaml' || format === 'native-json' || format === srcFormat)
        expect(back.text, `${name} → ${format} → ${source}`).toBe(sourceText);
    }
  });
});

describe('our own format loses nothing', () => {
  const designs: [string, string][] = [
    ...['ring.net.yaml', 'ring.net.json', 'ring.gml', 'ring.graphml', 'ring.csv', 'corrowen-fjord.geojson'].map(
      (f): [string, string] => [f, fixture(f)],
    ),
    [
      'lunmere-backbone.net.yaml',
      readFileSync(path.join(repoRoot, 'fixtures', 'demo', 'base', 'designs', 'lunmere-backbone.net.yaml'), 'utf8'),
    ],
  ];

  it.each(designs)('readDesign → writeNativeJson → readDesign: %s', (file, text) => {
    const t0 = parseDesign(text, file);
    const t1 = parseDesign(writeNativeJson(t0), 'x.net.json');
    expect(nodesOf(t1)).toEqual(nodesOf(t0));
    expect(linksOf(t1)).toEqual(linksOf(t0));
    expect(designOf(t1)).toEqual(designOf(t0));
    // and the JSON of what was read back is the same text
    expect(writeNativeJson(t1)).toBe(writeNativeJson(t0));
  });

  it('a weight comes through our format (it is the cost where there is no length)', () => {
    const t = parseDesign('source,target,weight\na,b,10\nb,c,2.5\n', 'w.csv');
    const back = parseDesign(writeNativeJson(t), 'w.net.json');
    expect(back.links.map((l) => l.weight)).toEqual([10, 2.5]);
  });
});

describe('estimated lengths', () => {
  it('a link without a length gets the great-circle distance, marked, and the others keep theirs', () => {
    // Two sites on the equator 1° apart: R·Δλ = 111.195 km (R = 6,371.0088 km, IUGG mean radius, from memory).
    const t = parseDesign(
      'nodes:\n  - {id: a, site: {lat: 0, lon: 0}}\n  - {id: b, site: {lat: 0, lon: 1}}\n  - {id: c}\nlinks:\n  - {between: [a, b]}\n  - {between: [b, c]}\n  - {between: [a, b], length_km: 130}\n',
      'e.net.yaml',
    );
    const out = convertDesign(t, 'native-yaml');
    expect([out.estimated, out.unestimated]).toEqual([1, 1]);
    const back = parseDesign(out.text, 'e.net.yaml');
    expect(back.links.map((l) => [l.length, l.attrs.length_estimated])).toEqual([
      [Math.round(6371.0088 * (Math.PI / 180) * 1000) / 1000, true],
      [undefined, undefined],
      [130, undefined],
    ]);
    expect(convertDesign(t, 'native-yaml', { estimateLengths: false }).estimated).toBe(0);
  });
});

describe('awkward text survives every writer', () => {
  // Quotes, markup, entities, separators, line breaks, non-ASCII and astral characters, and
  // ids that look like numbers: each written as its format escapes it and read back unchanged.
  const ids = ['a"b', '<x&y>', '&amp;', 'semi;colon', 'com,ma', 'line\nbreak', 'é€😀', '007', '1e3', 'tab\there'];
  const text = `nodes:\n${ids.map((id, i) => `  - {id: ${JSON.stringify(id)}, label: ${JSON.stringify(`«${id}»`)}, site: {lat: ${i}, lon: ${-i}}, attributes: {note: ${JSON.stringify(`${id}'s`)}}}`).join('\n')}\nlinks:\n${ids
    .slice(1)
    .map(
      (id, i) =>
        `  - {between: [${JSON.stringify(ids[i])}, ${JSON.stringify(id)}], id: ${JSON.stringify(`L ${id}`)}, attributes: {tag: ${JSON.stringify(`<${id}>`)}}}`,
    )
    .join('\n')}\n`;
  const t0 = parseDesign(text, 'awkward.net.yaml');

  it.each(FORMATS)('%s', (format) => {
    const written = writeDesign(t0, format);
    const t1 = reads(written.text, format);
    expect(t1.links.map((l) => [l.id, l.source, l.target, l.attrs.tag])).toEqual(
      t0.links.map((l) => [l.id, l.source, l.target, l.attrs.tag]),
    );
    if (format !== 'csv')
      expect(t1.nodes.map((n) => [n.id, n.label, n.attrs.note])).toEqual(
        t0.nodes.map((n) => [n.id, n.label, n.attrs.note]),
      );
  });
});
