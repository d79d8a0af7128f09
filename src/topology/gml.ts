// GML (Himsholt, "GML: A portable Graph File Format", Universität Passau, 1997): a tree of
// `key value` pairs where a value is an integer, a real, a "string" or a [ list ].
// No library fits (we need every element's line and column), so this is a small tokenizer
// and recursive-descent reader of our own. Directed graphs are read as undirected.

import type { DesignFormat, SourcePos, Topology } from './model.js';
import { TopologyBuilder, type BuilderOptions } from './builder.js';
import { mapLinkAttributes, mapNodeAttributes } from './attributes.js';
import { MAX_NESTING } from './nesting.js';

type GmlValue = number | string | GmlPair[];

interface GmlPair {
  key: string;
  value: GmlValue;
  /** As written, for numbers (so an id `7` stays "7" and `07` stays "07"). */
  raw: string;
  pos: SourcePos;
}

const ENTITIES: Readonly<Record<string, string>> = { quot: '"', amp: '&', lt: '<', gt: '>', apos: "'" };

/** GML strings cannot contain `"`; writers escape it (and others) as HTML entities. */
function unescape(s: string): string {
  if (!s.includes('&')) return s;
  return s.replace(/&(#x[0-9a-fA-F]+|#\d+|[a-zA-Z]+);/g, (m, body: string) => {
    if (body[0] === '#') {
      const code = body[1] === 'x' || body[1] === 'X' ? parseInt(body.slice(2), 16) : parseInt(body.slice(1), 10);
      return code >= 0 && code <= 0x10ffff ? String.fromCodePoint(code) : m;
    }
    return ENTITIES[body] ?? m;
  });
}

// Sticky patterns, shared by every reader (lastIndex is set before each use).
const KEY = /[A-Za-z_][A-Za-z0-9_]*/y;
const NUMBER = /[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?/y;

class GmlReader {
  private i = 0;
  private line = 1;
  private lineStart = 0;
  /** Lists open; bounded so that hostile nesting is an error, not a stack overflow. */
  private depth = 0;

  constructor(
    private readonly text: string,
    private readonly b: TopologyBuilder,
  ) {}

  private here(): SourcePos {
    return { line: this.line, column: this.i - this.lineStart + 1 };
  }

  /** Skip white space and `#` comments, counting lines. */
  private skip(): void {
    const t = this.text;
    while (this.i < t.length) {
      const c = t.charCodeAt(this.i);
      if (c === 10) {
        this.i++;
        this.line++;
        this.lineStart = this.i;
      } else if (c === 32 || c === 9 || c === 13 || c === 0xfeff) {
        this.i++;
      } else if (c === 35 /* # */) {
        while (this.i < t.length && t.charCodeAt(this.i) !== 10) this.i++;
      } else {
        return;
      }
    }
  }

  /** Reads pairs until `]` (nested) or the end of the text (top level). */
  readList(open?: SourcePos): GmlPair[] {
    const pairs: GmlPair[] = [];
    const t = this.text;
    for (;;) {
      this.skip();
      if (this.i >= t.length) {
        if (open) {
          throw this.b.error('unclosed "[": the list is never closed with "]"', open, 'add the missing "]" (check the brackets above the end of the file)');
        }
        return pairs;
      }
      if (t[this.i] === ']') {
        if (open) {
          this.i++;
          return pairs;
        }
        throw this.b.error('unexpected "]" with no open "["', this.here(), 'remove it, or add the "[" it closes');
      }
      const pos = this.here();
      KEY.lastIndex = this.i;
      const key = KEY.exec(t);
      if (!key) throw this.b.error(`expected a key, found "${t[this.i]}"`, pos, 'GML is a list of `key value` pairs; keys are letters, digits and _');
      this.i += key[0].length;
      this.skip();
      pairs.push(this.readValue(key[0], pos));
    }
  }

  private readValue(key: string, pos: SourcePos): GmlPair {
    const t = this.text;
    const vpos = this.here();
    if (this.i >= t.length) throw this.b.error(`key "${key}" has no value`, pos, 'give a number, a "string" or a [ list ]');
    const c = t[this.i];
    if (c === '[') {
      if (++this.depth > MAX_NESTING) {
        throw this.b.error(`lists nest deeper than ${MAX_NESTING} levels`, vpos, 'a GML design needs a few levels (graph, node, graphics); flatten this structure');
      }
      this.i++;
      const value = this.readList(vpos);
      this.depth--;
      return { key, value, raw: '', pos };
    }
    if (c === '"') {
      const start = this.i + 1;
      const end = t.indexOf('"', start);
      if (end < 0) throw this.b.error(`unterminated string for key "${key}"`, vpos, 'close it with a double quote');
      const raw = t.slice(start, end);
      for (let k = start; k < end; k++) {
        if (t.charCodeAt(k) === 10) {
          this.line++;
          this.lineStart = k + 1;
        }
      }
      this.i = end + 1;
      return { key, value: unescape(raw), raw, pos };
    }
    NUMBER.lastIndex = this.i;
    const num = NUMBER.exec(t);
    if (num) {
      this.i += num[0].length;
      return { key, value: Number(num[0]), raw: num[0], pos };
    }
    throw this.b.error(`value of "${key}" is not a number, a "string" or a [ list ]`, vpos);
  }
}

/** A nested list as a plain object for `attrs` (repeated keys become arrays). */
function toPlain(pairs: GmlPair[]): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const p of pairs) {
    const v = Array.isArray(p.value) ? toPlain(p.value) : p.value;
    if (p.key in out) {
      const prev = out[p.key];
      out[p.key] = Array.isArray(prev) ? [...prev, v] : [prev, v];
    } else out[p.key] = v;
  }
  return out;
}

