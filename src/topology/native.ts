// Our own design format, YAML (.net.yaml) or the same structure as JSON (.net.json).
// Both are read with the `yaml` package (JSON is YAML 1.2's flow subset), because it keeps
// every node's source offset — so schema errors point at the line a user has to fix — and
// because it caps alias expansion (a "billion laughs" document must fail, not eat memory).
// The structure is validated against design.schema.json with ajv, then checked for what a
// schema cannot say (ids unique, link and demand ends declared).

import type { ErrorObject } from 'ajv';
import {
  isAlias,
  isCollection,
  isMap,
  isPair,
  isScalar,
  LineCounter,
  parseDocument,
  visit,
  type Document,
  type Node as YamlNode,
} from 'yaml';
import { DesignError } from '../errors.js';
import { designValidator } from './design-validator.js';
import type { DesignFormat, SourcePos, Topology } from './model.js';
import { TopologyBuilder, type BuilderOptions } from './builder.js';
import { didYouMean } from './suggest.js';
import { firstNonNormal, quantityProblem, type Quantity } from './quantities.js';
import { MAX_NESTING, positionOf, yamlNestingExceeded } from './nesting.js';
import { lineColumn, readFastYaml, type FastYaml } from './fast-yaml.js';

/**
 * Aliases a document may expand. Real designs rarely use anchors at all; the yaml package's
 * default (100) already stops exponential growth, and a lower cap fails sooner.
 */
export const MAX_ALIAS_COUNT = 50;

type Path = (string | number)[];

/** What the design reader asks of either YAML reader about where things are written. */
interface Positions {
  pos(path: Path): SourcePos;
  keyPos(path: Path, name: string): SourcePos;
  source(path: Path): string | undefined;
  written(path: Path, prefix: string, suffix: string): string;
}

/** Positions from the fast reader's offsets (paths that exist; errors go to the full reader). */
class FastLocator implements Positions {
  constructor(private readonly y: FastYaml) {}

  /** The parent collection of the value at `path` and the child's index in its offsets. */
  private slot(path: Path): { at: number; src: string | undefined } | undefined {
    let cur: unknown = this.y.data;
    let found: { at: number; src: string | undefined } | undefined;
    for (const key of path) {
      if (cur === null || typeof cur !== 'object') return undefined;
      found = this.y.child(cur, key);
      if (!found) return undefined;
      cur = (cur as Record<string | number, unknown>)[key];
    }
    return found;
  }

  pos(path: Path): SourcePos {
    const s = this.slot(path);
    if (s) return lineColumn(this.y.lineStarts, s.at);
    const w =
      path.length === 0 && typeof this.y.data === 'object' && this.y.data ? this.y.start(this.y.data) : undefined;
    return w !== undefined ? lineColumn(this.y.lineStarts, w) : { line: 1, column: 1 };
  }

  keyPos(path: Path): SourcePos {
    return this.pos(path);
  }

  source(path: Path): string | undefined {
    return this.slot(path)?.src;
  }

  written(path: Path, prefix: string, suffix: string): string {
    const s = this.source(path);
    return s === undefined ? '' : `${prefix}${s}${suffix}`;
  }
}

/** Finds source positions in the parsed YAML document. */
class Locator implements Positions {
  constructor(
    private readonly doc: Document,
    private readonly lines: LineCounter,
  ) {}

  at(offset: number): SourcePos {
    const p = this.lines.linePos(offset);
    return { line: p.line, column: p.col };
  }

  private child(node: unknown, key: string | number): unknown {
    if (isAlias(node)) node = node.resolve(this.doc);
    if (!isCollection(node)) return undefined;
    // A list index is direct: scanning the items would make every lookup O(n), and a
    // design's positions O(n²) (minutes for a few tens of thousands of nodes).
    if (typeof key === 'number' && !isMap(node)) return node.items[key];
    for (const item of node.items) {
      if (isPair(item)) {
        const k = isScalar(item.key) ? item.key.value : item.key;
        if (String(k) === String(key)) return item.value;
      }
    }
    return undefined;
  }

  /** The YAML node at a path (the deepest one that exists) and whether it was found whole. */
  node(path: Path): { node: YamlNode | undefined; exact: boolean } {
    let cur: unknown = this.doc.contents;
    let last: YamlNode | undefined = (cur as YamlNode | null) ?? undefined;
    for (const key of path) {
      const next = this.child(cur, key);
      if (next === undefined || next === null) return { node: last, exact: false };
      cur = next;
      last = next as YamlNode;
    }
    return { node: last, exact: true };
  }

