// The one step from a file's bytes to the text every reader gets (designs and policies, from
// git or from disk). Text must be UTF-8 (RFC 3629); a byte-order mark is dropped. UTF-16 with
// a byte-order mark (what some Windows editors and shells write) is decoded as such, since the
// mark says which it is. Anything else is refused at its first bad byte, with the encoding it
// looks like, rather than decoded with replacement characters: two Latin-1 names that both turn
// into "M?hle" would silently become one node. A NUL character is refused too: no design or
// policy format allows it, and it is what UTF-16 without a mark looks like.
// Pure: the shell reads the bytes and calls decodeText.

import { DesignError } from './errors.js';

/** A file that is not text netbrace reads (kind "design"; policy readers restate it as a PolicyError). */
export class EncodingError extends DesignError {
  override name = 'EncodingError';
}

const HINT = 'save the file as UTF-8';

/**
 * Length of the well-formed UTF-8 sequence starting at `i` (RFC 3629 §4: no overlong forms, no
 * surrogates, nothing above U+10FFFF), or 0 when the bytes there are not one.
 */
function sequenceLength(b: Uint8Array, i: number): number {
  const c = b[i];
  if (c < 0x80) return 1;
  let need: number;
  let lo = 0x80;
  let hi = 0xbf;
  if (c >= 0xc2 && c <= 0xdf) need = 1;
  else if (c === 0xe0) [need, lo] = [2, 0xa0];
  else if (c === 0xed) [need, hi] = [2, 0x9f];
  else if (c >= 0xe1 && c <= 0xef) need = 2;
  else if (c === 0xf0) [need, lo] = [3, 0x90];
  else if (c === 0xf4) [need, hi] = [3, 0x8f];
  else if (c >= 0xf1 && c <= 0xf3) need = 3;
  else return 0;
  // Every continuation byte must be there (past the end, b[k] is undefined and compares false).
  if (i + need >= b.length) return 0;
  const b1 = b[i + 1];
  if (b1 < lo || b1 > hi) return 0;
  for (let k = 2; k <= need; k++) {
    const x = b[i + k];
    if (x < 0x80 || x > 0xbf) return 0;
  }
  return need + 1;
}

/** Offset of the first byte that does not start a well-formed UTF-8 sequence, or -1. */
export function firstInvalidUtf8(b: Uint8Array, from = 0): number {
  for (let i = from; i < b.length;) {
    if (b[i] < 0x80) {
      i++;
      continue;
    }
    const len = sequenceLength(b, i);
    if (len === 0) return i;
    i += len;
  }
  return -1;
}

/**
 * What bytes that are not UTF-8 most likely are. Latin-1 (ISO 8859-1) and Windows-1252 are the
 * usual single-byte code pages of European text; they differ in 0x80–0x9F, control codes in
 * Latin-1 but letters and quotes (€, “ ”, Œ) in Windows-1252.
 */
function guessEncoding(b: Uint8Array): string {
  let c1 = false;
  let utf8 = false;
  for (let i = 0; i < b.length;) {
    if (b[i] < 0x80) {
      i++;
      continue;
    }
    const len = sequenceLength(b, i);
    if (len > 0) {
      utf8 = true;
      i += len;
      continue;
    }
    if (b[i] <= 0x9f) c1 = true;
    i++;
  }
  const page = c1 ? 'Windows-1252' : 'Latin-1 (ISO 8859-1)';
  return utf8 ? `it mixes UTF-8 with another encoding, which looks like ${page}` : `it looks like ${page}`;
}

/** 1-based line and column (in UTF-16 units, as every reader counts) of offset `at` in `text`. */
function textPosition(text: string, at: number): { line: number; column: number } {
  let line = 1;
  let start = 0;
  for (let i = text.indexOf('\n'); i >= 0 && i < at; i = text.indexOf('\n', i + 1)) {
    line++;
    start = i + 1;
  }
  return { line, column: at - start + 1 };
}

const utf8Decoder = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true });

function decodeUtf8(bytes: Uint8Array, start: number, file: string): string {
  const bad = firstInvalidUtf8(bytes, start);
  if (bad >= 0) {
    // Bytes before `bad` are well-formed, so the line's prefix decodes; columns count its characters.
    let lineStart = bad;
    let line = 1;
    while (lineStart > start && bytes[lineStart - 1] !== 0x0a) lineStart--;
    for (let i = start; i < lineStart; i++) if (bytes[i] === 0x0a) line++;
    const column = utf8Decoder.decode(bytes.subarray(lineStart, bad)).length + 1;
    const hex = bytes[bad].toString(16).toUpperCase().padStart(2, '0');
    throw new EncodingError(
      `not UTF-8: byte 0x${hex} at line ${line}, column ${column}; ${guessEncoding(bytes.subarray(start))}`,
      { file, line, column },
      HINT,
    );
  }
  return utf8Decoder.decode(bytes.subarray(start));
}

