// A fast reader for the plain subset of YAML that designs are written in: block mappings and
// sequences indented with spaces, one-line flow lists and mappings (`between: [a, b]`,
// `site: {lat: 47.1, lon: 8.3}`), plain and simply quoted scalars, comments. Why: the `yaml`
// package builds a full document (every node an object with its range, plus a token stream)
// before it converts to plain values; for 100,000 elements that was seconds and about a
// gigabyte. This reader produces the plain values directly and keeps, beside each list and
// mapping, only the offsets the design reader asks for (where an item and each value start,
// and how a number was written), so `file:line:col` stays exact.
// It declines — returns undefined — on anything outside the subset (anchors, aliases, tags,
// block scalars, escapes, multi-line flow, tabs, odd numbers such as 0x10 or .inf, duplicate
// keys, deep nesting), and the caller then reads the text with the `yaml` package as before.
// Every value it does produce is the value `yaml` (YAML 1.2 core schema) gives for the same
// text; test/topology/fast-yaml.test.ts compares the two on every fixture and on variants.

/** Offsets of a list's or mapping's children while it is read (packed when it is done). */
interface Where {
  /** Offset where the collection itself starts (its first key, `-`, `[` or `{`). */
  start: number;
  /** Keys in order (mappings) — lists use indices. */
  keys: string[] | null;
  /** Offset of each child value (by index, or in the order of `keys`). */
  at: number[];
  /** How each number child was written (same indexing); null while there is none. */
  src: (string | undefined)[] | null;
}

export interface FastYaml {
  data: unknown;
  /** Offsets of the line starts (ascending), for offset → line and column. */
  lineStarts: Int32Array;
  /** Where the child `key` of a list or mapping read here starts, and how a number was written. */
  child(container: object, key: string | number): { at: number; src: string | undefined } | undefined;
  /** Where a list or mapping read here starts. */
  start(container: object): number | undefined;
}

/**
 * Offsets of every list and mapping, packed into one typed array: [start, key list, count,
 * child offsets…] per collection, found through one map entry. Small arrays per collection
 * cost a few hundred bytes each, which for 100,000 elements was most of the memory.
 */
class Packed {
  private data = new Int32Array(1 << 16);
  private used = 0;
  private readonly base = new Map<object, number>();
  private readonly keyLists: string[][] = [];
  private readonly keyIds = new Map<string, number>();
  private readonly sources = new Map<object, (string | undefined)[]>();

  add(value: object, w: Where): void {
    const need = 3 + w.at.length;
    if (this.used + need > this.data.length) {
      const bigger = new Int32Array(Math.max(this.data.length * 2, this.used + need));
      bigger.set(this.data.subarray(0, this.used));
      this.data = bigger;
    }
    const b = this.used;
    this.data[b] = w.start;
    this.data[b + 1] = w.keys ? this.keyId(w.keys) : -1;
    this.data[b + 2] = w.at.length;
    for (let k = 0; k < w.at.length; k++) this.data[b + 3 + k] = w.at[k];
    this.used += need;
    this.base.set(value, b);
    if (w.src) this.sources.set(value, w.src);
  }

  private keyId(keys: string[]): number {
    const id = keys.join('\n');
    let k = this.keyIds.get(id);
    if (k === undefined) {
      k = this.keyLists.length;
      this.keyLists.push(keys);
      this.keyIds.set(id, k);
    }
    return k;
  }

  child(container: object, key: string | number): { at: number; src: string | undefined } | undefined {
    const b = this.base.get(container);
    if (b === undefined) return undefined;
    const list = this.data[b + 1];
    const k = list >= 0 ? this.keyLists[list].indexOf(String(key)) : typeof key === 'number' ? key : -1;
    if (k < 0 || k >= this.data[b + 2]) return undefined;
    return { at: this.data[b + 3 + k], src: this.sources.get(container)?.[k] };
  }

  start(container: object): number | undefined {
    const b = this.base.get(container);
    return b === undefined ? undefined : this.data[b];
  }
}

class Decline extends Error {}

function setSrc(w: Where, k: number, src: string): void {
  (w.src ??= [])[k] = src;
}
const decline = (): never => {
  throw new Decline();
};

