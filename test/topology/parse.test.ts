import { describe, expect, it } from 'vitest';
import { parseDesign, utf8Length } from '../../src/topology/parse.js';
import { detectFormat, parseFormatName } from '../../src/topology/detect.js';
import { caught, fixture } from './helpers.js';

describe('format detection', () => {
  it('maps extensions to formats, ours first', () => {
    expect(
      [
        'a.net.yaml',
        'a.net.yml',
        'A.NET.JSON',
        'b.yaml',
        'b.yml',
        'b.json',
        'c.graphml',
        'd.gml',
        'e.csv',
        'f.txt',
      ].map(detectFormat),
    ).toEqual([
      'native-yaml',
      'native-yaml',
      'native-json',
      'native-yaml',
      'native-yaml',
      'native-json',
      'graphml',
      'gml',
      'csv',
      undefined,
    ]);
  });

  it('names accepted by --format', () => {
    expect(['yaml', 'JSON', 'graphml', 'gml', 'csv', 'native'].map(parseFormatName)).toEqual([
      'native-yaml',
      'native-json',
      'graphml',
      'gml',
      'csv',
      'native-yaml',
    ]);
    expect(caught(() => parseFormatName('dot')).format()).toBe(
      'unknown design format "dot" — use one of yaml, json, graphml, gml, csv, geojson',
    );
  });

  it('options.format overrides the extension', () => {
    const t = parseDesign(fixture('ring.gml'), 'ring.txt', { format: 'gml' });
    expect([t.format, t.nodes.length]).toEqual(['gml', 4]);
  });

  it('an unknown extension is a located error with a hint', () => {
    expect(caught(() => parseDesign('', 'net.txt')).format()).toBe(
      'net.txt:1:1: cannot tell the design format from the file name — use an extension .net.yaml, .net.json, .graphml, .gml, .csv or .geojson, or force one (yaml, json, graphml, gml, csv, geojson)',
    );
  });
});

describe('limits', () => {
  it('counts UTF-8 bytes exactly', () => {
    // 1 + 2 + 3 + 4 bytes (RFC 3629 encoding lengths).
    expect(utf8Length('a\u00e9\u20ac\u{1f600}')).toBe(10);
  });

  it('refuses text over the byte limit with a LimitError', () => {
    const text = fixture('ring.net.yaml');
    const e = caught(() => parseDesign(text, 'ring.net.yaml', { maxBytes: 100 }));
    expect(e.name).toBe('LimitError');
    expect(e.message).toBe(`the design file is larger than the limit (${Buffer.byteLength(text)} bytes > 100)`);
    expect(parseDesign(text, 'ring.net.yaml', { maxBytes: Buffer.byteLength(text) }).nodes).toHaveLength(4);
  });

  it('multi-byte text is measured in bytes, not characters', () => {
    const text = `source,target\n${'\u20ac'.repeat(40)},b\n`; // 14 + 120 + 3 bytes, 57 characters
    expect(caught(() => parseDesign(text, 'x.csv', { maxBytes: 100 })).name).toBe('LimitError');
    expect(parseDesign(text, 'x.csv', { maxBytes: 137 }).nodes).toHaveLength(2);
  });

  it('refuses designs over the element limit, in every format, at the element that crosses it', () => {
    for (const file of ['ring.net.yaml', 'ring.gml', 'ring.graphml', 'ring.csv', 'ring.geojson']) {
      const e = caught(() => parseDesign(fixture(file), file, { maxElements: 6 }));
      expect(e.name, file).toBe('LimitError');
      expect(e.message).toBe('the design has more than 6 elements (nodes + links)');
      expect(e.line).toBeGreaterThan(0);
      // 4 nodes + 5 links = 9 elements: 9 fits exactly.
      expect(parseDesign(fixture(file), file, { maxElements: 9 }).links).toHaveLength(5);
    }
  });
});

describe('the five formats agree', () => {
  it('the ring fixture has the same ends, lengths and keys in every format', () => {
    const ends = (file: string) => {
      const t = parseDesign(fixture(file), file);
      const name = new Map(t.nodes.map((n) => [n.id, n.label && file.endsWith('.gml') ? n.label : n.id]));
      return t.links.map((l) => [name.get(l.source), name.get(l.target), l.length]);
    };
    const expected = ends('ring.net.yaml');
    for (const f of ['ring.net.json', 'ring.gml', 'ring.graphml', 'ring.csv', 'ring.geojson'])
      expect(ends(f), f).toEqual(expected);
  });
});