  /** The source text of the plain scalar at `path` (a number as written), if there is one. */
  source(path: Path): string | undefined {
    const found = this.node(path);
    let node = found.node;
    if (!found.exact) return undefined;
    if (isAlias(node)) node = node.resolve(this.doc) as YamlNode | undefined;
    return isScalar(node) && typeof node.source === 'string' ? node.source : undefined;
  }

  /** `prefix + source + suffix` when the scalar at `path` has source text, else ''. */
  written(path: Path, prefix: string, suffix: string): string {
    const s = this.source(path);
    return s === undefined ? '' : `${prefix}${s}${suffix}`;
  }

  pos(path: Path): SourcePos {
    const { node } = this.node(path);
    return node?.range ? this.at(node.range[0]) : { line: 1, column: 1 };
  }

  /** Where the key `name` of the map at `path` is written. */
  keyPos(path: Path, name: string): SourcePos {
    let { node } = this.node(path);
    if (isAlias(node)) node = node.resolve(this.doc) as YamlNode | undefined;
    if (isMap(node)) {
      for (const item of node.items) {
        const k = item.key;
        if (isScalar(k) && String(k.value) === name && k.range) return this.at(k.range[0]);
      }
    }
    return this.pos(path);
  }
}

/** `links[2].length_km` from ajv's `/links/2/length_km`. */
function pathText(path: Path): string {
  let s = '';
  for (const k of path) s += typeof k === 'number' ? `[${k}]` : s === '' ? k : `.${k}`;
  return s === '' ? 'the design' : s;
}

function splitPointer(pointer: string): Path {
  if (pointer === '') return [];
  return pointer
    .slice(1)
    .split('/')
    .map((seg) => seg.replace(/~1/g, '/').replace(/~0/g, '~'))
    .map((seg) => (/^\d+$/.test(seg) ? Number(seg) : seg));
}

function describe(v: unknown): string {
  if (v === null) return 'empty (null)';
  if (Array.isArray(v)) return 'a list';
  if (typeof v === 'string') return `the text "${v.length > 40 ? `${v.slice(0, 40)}…` : v}"`;
  if (typeof v === 'object') return 'a mapping';
  return `${typeof v} ${String(v)}`;
}

const TYPE_WORDS: Readonly<Record<string, string>> = {
  number: 'a number',
  integer: 'a whole number',
  string: 'text',
  boolean: 'true or false',
  object: 'a mapping (key: value)',
  array: 'a list',
  'string,integer': 'an id (text or a whole number)',
};

/** One ajv error as a located DesignError. */
function toDesignError(e: ErrorObject, file: string, loc: Positions): DesignError {
  const path = splitPointer(e.instancePath);
  const where = (pos: SourcePos) => ({ file, line: pos.line, column: pos.column });
  const what = pathText(path);
  const params = e.params as Record<string, unknown>;
  switch (e.keyword) {
    case 'additionalProperties': {
      const key = String(params.additionalProperty);
      const allowed = Object.keys((e.parentSchema as { properties?: object } | undefined)?.properties ?? {});
      return new DesignError(
        `unknown key "${key}" in ${what}`,
        where(loc.keyPos(path, key)),
        didYouMean(key, allowed, `allowed keys: ${allowed.join(', ')}`),
      );
    }
    case 'required': {
      const key = String(params.missingProperty);
      if (key === 'between' && path[0] === 'links') {
        return new DesignError(
          `${what} has no ends: "between" is missing`,
          where(loc.pos(path)),
          'write between: [node-a, node-b]',
        );
      }
      return new DesignError(`${what} is missing the required key "${key}"`, where(loc.pos(path)));
    }
    case 'type': {
      const want = TYPE_WORDS[String(params.type)] ?? String(params.type);
      return new DesignError(
        `${what} must be ${want}, not ${describe(e.data)}`,
        where(loc.pos(path)),
        e.data === null ? 'give a value after the colon, or remove the key' : '',
      );
    }
    case 'minItems':
    case 'maxItems': {
      const n = Array.isArray(e.data) ? e.data.length : 0;
      if (path[path.length - 1] === 'between') {
        return new DesignError(
          `${what} needs exactly two node ids, found ${n}`,
          where(loc.pos(path)),
          n < 2
            ? 'a link end is missing: write between: [node-a, node-b]'
            : 'a link joins two nodes; write one link per pair',
        );
      }
      return new DesignError(`${what} ${e.message ?? 'has the wrong number of items'}`, where(loc.pos(path)));
    }
    case 'minimum':
    case 'exclusiveMinimum': {
      const limit = Number(params.limit);
      const message =
        limit === 0
          ? `${what} must not be negative (found ${String(e.data)})`
          : `${what} must be at least ${limit} (found ${String(e.data)})`;
      return new DesignError(message, where(loc.pos(path)));
    }
    case 'maximum':
      return new DesignError(
        `${what} must be at most ${String(params.limit)} (found ${String(e.data)})`,
        where(loc.pos(path)),
      );
    case 'minLength':
      return new DesignError(`${what} must not be empty`, where(loc.pos(path)));
    default:
      return new DesignError(`${what} ${e.message ?? 'is not valid'}`, where(loc.pos(path)));
  }
}

