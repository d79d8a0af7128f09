// Property-based fuzzing of every design reader (our YAML/JSON format, GraphML, GML, CSV).
// Inputs: random text, token soup in each format's own vocabulary, and real files mutated by
// a few edits — zoo networks (Knight et al., IEEE JSAC 2011, CC BY 4.0), the fixtures, and
// zoo networks rewritten into our own format and CSV. The only outcomes allowed are a
// Topology that holds together (and compiles), or a NetbraceError naming the file and a line
// of it; never another exception, never unbounded time or output. Seeded, counts bounded.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { stringify as yamlStringify } from 'yaml';
import { compileTopology } from '../../src/graph/compact.js';
import type { Topology } from '../../src/topology/model.js';
import { parseDesign } from '../../src/topology/parse.js';
import {
  attempt,
  fixtureText,
  lineCount,
  locationProblems,
  reportCount,
  SEED,
  Tally,
  zooSeeds,
  type SeedFile,
} from './support.js';

/** Guards against a hang, not a speed target: a case taking this long is a bug. */
const HANG_MS = 10_000;

type Format = 'graphml' | 'gml' | 'csv' | 'yaml' | 'json';

const FILE: Record<Format, string> = {
  graphml: 'fuzz/case.graphml',
  gml: 'fuzz/case.gml',
  csv: 'fuzz/case.csv',
  yaml: 'fuzz/case.net.yaml',
  json: 'fuzz/case.net.json',
};

/** Cases per format; three generators share them. Sized for two CI cores. */
const RUNS: Record<Format, number> = { graphml: 1500, gml: 1500, csv: 1500, yaml: 1200, json: 1200 };

/** Each format's vocabulary, so that mutations reach the interesting states of its reader. */
const TOKENS: Record<Format, string[]> = {
  graphml: [
    '<graphml>',
    '</graphml>',
    '<graph edgedefault="undirected">',
    '<graph edgedefault="directed">',
    '</graph>',
    '<node id="a"/>',
    '<node id="b">',
    '</node>',
    '<edge source="a" target="b"/>',
    '<edge source="a" target="zz"/>',
    '<edge source="a" target="a"/>',
    '<edge directed="true" source="b" target="a">',
    '</edge>',
    '<key id="d0" for="node" attr.name="Latitude" attr.type="double"/>',
    '<key id="d1" for="node" attr.name="Longitude" attr.type="double">',
    '<default>1e999</default>',
    '</key>',
    '<key id="d2" for="edge" attr.name="length" attr.type="string"/>',
    '<data key="d0">',
    '<data key="d2">',
    '<data key="__proto__">',
    '</data>',
    '<![CDATA[',
    ']]>',
    '&amp;',
    '&#0;',
    '&#x110000;',
    '&undefined;',
    '<!DOCTYPE g>',
    '<!DOCTYPE g [<!ENTITY e "x">]>',
    '<?xml version="1.0"?>',
    '<!--',
    '-->',
    '<y:ShapeNode>',
    '<hyperedge>',
    '"',
    "'",
    '<',
    '>',
    '/>',
    '=',
    ' id="',
    'NaN',
    '-1',
    '1e309',
    '\u0000',
    '\uFEFF',
    '\r\n',
  ],
  gml: [
    'graph [',
    'node [',
    'edge [',
    ']',
    '[',
    'id 1',
    'id 2',
    'id "a"',
    'id -0',
    'source 1',
    'target 2',
    'target 99',
    'source 1 target 1',
    'label "x"',
    'Latitude 91',
    'Longitude 1e999',
    'Latitude 47.1',
    'LinkLabel "10 Gbps"',
    'length -3',
    'length 1e999',
    'weight "x"',
    'directed 1',
    'multigraph 1',
    'hardened 2',
    '__proto__ [ a 1 ]',
    'constructor 1',
    'graphics [ x 1 y 2 ]',
    '"',
    '&#x110000;',
    '&quot;',
    '#',
    '\n',
    '\r',
    '+',
    '.',
    'e5',
    '-',
  ],
  csv: [
    'source,target',
    'source,target,length,latency,risk_groups,hardened,id',
    'a,b',
    'b,c',
    'a,a',
    ',',
    '"',
    '""',
    '"a,b"',
    '\n',
    '\r\n',
    '\r',
    'x',
    '1e999',
    '-1',
    'NaN',
    'yes',
    'maybe',
    'g1;g2',
    ';',
    '__proto__',
    'constructor',
    'source',
    'target',
    '\uFEFF',
    ' ',
  ],
  yaml: [
    'nodes:',
    'links:',
    'risk_groups:',
    'demands:',
    'metadata:',
    'network:',
    '  - id: a',
    '  - id: b',
    '- id: 7',
    '  - between: [a, b]',
    '    between: [a, zz]',
    'between: [a]',
    '    length_km: -1',
    '    latency_ms: 1e999',
    'volume: .inf',
    '    site: {lat: 91, lon: 0}',
    'hardened: maybe',
    '&a ',
    '*a',
    '<<: *a',
    '!!binary',
    '!!set',
    '!!js/function',
    '? ',
    '- ',
    '{',
    '}',
    '[',
    ']',
    '"',
    "'",
    '|',
    '>',
    '%YAML 1.1',
    '---',
    '...',
    '__proto__:',
    'constructor:',
    '\t',
    '\n',
    '  ',
    '#',
    ': ',
    ',',
    'id: ~',
    'id: [1]',
    '\u2028',
  ],
  json: [
    '{',
    '}',
    '[',
    ']',
    ',',
    ':',
    '"nodes"',
    '"links"',
    '"id"',
    '"between"',
    '"a"',
    '"b"',
    '"length_km"',
    '-1',
    '1e999',
    'null',
    'true',
    '"__proto__"',
    '"constructor"',
    '\\u0000',
    '"\\ud800"',
    '0',
    '01',
    '.5',
    'NaN',
    ' ',
    '\n',
    '"risk_groups"',
    '"site"',
    '{"lat": 91}',
  ],
};