/** UTF-16 after its byte-order mark; a lone surrogate or an odd byte is refused where it is. */
function decodeUtf16(bytes: Uint8Array, littleEndian: boolean, file: string): string {
  const units = (bytes.length - 2) >> 1;
  const chunks: string[] = [];
  const CHUNK = 8192;
  const buf = new Array<number>(CHUNK);
  let decoded = '';
  const fail = (message: string, unitIndex: number): never => {
    decoded = chunks.join('') + String.fromCharCode(...buf.slice(0, unitIndex % CHUNK));
    throw new EncodingError(`not valid UTF-16: ${message}`, { file, ...textPosition(decoded, decoded.length) }, HINT);
  };
  for (let u = 0; u < units; u++) {
    const p = 2 + 2 * u;
    const code = littleEndian ? bytes[p] | (bytes[p + 1] << 8) : (bytes[p] << 8) | bytes[p + 1];
    if (code >= 0xd800 && code <= 0xdbff) {
      const q = p + 2;
      const next =
        q + 1 < bytes.length ? (littleEndian ? bytes[q] | (bytes[q + 1] << 8) : (bytes[q] << 8) | bytes[q + 1]) : -1;
      if (!(next >= 0xdc00 && next <= 0xdfff)) fail(`a lone surrogate 0x${code.toString(16).toUpperCase()}`, u);
    } else if (code >= 0xdc00 && code <= 0xdfff) {
      const prev =
        u > 0 ? (littleEndian ? bytes[p - 2] | (bytes[p - 1] << 8) : (bytes[p - 2] << 8) | bytes[p - 1]) : -1;
      if (!(prev >= 0xd800 && prev <= 0xdbff)) fail(`a lone surrogate 0x${code.toString(16).toUpperCase()}`, u);
    }
    buf[u % CHUNK] = code;
    if (u % CHUNK === CHUNK - 1) chunks.push(String.fromCharCode(...buf));
  }
  if (units % CHUNK !== 0) chunks.push(String.fromCharCode(...buf.slice(0, units % CHUNK)));
  const text = chunks.join('');
  if ((bytes.length & 1) === 1) {
    throw new EncodingError(
      'not valid UTF-16: the file ends in the middle of a character (an odd number of bytes)',
      { file, ...textPosition(text, text.length) },
      HINT,
    );
  }
  return text;
}

/**
 * The text of a design or policy file. UTF-8 (byte-order mark dropped) or UTF-16 with its
 * byte-order mark; throws EncodingError at the first byte that is neither, naming what the
 * file looks like.
 */
export function decodeText(bytes: Uint8Array, file: string): string {
  let text: string;
  if (bytes[0] === 0xff && bytes[1] === 0xfe && bytes[2] === 0 && bytes[3] === 0) {
    throw new EncodingError(
      'not UTF-8: the file starts with a UTF-32 byte-order mark',
      { file, line: 1, column: 1 },
      HINT,
    );
  } else if (bytes[0] === 0 && bytes[1] === 0 && bytes[2] === 0xfe && bytes[3] === 0xff) {
    throw new EncodingError(
      'not UTF-8: the file starts with a UTF-32 byte-order mark',
      { file, line: 1, column: 1 },
      HINT,
    );
  } else if (bytes[0] === 0xff && bytes[1] === 0xfe) {
    text = decodeUtf16(bytes, true, file);
  } else if (bytes[0] === 0xfe && bytes[1] === 0xff) {
    text = decodeUtf16(bytes, false, file);
  } else {
    const bom = bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf ? 3 : 0;
    text = decodeUtf8(bytes, bom, file);
  }
  const nul = text.indexOf('\0');
  if (nul >= 0) {
    const { line, column } = textPosition(text, nul);
    // ASCII written as UTF-16 without a mark is every other byte zero.
    const sample = bytes.subarray(0, 4096);
    let zeros = 0;
    for (const x of sample) if (x === 0) zeros++;
    const looks =
      zeros * 4 >= sample.length
        ? 'it looks like UTF-16 without a byte-order mark'
        : 'it looks like a binary file, not text';
    throw new EncodingError(
      `not UTF-8 text: a NUL character at line ${line}, column ${column}; ${looks}`,
      { file, line, column },
      HINT,
    );
  }
  return text;
}

/** The length of `text` in UTF-8 bytes (GitHub's summary limit and the design size limit count bytes). */
export function utf8Length(text: string): number {
  let n = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c < 0x80) n += 1;
    else if (c < 0x800) n += 2;
    else if (c >= 0xd800 && c <= 0xdbff && i + 1 < text.length && (text.charCodeAt(i + 1) & 0xfc00) === 0xdc00) {
      n += 4;
      i++;
    } else n += 3;
  }
  return n;
}