/** Deepest block nesting the fast reader follows; deeper texts go to the full reader. */
const MAX_DEPTH = 24;
const KEY = /^[A-Za-z_][A-Za-z0-9_-]*$/;
const DECIMAL = /^-?(?:0|[1-9][0-9]*)(?:\.[0-9]+)?(?:[eE][-+]?[0-9]+)?$/;
/** Plain scalars that the core schema reads as something other than the text. */
const SPECIAL: Readonly<Record<string, null | boolean>> = {
  null: null,
  Null: null,
  NULL: null,
  '~': null,
  true: true,
  True: true,
  TRUE: true,
  false: false,
  False: false,
  FALSE: false,
};
const NOT_KEYS = new Set([...Object.keys(SPECIAL), '__proto__']);

/** The lines that hold content, as offsets: a reused view, so reading allocates no line objects. */
interface Line {
  /** Offset of the first character of the line. */
  begin: number;
  /** Offset of the first non-space character. */
  content: number;
  /** Offset just past the last character (line break excluded). */
  end: number;
  indent: number;
}

class Lines {
  count = 0;
  private begin = new Int32Array(1024);
  private content = new Int32Array(1024);
  private end = new Int32Array(1024);
  private readonly views: [Line, Line] = [
    { begin: 0, content: 0, end: 0, indent: 0 },
    { begin: 0, content: 0, end: 0, indent: 0 },
  ];

  push(begin: number, content: number, end: number): void {
    if (this.count === this.begin.length) {
      const grow = (a: Int32Array) => {
        const b = new Int32Array(a.length * 2);
        b.set(a);
        return b;
      };
      this.begin = grow(this.begin);
      this.content = grow(this.content);
      this.end = grow(this.end);
    }
    this.begin[this.count] = begin;
    this.content[this.count] = content;
    this.end[this.count++] = end;
  }

  /** Line i in view `slot` (0 or 1: two lines may be looked at together), or undefined. */
  get(i: number, slot: 0 | 1): Line | undefined {
    if (i >= this.count) return undefined;
    const v = this.views[slot];
    v.begin = this.begin[i];
    v.content = this.content[i];
    v.end = this.end[i];
    v.indent = v.content - v.begin;
    return v;
  }
}

export function readFastYaml(text: string): FastYaml | undefined {
  try {
    return new Reader(text).read();
  } catch (e) {
    if (e instanceof Decline) return undefined;
    throw e;
  }
}

class Reader {
  private readonly lines = new Lines();
  private i = 0;
  private readonly packed = new Packed();
  private readonly starts: number[] = [];

  constructor(private readonly text: string) {}

  read(): FastYaml {
    const t = this.text;
    let begin = 0;
    while (begin <= t.length) {
      let end = t.indexOf('\n', begin);
      if (end < 0) end = t.length;
      this.starts.push(begin);
      let stop = end;
      if (stop > begin && t.charCodeAt(stop - 1) === 13) stop--;
      let c = begin;
      while (c < stop && t.charCodeAt(c) === 32) c++;
      if (c < stop) {
        const ch = t.charCodeAt(c);
        if (ch === 9) decline(); // a tab in the indentation
        if (ch !== 35) {
          // Document markers and directives belong to the full reader.
          if (c === begin && (t.startsWith('---', c) || t.startsWith('...', c) || ch === 37)) decline();
          this.lines.push(begin, c, stop);
        }
      }
      if (end === t.length) break;
      begin = end + 1;
    }
    const first = this.lines.get(0, 0);
    if (!first || first.indent !== 0) decline();
    const data = this.block(0, 0);
    if (this.i < this.lines.count) decline();
    const packed = this.packed;
    return {
      data,
      lineStarts: Int32Array.from(this.starts),
      child: (c, k) => packed.child(c, k),
      start: (c) => packed.start(c),
    };
  }

  /** A block collection whose lines start at `indent`. */
  private block(indent: number, depth: number): unknown {
    if (depth > MAX_DEPTH) decline();
    const line = this.lines.get(this.i, 0)!;
    if (this.isItem(line.content, line.end)) return this.sequence(indent, depth);
    return this.mapping(indent, line.content, depth);
  }

  private isItem(c: number, end: number): boolean {
    return this.text.charCodeAt(c) === 45 && (c + 1 === end || this.text.charCodeAt(c + 1) === 32);
  }

