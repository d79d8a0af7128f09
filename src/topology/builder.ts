// The one place where every parser turns what it read into a Topology, so that all four
// formats agree on the rules: ids are unique, link ends must exist, self-loops are dropped
// with a warning, parallel links are kept (physical redundancy) with distinct stable keys,
// the arcs of a directed file pair up with their reverse arcs into one undirected link, and
// the element limit is applied as elements arrive rather than after the fact.

import { DesignError, LimitError, type Diagnostic } from '../errors.js';
import { didYouMean } from './suggest.js';
import {
  DEFAULT_MAX_ELEMENTS,
  linkKey,
  type Demand,
  type DesignFormat,
  type RiskGroup,
  type SourcePos,
  type TopoLink,
  type TopoNode,
  type Topology,
} from './model.js';

export interface NodeInput {
  id: string;
  pos: SourcePos;
  label?: string;
  kind?: string;
  lat?: number;
  lon?: number;
  hardened?: boolean;
  attrs?: Record<string, unknown>;
}

export interface LinkInput {
  /** How messages name this link (default: `link "id"` or `link`), e.g. `links[3]`. */
  what?: string;
  /** The file's own id, if it gives one. */
  id?: string;
  source: string;
  target: string;
  pos: SourcePos;
  /** Where each end is written, for "unknown node" errors (defaults to pos). */
  sourcePos?: SourcePos;
  targetPos?: SourcePos;
  length?: number;
  latency?: number;
  capacity?: number;
  weight?: number;
  riskGroups?: string[];
  hardened?: boolean;
  attrs?: Record<string, unknown>;
  /**
   * A directed arc source → target (GraphML `directed`, GML `directed 1`). Links are
   * undirected: an arc and a later arc the other way between the same nodes are one link.
   */
  arc?: boolean;
}

export interface BuilderOptions {
  maxElements?: number;
  /**
   * What to do when two links carry the same file id: interchange formats (written by
   * many tools) fall back to the derived id with a warning; our own format refuses.
   */
  duplicateLinkIds?: 'warn' | 'error';
}

/**
 * Longest element id accepted, in UTF-16 code units. Ids are repeated in every message,
 * table row, annotation and fingerprint that names an element, and compared by edit distance
 * for "did you mean"; a bound keeps a hostile 1 MB id from multiplying into every output.
 * Long human names belong in `label`.
 */
export const MAX_ID_LENGTH = 256;

/** Link end separator in derived ids and keys (an em dash, as in linkKey). */
const DASH = '\u2014';

export class TopologyBuilder {
  readonly file: string;
  readonly format: DesignFormat;
  private readonly maxElements: number;
  private readonly duplicateLinkIds: 'warn' | 'error';
  private readonly nodes: TopoNode[] = [];
  private readonly links: TopoLink[] = [];
  private readonly nodeLine = new Map<string, SourcePos>();
  private readonly linkIds = new Map<string, SourcePos>();
  /** Occurrences of each unordered end pair so far, for parallel-link keys. */
  private readonly pairCount = new Map<string, number>();
  private readonly warnings: Diagnostic[] = [];
  private readonly riskGroups: RiskGroup[] = [];
  private readonly riskGroupPos = new Map<string, SourcePos>();
  private readonly demands: Demand[] = [];
  /** Arcs not yet paired with a reverse arc, by `source\0target`, oldest first. */
  private readonly openArcs = new Map<string, TopoLink[]>();
  private directedAt: { pos: SourcePos; how: string } | undefined;
  private mergedArcs = 0;

  constructor(file: string, format: DesignFormat, options: BuilderOptions = {}) {
    this.file = file;
    this.format = format;
    this.maxElements = options.maxElements ?? DEFAULT_MAX_ELEMENTS;
    this.duplicateLinkIds = options.duplicateLinkIds ?? 'warn';
  }

  get nodeCount(): number {
    return this.nodes.length;
  }

  hasNode(id: string): boolean {
    return this.nodeLine.has(id);
  }

  /** A located DesignError in this file. */
  error(message: string, pos: SourcePos | undefined, hint = ''): DesignError {
    return new DesignError(message, { file: this.file, line: pos?.line ?? 0, column: pos?.column ?? 0 }, hint);
  }

  warn(message: string, pos: SourcePos | undefined, hint?: string): void {
    this.warnings.push({
      file: this.file,
      line: pos?.line ?? 0,
      column: pos?.column ?? 0,
      severity: 'warning',
      message,
      ...(hint ? { hint } : {}),
    });
  }

