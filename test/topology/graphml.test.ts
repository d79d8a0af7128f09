import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../src/topology/parse.js';
import { caught, fixture } from './helpers.js';

const HEAD = '<?xml version="1.0"?>\n<graphml xmlns="http://graphml.graphdrawing.org/xmlns">\n';
const graphml = (text: string) => () => parseDesign(text, 'wan.graphml');

/** The classic entity-expansion document: ten levels, each ten times the one below (10^9 "lol"s). */
function billionLaughs(): string {
  const decl = ['<!ENTITY lol0 "lol">'];
  for (let k = 1; k <= 9; k++) decl.push(`<!ENTITY lol${k} "${`&lol${k - 1};`.repeat(10)}">`);
  return `<?xml version="1.0"?>\n<!DOCTYPE graphml [\n${decl.join('\n')}\n]>\n<graphml><graph><node id="&lol9;"/></graph></graphml>\n`;
}

describe('GraphML', () => {
  it('reads the ring fixture: keys by attr.name, defaults, entities, parallel links, self-loop dropped', () => {
    const t = parseDesign(fixture('ring.graphml'), 'ring.graphml');
    expect(t.format).toBe('graphml');
    expect(t.name).toBe('ring');
    expect(t.nodes.map((n) => n.id)).toEqual(['north', 'east', 'south', 'west']);
    expect(t.nodes[0]).toMatchObject({ label: 'North & harbour', lat: 47.1, lon: 8.3, pos: { line: 13, column: 5 } });
    expect(t.links.map((l) => [l.id, l.length, l.weight])).toEqual([
      ['ne', 24, 1],
      ['east\u2014south', 19.5, 2],
      ['south\u2014west', 28, 1],
      ['south\u2014west#2', 31, 1],
      ['west\u2014north', 22, 1],
    ]);
    expect(t.links[0].latency).toBe(0.15); // attr.name "LinkLatency"
    expect(t.links[2].pos).toEqual({ line: 19, column: 5 });
    expect(t.warnings).toEqual([
      expect.objectContaining({ line: 22, column: 5, message: 'self-loop on node "east" dropped' }),
    ]);
  });

  it('reads the zoo\'s layout: edge id from a data key named "id", LinkSpeedRaw as capacity in Gbit/s', () => {
    const t = parseDesign(
      `${HEAD}  <key attr.name="id" attr.type="string" for="edge" id="d1"/>\n  <key attr.name="LinkSpeedRaw" attr.type="double" for="edge" id="d2"/>\n` +
        '  <graph edgedefault="undirected">\n    <node id="0"/><node id="1"/>\n' +
        '    <edge source="0" target="1"><data key="d1">e5</data><data key="d2">2500000000.0</data></edge>\n  </graph>\n</graphml>\n',
      'z.graphml',
    );
    expect(t.links[0]).toMatchObject({ id: 'e5', capacity: 2.5, attrs: { LinkSpeedRaw: 2.5e9 } });
  });

  it('reads a directed graph as undirected: reverse arcs are one link, with one warning', () => {
    const t = parseDesign(
      `${HEAD}  <graph edgedefault="directed">\n    <node id="a"/><node id="b"/>\n    <edge source="a" target="b"/>\n    <edge source="b" target="a"/>\n  </graph>\n</graphml>\n`,
      'd.graphml',
    );
    expect(t.links.map((l) => l.key)).toEqual(['a\u2014b']);
    expect(t.warnings).toEqual([
      expect.objectContaining({
        line: 3,
        column: 3,
        message:
          'the graph is directed (edgedefault="directed"); direction is ignored and links are read as undirected: 1 pair of reverse arcs (u \u2192 v and v \u2192 u) merged into one link each',
      }),
    ]);
  });

  it('ignores drawing markup inside <data> and an external DTD reference (never fetched)', () => {
    const t = parseDesign(
      '<?xml version="1.0"?>\n<!DOCTYPE graphml SYSTEM "graphml.dtd">\n<graphml><key id="g" for="node" yfiles.type="nodegraphics"/>' +
        '<graph><node id="a"><data key="g"><y:ShapeNode><y:Geometry x="1"/></y:ShapeNode></data></node></graph></graphml>\n',
      'y.graphml',
    );
    expect(t.nodes).toHaveLength(1);
  });

  it('edge to a missing node', () => {
    const e = caught(
      graphml(
        `${HEAD}  <graph>\n    <node id="a"/>\n    <edge id="e1" source="a" target="b"/>\n  </graph>\n</graphml>\n`,
      ),
    );
    expect(e.format()).toBe(
      'wan.graphml:5:5: edge "e1" refers to unknown node "b" — declare the node first, or fix the id',
    );
  });

  it('malformed XML', () => {
    const e = caught(graphml(`${HEAD}  <graph>\n    <node id="a">\n  </graph>\n</graphml>\n`));
    expect(e.name).toBe('DesignError');
    expect(e.format()).toBe(
      'wan.graphml:5:11: malformed XML: unexpected close tag — the file is not well-formed XML; check the tag at this point',
    );
  });

  it('a truncated file and an undefined entity are malformed XML too', () => {
    expect(caught(graphml(`${HEAD}<graph><node id="a"`)).message).toBe('malformed XML: unclosed tag: graph');
    expect(caught(graphml(`${HEAD}<graph><node id="&foo;"/></graph></graphml>`)).message).toBe(
      'malformed XML: undefined entity',
    );
  });

  it('billion laughs is refused at the DOCTYPE, fast and without growing memory', () => {
    const before = process.memoryUsage().heapUsed;
    const started = performance.now();
    const e = caught(graphml(billionLaughs()));
    const elapsed = performance.now() - started;
    const grown = process.memoryUsage().heapUsed - before;
    expect(e.format()).toBe(
      'wan.graphml:2:1: the XML declares entities in a DOCTYPE, which netbrace refuses — entity declarations can expand without bound ("billion laughs"); GraphML needs none — remove the DOCTYPE',
    );
    // Expanded, the document would be 3 GB; refusing it must cost next to nothing.
    // Generous bounds (shared machines): these catch expansion, not slowness.
    expect(elapsed).toBeLessThan(2000);
    expect(grown).toBeLessThan(64 * 1024 * 1024);
  });

  it('an external entity is refused the same way (nothing is fetched or read)', () => {
    const e = caught(
      graphml(
        '<?xml version="1.0"?>\n<!DOCTYPE g [<!ENTITY x SYSTEM "file:///etc/passwd">]>\n<graphml><graph><node id="&x;"/></graph></graphml>\n',
      ),
    );
    expect([e.line, e.message]).toEqual([2, 'the XML declares entities in a DOCTYPE, which netbrace refuses']);
  });

  it('missing ids and ends are located', () => {
    expect(caught(graphml(`${HEAD}<graph>\n<node/>\n</graph></graphml>`)).format()).toBe(
      'wan.graphml:4:1: <node> without an "id" — every GraphML node needs id="..."',
    );
    expect(caught(graphml(`${HEAD}<graph><node id="a"/>\n<edge source="a"/>\n</graph></graphml>`)).message).toBe(
      '<edge> without a "target"',
    );
    expect(caught(graphml('<?xml version="1.0"?>\n<graph/>\n')).message).toBe('no <graphml> element in this file');
  });

  it('a non-numeric length is refused at its <data>', () => {
    const e = caught(
      graphml(
        `${HEAD}<key id="l" for="edge" attr.name="length"/>\n<graph><node id="a"/><node id="b"/>\n<edge source="a" target="b">\n  <data key="l">far</data></edge></graph></graphml>`,
      ),
    );
    expect(e.format()).toBe('wan.graphml:6:3: link length must be a number, not "far" — write a plain decimal number');
  });
});
