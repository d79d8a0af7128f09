import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../src/topology/parse.js';
import { compileTopology } from '../../src/graph/compact.js';
import { caught, fixture, repoRoot } from './helpers.js';

const yaml = (text: string) => () => parseDesign(text, 'net/core.net.yaml');
const twoNodes = 'nodes:\n  - id: a\n  - id: b\n';

describe('our design format (YAML)', () => {
  it('reads every field of the ring fixture with its source line', () => {
    const t = parseDesign(fixture('ring.net.yaml'), 'ring.net.yaml');
    expect(t.format).toBe('native-yaml');
    expect(t.name).toBe('Lakeside regional ring');
    expect(t.description).toBe('Invented example for tests and docs.');
    expect(t.nodes.map((n) => n.id)).toEqual(['north', 'east', 'south', 'west']);
    expect(t.nodes[0]).toMatchObject({
      kind: 'pop',
      lat: 47.1,
      lon: 8.3,
      hardened: false,
      pos: { line: 6, column: 5 },
    });
    expect(t.nodes[2].hardened).toBe(true);
    expect(t.nodes[3].label).toBe('West exchange');
    expect(t.links).toHaveLength(5);
    expect(t.links[0]).toMatchObject({
      id: 'north\u2014east',
      key: 'east\u2014north',
      length: 24,
      latency: 0.15,
      capacity: 100,
      riskGroups: ['duct-lake-road'],
      pos: { line: 21, column: 5 },
    });
    // Parallel links are kept, each with its own id and stable key.
    expect(t.links[2]).toMatchObject({ id: 'south-west-1', key: 'south\u2014west' });
    expect(t.links[3]).toMatchObject({ id: 'south-west-2', key: 'south\u2014west#2', hardened: true });
    expect(t.riskGroups).toEqual([
      { id: 'duct-lake-road', description: 'Shared duct along the lake road', pos: { line: 39, column: 5 } },
    ]);
    expect(t.demands).toEqual([{ source: 'north', target: 'south', volume: 40, pos: { line: 42, column: 5 } }]);
    expect(t.latencyBudget).toBe(1.5);
    expect(t.metadata).toEqual({ owner: 'planning team' });
    expect(t.warnings).toEqual([]);
    const g = compileTopology(t);
    expect([g.n, g.m, g.groupIds.length]).toEqual([4, 5, 1]);
  });

  it('reads the JSON copy of the ring into the same design', () => {
    const y = parseDesign(fixture('ring.net.yaml'), 'ring.net.yaml');
    const j = parseDesign(fixture('ring.net.json'), 'ring.net.json');
    expect(j.format).toBe('native-json');
    const strip = (t: typeof y) => ({
      nodes: t.nodes.map(({ pos: _p, ...rest }) => rest),
      links: t.links.map(({ pos: _p, ...rest }) => rest),
      demands: t.demands.map(({ pos: _p, ...rest }) => rest),
      name: t.name,
      latencyBudget: t.latencyBudget,
    });
    expect(strip(j)).toEqual(strip(y));
    // Positions work for JSON too: the second node object starts on line 15.
    expect(j.nodes[1].pos.line).toBe(15);
  });

  it('accepts whole-number ids and stores them as text', () => {
    const t = parseDesign('nodes: [{id: 1}, {id: 2}]\nlinks: [{between: [1, 2]}]\n', 'n.net.yml');
    expect(t.links[0]).toMatchObject({ source: '1', target: '2', id: '1\u20142' });
  });

  it('drops a self-loop with a located warning', () => {
    const t = parseDesign(`${twoNodes}links:\n  - between: [a, b]\n  - between: [b, b]\n`, 'x.net.yaml');
    expect(t.links).toHaveLength(1);
    expect(t.warnings).toEqual([
      expect.objectContaining({ severity: 'warning', line: 6, message: 'self-loop on node "b" dropped' }),
    ]);
  });
});

