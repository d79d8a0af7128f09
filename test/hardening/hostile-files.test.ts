// Hostile files, one test each: what a pull request from a stranger could contain to make the
// gate hang, eat memory, read files it must not, or crash. Each must be refused fast with a
// located error (or, where harmless, read within the limits), never by an exception of
// another kind. At the end, the same files go through the real gate together with a good
// design: each hostile file fails alone with its line, and the good one is still judged.

import { closeSync, mkdtempSync, openSync, rmSync, truncateSync, writeFileSync, writeSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { NetbraceError } from '../../src/errors.js';
import { loadPolicy } from '../../src/policy/resolve.js';
import { runGate } from '../../src/run-gate.js';
import { inspectCommand } from '../../src/shell/commands/inspect.js';
import { readDesign } from '../../src/shell/read-design.js';
import { MAX_ID_LENGTH } from '../../src/topology/builder.js';
import { DEFAULT_MAX_BYTES } from '../../src/topology/model.js';
import { MAX_NESTING } from '../../src/topology/nesting.js';
import { parseDesign } from '../../src/topology/parse.js';
import { memoryDeps } from '../gate/memory-repo.js';
import { recordIO } from '../shell/helpers-io.js';
import { attempt, fixtureText, locationProblems, reportCount } from './support.js';

/** Hang guard (not a speed target): every hostile input below is refused well within it. */
const HANG_MS = 5_000;

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(path.join(tmpdir(), 'nb-hostile-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

let tried = 0;
/** Parses `text` as `file`: it must be refused with a NetbraceError of `kind`, located in the file. */
function refused(text: string, file: string, kind: NetbraceError['kind'] = 'design'): NetbraceError {
  tried++;
  const o = attempt(() => parseDesign(text, file));
  expect(o.ms, 'hang guard').toBeLessThan(HANG_MS);
  if (o.ok) throw new Error(`${file} was accepted (${o.value.nodes.length} nodes); expected a refusal`);
  expect(o.error.kind, o.error.format()).toBe(kind);
  expect(locationProblems(o.error, text, [file]), o.error.format()).toEqual([]);
  return o.error;
}

/** Entities nine deep, each ten of the one below: 10^9 "lol"s if anything expanded them. */
function billionLaughs(): string {
  const entities = ['<!ENTITY lol0 "lol">'];
  for (let i = 1; i <= 9; i++) entities.push(`<!ENTITY lol${i} "${`&lol${i - 1};`.repeat(10)}">`);
  return `<?xml version="1.0"?>\n<!DOCTYPE graphml [\n${entities.join('\n')}\n]>\n<graphml><graph><node id="&lol9;"/></graph></graphml>\n`;
}

describe('XML', () => {
  it('billion laughs (nested entity declarations) is refused at the DOCTYPE, before any expansion', () => {
    const e = refused(billionLaughs(), 'evil/laughs.graphml');
    expect(e.message).toMatch(/declares entities in a DOCTYPE/);
    expect(e.line).toBe(2);
  });

  describe('external entities', () => {
    let server: Server;
    let url = '';
    const requests: string[] = [];
    const secretFile = () => path.join(dir, 'secret.txt');
    beforeAll(async () => {
      writeFileSync(secretFile(), 'SECRET-MARKER-7f3a');
      server = createServer((req, res) => {
        requests.push(req.url ?? '');
        res.end('<!ENTITY leak "SECRET-MARKER-7f3a">');
      });
      await new Promise<void>((r) => server.listen(0, '127.0.0.1', () => r()));
      url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    });
    afterAll(() => new Promise<void>((r) => server.close(() => r())));

    it('a SYSTEM entity (file:// and http://) is refused; nothing is read or fetched', () => {
      for (const target of [`file://${secretFile()}`, `${url}/entity`]) {
        const text = `<?xml version="1.0"?>\n<!DOCTYPE graphml [\n  <!ENTITY xxe SYSTEM "${target}">\n]>\n<graphml><graph><node id="&xxe;"/></graph></graphml>\n`;
        const e = refused(text, 'evil/xxe.graphml');
        expect(e.message).toMatch(/declares entities/);
        expect(e.format()).not.toContain('SECRET-MARKER');
      }
      expect(requests).toEqual([]);
    });

    it('an external DTD (DOCTYPE … SYSTEM) is never loaded: its entities stay undefined', () => {
      const text = `<?xml version="1.0"?>\n<!DOCTYPE graphml SYSTEM "${url}/evil.dtd">\n<graphml><graph>\n<node id="&leak;"/>\n</graph></graphml>\n`;
      const e = refused(text, 'evil/dtd.graphml');
      expect(e.message).toMatch(/undefined entity/);
      expect(e.line).toBe(4);
      expect(requests).toEqual([]);
    });

    it('a parameter entity (%) is refused like any entity declaration', () => {
      const text = `<?xml version="1.0"?>\n<!DOCTYPE graphml [\n  <!ENTITY % remote SYSTEM "${url}/p.dtd">\n  %remote;\n]>\n<graphml/>\n`;
      expect(refused(text, 'evil/param.graphml').message).toMatch(/declares entities/);
      expect(requests).toEqual([]);
    });
  });
});

describe('YAML aliases', () => {
  /** Nine levels of nine aliases each: 9^9 ≈ 387 million strings if expanded. */
  const bomb = (top: string) => {
    const lines = ['a0: &a0 ["lol", "lol", "lol", "lol", "lol", "lol", "lol", "lol", "lol"]'];
    for (let i = 1; i <= 8; i++)
      lines.push(
        `a${i}: &a${i} [${Array(9)
          .fill(`*a${i - 1}`)
          .join(', ')}]`,
      );
    lines.push(`${top}: *a8`);
    return `${lines.join('\n')}\n`;
  };

  it('an alias bomb in a design is refused at its first alias', () => {
    const e = refused(`nodes: [{id: a}]\nmetadata:\n${bomb('x').replace(/^/gm, '  ')}`, 'evil/bomb.net.yaml');
    expect(e.message).toMatch(/alias bomb/);
    expect(e.line).toBe(4); // metadata.a1, where the first *alias stands
  });

  it('merge keys (<<: *a) chained into a bomb are refused too', () => {
    const lines = ['nodes: [{id: a}]', 'metadata:', '  m0: &m0 {k0: 1, k1: 2, k2: 3, k3: 4}'];
    for (let i = 1; i <= 12; i++) lines.push(`  m${i}: &m${i} {<<: [*m${i - 1}, *m${i - 1}, *m${i - 1}], j${i}: 1}`);
    const e = refused(`${lines.join('\n')}\n`, 'evil/merge.net.yaml');
    expect(e.message).toMatch(/alias/);
  });

  it('an alias bomb in a policy is a PolicyError with its line', () => {
    tried++;
    const text = `seed: 1\n${bomb('exclude')}`;
    const o = attempt(() => loadPolicy('.netbrace.yaml', () => text));
    expect(o.ok).toBe(false);
    if (o.ok) return;
    expect(o.error.kind).toBe('policy');
    expect(o.error.message).toMatch(/alias/i);
    expect(locationProblems(o.error, text, ['.netbrace.yaml'])).toEqual([]);
  });
});

describe('nesting 100,000 levels deep', () => {
  const D = 100_000;
  // [what, file, text, line where the limit is crossed]
  const cases: [string, string, string, number][] = [
    ['YAML flow sequences', 'evil/deep.net.yaml', `nodes: [{id: a}]\nmetadata: ${'['.repeat(D)}${']'.repeat(D)}\n`, 2],
    ['YAML block sequences', 'evil/deep-block.net.yaml', `nodes: [{id: a}]\nmetadata:\n  x: ${'- '.repeat(D)}a\n`, 3],
    [
      'YAML block mappings by indentation',
      'evil/deep-indent.net.yaml',
      `nodes: [{id: a}]\nmetadata:\n${Array.from({ length: 2_000 }, (_, i) => `${' '.repeat(i + 2)}k:`).join('\n')} 1\n`,
      101,
    ],
    [
      'JSON arrays',
      'evil/deep.net.json',
      `{"nodes": [{"id": "a"}],\n "metadata": {"x": ${'['.repeat(D)}${']'.repeat(D)}}}`,
      2,
    ],
    [
      'JSON objects',
      'evil/deep-obj.net.json',
      `{"nodes": [{"id": "a"}],\n "metadata": ${'{"a":'.repeat(D)}1${'}'.repeat(D)}}`,
      2,
    ],
    [
      'XML elements',
      'evil/deep.graphml',
      `<graphml>\n<graph>\n${'<g>'.repeat(D)}${'</g>'.repeat(D)}\n</graph></graphml>\n`,
      3,
    ],
    ['GML lists', 'evil/deep.gml', `graph [\n node [ id 1 ]\n x ${'[ a '.repeat(D)}${']'.repeat(D)}\n]\n`, 3],
  ];
  for (const [what, file, text, line] of cases) {
    it(`${what}: a located error at line ${line}, no stack overflow (twice in a row)`, () => {
      for (let round = 0; round < 2; round++) {
        const e = refused(text, file);
        expect(e.message).toMatch(new RegExp(`deeper than ${MAX_NESTING} levels`));
        expect(e.line).toBe(line);
      }
    });
  }

  it('a policy nested 100,000 levels deep: a located PolicyError', () => {
    tried++;
    const text = `seed: 1\nexclude: ${'['.repeat(D)}${']'.repeat(D)}\n`;
    for (let round = 0; round < 2; round++) {
      const o = attempt(() => loadPolicy('.netbrace.yaml', () => text));
      expect(o.ok).toBe(false);
      if (o.ok) return;
      expect(o.error.kind).toBe('policy');
      expect(o.error.line).toBe(2);
      expect(o.error.message).toMatch(/deeper than 100 levels/);
    }
  });

  it('ordinary nesting is untouched: every fixture and the demo design still parse', () => {
    for (const f of ['ring.net.yaml', 'ring.net.json', 'ring.gml', 'ring.graphml'])
      expect(parseDesign(fixtureText('designs', f), f).nodes.length).toBe(4);
    expect(
      parseDesign(fixtureText('demo', 'base', 'designs', 'lunmere-backbone.net.yaml'), 'lunmere.net.yaml').nodes.length,
    ).toBe(50);
  });
});

describe('size and element limits', () => {
  it('a 10-million-line CSV is refused by the size limit from stat(), before it is read', async () => {
    tried++;
    const file = path.join(dir, 'ten-million.csv');
    const fd = openSync(file, 'w');
    writeSync(fd, 'source,target\n');
    let bytes = 14;
    for (let block = 0; block < 100; block++) {
      let chunk = '';
      for (let i = block * 100_000; i < (block + 1) * 100_000; i++) chunk += `n${i % 5003},m${i % 4001}\n`;
      bytes += writeSync(fd, chunk);
    }
    closeSync(fd);
    expect(bytes).toBeGreaterThan(DEFAULT_MAX_BYTES);
    const o = attempt(() => readDesign(file, { displayName: 'designs/ten-million.csv' }));
    expect(o.ok).toBe(false);
    if (o.ok) return;
    expect(o.error.kind).toBe('limit');
    expect(o.error.format()).toBe(
      `designs/ten-million.csv:1:1: the design file is larger than the limit (${bytes} bytes > ${DEFAULT_MAX_BYTES}) — raise the limit (for the CLI: --max-bytes) if a file this large is intended`,
    );
    // The command line says the same, and fails the file.
    const io = recordIO(dir);
    expect(await inspectCommand.run(['ten-million.csv'], io)).toBe(1);
    expect(io.err.join('')).toMatch(/ten-million\.csv:1:1: the design file is larger than the limit/);
    expect(io.out.join('')).toBe('');
  });

  it('proof that the size is checked before reading: a sparse 64 GiB file is refused the same way', () => {
    tried++;
    const file = path.join(dir, 'sparse.graphml');
    writeFileSync(file, '');
    truncateSync(file, 64 * 2 ** 30); // no disk used; reading it would fail (ERR_FS_FILE_TOO_LARGE) or take minutes
    const o = attempt(() => readDesign(file));
    expect(o.ok).toBe(false);
    if (!o.ok)
      expect(o.error.message).toBe(
        `the design file is larger than the limit (${64 * 2 ** 30} bytes > ${DEFAULT_MAX_BYTES})`,
      );
    expect(o.ms).toBeLessThan(HANG_MS);
  });

  it('a file under the size limit with too many elements is refused at the row that crosses the element limit', () => {
    tried++;
    const file = path.join(dir, 'many.csv');
    // Every row names two new nodes and one link: three elements a row.
    const rows = Array.from({ length: 12_000 }, (_, i) => `a${i},b${i}`);
    writeFileSync(file, `source,target\n${rows.join('\n')}\n`);
    const o = attempt(() => readDesign(file, { displayName: 'many.csv', maxElements: 10_000 }));
    expect(o.ok).toBe(false);
    if (o.ok) return;
    expect(o.error.kind).toBe('limit');
    // 3333 rows hold 9999 elements; row 3334 (line 3335) adds the 10,000th (a3333) and then b3333 is refused.
    expect(o.error.format()).toBe(
      'many.csv:3335:7: the design has more than 10000 elements (nodes + links) — split the design, or raise the element limit if this size is intended',
    );
  });

  it('a text over the size limit is refused by parseDesign itself (the gate reads from git, not stat)', () => {
    const e = refused(`source,target\n${'a,b\n'.repeat(DEFAULT_MAX_BYTES / 4)}`, 'big.csv', 'limit');
    expect(e.message).toMatch(/larger than the limit/);
  });
});

describe(`a node id 1 MB long (the limit is ${MAX_ID_LENGTH} characters)`, () => {
  const big = 'n'.repeat(2 ** 20);
  const cases: [string, string, number][] = [
    ['evil/long.net.yaml', `nodes:\n  - id: b\n  - id: ${big}\nlinks:\n  - between: [b, ${big}]\n`, 3],
    [
      'evil/long.net.json',
      `{"nodes": [{"id": "b"},\n {"id": "${big}"}],\n "links": [{"between": ["b", "${big}"]}]}`,
      2,
    ],
    [
      'evil/long.graphml',
      `<graphml><graph>\n<node id="b"/>\n<node id="${big}"/>\n<edge source="b" target="${big}"/>\n</graph></graphml>\n`,
      3,
    ],
    ['evil/long.gml', `graph [\n node [ id "b" ]\n node [ id "${big}" ]\n edge [ source "b" target "${big}" ]\n]\n`, 3],
    ['evil/long.csv', `source,target\nb,c\nb,${big}\n`, 3],
    ['evil/long-link-end.net.yaml', `nodes:\n  - id: b\nlinks:\n  - between: [b, ${big}x]\n`, 4],
  ];
  for (const [file, text, line] of cases) {
    it(`${path.extname(file)}${file.includes('link-end') ? ' (unknown link end)' : ''}: refused at line ${line} with a short message`, () => {
      const e = refused(text, file, 'limit');
      expect(e.line).toBe(line);
      expect(e.message).toMatch(
        new RegExp(
          `${2 ** 20 + (file.includes('link-end') ? 1 : 0)} characters long; netbrace accepts ids of at most ${MAX_ID_LENGTH}`,
        ),
      );
      expect(e.format().length).toBeLessThan(300);
    });
  }

  it(`an id of exactly ${MAX_ID_LENGTH} characters is fine`, () => {
    const id = 'x'.repeat(MAX_ID_LENGTH);
    expect(parseDesign(`source,target\n${id},b\n`, 'ok.csv').nodes[0].id).toBe(id);
  });
});

describe('bytes that are not UTF-8 text', () => {
  /** Writes `bytes` to `name` and reads it as the shell does (readDesign: stat, read, decode, parse). */
  function readBytes(name: string, bytes: Uint8Array) {
    tried++;
    writeFileSync(path.join(dir, name), bytes);
    return attempt(() => readDesign(name, { cwd: dir }));
  }
  const ascii = (s: string) => new TextEncoder().encode(s);

  const cases: [string, () => Uint8Array, number, RegExp][] = [
    // 5 MB of plain text, then one Latin-1 byte on the last line: found, not decoded with U+FFFD.
    [
      'late-latin1.csv',
      () => new Uint8Array([...ascii('source,target\n'), ...new Uint8Array(5_000_000).fill(0x61), 0x2c, 0xe9, 0x0a]),
      2,
      /^not UTF-8: byte 0xE9 at line 2, column 5000002; it looks like Latin-1/,
    ],
    // A PNG signature under a design name.
    [
      'image.gml',
      () => new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d]),
      1,
      /^not UTF-8: byte 0x89 at line 1, column 1/,
    ],
    // UTF-16 with a mark, then a high surrogate with no low one.
    [
      'lone.net.yaml',
      () => new Uint8Array([0xff, 0xfe, 0x61, 0, 0x0a, 0, 0x00, 0xd8, 0x62, 0]),
      2,
      /^not valid UTF-16: a lone surrogate 0xD800/,
    ],
    ['nul.csv', () => ascii('source,target\na\u0000,b\n'), 2, /^not UTF-8 text: a NUL character at line 2, column 2/],
  ];
  for (const [name, make, line, message] of cases) {
    it(`${name}: refused at line ${line}, the encoding named`, () => {
      const o = readBytes(name, make());
      expect(o.ms, 'hang guard').toBeLessThan(HANG_MS);
      if (o.ok) throw new Error(`${name} was accepted`);
      expect([o.error.name, o.error.line, o.error.hint]).toEqual(['EncodingError', line, 'save the file as UTF-8']);
      expect(o.error.message).toMatch(message);
      expect(o.error.format().length).toBeLessThan(300);
    });
  }

  it('UTF-16 with a byte-order mark reads as the same design', () => {
    const text = fixtureText('designs', 'ring.graphml');
    const wide = new Uint8Array(2 + 2 * text.length);
    wide.set([0xfe, 0xff]);
    for (let i = 0; i < text.length; i++) wide.set([text.charCodeAt(i) >> 8, text.charCodeAt(i) & 0xff], 2 + 2 * i);
    const o = readBytes('wide.graphml', wide);
    if (!o.ok) throw new Error(o.error.format());
    expect(JSON.stringify(o.value)).toBe(JSON.stringify(parseDesign(text, 'wide.graphml')));
  });
});

describe('through the gate', () => {
  it('each hostile design fails alone with its line; the good design beside them is still judged', async () => {
    const hostile: Record<string, string> = {
      'designs/laughs.graphml': billionLaughs(),
      'designs/deep.net.json': `{"nodes": [${'['.repeat(100_000)}`,
      'designs/deep.gml': `graph [\n${'[ a '.repeat(100_000)}`,
      'designs/long.csv': `source,target\na,${'n'.repeat(2 ** 20)}\n`,
      'designs/bomb.net.yaml': `nodes: [{id: a}]\nx: &x [1, 1, 1, 1, 1, 1, 1, 1, 1, 1]\n${Array.from({ length: 60 }, (_, i) => `y${i}: *x`).join('\n')}\n`,
    };
    const good = fixtureText('designs', 'ring.net.yaml');
    const policy = 'designs:\n  - paths: ["designs/**"]\n';
    const head = { ...hostile, 'designs/ring.net.yaml': good, '.netbrace.yaml': policy };
    const { report, exitCode } = await runGate(
      { policySource: 'base', mode: 'block', eventKind: 'schedule', head: 'head' },
      memoryDeps({ base: head, head }),
    );
    expect(exitCode).toBe(1);
    const byPath = new Map(report.files.map((f) => [f.path, f]));
    for (const p of Object.keys(hostile)) {
      const f = byPath.get(p)!;
      expect(f.status, p).toBe('unreadable');
      expect(f.error!.line, p).toBeGreaterThanOrEqual(1);
      expect(f.findings.map((x) => x.rule)).toEqual(['parse-error']);
    }
    expect(byPath.get('designs/ring.net.yaml')!.status).not.toBe('unreadable');
    reportCount(
      'hostile',
      'gate run over hostile designs',
      report.files.length,
      report.files.map((f) => `${f.path}: ${f.status}${f.error ? ` at line ${f.error.line}` : ''}`).join('; '),
    );
  });
});

afterAll(() => reportCount('hostile', 'inputs', tried));
