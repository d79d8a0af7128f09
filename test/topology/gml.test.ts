import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../src/topology/parse.js';
import { caught, fixture } from './helpers.js';

const gml = (text: string) => () => parseDesign(text, 'wan.gml');

describe('GML', () => {
  it('reads the ring fixture: ids as strings, labels, coordinates, parallel links, self-loop dropped', () => {
    const t = parseDesign(fixture('ring.gml'), 'ring.gml');
    expect(t.format).toBe('gml');
    expect(t.name).toBe('Lakeside regional ring');
    expect(t.nodes.map((n) => [n.id, n.label])).toEqual([
      ['1', 'north'],
      ['2', 'east'],
      ['3', 'south'],
      ['4', 'west'],
    ]);
    expect(t.nodes[0]).toMatchObject({ lat: 47.1, lon: 8.3, pos: { line: 4, column: 3 } });
    expect(t.nodes[2].kind).toBe('datacentre');
    expect(t.links).toHaveLength(5);
    expect(t.links[0]).toMatchObject({
      id: '1\u20142',
      length: 24,
      latency: 0.15,
      attrs: { LinkLabel: '100G' },
      pos: { line: 29, column: 3 },
    });
    expect(t.links.map((l) => l.key)).toEqual(['1\u20142', '2\u20143', '3\u20144', '3\u20144#2', '1\u20144']);
    expect(t.links[3].id).toBe('3\u20144#2');
    expect(t.warnings).toEqual([expect.objectContaining({ line: 56, message: 'self-loop on node "2" dropped' })]);
  });

  it("keeps the file's edge id, string ids, entities and nested lists", () => {
    const t = parseDesign(
      'graph [\n  node [ id "a" label "A &amp; B" graphics [ x 1.5 y 2 ] ]\n  node [ id "b" ]\n  edge [ id "e7" source "a" target "b" LinkSpeed "10" ]\n]\n',
      'x.gml',
    );
    expect(t.nodes[0]).toMatchObject({ id: 'a', label: 'A & B', attrs: { graphics: { x: 1.5, y: 2 } } });
    expect(t.links[0]).toMatchObject({ id: 'e7', attrs: { LinkSpeed: '10' } });
  });

  it('reads a directed graph as undirected, with a warning', () => {
    const t = parseDesign(
      'graph [\n  directed 1\n  node [ id 1 ]\n  node [ id 2 ]\n  edge [ source 2 target 1 ]\n]\n',
      'd.gml',
    );
    expect(t.links).toHaveLength(1);
    expect(t.warnings[0]).toMatchObject({
      line: 2,
      column: 3,
      message: 'the graph is directed ("directed 1"); direction is ignored and links are read as undirected',
    });
  });

  it('skips # comments', () => {
    const t = parseDesign('# made by hand\ngraph [ # the graph\n node [ id 1 ]\n]\n', 'c.gml');
    expect(t.nodes).toHaveLength(1);
  });

  it('unclosed bracket points at the "[" that is never closed', () => {
    const e = caught(gml('graph [\n  node [ id 1 ]\n  node [\n    id 2\n  edge [ source 1 target 2 ]\n]\n'));
    expect(e.format()).toBe(
      'wan.gml:1:7: unclosed "[": the list is never closed with "]" — add the missing "]" (check the brackets above the end of the file)',
    );
  });

  it('a stray "]"', () => {
    expect(caught(gml('graph [ node [ id 1 ] ]\n]\n')).format()).toBe(
      'wan.gml:2:1: unexpected "]" with no open "[" — remove it, or add the "[" it closes',
    );
  });

  it('edge to a missing node', () => {
    const e = caught(gml('graph [\n  node [ id 1 ]\n  node [ id 2 ]\n  edge [\n    source 1\n    target 3\n  ]\n]\n'));
    expect(e.format()).toBe('wan.gml:6:5: edge refers to unknown node "3" — declare the node first, or fix the id');
  });

  it('edge without a target', () => {
    expect(caught(gml('graph [\n  node [ id 1 ]\n  edge [ source 1 ]\n]\n')).format()).toBe(
      'wan.gml:3:3: edge without "target" — every GML edge needs `source N target M`',
    );
  });

  it('duplicate node id', () => {
    expect(caught(gml('graph [\n  node [ id 1 ]\n  node [ id 1 ]\n]\n')).format()).toBe(
      'wan.gml:3:3: duplicate node id "1" — first defined on line 2; node ids must be unique',
    );
  });

  it('node without id, unterminated string, bad value, no graph', () => {
    expect(caught(gml('graph [\n  node [ label "x" ]\n]\n')).message).toBe('node without "id"');
    expect(caught(gml('graph [\n  label "oops\n]\n')).format()).toMatch(
      /^wan\.gml:2:9: unterminated string for key "label"/,
    );
    expect(caught(gml('graph [\n  weight @\n]\n')).format()).toMatch(
      /^wan\.gml:2:10: value of "weight" is not a number/,
    );
    expect(caught(gml('Creator "me"\n')).message).toBe('no "graph [ ... ]" list in this file');
  });

  it('a non-numeric length is refused where it is written', () => {
    const e = caught(
      gml('graph [\n  node [ id 1 ]\n  node [ id 2 ]\n  edge [ source 1 target 2\n    length "far" ]\n]\n'),
    );
    expect(e.format()).toBe('wan.gml:5:5: link length must be a number, not "far" — write a plain decimal number');
  });

  it('a second top-level graph is refused where it begins (not silently left out)', () => {
    expect(caught(gml('graph [\n  node [ id 1 ]\n]\ngraph [\n  node [ id 2 ]\n]\n')).format()).toBe(
      'wan.gml:4:1: a second top-level graph (the first begins on line 1) — netbrace reads one design per file: put each graph in a file of its own',
    );
  });

  it('a nested graph is refused where it begins, in the graph or inside a node', () => {
    const msg =
      'a nested graph: netbrace reads one flat graph per file — list its nodes and edges in the top-level graph (node ids must stay unique)';
    expect(caught(gml('graph [\n  node [ id 1 ]\n  graph [\n    node [ id 2 ]\n  ]\n]\n')).format()).toBe(
      `wan.gml:3:3: ${msg}`,
    );
    expect(caught(gml('graph [\n  node [\n    id 1\n    graph [ node [ id 2 ] ]\n  ]\n]\n')).format()).toBe(
      `wan.gml:4:5: ${msg}`,
    );
    // A key that merely says "graph" in a drawing block is a value, not a graph.
    expect(parseDesign('graph [\n  node [ id 1 graphics [ graph "x" ] ]\n]\n', 'g.gml').nodes).toHaveLength(1);
  });

  it('a key netbrace reads, written twice on a node or an edge, is refused with both lines', () => {
    expect(caught(gml('graph [\n  node [\n    id 1\n    id 2\n  ]\n]\n')).format()).toBe(
      'wan.gml:4:5: the node on line 2 has "id" twice (lines 3 and 4) — keep one; the first is on line 3',
    );
    expect(caught(gml('graph [\n  node [ id 1 label "a"\n    label "b" ]\n]\n')).format()).toBe(
      'wan.gml:3:5: the node on line 2 has "label" twice (lines 2 and 3) — keep one; the first is on line 2',
    );
    const two = 'graph [\n  node [ id 1 ]\n  node [ id 2 ]\n  node [ id 3 ]\n';
    expect(caught(gml(`${two}  edge [ source 1 target 2\n    target 3 ]\n]\n`)).format()).toBe(
      'wan.gml:6:5: the edge on line 5 has "target" twice (lines 5 and 6) — keep one; the first is on line 5',
    );
    expect(caught(gml(`${two}  edge [\n    source 1\n    source 3\n    target 2 ]\n]\n`)).message).toBe(
      'the edge on line 5 has "source" twice (lines 6 and 7)',
    );
    expect(caught(gml(`${two}  edge [ source 1 target 2 length 3\n    length 4 ]\n]\n`)).message).toBe(
      'the edge on line 5 has "length" twice (lines 5 and 6)',
    );
  });

  it('other repeated keys are all kept, as a list', () => {
    const t = parseDesign('graph [\n  node [ id 1 note "a" note "b" note "c" ]\n]\n', 'r.gml');
    expect(t.nodes[0].attrs).toEqual({ note: ['a', 'b', 'c'] });
  });
});
