// decode.ts: a file's bytes to text. UTF-8 (RFC 3629) and UTF-16 with a byte-order mark are
// read; everything else is refused at its first bad byte with the encoding it looks like, by
// every reader of files: git (showFile), the working tree (readInsideSync) and readDesign.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { decodeText, EncodingError, firstInvalidUtf8 } from '../src/decode.js';
import { isNetbraceError } from '../src/errors.js';
import { gitDeps, showFile } from '../src/shell/git.js';
import { readDesign } from '../src/shell/read-design.js';
import { readInsideSync } from '../src/shell/workspace.js';

const enc = new TextEncoder();
const bytes = (...parts: (string | number[])[]) =>
  new Uint8Array(parts.flatMap((p) => (typeof p === 'string' ? [...enc.encode(p)] : p)));
/** ISO 8859-1 maps each character U+0000–U+00FF to the byte of the same value. */
const latin1 = (s: string) => new Uint8Array([...s].map((c) => c.charCodeAt(0)));
function utf16(s: string, littleEndian: boolean): Uint8Array {
  const out = [littleEndian ? 0xff : 0xfe, littleEndian ? 0xfe : 0xff];
  for (let i = 0; i < s.length; i++) {
    const u = s.charCodeAt(i);
    out.push(...(littleEndian ? [u & 0xff, u >> 8] : [u >> 8, u & 0xff]));
  }
  return new Uint8Array(out);
}

function refusal(b: Uint8Array, file = 'net/a.net.yaml'): EncodingError {
  try {
    decodeText(b, file);
  } catch (e) {
    if (e instanceof EncodingError) return e;
    throw e;
  }
  throw new Error('the bytes were accepted');
}

const DESIGN = 'nodes:\n  - id: a\n    label: Mühle\n  - id: b\n    label: Mähle\n';

describe('decodeText', () => {
  it('UTF-8 is read as is; a byte-order mark is dropped', () => {
    expect(decodeText(enc.encode(DESIGN), 'a')).toBe(DESIGN);
    expect(decodeText(bytes([0xef, 0xbb, 0xbf], DESIGN), 'a')).toBe(DESIGN);
    expect(decodeText(bytes('😀 €'), 'a')).toBe('😀 €');
    expect(decodeText(new Uint8Array(0), 'a')).toBe('');
  });

  it('Latin-1: refused at the first byte that is not UTF-8, with line, column and the encoding named', () => {
    const e = refusal(latin1(DESIGN));
    // "Mühle": ü is 0xFC in ISO 8859-1, on line 3 after "    label: M" (12 characters).
    expect(e.format()).toBe(
      'net/a.net.yaml:3:13: not UTF-8: byte 0xFC at line 3, column 13; it looks like Latin-1 (ISO 8859-1) — save the file as UTF-8',
    );
    expect(e.kind).toBe('design');
  });

  it('Windows-1252 (bytes 0x80–0x9F used for quotes and €) and files that mix in UTF-8 are named as such', () => {
    // “ and ” are 0x93 and 0x94 in Windows-1252 (its code page table); € is 0x80.
    expect(refusal(bytes('label: ', [0x93], 'quoted', [0x94], '\n')).message).toBe(
      'not UTF-8: byte 0x93 at line 1, column 8; it looks like Windows-1252',
    );
    const mixed = refusal(bytes('a: é\nb: ', [0xe9], '\n'));
    expect([mixed.line, mixed.column]).toEqual([2, 4]);
    expect(mixed.message).toContain('it mixes UTF-8 with another encoding, which looks like Latin-1 (ISO 8859-1)');
    // Columns count characters: the two-byte é before the bad byte is one column.
    expect(refusal(bytes('é', [0xff])).column).toBe(2);
  });

  it('UTF-16 with a byte-order mark, either order, decodes to the same text', () => {
    expect(decodeText(utf16(DESIGN, true), 'a')).toBe(DESIGN);
    expect(decodeText(utf16(DESIGN, false), 'a')).toBe(DESIGN);
    expect(decodeText(utf16('😀', true), 'a')).toBe('😀');
  });

  it('broken UTF-16, UTF-16 without a mark, UTF-32 and binary files are refused', () => {
    expect(refusal(new Uint8Array([...utf16('ab\nc', true), 0x00, 0xd8, 0x41, 0x00])).format()).toBe(
      'net/a.net.yaml:2:2: not valid UTF-16: a lone surrogate 0xD800 — save the file as UTF-8',
    );
    expect(refusal(new Uint8Array([...utf16('ab', true), 0x41])).message).toBe(
      'not valid UTF-16: the file ends in the middle of a character (an odd number of bytes)',
    );
    expect(refusal(new Uint8Array([0x61, 0, 0x62, 0, 0x0a, 0])).message).toBe(
      'not UTF-8 text: a NUL character at line 1, column 2; it looks like UTF-16 without a byte-order mark',
    );
    expect(refusal(new Uint8Array([0xff, 0xfe, 0, 0, 0x61, 0, 0, 0])).message).toBe(
      'not UTF-8: the file starts with a UTF-32 byte-order mark',
    );
    expect(refusal(bytes('nodes: [', Array(40).fill(0x41), [0])).message).toContain(
      'a NUL character at line 1, column 49; it looks like a binary file',
    );
  });

  it('RFC 3629 §3–4 edge cases: overlong forms, surrogates, past U+10FFFF, truncated sequences', () => {
    // Well-formed boundaries: U+007F, U+0080, U+07FF, U+0800, U+FFFF, U+10000, U+10FFFF.
    for (const ok of [
      [0x7f],
      [0xc2, 0x80],
      [0xdf, 0xbf],
      [0xe0, 0xa0, 0x80],
      [0xef, 0xbf, 0xbf],
      [0xf0, 0x90, 0x80, 0x80],
      [0xf4, 0x8f, 0xbf, 0xbf],
    ]) {
      expect(firstInvalidUtf8(new Uint8Array(ok)), ok.join(',')).toBe(-1);
    }
    // Overlong "/" (C0 AF), overlong U+0000 (E0 80 80), a surrogate (ED A0 80), U+110000 (F4 90 80 80),
    // F5, a lone continuation byte, and a sequence cut off by the end of the file.
    for (const bad of [
      [0xc0, 0xaf],
      [0xe0, 0x80, 0x80],
      [0xed, 0xa0, 0x80],
      [0xf4, 0x90, 0x80, 0x80],
      [0xf5, 0x80, 0x80, 0x80],
      [0x80],
      [0xe2, 0x82],
    ]) {
      expect(firstInvalidUtf8(new Uint8Array([0x61, ...bad])), bad.join(',')).toBe(1);
    }
  });

  it('agrees with the WHATWG UTF-8 decoder (TextDecoder, fatal) on random bytes: same verdict, same text', () => {
    const reference = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true });
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 40 }), fc.constantFrom(0, 0x80, 0xc0), (raw, mask) => {
        // Biased towards high bytes, where the cases are; no NUL (refused on its own), and a
        // leading "a" so that no byte-order mark is read.
        const b = new Uint8Array([0x61, ...raw.map((x, i) => (i % 3 === 0 ? x | mask : x)).filter((x) => x !== 0)]);
        let expected: string | undefined;
        try {
          expected = reference.decode(b);
        } catch {
          expected = undefined;
        }
        expect(firstInvalidUtf8(b) === -1).toBe(expected !== undefined);
        if (expected !== undefined) expect(decodeText(b, 'f')).toBe(expected);
        else expect(() => decodeText(b, 'f')).toThrow(EncodingError);
      }),
      { seed: 20_240_817, numRuns: 3000 },
    );
  });
});