/** A zoo network rewritten into our own format (YAML or JSON) or a CSV edge list. */
function rewrite(t: Topology, format: 'yaml' | 'json' | 'csv'): string {
  if (format === 'csv') {
    const rows = t.links.map((l) =>
      [l.source, l.target, l.length ?? '']
        .map((v) => (/[",\n]/.test(String(v)) ? `"${String(v).replace(/"/g, '""')}"` : String(v)))
        .join(','),
    );
    return `source,target,length\n${rows.join('\n')}\n`;
  }
  const design = {
    network: { name: t.name ?? 'zoo network' },
    nodes: t.nodes.map((n) => ({ id: n.id, ...(n.lat !== undefined ? { site: { lat: n.lat, lon: n.lon } } : {}) })),
    links: t.links.map((l) => ({
      between: [l.source, l.target],
      ...(l.length !== undefined ? { length_km: l.length } : {}),
    })),
  };
  return format === 'json' ? JSON.stringify(design, null, 2) : yamlStringify(design);
}

function seedsFor(format: Format): SeedFile[] {
  const zooGml = zooSeeds('gml', 6);
  switch (format) {
    case 'graphml':
      return [
        ...zooSeeds('graphml', 6),
        { name: 'fixtures/designs/ring.graphml', text: fixtureText('designs', 'ring.graphml') },
      ];
    case 'gml':
      return [...zooGml, { name: 'fixtures/designs/ring.gml', text: fixtureText('designs', 'ring.gml') }];
    default: {
      const own: SeedFile[] =
        format === 'csv'
          ? [{ name: 'ring.csv', text: fixtureText('designs', 'ring.csv') }]
          : format === 'json'
            ? [{ name: 'ring.net.json', text: fixtureText('designs', 'ring.net.json') }]
            : [
                { name: 'ring.net.yaml', text: fixtureText('designs', 'ring.net.yaml') },
                // The demo design's first 60 lines (it is large for thousands of YAML parses); cut, so not always valid.
                {
                  name: 'lunmere-backbone.net.yaml',
                  text: fixtureText('demo', 'base', 'designs', 'lunmere-backbone.net.yaml')
                    .split('\n')
                    .slice(0, 60)
                    .join('\n'),
                },
              ];
      const converted = zooGml
        .slice(0, 3)
        .map((s) => ({ name: `${s.name} as ${format}`, text: rewrite(parseDesign(s.text, s.name), format) }));
      return [...own, ...converted];
    }
  }
}

type Edit =
  | { op: 'insert'; at: number; s: string }
  | { op: 'delete'; at: number; len: number }
  | { op: 'replace'; at: number; s: string }
  | { op: 'dupLine'; at: number }
  | { op: 'dropLine'; at: number }
  | { op: 'swapLines'; at: number; to: number }
  | { op: 'truncate'; at: number };

function applyEdit(text: string, e: Edit): string {
  const at = (f: number, n: number) => Math.min(n, Math.floor(f * (n + 1)));
  switch (e.op) {
    case 'insert': {
      const i = at(e.at, text.length);
      return text.slice(0, i) + e.s + text.slice(i);
    }
    case 'delete': {
      const i = at(e.at, text.length);
      return text.slice(0, i) + text.slice(i + e.len);
    }
    case 'replace': {
      const i = at(e.at, text.length);
      return text.slice(0, i) + e.s + text.slice(i + e.s.length);
    }
    case 'truncate':
      return text.slice(0, at(e.at, text.length));
    default: {
      const lines = text.split('\n');
      const i = Math.min(lines.length - 1, at(e.at, lines.length - 1));
      if (e.op === 'dupLine') lines.splice(i, 0, lines[i]);
      else if (e.op === 'dropLine') lines.splice(i, 1);
      else {
        const j = Math.min(lines.length - 1, at(e.to, lines.length - 1));
        [lines[i], lines[j]] = [lines[j], lines[i]];
      }
      return lines.join('\n');
    }
  }
}

/** A small design drawn at random and written in the format: ids and values from hostile vocabularies. */
interface Drawn {
  nodes: { id: string; attrs: [string, string][] }[];
  links: { s: number; t: number; attrs: [string, string][] }[];
}

const ID = fc.oneof(
  fc.constantFrom(
    'a',
    'b',
    'c',
    '7',
    '07',
    '-0',
    ' a',
    '__proto__',
    'constructor',
    'a\u0000b',
    '\u202e',
    'x"y',
    "x'y",
    '<b>',
    '&amp;',
    'a,b',
  ),
  fc.string({ maxLength: 4 }),
);
const VALUE = fc.oneof(
  fc.constantFrom(
    '1',
    '0',
    '-1',
    '0.5',
    '1e999',
    '-1e999',
    'NaN',
    '1e-400',
    'x',
    '',
    'true',
    'no',
    'maybe',
    'g1;g2',
    ';',
    '91',
    '181',
    '1,5',
  ),
  fc.string({ maxLength: 4 }),
);
const NODE_ATTR = fc.constantFrom(
  'label',
  'kind',
  'Latitude',
  'Longitude',
  'x',
  'y',
  'hardened',
  '__proto__',
  'Internal',
  'type',
);
const LINK_ATTR = fc.constantFrom(
  'length',
  'latency',
  'capacity',
  'weight',
  'hardened',
  'risk_groups',
  'LinkSpeedRaw',
  'id',
  '__proto__',
  'label',
);

const drawn: fc.Arbitrary<Drawn> = fc.integer({ min: 0, max: 6 }).chain((n) =>
  fc.record({
    nodes: fc.array(fc.record({ id: ID, attrs: fc.array(fc.tuple(NODE_ATTR, VALUE), { maxLength: 3 }) }), {
      minLength: n,
      maxLength: n,
    }),
    links: fc.array(
      fc.record({ s: fc.nat(8), t: fc.nat(8), attrs: fc.array(fc.tuple(LINK_ATTR, VALUE), { maxLength: 3 }) }),
      { maxLength: 8 },
    ),
  }),
);

const xml = (v: string) => v.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/"/g, '&quot;');
const csvCell = (v: string) => (/[",\r\n]/.test(v) ? `"${v.replace(/"/g, '""')}"` : v);
const gmlValue = (v: string) =>
  /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(v) ? v : `"${v.replace(/"/g, '&quot;')}"`;
const NATIVE_LINK: Record<string, string> = {
  length: 'length_km',
  latency: 'latency_ms',
  capacity: 'capacity_gbps',
  hardened: 'hardened',
  risk_groups: 'risk_groups',
  id: 'id',
};
const typedValue = (v: string): unknown =>
  v !== '' && Number.isFinite(Number(v)) ? Number(v) : v === 'true' ? true : v === 'no' ? false : v;

function writeDrawn(d: Drawn, format: Format): string {
  const end = (i: number) => d.nodes[i]?.id ?? `missing-${i}`;
  switch (format) {
    case 'graphml': {
      const names = [
        ...new Set([...d.nodes.flatMap((n) => n.attrs), ...d.links.flatMap((l) => l.attrs)].map(([k]) => k)),
      ];
      const key = (k: string) => `k${names.indexOf(k)}`;
      const keys = names
        .map((k) => `<key id="${key(k)}" for="all" attr.name="${xml(k)}" attr.type="string"/>`)
        .join('');
      const data = (attrs: [string, string][]) =>
        attrs.map(([k, v]) => `<data key="${key(k)}">${xml(v)}</data>`).join('');
      const nodes = d.nodes.map((n) => `<node id="${xml(n.id)}">${data(n.attrs)}</node>`).join('\n');
      const edges = d.links
        .map((l) => `<edge source="${xml(end(l.s))}" target="${xml(end(l.t))}">${data(l.attrs)}</edge>`)
        .join('\n');
      return `<?xml version="1.0"?>\n<graphml>${keys}\n<graph edgedefault="undirected">\n${nodes}\n${edges}\n</graph></graphml>\n`;
    }
    case 'gml': {
      const pairs = (attrs: [string, string][]) =>
        attrs
          .filter(([k]) => /^[A-Za-z_]\w*$/.test(k))
          .map(([k, v]) => ` ${k} ${gmlValue(v)}`)
          .join('');
      const nodes = d.nodes.map((n) => `  node [ id ${gmlValue(n.id)}${pairs(n.attrs)} ]`).join('\n');
      const edges = d.links
        .map((l) => `  edge [ source ${gmlValue(end(l.s))} target ${gmlValue(end(l.t))}${pairs(l.attrs)} ]`)
        .join('\n');
      return `graph [\n${nodes}\n${edges}\n]\n`;
    }
    case 'csv': {
      const names = [...new Set(d.links.flatMap((l) => l.attrs.map(([k]) => k)))].filter(
        (k) => k !== 'source' && k !== 'target',
      );
      const rows = d.links.map((l) =>
        [end(l.s), end(l.t), ...names.map((k) => l.attrs.find(([a]) => a === k)?.[1] ?? '')].map(csvCell).join(','),
      );
      return `${['source', 'target', ...names].map(csvCell).join(',')}\n${rows.join('\n')}\n`;
    }
    default: {
      const design = {
        nodes: d.nodes.map((n) => ({
          id: n.id,
          ...Object.fromEntries(
            n.attrs
              .filter(([k]) => k === 'label' || k === 'kind' || k === 'hardened')
              .map(([k, v]) => [k, typedValue(v)]),
          ),
        })),
        links: d.links.map((l) => ({
          between: [end(l.s), end(l.t)],
          ...Object.fromEntries(
            l.attrs
              .filter(([k]) => NATIVE_LINK[k])
              .map(([k, v]) => [NATIVE_LINK[k], k === 'risk_groups' ? v.split(';') : typedValue(v)]),
          ),
        })),
      };
      return format === 'json' ? JSON.stringify(design, null, 1) : yamlStringify(design);
    }
  }
}

function inputs(format: Format, seeds: SeedFile[]): fc.Arbitrary<string> {
  const token = fc.constantFrom(...TOKENS[format]);
  const piece = fc.oneof(token, fc.string({ unit: 'binary', maxLength: 6 }), fc.constantFrom('\n', ' ', '\t'));
  const frac = fc.double({ min: 0, max: 1, noNaN: true });
  const edit: fc.Arbitrary<Edit> = fc.oneof(
    { weight: 4, arbitrary: fc.record({ op: fc.constant('insert' as const), at: frac, s: piece }) },
    {
      weight: 2,
      arbitrary: fc.record({ op: fc.constant('delete' as const), at: frac, len: fc.integer({ min: 1, max: 80 }) }),
    },
    { weight: 3, arbitrary: fc.record({ op: fc.constant('replace' as const), at: frac, s: piece }) },
    { weight: 1, arbitrary: fc.record({ op: fc.constant('dupLine' as const), at: frac }) },
    { weight: 1, arbitrary: fc.record({ op: fc.constant('dropLine' as const), at: frac }) },
    { weight: 1, arbitrary: fc.record({ op: fc.constant('swapLines' as const), at: frac, to: frac }) },
    { weight: 1, arbitrary: fc.record({ op: fc.constant('truncate' as const), at: frac }) },
  );
  const mutated = fc
    .record({
      seed: fc.integer({ min: 0, max: seeds.length - 1 }),
      edits: fc.array(edit, { minLength: 1, maxLength: 3 }),
    })
    .map(({ seed, edits }) => edits.reduce(applyEdit, seeds[seed].text));
  const soup = fc.array(piece, { maxLength: 60 }).map((p) => p.join(''));
  const random = fc.string({ unit: 'binary', maxLength: 300 });
  const written = drawn.map((d) => writeDrawn(d, format));
  return fc.oneof(
    { weight: 5, arbitrary: mutated },
    { weight: 3, arbitrary: written },
    { weight: 2, arbitrary: soup },
    { weight: 1, arbitrary: random },
  );
}

/** What a parsed design must satisfy, whatever the input was. */
function topologyProblems(t: Topology, text: string): string[] {
  const problems: string[] = [];
  const lines = Math.max(1, lineCount(text));
  const ids = new Set<string>();
  for (const n of t.nodes) {
    if (ids.has(n.id)) problems.push(`duplicate node id ${JSON.stringify(n.id)}`);
    ids.add(n.id);
    if (!(n.pos.line >= 1 && n.pos.line <= lines + 1)) problems.push(`node ${n.id} at line ${n.pos.line}`);
    for (const v of [n.lat, n.lon])
      if (v !== undefined && !Number.isFinite(v)) problems.push(`node ${n.id} coordinate ${v}`);
  }
  const linkIds = new Set<string>();
  for (const l of t.links) {
    if (!ids.has(l.source) || !ids.has(l.target)) problems.push(`link ${l.id} has an unknown end`);
    if (l.source === l.target) problems.push(`self-loop ${l.id} kept`);
    if (linkIds.has(l.id)) problems.push(`duplicate link id ${JSON.stringify(l.id)}`);
    linkIds.add(l.id);
    if (!(l.pos.line >= 1 && l.pos.line <= lines + 1)) problems.push(`link ${l.id} at line ${l.pos.line}`);
    for (const [k, v] of Object.entries({
      length: l.length,
      latency: l.latency,
      capacity: l.capacity,
      weight: l.weight,
    })) {
      if (v !== undefined && !(Number.isFinite(v) && v >= 0)) problems.push(`link ${l.id} ${k} = ${v}`);
    }
  }
  return problems;
}

/** Output bounded by input: a parsed design is never much larger than its text. */
function sizeProblem(t: Topology, text: string): string | undefined {
  const size = JSON.stringify(t).length;
  const bound = 64 * text.length + 65_536;
  return size > bound ? `a ${text.length}-character input became ${size} characters of design` : undefined;
}

function fuzzFormat(format: Format): Tally {
  const seeds = seedsFor(format);
  const tally = new Tally();
  fc.assert(
    fc.property(inputs(format, seeds), (text) => {
      const o = attempt(() => parseDesign(text, FILE[format]));
      tally.add(o);
      expect(o.ms, 'parse time (hang guard)').toBeLessThan(HANG_MS);
      if (o.ok) {
        expect(topologyProblems(o.value, text)).toEqual([]);
        expect(sizeProblem(o.value, text)).toBeUndefined();
        // What parses must compile: the gate's next step may not throw either.
        const g = compileTopology(o.value);
        expect(g.n).toBe(o.value.nodes.length);
      } else {
        expect(locationProblems(o.error, text, [FILE[format]]), o.error.format()).toEqual([]);
      }
    }),
    { seed: SEED, numRuns: RUNS[format] },
  );
  return tally;
}

describe('fuzzing the design readers (seeded)', () => {
  for (const format of Object.keys(RUNS) as Format[]) {
    it(`${format}: a parsed design or a located error, for ${RUNS[format]} random and mutated inputs`, () => {
      const tally = fuzzFormat(format);
      reportCount('fuzz', format, tally.cases, tally.summary());
      expect(tally.cases).toBe(RUNS[format]);
      // The mutations must reach both outcomes, or the fuzzing says nothing.
      expect(tally.parsed).toBeGreaterThan(0);
      expect(tally.refused).toBeGreaterThan(0);
    });
  }
});