/** The error a user should fix first: the earliest in the file. */
function firstError(errors: readonly ErrorObject[], file: string, loc: Positions): DesignError {
  const located = errors.map((e) => toDesignError(e, file, loc));
  located.sort((a, b) => a.line - b.line || a.column - b.column);
  return located[0];
}

interface NativeDesign {
  network?: { name?: string; description?: string };
  nodes: {
    id: string | number;
    label?: string;
    kind?: string;
    site?: { lat: number; lon: number };
    hardened?: boolean;
    attributes?: Record<string, unknown>;
  }[];
  links?: {
    id?: string | number;
    between: [string | number, string | number];
    length_km?: number;
    latency_ms?: number;
    capacity_gbps?: number;
    weight?: number;
    risk_groups?: (string | number)[];
    hardened?: boolean;
    attributes?: Record<string, unknown>;
  }[];
  risk_groups?: { id: string | number; description?: string }[];
  demands?: { between: [string | number, string | number]; volume: number }[];
  latency_budget?: number;
  metadata?: Record<string, unknown>;
}

export function parseNative(
  text: string,
  file: string,
  options: BuilderOptions = {},
  format: DesignFormat = 'native-yaml',
  fast = true,
): Topology {
  // The fast reader first (fast-yaml.ts); it declines what it does not cover. Anything the
  // design gets wrong is then reported by the full reader below, so every message and
  // position a user sees comes from one place.
  if (fast && format === 'native-yaml') {
    const read = readFastYaml(text);
    if (read) {
      try {
        return buildDesign(read.data, new FastLocator(read), [], file, options, format);
      } catch {
        // fall through: the full reader gives the located message
      }
    }
  }
  const kindWord = format === 'native-json' ? 'JSON' : 'YAML';
  const deep = yamlNestingExceeded(text);
  if (deep >= 0) {
    throw new DesignError(
      `the ${kindWord} nests deeper than ${MAX_NESTING} levels`,
      { file, ...positionOf(text, deep) },
      'a design needs a few levels of nesting; flatten this structure',
    );
  }
  const lines = new LineCounter();
  const doc = parseDocument(text, { lineCounter: lines, prettyErrors: false, uniqueKeys: true, strict: true });
  const loc = new Locator(doc, lines);
  if (doc.errors.length > 0) {
    const e = doc.errors[0];
    if (e.code === 'DUPLICATE_KEY') {
      throw new DesignError(
        `${kindWord}: a key appears twice in the same mapping`,
        { file, ...loc.at(e.pos[0]) },
        'keep one of them',
      );
    }
    const message = e.message.split('\n')[0].replace(/ at line \d+, column \d+:?$/, '');
    throw new DesignError(
      `${kindWord} syntax error: ${message}`,
      { file, ...loc.at(e.pos[0]) },
      'fix the syntax at this point (check indentation, colons and quotes)',
    );
  }

  let data: unknown;
  try {
    data = doc.toJS({ maxAliasCount: MAX_ALIAS_COUNT });
  } catch (e) {
    if (e instanceof ReferenceError || (e instanceof Error && /alias/i.test(e.message))) {
      // Point at the first alias: that is where the expansion starts.
      let first: SourcePos = { line: 1, column: 1 };
      visit(doc, {
        Alias(_, node) {
          if (node.range) first = loc.at(node.range[0]);
          return visit.BREAK;
        },
      });
      throw new DesignError(
        'too many YAML aliases are expanded (this looks like an alias bomb)',
        { file, ...first },
        `netbrace expands at most ${MAX_ALIAS_COUNT} aliases; write the values out instead of using *aliases`,
      );
    }
    throw e;
  }
  if (data === null || data === undefined) {
    throw new DesignError(
      `the ${kindWord} design is empty`,
      { file, line: 1, column: 1 },
      'a design needs at least `nodes:`',
    );
  }
  return buildDesign(
    data,
    loc,
    doc.warnings.map((w) => ({ message: w.message, pos: loc.at(w.pos[0]) })),
    file,
    options,
    format,
  );
}

