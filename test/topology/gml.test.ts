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
    expect(t.links[0]).toMatchObject({ id: '1\u20142', length: 24, latency: 0.15, attrs: { LinkLabel: '100G' }, pos: { line: 29, column: 3 } });
    expect(t.links.map((l) => l.key)).toEqual(['1\u20142', '2\u20143', '3\u20144', '3\u20144#2', '1\u20144']);
    expect(t.links[3].id).toBe('3\u20144#2');
    expect(t.warnings).toEqual([expect.objectContaining({ line: 56, message: 'self-loop on node "2" dropped' })]);
  });

  it('keeps the file\'s edge id, string ids, entities and nested lists', () => {
    const t = parseDesign(
      'graph [\n  node [ id "a" label "A &amp; B" graphics [ x 1.5 y 2 ] ]\n  node [ id "b" ]\n  edge [ id "e7" source "a" target "b" LinkSpeed "10" ]\n]\n',
      'x.gml',
    );
    expect(t.nodes[0]).toMatchObject({ id: 'a', label: 'A & B', attrs: { graphics: { x: 1.5, y: 2 } } });
    expect(t.links[0]).toMatchObject({ id: 'e7', attrs: { LinkSpeed: '10' } });
  });

  it('reads a directed graph as undirected, with a warning', () => {
    const t = parseDesign('graph [\n  directed 1\n  node [ id 1 ]\n  node [ id 2 ]\n  edge [ source 2 target 1 ]\n]\n', 'd.gml');
    expect(t.links).toHaveLength(1);
    expect(t.warnings[0]).toMatchObject({ line: 2, column: 3, message: 'the graph is directed ("directed 1"); links are read as undirected' });
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
    expect(caught(gml('graph [ node [ id 1 ] ]\n]\n')).format()).toBe('wan.gml:2:1: unexpected "]" with no open "[" — remove it, or add the "[" it closes');
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
    expect(caught(gml('graph [\n  label "oops\n]\n')).format()).toMatch(/^wan\.gml:2:9: unterminated string for key "label"/);
    expect(caught(gml('graph [\n  weight @\n]\n')).format()).toMatch(/^wan\.gml:2:10: value of "weight" is not a number/);
    expect(caught(gml('Creator "me"\n')).message).toBe('no "graph [ ... ]" list in this file');
  });

  it('a non-numeric length is refused where it is written', () => {
    const e = caught(gml('graph [\n  node [ id 1 ]\n  node [ id 2 ]\n  edge [ source 1 target 2\n    length "far" ]\n]\n'));
    expect(e.format()).toBe('wan.gml:5:5: link length must be a number, not "far" — write a plain decimal number');
  });
});
