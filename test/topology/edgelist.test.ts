import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../src/topology/parse.js';
import { csvHasEdgeHeader } from '../../src/topology/edgelist.js';
import { caught, fixture } from './helpers.js';

const csv = (text: string) => () => parseDesign(text, 'links.csv');

describe('CSV edge list', () => {
  it('reads the ring fixture: nodes in order of first appearance, optional columns, parallel links', () => {
    const t = parseDesign(fixture('ring.csv'), 'ring.csv');
    expect(t.format).toBe('csv');
    expect(t.nodes.map((n) => [n.id, n.pos.line, n.pos.column])).toEqual([
      ['north', 2, 1],
      ['east', 2, 7],
      ['south', 3, 6],
      ['west', 4, 7],
    ]);
    expect(t.links.map((l) => [l.id, l.key, l.length, l.pos.line])).toEqual([
      ['north\u2014east', 'east\u2014north', 24, 2],
      ['east\u2014south', 'east\u2014south', 19.5, 3],
      ['south-west-1', 'south\u2014west', 28, 4],
      ['south-west-2', 'south\u2014west#2', 31, 5],
      ['west\u2014north', 'north\u2014west', 22, 6],
    ]);
    expect(t.links[0]).toMatchObject({ latency: 0.15, capacity: 100, riskGroups: ['duct-lake-road', 'duct-bridge'] });
    expect(t.links[1].latency).toBeUndefined(); // an empty cell is "unknown"
    expect(t.warnings).toEqual([expect.objectContaining({ line: 7, message: 'self-loop on node "east" dropped' })]);
  });

  it('RFC 4180 quoting: commas, doubled quotes and line breaks inside quotes; CRLF line ends', () => {
    const t = parseDesign('source,target,note\r\n"a, x","b","say ""hi""\nthere"\r\nb,c,\r\n', 'q.csv');
    expect(t.nodes.map((n) => n.id)).toEqual(['a, x', 'b', 'c']);
    expect(t.links[0].attrs).toEqual({ note: 'say "hi"\nthere' });
    expect(t.links[1].pos.line).toBe(4);
  });

  it('missing column', () => {
    const e = caught(csv('source,target,length\na,b,3\nb,c\n'));
    expect(e.format()).toBe(
      'links.csv:3:4: row has 2 of the header\'s 3 columns (missing "length") — add the missing values (an empty value is written as nothing between two commas)',
    );
  });

  it('header without a target column', () => {
    expect(caught(csv('source,dest\na,b\n')).format()).toBe(
      'links.csv:1:1: the CSV header has no "target" column — the first line must name the columns, e.g. source,target,length',
    );
  });

  it('too many columns, unterminated quotes, stray quotes, empty ends, bad numbers', () => {
    expect(caught(csv('source,target\na,b,c\n')).format()).toBe(
      'links.csv:2:5: row has 3 columns but the header has 2 — quote values that contain commas',
    );
    expect(caught(csv('source,target\n"a,b\n')).message).toBe('unterminated quoted field');
    expect(caught(csv('source,target\na"x,b\n')).message).toBe('a double quote inside an unquoted field');
    expect(caught(csv('source,target\na,\n')).format()).toBe(
      'links.csv:2:3: empty target — every row needs both link ends',
    );
    expect(caught(csv('source,target,latency\na,b,slow\n')).format()).toBe(
      'links.csv:2:5: link latency must be a number, not "slow" — write a plain decimal number',
    );
    expect(caught(csv('source,target,length\na,b,-1\n')).message).toBe('link length must not be negative (-1)');
    expect(caught(csv('source,target,source\na,b,c\n')).message).toBe('column "source" appears twice in the header');
    expect(caught(csv('')).message).toBe('the CSV file is empty');
  });
});

describe('is it an edge list? (the header decides)', () => {
  it('a header with source and target columns, in any case, order or quoting', () => {
    expect(csvHasEdgeHeader(fixture('ring.csv'))).toBe(true);
    expect(csvHasEdgeHeader('\ufeff"Target",id,SOURCE\r\nb,1,a\r\n')).toBe(true);
    expect(csvHasEdgeHeader('\n\nsource,target\n')).toBe(true);
  });

  it('anything else is not: other columns, one of the two, an empty file, a broken first line', () => {
    for (const text of ['item,quantity\nducts,4\n', 'source,length\n', '', '"source,target\n', 'from,to\na,b\n'])
      expect(csvHasEdgeHeader(text), text).toBe(false);
  });
});