  private sequence(indent: number, depth: number): unknown[] {
    const out: unknown[] = [];
    const w: Where = { start: this.lines.get(this.i, 0)!.content, keys: null, at: [], src: null };
    while (this.i < this.lines.count) {
      const line = this.lines.get(this.i, 0)!;
      if (line.indent !== indent || !this.isItem(line.content, line.end)) break;
      let c = line.content + 1;
      while (c < line.end && this.text.charCodeAt(c) === 32) c++;
      if (c >= line.end || this.text.charCodeAt(c) === 35) {
        // The item is the block below.
        this.i++;
        const next = this.lines.get(this.i, 1);
        if (!next || next.indent <= indent) return decline(); // an empty item
        w.at.push(next.content);
        out.push(this.block(next.indent, depth + 1));
        continue;
      }
      if (this.isItem(c, line.end)) decline(); // `- - x`
      if (this.keyAt(c, line.end) >= 0) {
        // `- key: value`: a mapping whose keys line up with this one.
        w.at.push(c);
        out.push(this.mapping(c - line.begin, c, depth + 1));
        continue;
      }
      this.i++;
      const v = this.inline(c, line.end);
      w.at.push(c);
      if (v.src !== undefined) setSrc(w, w.at.length - 1, v.src);
      out.push(v.value);
    }
    this.packed.add(out, w);
    return out;
  }

  /** End of a `key:` at c (the offset of the colon), or -1 when the line is no mapping entry. */
  private keyAt(c: number, end: number): number {
    const t = this.text;
    let k = c;
    while (k < end) {
      const ch = t.charCodeAt(k);
      if (ch === 58) break;
      if (ch === 32 || ch === 35 || ch === 44 || ch === 91 || ch === 93 || ch === 123 || ch === 125) return -1;
      k++;
    }
    if (k >= end || k === c) return -1;
    if (k + 1 < end && t.charCodeAt(k + 1) !== 32) return -1;
    const key = t.slice(c, k);
    if (!KEY.test(key)) decline(); // a key the full reader must judge
    return k;
  }

  /** A block mapping; its first key is at offset `first` (column `indent`). */
  private mapping(indent: number, first: number, depth: number): Record<string, unknown> {
    if (depth > MAX_DEPTH) decline();
    const out: Record<string, unknown> = {};
    const w: Where = { start: first, keys: [], at: [], src: null };
    let c = first;
    for (;;) {
      const line = this.lines.get(this.i, 0)!;
      const colon = this.keyAt(c, line.end);
      if (colon < 0) decline();
      const key = this.text.slice(c, colon);
      if (NOT_KEYS.has(key) || Object.prototype.hasOwnProperty.call(out, key)) decline();
      let v = colon + 1;
      while (v < line.end && this.text.charCodeAt(v) === 32) v++;
      this.i++;
      w.keys!.push(key);
      if (v >= line.end || this.text.charCodeAt(v) === 35) {
        const next = this.lines.get(this.i, 1);
        if (next && (next.indent > indent || (next.indent === indent && this.isItem(next.content, next.end)))) {
          w.at.push(next.content);
          out[key] = this.block(next.indent, depth + 1);
        } else {
          w.at.push(colon + 1);
          out[key] = null;
        }
      } else {
        const val = this.inline(v, line.end);
        w.at.push(v);
        if (val.src !== undefined) setSrc(w, w.at.length - 1, val.src);
        out[key] = val.value;
      }
      const next = this.lines.get(this.i, 1);
      if (!next || next.indent < indent) break;
      if (next.indent > indent) decline(); // a continuation line or a misplaced key
      if (this.isItem(next.content, next.end)) break;
      c = next.content;
    }
    this.packed.add(out, w);
    return out;
  }

  /** A value written on the rest of one line, then nothing but a comment. */
  private inline(c: number, end: number): { value: unknown; src: string | undefined } {
    const t = this.text;
    const ch = t.charCodeAt(c);
    let r: { value: unknown; src: string | undefined; next: number };
    if (ch === 91 || ch === 123) {
      const f = this.flow(c, end, 0);
      r = { value: f.value, src: undefined, next: f.next };
    } else if (ch === 34 || ch === 39) r = this.quoted(c, end);
    else {
      // A plain scalar runs to a comment or the end of the line.
      let e = c;
      while (e < end) {
        const x = t.charCodeAt(e);
        if (x === 35 && t.charCodeAt(e - 1) === 32) break;
        if (x === 58 && (e + 1 === end || t.charCodeAt(e + 1) === 32)) decline();
        if (x === 9) decline();
        e++;
      }
      let s = e;
      while (s > c && t.charCodeAt(s - 1) === 32) s--;
      const p = this.plain(t.slice(c, s), false);
      return p;
    }
    let k = r.next;
    while (k < end && t.charCodeAt(k) === 32) k++;
    if (k < end && !(t.charCodeAt(k) === 35 && k > r.next)) decline();
    return { value: r.value, src: r.src };
  }

