// Ids are strings exactly as written, in every format. A reader that converts number-like ids
// makes different elements collide: YAML reads 0x10 as 16 and 007 as 7, and a 20-digit number
// loses its last digits in a double (2^53 ≈ 9.0e15 is the last integer every double holds).
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../src/topology/parse.js';

const NUMBER_LIKE = ['0x10', '16', '007', '7', '1e3', '1000', '12345678901234567890', '12345678901234567891'];

describe('number-like ids stay as written', () => {
  it('the 20-digit ids really do collide as numbers (why the readers keep text)', () => {
    expect(Number('12345678901234567890')).toBe(Number('12345678901234567891'));
    expect([Number('0x10'), Number('1e3'), Number('007')]).toEqual([16, 1000, 7]);
  });

  it('YAML: node, link, link end, risk group and demand ids, plain or quoted', () => {
    const text = [
      'nodes:',
      ...NUMBER_LIKE.map((id) => `  - id: ${id}`),
      'risk_groups:',
      '  - id: 0x10',
      '  - id: 16',
      'links:',
      '  - id: 007',
      '    between: [0x10, 16]',
      '    risk_groups: [0x10, 16]',
      '  - id: 7',
      '    between: [12345678901234567890, 12345678901234567891]',
      '  - between: ["1e3", 1000]',
      'demands:',
      '  - between: [007, 7]',
      '    volume: 1',
      '',
    ].join('\n');
    const t = parseDesign(text, 'ids.net.yaml');
    expect(t.nodes.map((n) => n.id)).toEqual(NUMBER_LIKE);
    expect(t.riskGroups.map((g) => g.id)).toEqual(['0x10', '16']);
    expect(t.links.map((l) => [l.id, l.source, l.target])).toEqual([
      ['007', '0x10', '16'],
      ['7', '12345678901234567890', '12345678901234567891'],
      ['1e3\u20141000', '1e3', '1000'],
    ]);
    expect(t.links[0].riskGroups).toEqual(['0x10', '16']);
    expect(t.demands.map((d) => [d.source, d.target])).toEqual([['007', '7']]);
  });

  it('YAML: an id still must be text or a whole number (a fraction is refused)', () => {
    expect(() => parseDesign('nodes:\n  - id: 1.5\n', 'f.net.yaml')).toThrow(
      'nodes[0].id must be an id (text or a whole number), not number 1.5',
    );
  });

  it('JSON: 20-digit and exponent ids keep their digits', () => {
    const t = parseDesign(
      '{"nodes": [{"id": 12345678901234567890}, {"id": 12345678901234567891}, {"id": 1e3}, {"id": 1000}],\n' +
        ' "links": [{"between": [12345678901234567890, 12345678901234567891]}, {"between": [1e3, 1000]}]}\n',
      'ids.net.json',
    );
    expect(t.nodes.map((n) => n.id)).toEqual(['12345678901234567890', '12345678901234567891', '1e3', '1000']);
    expect(t.links.map((l) => l.key)).toEqual(['12345678901234567890\u201412345678901234567891', '1000\u20141e3']);
  });

  it('GML: integer ids keep their text (007 and 7, 1e3 and 1000 are different nodes), ends too', () => {
    const ids = ['007', '7', '1e3', '1000', '12345678901234567890', '12345678901234567891'];
    const text =
      `graph [\n${ids.map((id) => `  node [ id ${id} ]`).join('\n')}\n  node [ id "0x10" ]\n  node [ id 16 ]\n` +
      '  edge [ source 007 target 7 ]\n  edge [ source 12345678901234567890 target 12345678901234567891 ]\n  edge [ source "0x10" target 16 id 0010 ]\n]\n';
    const t = parseDesign(text, 'ids.gml');
    expect(t.nodes.map((n) => n.id)).toEqual([...ids, '0x10', '16']);
    expect(t.links.map((l) => [l.id, l.source, l.target])).toEqual([
      ['007\u20147', '007', '7'],
      ['12345678901234567890\u201412345678901234567891', '12345678901234567890', '12345678901234567891'],
      ['0010', '0x10', '16'],
    ]);
  });

  it('GraphML: ids are attribute text; an edge id and risk groups from typed <data> keep their text', () => {
    const text =
      '<?xml version="1.0"?>\n<graphml>\n<key id="i" for="edge" attr.name="id" attr.type="int"/><key id="g" for="edge" attr.name="srlg" attr.type="int"/>\n<graph>\n' +
      '<node id="0x10"/><node id="16"/><node id="007"/><node id="7"/>\n' +
      '<edge source="0x10" target="16"><data key="i">007</data><data key="g">0042</data></edge>\n<edge source="007" target="7"/>\n</graph>\n</graphml>\n';
    const t = parseDesign(text, 'ids.graphml');
    expect(t.nodes.map((n) => n.id)).toEqual(['0x10', '16', '007', '7']);
    expect(t.links.map((l) => [l.id, l.riskGroups])).toEqual([
      ['007', ['0042']],
      ['007\u20147', []],
    ]);
  });

  it('CSV: cell text is the id', () => {
    const t = parseDesign('source,target,risk_groups\n0x10,16,007\n007,7,7\n', 'ids.csv');
    expect(t.nodes.map((n) => n.id)).toEqual(['0x10', '16', '007', '7']);
    expect(t.links.map((l) => l.riskGroups)).toEqual([['007'], ['7']]);
  });
});