  /** Refuses an id longer than MAX_ID_LENGTH (LimitError at the element). */
  checkId(id: string, what: string, pos: SourcePos | undefined): void {
    if (id.length <= MAX_ID_LENGTH) return;
    throw new LimitError(
      `${what} is ${id.length} characters long; netbrace accepts ids of at most ${MAX_ID_LENGTH} ("${id.slice(0, 24)}\u2026")`,
      { file: this.file, line: pos?.line ?? 0, column: pos?.column ?? 0 },
      'use a short id and put the long name in a label',
    );
  }

  private countElement(pos: SourcePos): void {
    if (this.nodes.length + this.links.length >= this.maxElements) {
      throw new LimitError(
        `the design has more than ${this.maxElements} elements (nodes + links)`,
        { file: this.file, line: pos.line, column: pos.column },
        'split the design, or raise the element limit if this size is intended',
      );
    }
  }

  addNode(input: NodeInput): void {
    this.checkId(input.id, 'a node id', input.pos);
    const first = this.nodeLine.get(input.id);
    if (first !== undefined) {
      throw this.error(
        `duplicate node id "${input.id}"`,
        input.pos,
        `first defined on line ${first.line}; node ids must be unique`,
      );
    }
    this.countElement(input.pos);
    this.nodeLine.set(input.id, input.pos);
    const node: TopoNode = {
      id: input.id,
      hardened: input.hardened ?? false,
      pos: input.pos,
      attrs: input.attrs ?? {},
    };
    if (input.label !== undefined) node.label = input.label;
    if (input.kind !== undefined) node.kind = input.kind;
    if (input.lat !== undefined && input.lon !== undefined) {
      node.lat = input.lat;
      node.lon = input.lon;
    }
    this.nodes.push(node);
  }

  private requireNode(id: string, pos: SourcePos, what: string): void {
    if (this.nodeLine.has(id)) return;
    this.checkId(id, `a node id in ${what}`, pos);
    throw this.error(
      `${what} refers to unknown node "${id}"`,
      pos,
      didYouMean(id, this.nodeLine.keys(), 'declare the node first, or fix the id'),
    );
  }

  /**
   * Says the file declares direction (`how`, e.g. `edgedefault="directed"`), once; finish()
   * warns that direction is ignored and how many reverse arcs were merged.
   */
  directed(pos: SourcePos, how: string): void {
    this.directedAt ??= { pos, how };
  }

  /**
   * Adds a link; returns false when it was dropped (a self-loop) or merged into the link of
   * the reverse arc. Arcs pair up in file order, so the links between two nodes are as many
   * as the arcs in the more frequent direction: u→v with v→u is one link, u→v twice is two.
   */
  addLink(input: LinkInput): boolean {
    if (input.id !== undefined) this.checkId(input.id, 'a link id', input.pos);
    for (const g of input.riskGroups ?? []) this.checkId(g, 'a risk group id of a link', input.pos);
    const what = input.what ?? (input.id !== undefined ? `link "${input.id}"` : `link on line ${input.pos.line}`);
    this.requireNode(input.source, input.sourcePos ?? input.pos, what);
    this.requireNode(input.target, input.targetPos ?? input.pos, what);
    if (input.source === input.target) {
      this.warn(
        `self-loop on node "${input.source}" dropped`,
        input.pos,
        'a link from a node to itself adds no connectivity',
      );
      return false;
    }
    if (input.arc) {
      const reverse = this.openArcs.get(`${input.target}\u0000${input.source}`);
      const partner = reverse?.shift();
      if (partner) {
        this.mergeArc(partner, input);
        return false;
      }
    }
    this.countElement(input.pos);
    const pairKey =
      input.source <= input.target ? `${input.source}\u0000${input.target}` : `${input.target}\u0000${input.source}`;
    const occurrence = (this.pairCount.get(pairKey) ?? 0) + 1;
    this.pairCount.set(pairKey, occurrence);

    let id = input.id;
    if (id !== undefined) {
      const first = this.linkIds.get(id);
      if (first !== undefined) {
        if (this.duplicateLinkIds === 'error') {
          throw this.error(
            `duplicate link id "${id}"`,
            input.pos,
            `first used on line ${first.line}; link ids must be unique`,
          );
        }
        this.warn(
          `duplicate link id "${id}" (first on line ${first.line}); the link is named by its ends instead`,
          input.pos,
        );
        id = undefined;
      }
    }
    if (id === undefined) {
      const base = `${input.source}${DASH}${input.target}`;
      id = occurrence > 1 ? `${base}#${occurrence}` : base;
      // A file id could already spell a derived name; keep ids unique regardless.
      for (let k = 2; this.linkIds.has(id); k++) id = `${base}#${occurrence}.${k}`;
    }
    this.linkIds.set(id, input.pos);

    const link: TopoLink = {
      id,
      key: linkKey(input.source, input.target, occurrence),
      source: input.source,
      target: input.target,
      riskGroups: input.riskGroups ?? [],
      hardened: input.hardened ?? false,
      pos: input.pos,
      attrs: input.attrs ?? {},
    };
    if (input.length !== undefined) link.length = input.length;
    if (input.latency !== undefined) link.latency = input.latency;
    if (input.capacity !== undefined) link.capacity = input.capacity;
    if (input.weight !== undefined) link.weight = input.weight;
    this.links.push(link);
    if (input.arc) {
      const key = `${input.source}\u0000${input.target}`;
      const open = this.openArcs.get(key);
      if (open) open.push(link);
      else this.openArcs.set(key, [link]);
    }
    return true;
  }