/** The plain values of a design (from either reader) → its Topology, or a located error. */
function buildDesign(
  data: unknown,
  loc: Positions,
  warnings: readonly { message: string; pos: SourcePos }[],
  file: string,
  options: BuilderOptions,
  format: DesignFormat,
): Topology {
  const kindWord = format === 'native-json' ? 'JSON' : 'YAML';
  // Before the schema, which would call Infinity "not a number" without saying why.
  const odd = firstNonNormal(data, [], new Set(['metadata']));
  if (odd) {
    throw new DesignError(
      `${pathText(odd.path)} ${odd.why}${loc.written(odd.path, ' (written ', ')')}`,
      { file, ...loc.pos(odd.path) },
      'write a plain decimal number',
    );
  }
  const check = designValidator();
  if (!check(data)) throw firstError(check.errors ?? [], file, loc);
  const d = data as NativeDesign;
  /** An id as written: `0x10` and `16` are two ids, and 12345678901234567890 keeps its digits. */
  const idAt = (path: Path, v: string | number): string =>
    typeof v === 'string' ? v : (loc.source(path) ?? String(v));
  /** A measured quantity, refused at its line when it is out of range (quantities.ts). */
  const quantity = (kind: Quantity, path: Path, v: number | undefined): number | undefined => {
    if (v === undefined) return undefined;
    const problem = quantityProblem(kind, v, loc.source(path));
    if (problem)
      throw new DesignError(`${pathText(path)} ${problem.message}`, { file, ...loc.pos(path) }, problem.hint);
    return v;
  };

  const b = new TopologyBuilder(file, format, { ...options, duplicateLinkIds: 'error' });
  for (const w of warnings) b.warn(`${kindWord}: ${w.message.split('\n')[0]}`, w.pos);

  d.nodes.forEach((n, i) => {
    b.addNode({
      id: idAt(['nodes', i, 'id'], n.id),
      pos: loc.pos(['nodes', i]),
      ...(n.label !== undefined ? { label: n.label } : {}),
      ...(n.kind !== undefined ? { kind: n.kind } : {}),
      ...(n.site ? { lat: n.site.lat, lon: n.site.lon } : {}),
      hardened: n.hardened ?? false,
      ...(n.attributes ? { attrs: n.attributes } : {}),
    });
  });
  (d.risk_groups ?? []).forEach((g, i) => {
    b.addRiskGroup({
      id: idAt(['risk_groups', i, 'id'], g.id),
      pos: loc.pos(['risk_groups', i]),
      ...(g.description !== undefined ? { description: g.description } : {}),
    });
  });
  (d.links ?? []).forEach((l, i) => {
    const at = ['links', i];
    const id = l.id !== undefined ? idAt([...at, 'id'], l.id) : undefined;
    const length = quantity('length', [...at, 'length_km'], l.length_km);
    const latency = quantity('latency', [...at, 'latency_ms'], l.latency_ms);
    const capacity = quantity('capacity', [...at, 'capacity_gbps'], l.capacity_gbps);
    const weight = quantity('weight', [...at, 'weight'], l.weight);
    b.addLink({
      what: id !== undefined ? `link "${id}" (links[${i}])` : `links[${i}]`,
      ...(id !== undefined ? { id } : {}),
      source: idAt([...at, 'between', 0], l.between[0]),
      target: idAt([...at, 'between', 1], l.between[1]),
      pos: loc.pos(at),
      sourcePos: loc.pos([...at, 'between', 0]),
      targetPos: loc.pos([...at, 'between', 1]),
      ...(length !== undefined ? { length } : {}),
      ...(latency !== undefined ? { latency } : {}),
      ...(capacity !== undefined ? { capacity } : {}),
      ...(weight !== undefined ? { weight } : {}),
      riskGroups: (l.risk_groups ?? []).map((g, k) => idAt([...at, 'risk_groups', k], g)),
      hardened: l.hardened ?? false,
      ...(l.attributes ? { attrs: l.attributes } : {}),
    });
  });
  (d.demands ?? []).forEach((dm, i) => {
    const at = ['demands', i];
    const volume = quantity('volume', [...at, 'volume'], dm.volume)!;
    b.addDemand(
      idAt([...at, 'between', 0], dm.between[0]),
      idAt([...at, 'between', 1], dm.between[1]),
      volume,
      loc.pos(at),
      [loc.pos([...at, 'between', 0]), loc.pos([...at, 'between', 1])],
      `demands[${i}]`,
    );
  });

  const t = b.finish({
    ...(d.network?.name !== undefined ? { name: d.network.name } : {}),
    ...(d.latency_budget !== undefined ? { latencyBudget: d.latency_budget } : {}),
    metadata: d.metadata ?? {},
  });
  if (d.network?.description !== undefined) t.description = d.network.description;
  return t;
}
