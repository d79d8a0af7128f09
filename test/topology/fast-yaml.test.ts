// The fast reader of our YAML subset (src/topology/fast-yaml.ts) against the `yaml` package
// (the reference: YAML 1.2 core schema, eemeli/yaml 2.x): where it reads a text at all, its
// values must equal yaml's and the design it gives must equal, field by field and position by
// position, the one the full reader gives; where it is unsure it must decline.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { LineCounter, parse, parseDocument } from 'yaml';
import { describe, expect, it } from 'vitest';
import { lineColumn, readFastYaml } from '../../src/topology/fast-yaml.js';
import { parseNative } from '../../src/topology/native.js';
import { repoRoot } from './helpers.js';

function yamlFiles(dir: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    const p = path.join(dir, name);
    if (statSync(p).isDirectory()) yamlFiles(p, out);
    else if (/\.ya?ml$/.test(name)) out.push(p);
  }
  return out;
}

/** Both readers on one text: the same design, or the same error message. */
function bothReaders(text: string, file = 'x.net.yaml'): { fast: unknown; full: unknown } {
  const run = (fast: boolean) => {
    try {
      return parseNative(text, file, {}, 'native-yaml', fast);
    } catch (e) {
      return `error: ${(e as Error).message}`;
    }
  };
  return { fast: run(true), full: run(false) };
}

describe('fast YAML reader', () => {
  const files = yamlFiles(path.join(repoRoot, 'fixtures'));

  it('gives the values the yaml package gives, on every fixture it reads, and reads most designs', () => {
    let read = 0;
    let designs = 0;
    for (const f of files) {
      const text = readFileSync(f, 'utf8').replace(/^\uFEFF/, '');
      const r = readFastYaml(text);
      if (!r) continue;
      read++;
      if (f.endsWith('.net.yaml')) designs++;
      expect(r.data, f).toStrictEqual(parse(text, { uniqueKeys: true, strict: true }));
    }
    // Most fixtures are plain block YAML; the rest (anchors, tags, broken files) decline.
    expect(read).toBeGreaterThan(files.length / 2);
    expect(designs).toBeGreaterThan(20);
  });

  it('gives the same design (positions included) or the same error as the full reader on every design fixture', () => {
    for (const f of files.filter((x) => x.endsWith('.net.yaml'))) {
      const text = readFileSync(f, 'utf8').replace(/^\uFEFF/, '');
      const { fast, full } = bothReaders(text, path.basename(f));
      expect(fast, f).toStrictEqual(full);
    }
  });

  it('agrees with the full reader on written variants: compact and nested items, flow maps, comments, quotes, CRLF', () => {
    const variants = [
      'nodes:\n- id: a\n- id: b\nlinks:\n- between: [a, b]\n',
      'nodes:\n  -\n    id: a\n    label: "Site A"   # quoted\n  - {id: b, label: \'B\'}\nlinks:\n  - between:\n      - a\n      - b\n    length_km: 12.5\n',
      'network: {name: x}\nnodes:\n  - id: 1\n  - id: 12345678901234567890\nlinks:\n  - between: [1, 12345678901234567890]\n',
      'nodes:\r\n  - id: a\r\n    site: {lat: 47.1, lon: -8.25e0}\r\n  - id: b\r\nlinks:\r\n  - between: [a, b]\r\n    latency_ms: 1e-1\r\n',
      '# leading comment\n\nnodes:\n  - id: a # trailing\n    hardened: true\n\n  - id: b\n    hardened: False\nlinks: []\n',
      'nodes:\n  - id: a\n  - id: a\n', // duplicate id: the builder's error, from the full reader
      'nodes:\n  - id: a\nlinks:\n  - between: [a, zz]\n', // unknown end
      'nodes:\n  - id: a\n  - id: b\nlinks:\n  - between: [a, b]\n    length_km: 0.0000001\n', // out of range
      'nodes:\n  - id: a\n    colour: red\n', // schema error
    ];
    for (const text of variants) {
      const { fast, full } = bothReaders(text);
      expect(fast, text).toStrictEqual(full);
    }
    expect(readFastYaml(variants[2])).toBeDefined();
    expect(readFastYaml(variants[3])).toBeDefined();
  });

  it('declines what it does not cover, so the full reader decides', () => {
    const declined = [
      'a: &x 1\nb: *x\n', // anchors and aliases
      'a: !!str 1\n', // tags
      'a: |\n  text\n', // block scalars
      'a: "x\\ty"\n', // escapes
      'a: [1,\n  2]\n', // multi-line flow
      'a:\n\tb: 1\n', // tabs
      'a: 0x10\n', // another spelling of a number
      'a: .inf\n',
      'a: 1\na: 2\n', // duplicate keys
      '---\na: 1\n',
      'a: b: c\n',
      'a: x\n  y\n', // a continued plain scalar
      `${'a:\n'.repeat(1)}${Array.from({ length: 30 }, (_, i) => `${'  '.repeat(i + 1)}k${i}:`).join('\n')}\n`, // deep
    ];
    for (const text of declined) expect(readFastYaml(text), text).toBeUndefined();
  });

  it('converts offsets to 1-based line and column as the yaml package does', () => {
    const text = 'a: 1\r\nbb:\n\n  - x\n';
    const r = readFastYaml(text)!;
    const lines = new LineCounter();
    parseDocument(text, { lineCounter: lines });
    for (let offset = 0; offset < text.length; offset++) {
      const p = lines.linePos(offset);
      expect(lineColumn(r.lineStarts, offset), String(offset)).toEqual({ line: p.line, column: p.col });
    }
  });
});