  /** The reverse arc joins its partner's link; values that differ are reported, the first kept. */
  private mergeArc(link: TopoLink, arc: LinkInput): void {
    this.mergedArcs++;
    const differs: string[] = [];
    for (const k of ['length', 'latency', 'capacity', 'weight'] as const) {
      if (arc[k] !== link[k]) differs.push(`${k} ${link[k] ?? 'unset'} vs ${arc[k] ?? 'unset'}`);
    }
    if ((arc.hardened ?? false) !== link.hardened)
      differs.push(`hardened ${link.hardened} vs ${arc.hardened ?? false}`);
    const groups = (g: readonly string[]) => [...new Set(g)].sort().join(';');
    if (groups(arc.riskGroups ?? []) !== groups(link.riskGroups))
      differs.push(`risk groups "${groups(link.riskGroups)}" vs "${groups(arc.riskGroups ?? [])}"`);
    if (differs.length > 0) {
      this.warn(
        `the arc ${arc.source} → ${arc.target} is merged with the reverse arc on line ${link.pos.line}, which says otherwise (${differs.join(', ')}); the first arc's values are kept`,
        arc.pos,
        'give both directions the same values, or write one undirected link',
      );
    }
  }

  addRiskGroup(group: RiskGroup): void {
    this.checkId(group.id, 'a risk group id', group.pos);
    const first = this.riskGroupPos.get(group.id);
    if (first)
      throw this.error(`duplicate risk group id "${group.id}"`, group.pos, `first described on line ${first.line}`);
    this.riskGroupPos.set(group.id, group.pos);
    this.riskGroups.push(group);
  }

  addDemand(
    source: string,
    target: string,
    volume: number,
    pos: SourcePos,
    endPos?: [SourcePos, SourcePos],
    what = 'demand',
  ): void {
    this.requireNode(source, endPos?.[0] ?? pos, what);
    this.requireNode(target, endPos?.[1] ?? pos, what);
    if (source === target)
      throw this.error(`${what} goes from node "${source}" to itself`, pos, 'a demand needs two different ends');
    this.demands.push({ source, target, volume, pos });
  }

  finish(extra: { name?: string; latencyBudget?: number; metadata?: Record<string, unknown> } = {}): Topology {
    if (this.directedAt) {
      const merged = this.mergedArcs;
      this.warnings.unshift({
        file: this.file,
        line: this.directedAt.pos.line,
        column: this.directedAt.pos.column,
        severity: 'warning',
        message:
          `the graph is directed (${this.directedAt.how}); direction is ignored and links are read as undirected` +
          (merged > 0
            ? `: ${merged} pair${merged === 1 ? '' : 's'} of reverse arcs (u → v and v → u) merged into one link each`
            : ''),
      });
    }
    const t: Topology = {
      file: this.file,
      format: this.format,
      nodes: this.nodes,
      links: this.links,
      riskGroups: this.riskGroups,
      demands: this.demands,
      metadata: extra.metadata ?? {},
      warnings: this.warnings,
    };
    if (extra.name !== undefined) t.name = extra.name;
    if (extra.latencyBudget !== undefined) t.latencyBudget = extra.latencyBudget;
    return t;
  }
}