function scalarId(p: GmlPair): string | undefined {
  if (Array.isArray(p.value)) return undefined;
  return typeof p.value === 'number' ? p.raw : p.value;
}

export function parseGml(text: string, file: string, options: BuilderOptions = {}, format: DesignFormat = 'gml'): Topology {
  const b = new TopologyBuilder(file, format, options);
  const top = new GmlReader(text, b).readList();
  const graph = top.find((p) => p.key === 'graph');
  if (!graph || !Array.isArray(graph.value)) {
    throw b.error('no "graph [ ... ]" list in this file', top[0]?.pos ?? { line: 1, column: 1 }, 'a GML design is `graph [ node [ id 1 ] ... edge [ source 1 target 2 ] ]`');
  }
  const metadata: Record<string, unknown> = {};
  let name: string | undefined;
  let network: string | undefined;
  const edges: GmlPair[] = [];
  for (const p of graph.value) {
    if (p.key === 'node' && Array.isArray(p.value)) readNode(p, p.value, b);
    else if (p.key === 'edge' && Array.isArray(p.value)) edges.push(p);
    else if (p.key === 'directed') {
      if (p.value !== 0) b.warn('the graph is directed ("directed 1"); links are read as undirected', p.pos);
    } else if (p.key === 'multigraph') {
      // Parallel links are always kept; the flag adds nothing.
    } else {
      if (p.key === 'label' && typeof p.value === 'string') name = p.value;
      if (p.key === 'Network' && typeof p.value === 'string') network = p.value;
      metadata[p.key] = Array.isArray(p.value) ? toPlain(p.value) : p.value;
    }
  }
  // Edges are resolved after all nodes, so a file may list them in any order.
  for (const e of edges) readEdge(e, e.value as GmlPair[], b);
  const resolved = name ?? network;
  return b.finish({ ...(resolved !== undefined ? { name: resolved } : {}), metadata });
}

function readNode(node: GmlPair, body: GmlPair[], b: TopologyBuilder): void {
  let id: string | undefined;
  const raw: Record<string, unknown> = {};
  const where = new Map<string, SourcePos>();
  for (const p of body) {
    if (p.key === 'id') {
      id = scalarId(p);
      if (id === undefined) throw b.error('node "id" must be a number or a string', p.pos);
      continue;
    }
    raw[p.key] = Array.isArray(p.value) ? toPlain(p.value) : p.value;
    where.set(p.key, p.pos);
  }
  if (id === undefined) throw b.error('node without "id"', node.pos, 'every GML node needs `id N`');
  const mapped = mapNodeAttributes(raw, b, (k) => where.get(k) ?? node.pos);
  b.addNode({ id, pos: node.pos, ...mapped });
}

function readEdge(edge: GmlPair, body: GmlPair[], b: TopologyBuilder): void {
  let source: GmlPair | undefined;
  let target: GmlPair | undefined;
  let id: string | undefined;
  const raw: Record<string, unknown> = {};
  const where = new Map<string, SourcePos>();
  for (const p of body) {
    if (p.key === 'source') source = p;
    else if (p.key === 'target') target = p;
    else if (p.key === 'id' && !Array.isArray(p.value)) id = scalarId(p);
    else {
      raw[p.key] = Array.isArray(p.value) ? toPlain(p.value) : p.value;
      where.set(p.key, p.pos);
    }
  }
  if (!source || !target) {
    throw b.error(`edge without "${source ? 'target' : 'source'}"`, edge.pos, 'every GML edge needs `source N target M`');
  }
  const s = scalarId(source);
  const d = scalarId(target);
  if (s === undefined || d === undefined) throw b.error('edge "source" and "target" must be node ids', edge.pos);
  const mapped = mapLinkAttributes(raw, b, (k) => where.get(k) ?? edge.pos);
  b.addLink({ what: id !== undefined ? `edge "${id}"` : 'edge', ...(id !== undefined ? { id } : {}), source: s, target: d, pos: edge.pos, sourcePos: source.pos, targetPos: target.pos, ...mapped });
}