describe('every file reader decodes the same way', () => {
  const scratch: string[] = [];
  afterAll(() => {
    for (const d of scratch) rmSync(d, { recursive: true, force: true });
  });
  const dir = () => {
    const d = mkdtempSync(path.join(os.tmpdir(), 'netbrace-decode-'));
    scratch.push(d);
    return d;
  };
  const git = (cwd: string, ...args: string[]) => execFileSync('git', args, { cwd, encoding: 'utf8' }).trim();
  const expectRefusal = (e: unknown, file: string) => {
    expect(isNetbraceError(e) && e.format()).toBe(
      `${file}:3:13: not UTF-8: byte 0xFC at line 3, column 13; it looks like Latin-1 (ISO 8859-1) — save the file as UTF-8`,
    );
  };

  it('git (a commit), the working tree and readDesign refuse a Latin-1 file and read UTF-16', async () => {
    const root = dir();
    git(root, 'init', '-q', '-b', 'main');
    git(root, 'config', 'user.email', 'planner@example.invalid');
    git(root, 'config', 'user.name', 'Planner');
    git(root, 'config', 'commit.gpgsign', 'false');
    writeFileSync(path.join(root, 'latin.net.yaml'), latin1(DESIGN));
    writeFileSync(path.join(root, 'wide.net.yaml'), utf16(DESIGN, true));
    git(root, 'add', '-A');
    git(root, 'commit', '-q', '-m', 'designs');
    await showFile(root, 'HEAD', 'latin.net.yaml').then(
      () => expect.fail('accepted'),
      (e: unknown) => expectRefusal(e, 'latin.net.yaml'),
    );
    expect(await showFile(root, 'HEAD', 'wide.net.yaml')).toBe(DESIGN);
    const deps = gitDeps(root);
    await Promise.resolve(deps.readAt('worktree', 'latin.net.yaml')).then(
      () => expect.fail('accepted'),
      (e: unknown) => expectRefusal(e, 'latin.net.yaml'),
    );
    expect(readInsideSync(root, 'wide.net.yaml')).toBe(DESIGN);
    try {
      readDesign('latin.net.yaml', { cwd: root });
      expect.fail('accepted');
    } catch (e) {
      expectRefusal(e, 'latin.net.yaml');
    }
    expect(readDesign('wide.net.yaml', { cwd: root }).nodes.map((n) => n.label)).toEqual(['Mühle', 'Mähle']);
  });
});
