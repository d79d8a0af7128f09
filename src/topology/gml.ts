// GML (Himsholt, "GML: A portable Graph File Format", Universität Passau, 1997): a tree of
// `key value` pairs where a value is an integer, a real, a "string" or a [ list ].
// No library fits (we need every element's line and column), so this is a small tokenizer
// and recursive-descent reader of our own. Directed graphs are read as undirected (reverse
// arcs merged, builder.ts); one flat graph per file: a second graph or a nested one is refused.

import type { DesignFormat, SourcePos, Topology } from './model.js';
import { TopologyBuilder, type BuilderOptions } from './builder.js';
import { isLinkField, isNodeField, mapLinkAttributes, mapNodeAttributes } from './attributes.js';
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
          throw this.b.error(
            'unclosed "[": the list is never closed with "]"',
            open,
            'add the missing "]" (check the brackets above the end of the file)',
          );
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
      if (!key)
        throw this.b.error(
          `expected a key, found "${t[this.i]}"`,
          pos,
          'GML is a list of `key value` pairs; keys are letters, digits and _',
        );
      this.i += key[0].length;
      this.skip();
      pairs.push(this.readValue(key[0], pos));
    }
  }

  private readValue(key: string, pos: SourcePos): GmlPair {
    const t = this.text;
    const vpos = this.here();
    if (this.i >= t.length)
      throw this.b.error(`key "${key}" has no value`, pos, 'give a number, a "string" or a [ list ]');
    const c = t[this.i];
    if (c === '[') {
      if (++this.depth > MAX_NESTING) {
        throw this.b.error(
          `lists nest deeper than ${MAX_NESTING} levels`,
          vpos,
          'a GML design needs a few levels (graph, node, graphics); flatten this structure',
        );
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

export function parseGml(
  text: string,
  file: string,
  options: BuilderOptions = {},
  format: DesignFormat = 'gml',
): Topology {
  const b = new TopologyBuilder(file, format, options);
  const top = new GmlReader(text, b).readList();
  const graphs = top.filter((p) => p.key === 'graph');
  const graph = graphs[0];
  if (!graph || !Array.isArray(graph.value)) {
    throw b.error(
      'no "graph [ ... ]" list in this file',
      top[0]?.pos ?? { line: 1, column: 1 },
      'a GML design is `graph [ node [ id 1 ] ... edge [ source 1 target 2 ] ]`',
    );
  }
  if (graphs.length > 1) {
    throw b.error(
      `a second top-level graph (the first begins on line ${graph.pos.line})`,
      graphs[1].pos,
      'netbrace reads one design per file: put each graph in a file of its own',
    );
  }
  refuseNestedGraphs(graph.value, b);
  const metadata: Record<string, unknown> = {};
  let name: string | undefined;
  let network: string | undefined;
  let directed = false;
  const edges: GmlPair[] = [];
  for (const p of graph.value) {
    if (p.key === 'node' && Array.isArray(p.value)) readNode(p, p.value, b);
    else if (p.key === 'edge' && Array.isArray(p.value)) edges.push(p);
    else if (p.key === 'directed') {
      if (p.value !== 0) {
        directed = true;
        b.directed(p.pos, '"directed 1"');
      }
    } else if (p.key === 'multigraph') {
      // Parallel links are always kept; the flag adds nothing.
    } else {
      if (p.key === 'label' && typeof p.value === 'string') name = p.value;
      if (p.key === 'Network' && typeof p.value === 'string') network = p.value;
      metadata[p.key] = Array.isArray(p.value) ? toPlain(p.value) : p.value;
    }
  }
  // Edges are resolved after all nodes, so a file may list them in any order.
  for (const e of edges) readEdge(e, e.value as GmlPair[], b, directed);
  const resolved = name ?? network;
  return b.finish({ ...(resolved !== undefined ? { name: resolved } : {}), metadata });
}

/**
 * Hierarchical GML (a graph inside the graph, or inside a node) is not read: refused where it
 * begins, rather than its nodes and edges silently left out.
 */
function refuseNestedGraphs(pairs: GmlPair[], b: TopologyBuilder): void {
  for (const p of pairs) {
    if (!Array.isArray(p.value)) continue;
    if (p.key === 'graph') {
      throw b.error(
        'a nested graph: netbrace reads one flat graph per file',
        p.pos,
        'list its nodes and edges in the top-level graph (node ids must stay unique)',
      );
    }
    refuseNestedGraphs(p.value, b);
  }
}

/**
 * The pairs of a node or edge body as attributes: a key netbrace reads (`read(key)`) may be
 * written once — a second one is refused with both lines, not silently the one that counts;
 * other repeated keys are kept, as a list of their values.
 */
function bodyAttributes(body: GmlPair[], what: string, b: TopologyBuilder, read: (key: string) => boolean) {
  const raw: Record<string, unknown> = {};
  const where = new Map<string, SourcePos>();
  const written = new Map<string, string>();
  const first = new Map<string, GmlPair>();
  const repeated = new Set<string>();
  for (const p of body) {
    const value = Array.isArray(p.value) ? toPlain(p.value) : p.value;
    const earlier = first.get(p.key);
    if (earlier !== undefined) {
      if (read(p.key)) {
        throw b.error(
          `${what} has "${p.key}" twice (lines ${earlier.pos.line} and ${p.pos.line})`,
          p.pos,
          `keep one; the first is on line ${earlier.pos.line}`,
        );
      }
      raw[p.key] = repeated.has(p.key) ? [...(raw[p.key] as unknown[]), value] : [raw[p.key], value];
      repeated.add(p.key);
      continue;
    }
    first.set(p.key, p);
    raw[p.key] = value;
    where.set(p.key, p.pos);
    if (typeof p.value === 'number') written.set(p.key, p.raw);
  }
  return { raw, where, written, first };
}

function readNode(node: GmlPair, body: GmlPair[], b: TopologyBuilder): void {
  const { raw, where, written, first } = bodyAttributes(
    body,
    `the node on line ${node.pos.line}`,
    b,
    (k) => k === 'id' || isNodeField(k),
  );
  const idPair = first.get('id');
  if (idPair === undefined) throw b.error('node without "id"', node.pos, 'every GML node needs `id N`');
  const id = scalarId(idPair);
  if (id === undefined) throw b.error('node "id" must be a number or a string', idPair.pos);
  delete raw.id;
  const mapped = mapNodeAttributes(raw, b, { pos: (k) => where.get(k) ?? node.pos, text: (k) => written.get(k) });
  b.addNode({ id, pos: node.pos, ...mapped });
}

function readEdge(edge: GmlPair, body: GmlPair[], b: TopologyBuilder, directed: boolean): void {
  const ends = (k: string) => k === 'id' || k === 'source' || k === 'target';
  const { raw, where, written, first } = bodyAttributes(
    body,
    `the edge on line ${edge.pos.line}`,
    b,
    (k) => ends(k) || isLinkField(k),
  );
  const source = first.get('source');
  const target = first.get('target');
  const idPair = first.get('id');
  const id = idPair !== undefined ? scalarId(idPair) : undefined;
  // A list under `id` is not an id; it stays an attribute.
  if (id !== undefined) delete raw.id;
  delete raw.source;
  delete raw.target;
  if (!source || !target) {
    throw b.error(
      `edge without "${source ? 'target' : 'source'}"`,
      edge.pos,
      'every GML edge needs `source N target M`',
    );
  }
  const s = scalarId(source);
  const d = scalarId(target);
  if (s === undefined || d === undefined) throw b.error('edge "source" and "target" must be node ids', edge.pos);
  const mapped = mapLinkAttributes(raw, b, { pos: (k) => where.get(k) ?? edge.pos, text: (k) => written.get(k) });
  b.addLink({
    what: id !== undefined ? `edge "${id}"` : 'edge',
    ...(id !== undefined ? { id } : {}),
    source: s,
    target: d,
    pos: edge.pos,
    sourcePos: source.pos,
    targetPos: target.pos,
    ...mapped,
    ...(directed ? { arc: true } : {}),
  });
}