// Each bad input gets its own test: kind, exact message and position (the user fixes that line).
describe('our design format: bad input is located', () => {
  it('YAML syntax error', () => {
    const e = caught(yaml('nodes:\n  - id: a\n   - id: b\n'));
    expect(e.name).toBe('DesignError');
    expect(e.format()).toBe(
      'net/core.net.yaml:3:4: YAML syntax error: All sequence items must start at the same column — fix the syntax at this point (check indentation, colons and quotes)',
    );
  });

  it('JSON syntax error', () => {
    const e = caught(() => parseDesign('{\n  "nodes": [\n    {"id": "a"}\n    {"id": "b"}\n  ]\n}\n', 'core.net.json'));
    expect(e.message).toMatch(/^JSON syntax error: /);
    expect([e.line, e.column]).toEqual([4, 5]);
  });

  it('unknown key, with the closest allowed key suggested', () => {
    const e = caught(yaml(`${twoNodes}links:\n  - between: [a, b]\n    lenght_km: 3\n`));
    expect(e.format()).toBe('net/core.net.yaml:6:5: unknown key "lenght_km" in links[0] — did you mean "length_km"?');
  });

  it('unknown top-level key', () => {
    const e = caught(yaml('nodes: []\nlinx: []\n'));
    expect(e.format()).toBe('net/core.net.yaml:2:1: unknown key "linx" in the design — did you mean "links"?');
  });

  it('link to an unknown node points at the end that is wrong', () => {
    const e = caught(yaml(`${twoNodes}links:\n  - between: [a, bb]\n`));
    expect(e.format()).toBe('net/core.net.yaml:5:18: links[0] refers to unknown node "bb" — did you mean "b"?');
  });

  it('duplicate node id names the first definition', () => {
    const e = caught(yaml(`${twoNodes}  - id: a\n`));
    expect(e.format()).toBe(
      'net/core.net.yaml:4:5: duplicate node id "a" — first defined on line 2; node ids must be unique',
    );
  });

  it('missing link end', () => {
    const e = caught(yaml('nodes:\n  - id: a\nlinks:\n  - between: [a]\n'));
    expect(e.format()).toBe(
      'net/core.net.yaml:4:14: links[0].between needs exactly two node ids, found 1 — a link end is missing: write between: [node-a, node-b]',
    );
  });

  it('link with no ends at all', () => {
    const e = caught(yaml('nodes:\n  - id: a\nlinks:\n  - length_km: 3\n'));
    expect(e.format()).toBe(
      'net/core.net.yaml:4:5: links[0] has no ends: "between" is missing — write between: [node-a, node-b]',
    );
  });

  it('non-numeric length', () => {
    const e = caught(yaml(`${twoNodes}links:\n  - between: [a, b]\n    length_km: far\n`));
    expect(e.format()).toBe('net/core.net.yaml:6:16: links[0].length_km must be a number, not the text "far"');
  });

  it('negative latency', () => {
    const e = caught(yaml(`${twoNodes}links:\n  - between: [a, b]\n    latency_ms: -2\n`));
    expect(e.format()).toBe('net/core.net.yaml:6:17: links[0].latency_ms must not be negative (found -2)');
  });

  it('demand to an unknown node', () => {
    const e = caught(yaml(`${twoNodes}demands:\n  - between: [a, cc]\n    volume: 3\n`));
    expect(e.format()).toBe(
      'net/core.net.yaml:5:18: demands[0] refers to unknown node "cc" — declare the node first, or fix the id',
    );
  });

  it('duplicate link id', () => {
    const e = caught(yaml(`${twoNodes}links:\n  - {id: x, between: [a, b]}\n  - {id: x, between: [b, a]}\n`));
    expect(e.format()).toBe(
      'net/core.net.yaml:6:5: duplicate link id "x" — first used on line 5; link ids must be unique',
    );
  });

  it('a key given twice', () => {
    const e = caught(yaml('nodes:\n  - id: a\n    id: b\n'));
    expect([e.line, e.message]).toEqual([3, 'YAML: a key appears twice in the same mapping']);
  });

  it('empty file', () => {
    expect(caught(yaml('')).message).toBe('the YAML design is empty');
  });

  it('an alias bomb fails fast at the first alias', () => {
    // Nine levels of nine-fold aliases would expand to 9^9 ≈ 3.9e8 items.
    const levels = ['a0: &a0 [x, x, x, x, x, x, x, x, x]'];
    for (let k = 1; k < 9; k++)
      levels.push(
        `a${k}: &a${k} [${Array(9)
          .fill(`*a${k - 1}`)
          .join(', ')}]`,
      );
    const text = `metadata:\n  ${levels.join('\n  ')}\nnodes: []\n`;
    const started = performance.now();
    const e = caught(yaml(text));
    expect(performance.now() - started).toBeLessThan(5000); // a correctness bound, not a speed target
    expect(e.format()).toBe(
      'net/core.net.yaml:3:12: too many YAML aliases are expanded (this looks like an alias bomb) — netbrace expands at most 50 aliases; write the values out instead of using *aliases',
    );
  });

  it('a few ordinary aliases are fine', () => {
    const t = parseDesign('metadata:\n  base: &b {owner: ops}\n  copy: *b\nnodes: [{id: a}]\n', 'x.net.yaml');
    expect(t.metadata).toEqual({ base: { owner: 'ops' }, copy: { owner: 'ops' } });
  });
});

describe('the README example', () => {
  it('parses, with the parallel link kept', () => {
    const readme = readFileSync(`${repoRoot}/README.md`, 'utf8');
    const block = /### Our format\n```yaml\n([\s\S]*?)```/.exec(readme);
    expect(block, 'README.md has a "### Our format" yaml block').not.toBeNull();
    const t = parseDesign(block![1], 'README.net.yaml');
    expect([t.nodes.length, t.links.length, t.demands.length, t.riskGroups.length]).toEqual([3, 3, 1, 1]);
    expect(t.links.map((l) => l.id)).toEqual(['ns-1', 'north\u2014south#2', 'south\u2014west']);
  });
});

describe('attributes and weights in our format', () => {
  it("keeps a node's and a link's attributes, and reads a weight", () => {
    const t = parseDesign(
      `${twoNodes}  - id: c\n    attributes: {Country: Norway, Internal: 1}\nlinks:\n  - between: [a, c]\n    weight: 12\n    attributes: {LinkLabel: 10G, length_estimated: true}\n`,
      'a.net.yaml',
    );
    expect(t.nodes[2].attrs).toEqual({ Country: 'Norway', Internal: 1 });
    expect(t.links[0]).toMatchObject({ weight: 12, attrs: { LinkLabel: '10G', length_estimated: true } });
  });

  it('a weight out of range or an attributes list is refused at its line', () => {
    expect(caught(yaml(`${twoNodes}links:\n  - between: [a, b]\n    weight: 1e12\n`)).format()).toBe(
      'net/core.net.yaml:6:13: links[0].weight must be at most 1000000000 (found 1000000000000)',
    );
    expect(caught(yaml(`${twoNodes}    attributes: [x]\n`)).format()).toBe(
      'net/core.net.yaml:4:17: nodes[1].attributes must be a mapping (key: value), not a list',
    );
  });
});
