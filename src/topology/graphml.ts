// GraphML (Brandes et al., "GraphML Progress Report", Graph Drawing 2001; the schema at
// graphml.graphdrawing.org) read with saxes, a streaming XML parser that never fetches
// external entities. We also refuse any DOCTYPE that declares entities, before a single
// element is read: that is how "billion laughs" documents grow, and no GraphML needs one.
// Attributes are matched by their <key attr.name>; see attributes.ts for the mapping.

import { SaxesParser, type SaxesTagPlain } from 'saxes';
import type { DesignFormat, SourcePos, Topology } from './model.js';
import { TopologyBuilder, type BuilderOptions } from './builder.js';
import { mapLinkAttributes, mapNodeAttributes, toFlag, toNumber } from './attributes.js';
import { MAX_NESTING } from './nesting.js';

interface KeyDef {
  name: string;
  domain: string;
  type: string;
  default?: string;
}

interface Element {
  pos: SourcePos;
  attrs: Record<string, string>;
  data: Record<string, unknown>;
  dataPos: Map<string, SourcePos>;
  /** Each <data> as written, before its key's attr.type converted it (ids stay as written). */
  dataText: Map<string, string>;
  /** An edge that is a directed arc (its own `directed`, else its graph's `edgedefault`). */
  arc?: boolean;
}

/** Converts a <data> text by its key's attr.type; text that does not fit stays text. */
function typed(text: string, type: string): unknown {
  switch (type) {
    case 'int':
    case 'integer':
    case 'long':
    case 'float':
    case 'double':
      return toNumber(text) ?? text;
    case 'boolean':
      return toFlag(text) ?? text;
    default:
      return text;
  }
}

