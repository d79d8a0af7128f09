// Directed files (GraphML edgedefault="directed" or directed="true" on an edge, GML
// "directed 1") are read as undirected designs. A link between two sites written as both of
// its arcs is one link, not two parallel ones: otherwise a ring whose every span is written
// twice has no bridge, and a chain of such spans passes as if it were redundant.
import { describe, expect, it } from 'vitest';
import { compileTopology } from '../../src/graph/compact.js';
import { findCutElements } from '../../src/graph/structure.js';
import { parseDesign } from '../../src/topology/parse.js';

const HEAD = '<?xml version="1.0"?>\n<graphml xmlns="http://graphml.graphdrawing.org/xmlns">\n';

function graphml(edgedefault: string, edges: string[], nodes = ['a', 'b', 'c']): string {
  return `${HEAD}<graph edgedefault="${edgedefault}">\n${nodes.map((n) => `<node id="${n}"/>`).join('\n')}\n${edges.join('\n')}\n</graph>\n</graphml>\n`;
}
const arc = (s: string, t: string, extra = '') => `<edge source="${s}" target="${t}"${extra}/>`;

function gml(directed: boolean, edges: [number, number][]): string {
  const nodes = [1, 2, 3].map((i) => `  node [ id ${i} ]`).join('\n');
  return `graph [\n${directed ? '  directed 1\n' : ''}${nodes}\n${edges.map(([s, t]) => `  edge [ source ${s} target ${t} ]`).join('\n')}\n]\n`;
}

const keys = (text: string, file: string) => parseDesign(text, file).links.map((l) => l.key);

describe('directed files: reverse arcs are one link', () => {
  it('GraphML: u→v with v→u is one link; u→v twice is two parallel links', () => {
    expect(keys(graphml('directed', [arc('a', 'b'), arc('b', 'a')]), 'd.graphml')).toEqual(['a\u2014b']);
    expect(keys(graphml('directed', [arc('a', 'b'), arc('a', 'b')]), 'd.graphml')).toEqual(['a\u2014b', 'a\u2014b#2']);
    // Arcs pair up in file order: as many links as arcs in the busier direction.
    expect(keys(graphml('directed', [arc('a', 'b'), arc('a', 'b'), arc('b', 'a')]), 'd.graphml')).toEqual([
      'a\u2014b',
      'a\u2014b#2',
    ]);
    expect(
      keys(graphml('directed', [arc('a', 'b'), arc('b', 'a'), arc('b', 'a'), arc('a', 'b')]), 'd.graphml'),
    ).toEqual(['a\u2014b', 'a\u2014b#2']);
  });

  it("GraphML: the edge's own directed attribute decides, over the graph default", () => {
    // In an undirected graph, two edges marked directed="true" the two ways are one link.
    expect(
      keys(graphml('undirected', [arc('a', 'b', ' directed="true"'), arc('b', 'a', ' directed="true"')]), 'd.graphml'),
    ).toEqual(['a\u2014b']);
    // Undirected edges are never merged, even in a directed graph: two of them are two links.
    expect(
      keys(graphml('directed', [arc('a', 'b', ' directed="false"'), arc('b', 'a', ' directed="false"')]), 'd.graphml'),
    ).toEqual(['a\u2014b', 'a\u2014b#2']);
    // An undirected edge and an arc: two links (only arcs pair up).
    expect(keys(graphml('directed', [arc('a', 'b', ' directed="false"'), arc('b', 'a')]), 'd.graphml')).toEqual([
      'a\u2014b',
      'a\u2014b#2',
    ]);
    // Undirected files are unchanged: a→b and b→a are two parallel links, as written.
    expect(keys(graphml('undirected', [arc('a', 'b'), arc('b', 'a')]), 'd.graphml')).toEqual([
      'a\u2014b',
      'a\u2014b#2',
    ]);
  });

  it('GML "directed 1" follows the same rule; without it, both edges stay', () => {
    expect(
      keys(
        gml(true, [
          [1, 2],
          [2, 1],
          [2, 3],
        ]),
        'd.gml',
      ),
    ).toEqual(['1\u20142', '2\u20143']);
    expect(
      keys(
        gml(true, [
          [1, 2],
          [1, 2],
        ]),
        'd.gml',
      ),
    ).toEqual(['1\u20142', '1\u20142#2']);
    expect(
      keys(
        gml(false, [
          [1, 2],
          [2, 1],
        ]),
        'd.gml',
      ),
    ).toEqual(['1\u20142', '1\u20142#2']);
  });

  it('one warning, at the declaration, says direction is ignored and how many arcs were merged', () => {
    const t = parseDesign(
      graphml('directed', [arc('a', 'b'), arc('b', 'a'), arc('b', 'c'), arc('c', 'b'), arc('a', 'c')]),
      'd.graphml',
    );
    expect(t.links).toHaveLength(3);
    expect(t.warnings).toEqual([
      expect.objectContaining({
        line: 3,
        column: 1,
        message:
          'the graph is directed (edgedefault="directed"); direction is ignored and links are read as undirected: 2 pairs of reverse arcs (u \u2192 v and v \u2192 u) merged into one link each',
      }),
    ]);
  });

  it('a ring written with both arcs of every span has the same links as the undirected ring, and its chain has bridges', () => {
    const sites = ['a', 'b', 'c', 'd'];
    const spans = sites.map((s, i) => [s, sites[(i + 1) % 4]] as const);
    const both = (list: readonly (readonly [string, string])[]) => list.flatMap(([s, t]) => [arc(s, t), arc(t, s)]);
    const ringDirected = parseDesign(graphml('directed', both(spans), sites), 'ring.graphml');
    const ringUndirected = parseDesign(
      graphml(
        'undirected',
        spans.map(([s, t]) => arc(s, t)),
        sites,
      ),
      'ring.graphml',
    );
    // Same stable keys, so base and head share their random removal orders (delta 0 for the same design).
    expect(ringDirected.links.map((l) => l.key)).toEqual(ringUndirected.links.map((l) => l.key));
    expect(findCutElements(compileTopology(ringDirected)).bridges.length).toBe(0);
    const chain = parseDesign(graphml('directed', both(spans.slice(0, 3)), sites), 'chain.graphml');
    expect(chain.links).toHaveLength(3);
    // Every span of a chain is a bridge (graph theory: a tree's edges are all bridges).
    expect(findCutElements(compileTopology(chain)).bridges.length).toBe(3);
  });

  it("reverse arcs that disagree: the first arc's values are kept, with a warning at the second", () => {
    const text =
      `${HEAD}<key id="w" for="edge" attr.name="weight" attr.type="double"/>\n<graph edgedefault="directed">\n<node id="a"/><node id="b"/>\n` +
      '<edge source="a" target="b"><data key="w">3</data></edge>\n<edge source="b" target="a"><data key="w">5</data></edge>\n</graph>\n</graphml>\n';
    const t = parseDesign(text, 'd.graphml');
    expect(t.links.map((l) => [l.key, l.weight])).toEqual([['a\u2014b', 3]]);
    expect(t.warnings[1]).toMatchObject({
      line: 7,
      message:
        "the arc b \u2192 a is merged with the reverse arc on line 6, which says otherwise (weight 3 vs 5); the first arc's values are kept",
    });
  });
});