  private quoted(c: number, end: number): { value: string; src: undefined; next: number } {
    const t = this.text;
    const q = t.charCodeAt(c);
    const close = t.indexOf(q === 34 ? '"' : "'", c + 1);
    if (close < 0 || close >= end) decline();
    if (q === 34 && t.lastIndexOf('\\', close) > c) decline(); // escapes
    if (q === 39 && t.charCodeAt(close + 1) === 39) decline(); // '' inside
    return { value: t.slice(c + 1, close), src: undefined, next: close + 1 };
  }

  /** A plain scalar's value by the core schema, for the forms this reader is sure of. */
  private plain(s: string, flow: boolean): { value: unknown; src: string | undefined } {
    if (s === '') decline();
    const c0 = s.charCodeAt(0);
    if (Object.prototype.hasOwnProperty.call(SPECIAL, s)) return { value: SPECIAL[s], src: undefined };
    if (DECIMAL.test(s)) return { value: Number(s), src: s };
    // Indicators, and anything that might be a number in another spelling (0x10, +1, .5, .inf).
    if ('-?:,[]{}#&*!|>\'"%@`+.~'.includes(s[0]) || (c0 >= 48 && c0 <= 57)) decline();
    if (flow && /[,[\]{}#:]/.test(s)) decline();
    if (s.includes(' #') || s.includes('\t')) decline();
    return { value: s, src: undefined };
  }

  /** A one-line flow list or mapping at c; `next` is the offset after its closing bracket. */
  private flow(c: number, end: number, depth: number): { value: unknown; next: number } {
    if (depth > MAX_DEPTH) decline();
    const t = this.text;
    const isMap = t.charCodeAt(c) === 123;
    const close = isMap ? 125 : 93;
    const list: unknown[] = [];
    const map: Record<string, unknown> = {};
    const w: Where = { start: c, keys: isMap ? [] : null, at: [], src: null };
    let k = c + 1;
    const skip = () => {
      while (k < end && t.charCodeAt(k) === 32) k++;
    };
    skip();
    if (t.charCodeAt(k) === close) {
      k++;
    } else {
      for (;;) {
        skip();
        if (k >= end) decline();
        let key = '';
        if (isMap) {
          const s = k;
          while (k < end && t.charCodeAt(k) !== 58 && t.charCodeAt(k) !== 44 && t.charCodeAt(k) !== close) k++;
          key = t.slice(s, k).trimEnd();
          if (
            t.charCodeAt(k) !== 58 ||
            !KEY.test(key) ||
            NOT_KEYS.has(key) ||
            Object.prototype.hasOwnProperty.call(map, key)
          )
            decline();
          k++;
          if (t.charCodeAt(k) !== 32) decline();
          skip();
        }
        const at = k;
        const ch = t.charCodeAt(k);
        let value: unknown;
        let src: string | undefined;
        if (ch === 91 || ch === 123) {
          const f = this.flow(k, end, depth + 1);
          value = f.value;
          k = f.next;
        } else if (ch === 34 || ch === 39) {
          const q = this.quoted(k, end);
          value = q.value;
          k = q.next;
        } else {
          const s = k;
          while (k < end && t.charCodeAt(k) !== 44 && t.charCodeAt(k) !== close) k++;
          const p = this.plain(t.slice(s, k).trimEnd(), true);
          value = p.value;
          src = p.src;
        }
        w.at.push(at);
        if (src !== undefined) setSrc(w, w.at.length - 1, src);
        if (isMap) {
          w.keys!.push(key);
          map[key] = value;
        } else list.push(value);
        skip();
        const x = t.charCodeAt(k);
        if (x === 44) {
          k++;
          skip();
          if (t.charCodeAt(k) === close) decline(); // a trailing comma: the full reader decides
          continue;
        }
        if (x === close) {
          k++;
          break;
        }
        decline();
      }
    }
    const value = isMap ? map : list;
    this.packed.add(value, w);
    return { value, next: k };
  }
}

/** 1-based line and column of an offset. */
export function lineColumn(lineStarts: Int32Array, offset: number): { line: number; column: number } {
  let lo = 0;
  let hi = lineStarts.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (lineStarts[mid] <= offset) lo = mid;
    else hi = mid - 1;
  }
  return { line: lo + 1, column: offset - lineStarts[lo] + 1 };
}