export function parseGraphml(
  text: string,
  file: string,
  options: BuilderOptions = {},
  format: DesignFormat = 'graphml',
): Topology {
  const b = new TopologyBuilder(file, format, options);
  const parser = new SaxesParser({ xmlns: false, position: true });
  const keys = new Map<string, KeyDef>();
  const nodes: Element[] = [];
  const edges: Element[] = [];
  const metadata: Record<string, unknown> = {};

  // What we are inside of: element names from the root, and the element being filled.
  const stack: string[] = [];
  let current: Element | undefined;
  let graphDepth = 0;
  /** edgedefault of each open <graph>, innermost last. */
  const directedGraphs: boolean[] = [];
  let currentKey: KeyDef | undefined;
  let dataKey: string | undefined;
  let dataPos: SourcePos = { line: 1, column: 1 };
  let dataText = '';
  let dataNested = false;
  let defaultText: string | undefined;
  let sawRoot = false;
  let warnedNested = false;
  let tagStart: SourcePos = { line: 1, column: 1 };
  let graphId: string | undefined;

  const here = (): SourcePos => ({ line: parser.line, column: parser.column + 1 });

  parser.on('error', (err) => {
    // saxes prefixes its own (0-based) position and ends with a full stop; we give ours.
    const message = err.message.replace(/^(?:[^:\n]*:)?\d+:\d+: /, '').replace(/\.$/, '');
    throw b.error(`malformed XML: ${message}`, here(), 'the file is not well-formed XML; check the tag at this point');
  });
  parser.on('doctype', (doctype) => {
    if (/<!ENTITY/i.test(doctype)) {
      throw b.error(
        'the XML declares entities in a DOCTYPE, which netbrace refuses',
        offsetPos(text, text.search(/<!DOCTYPE/i)),
        'entity declarations can expand without bound ("billion laughs"); GraphML needs none — remove the DOCTYPE',
      );
    }
  });
  parser.on('opentagstart', (tag) => {
    // saxes reports the position after the tag name and the character that ended it;
    // the tag began at its "<".
    tagStart = { line: parser.line, column: Math.max(1, parser.column - tag.name.length - 1) };
  });
  parser.on('opentag', (tag: SaxesTagPlain) => {
    const name = localName(tag.name);
    const attrs = tag.attributes as Record<string, string>;
    const pos = tagStart;
    stack.push(name);
    if (stack.length > MAX_NESTING) {
      throw b.error(
        `elements nest deeper than ${MAX_NESTING} levels`,
        pos,
        'GraphML needs a few levels (graphml, graph, node, data); flatten this structure',
      );
    }
    if (dataKey !== undefined) {
      dataNested = true; // markup inside <data> (drawing tools): keep only plain text values
      return;
    }
    switch (name) {
      case 'graphml':
        sawRoot = true;
        break;
      case 'key': {
        const id = attrs.id;
        if (id === undefined) throw b.error('<key> without an "id"', pos);
        currentKey = {
          name: attrs['attr.name'] ?? id,
          domain: attrs.for ?? 'all',
          type: attrs['attr.type'] ?? 'string',
        };
        keys.set(id, currentKey);
        break;
      }
      case 'default':
        if (currentKey) defaultText = '';
        break;
      case 'graph':
        graphDepth++;
        if (graphDepth === 1 && attrs.id) graphId = attrs.id;
        if (graphDepth > 1 && !warnedNested) {
          warnedNested = true;
          b.warn('nested <graph> found; its nodes and edges are read into the one design', pos);
        }
        directedGraphs.push(attrs.edgedefault === 'directed');
        if (attrs.edgedefault === 'directed') b.directed(pos, 'edgedefault="directed"');
        break;
      case 'node':
        if (attrs.id === undefined) throw b.error('<node> without an "id"', pos, 'every GraphML node needs id="..."');
        current = { pos, attrs, data: {}, dataPos: new Map(), dataText: new Map() };
        nodes.push(current);
        break;
      case 'edge':
        if (attrs.source === undefined || attrs.target === undefined) {
          throw b.error(
            `<edge> without a "${attrs.source === undefined ? 'source' : 'target'}"`,
            pos,
            'every GraphML edge needs source="..." and target="..."',
          );
        }
        if (attrs.directed === 'true') b.directed(pos, 'an edge has directed="true"');
        current = {
          pos,
          attrs,
          data: {},
          dataPos: new Map(),
          dataText: new Map(),
          arc:
            attrs.directed === 'true' ||
            (attrs.directed !== 'false' && directedGraphs[directedGraphs.length - 1] === true),
        };
        edges.push(current);
        break;
      case 'hyperedge':
        b.warn('<hyperedge> is not supported and was skipped', pos);
        break;
      case 'data':
        dataKey = attrs.key ?? '';
        dataPos = pos;
        dataText = '';
        dataNested = false;
        break;
      default:
        break;
    }
  });
  const onText = (t: string) => {
    if (dataKey !== undefined && !dataNested) dataText += t;
    else if (defaultText !== undefined) defaultText += t;
  };
  parser.on('text', onText);
  parser.on('cdata', onText);
  parser.on('closetag', (tag) => {
    const name = localName(tag.name);
    stack.pop();
    if (dataKey !== undefined && name !== 'data') return;
    switch (name) {
      case 'data': {
        const def = keys.get(dataKey ?? '');
        const attrName = def?.name ?? dataKey ?? '';
        const written = dataNested ? dataText.trim() : dataText;
        const value = typed(written, def?.type ?? 'string');
        if (current) {
          current.data[attrName] = value;
          current.dataPos.set(attrName, dataPos);
          current.dataText.set(attrName, written);
        } else if (graphDepth > 0) {
          metadata[attrName] = value;
        }
        dataKey = undefined;
        break;
      }
      case 'default':
        if (currentKey && defaultText !== undefined) currentKey.default = defaultText;
        defaultText = undefined;
        break;
      case 'key':
        currentKey = undefined;
        break;
      case 'node':
      case 'edge':
        current = undefined;
        break;
      case 'graph':
        graphDepth--;
        directedGraphs.pop();
        break;
      default:
        break;
    }
  });

  parser.write(text).close();
  if (!sawRoot)
    throw b.error('no <graphml> element in this file', { line: 1, column: 1 }, 'is this really a GraphML file?');

  // Defaults from <key><default>, for elements that do not set the attribute themselves.
  const defaults = (domain: string) =>
    [...keys.values()].filter((k) => k.default !== undefined && (k.domain === domain || k.domain === 'all'));
  const nodeDefaults = defaults('node');
  const edgeDefaults = defaults('edge');
  const withDefaults = (el: Element, defs: KeyDef[]) => {
    for (const k of defs) {
      if (k.name in el.data) continue;
      el.data[k.name] = typed(k.default!, k.type);
      el.dataText.set(k.name, k.default!);
    }
    return el.data;
  };
  const sourceOf = (el: Element) => ({
    pos: (k: string) => el.dataPos.get(k) ?? el.pos,
    text: (k: string) => el.dataText.get(k),
  });

  for (const n of nodes) {
    const mapped = mapNodeAttributes(withDefaults(n, nodeDefaults), b, sourceOf(n));
    b.addNode({ id: n.attrs.id, pos: n.pos, ...mapped });
  }
  // Edges are resolved after all nodes: GraphML allows them in any order.
  for (const e of edges) {
    const data = withDefaults(e, edgeDefaults);
    let id: string | undefined = e.attrs.id;
    if (id === undefined && 'id' in data) {
      id = e.dataText.get('id') ?? String(data.id);
      delete data.id;
    }
    const mapped = mapLinkAttributes(data, b, sourceOf(e));
    b.addLink({
      what: id !== undefined ? `edge "${id}"` : 'edge',
      ...(id !== undefined ? { id } : {}),
      source: e.attrs.source,
      target: e.attrs.target,
      pos: e.pos,
      ...mapped,
      ...(e.arc ? { arc: true } : {}),
    });
  }

  const name = metadata.label ?? metadata.Network ?? metadata.name ?? graphId;
  return b.finish({ ...(typeof name === 'string' ? { name } : {}), metadata });
}

/** 1-based line and column of a string offset (for the rare error found outside saxes). */
function offsetPos(text: string, offset: number): SourcePos {
  if (offset < 0) return { line: 1, column: 1 };
  let line = 1;
  let start = 0;
  for (let i = text.indexOf('\n'); i >= 0 && i < offset; i = text.indexOf('\n', i + 1)) {
    line++;
    start = i + 1;
  }
  return { line, column: offset - start + 1 };
}

/** `y:ShapeNode` → `ShapeNode`; GraphML's own elements are unprefixed or in its namespace. */
function localName(qname: string): string {
  const colon = qname.indexOf(':');
  return colon < 0 ? qname : qname.slice(colon + 1);
}
