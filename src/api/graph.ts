// A design as a graphology multigraph and back, so that a graph built or analysed with
// graphology's ecosystem can be read, evaluated and gated. A multigraph, because parallel
// links are physical redundancy; undirected, because netbrace reads every design that way.

import { MultiUndirectedGraph } from 'graphology';
import type { AbstractGraph } from 'graphology-types';
import type { Demand, DesignFormat, RiskGroup, SourcePos, Topology } from '../topology/model.js';
import { TopologyBuilder } from '../topology/builder.js';

export interface NodeAttributes {
  label?: string;
  kind?: string;
  lat?: number;
  lon?: number;
  hardened: boolean;
  /** 1-based line of the element in the file it was read from. */
  line: number;
  /** Everything else the file said about the node. */
  attrs: Record<string, unknown>;
}

export interface LinkAttributes {
  /** The link's display id (graphology's edge key is the link's stable key). */
  id: string;
  length_km?: number;
  latency_ms?: number;
  capacity_gbps?: number;
  weight?: number;
  risk_groups: string[];
  hardened: boolean;
  line: number;
  attrs: Record<string, unknown>;
}

export interface DesignAttributes {
  file: string;
  format: DesignFormat;
  name?: string;
  description?: string;
  riskGroups: RiskGroup[];
  demands: Demand[];
  latencyBudget?: number;
  metadata: Record<string, unknown>;
}

export type DesignGraph = MultiUndirectedGraph<NodeAttributes, LinkAttributes, DesignAttributes>;

/** The design as a graphology multigraph: node keys are ids, edge keys are stable link keys. */
export function toGraph(t: Topology): DesignGraph {
  const g: DesignGraph = new MultiUndirectedGraph<NodeAttributes, LinkAttributes, DesignAttributes>({
    allowSelfLoops: false,
  });
  const attributes: DesignAttributes = {
    file: t.file,
    format: t.format,
    riskGroups: t.riskGroups.map((r) => ({ ...r })),
    demands: t.demands.map((d) => ({ ...d })),
    metadata: { ...t.metadata },
  };
  if (t.name !== undefined) attributes.name = t.name;
  if (t.description !== undefined) attributes.description = t.description;
  if (t.latencyBudget !== undefined) attributes.latencyBudget = t.latencyBudget;
  g.replaceAttributes(attributes);
  for (const n of t.nodes) {
    const a: NodeAttributes = { hardened: n.hardened, line: n.pos.line, attrs: { ...n.attrs } };
    if (n.label !== undefined) a.label = n.label;
    if (n.kind !== undefined) a.kind = n.kind;
    if (n.lat !== undefined) a.lat = n.lat;
    if (n.lon !== undefined) a.lon = n.lon;
    g.addNode(n.id, a);
  }
  for (const l of t.links) {
    const a: LinkAttributes = {
      id: l.id,
      risk_groups: [...l.riskGroups],
      hardened: l.hardened,
      line: l.pos.line,
      attrs: { ...l.attrs },
    };
    if (l.length !== undefined) a.length_km = l.length;
    if (l.latency !== undefined) a.latency_ms = l.latency;
    if (l.capacity !== undefined) a.capacity_gbps = l.capacity;
    if (l.weight !== undefined) a.weight = l.weight;
    g.addEdgeWithKey(l.key, l.source, l.target, a);
  }
  return g;
}

export interface FromGraphOptions {
  /** The name reports give the design (default: the graph's `file` attribute, else "graph"). */
  file?: string;
}

type Loose = Record<string, unknown>;

function num(v: unknown): number | undefined {
  return typeof v === 'number' && Number.isFinite(v) ? v : undefined;
}

function lineOf(v: unknown, fallback: number): SourcePos {
  return { line: typeof v === 'number' && Number.isInteger(v) && v >= 1 ? v : fallback, column: 1 };
}

/**
 * A Topology from any graphology graph (attributes as toGraph writes them; unknown ones are
 * kept). The same rules as every file reader apply (TopologyBuilder): unique ids, link ends
 * that exist, self-loops dropped with a warning, parallel links kept. Direction is ignored.
 * Elements without a `line` attribute are numbered in graph order.
 */
// Any graphology graph, whatever attribute types its author declared.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type AnyGraph = AbstractGraph<any, any, any>;

export function fromGraph(g: AnyGraph, options: FromGraphOptions = {}): Topology {
  const ga = g.getAttributes() as Partial<DesignAttributes>;
  const file = options.file ?? (typeof ga.file === 'string' ? ga.file : 'graph');
  const b = new TopologyBuilder(file, 'native-json');
  let i = 0;
  g.forEachNode((id: string, raw: Loose) => {
    const a = raw as unknown as Loose;
    const known = new Set(['label', 'kind', 'lat', 'lon', 'hardened', 'line', 'attrs']);
    const attrs: Loose = { ...((a.attrs as Loose | undefined) ?? {}) };
    for (const [k, v] of Object.entries(a)) if (!known.has(k)) attrs[k] = v;
    i++;
    b.addNode({
      id: String(id),
      pos: lineOf(a.line, i),
      ...(typeof a.label === 'string' ? { label: a.label } : {}),
      ...(typeof a.kind === 'string' ? { kind: a.kind } : {}),
      ...(num(a.lat) !== undefined && num(a.lon) !== undefined ? { lat: num(a.lat), lon: num(a.lon) } : {}),
      hardened: a.hardened === true,
      attrs,
    });
  });
  g.forEachEdge((key: string, raw: Loose, source: string, target: string) => {
    const a = raw as unknown as Loose;
    const known = new Set([
      'id',
      'length_km',
      'latency_ms',
      'capacity_gbps',
      'weight',
      'risk_groups',
      'hardened',
      'line',
      'attrs',
    ]);
    const attrs: Loose = { ...((a.attrs as Loose | undefined) ?? {}) };
    for (const [k, v] of Object.entries(a)) if (!known.has(k)) attrs[k] = v;
    i++;
    const pos = lineOf(a.line, i);
    const length = num(a.length_km);
    const latency = num(a.latency_ms);
    const capacity = num(a.capacity_gbps);
    const weight = num(a.weight);
    b.addLink({
      ...(typeof a.id === 'string' && a.id !== '' ? { id: a.id } : {}),
      source: String(source),
      target: String(target),
      pos,
      ...(length !== undefined ? { length } : {}),
      ...(latency !== undefined ? { latency } : {}),
      ...(capacity !== undefined ? { capacity } : {}),
      ...(weight !== undefined ? { weight } : {}),
      riskGroups: Array.isArray(a.risk_groups) ? a.risk_groups.map(String) : [],
      hardened: a.hardened === true,
      attrs,
      what: `edge "${key}"`,
    });
  });
  for (const r of ga.riskGroups ?? [])
    b.addRiskGroup({
      id: String(r.id),
      ...(r.description !== undefined ? { description: r.description } : {}),
      pos: r.pos ?? { line: 1, column: 1 },
    });
  for (const d of ga.demands ?? [])
    b.addDemand(String(d.source), String(d.target), d.volume, d.pos ?? { line: 1, column: 1 });
  const extra: { name?: string; latencyBudget?: number; metadata?: Record<string, unknown> } = {
    metadata: { ...(ga.metadata ?? {}) },
  };
  if (ga.name !== undefined) extra.name = ga.name;
  if (ga.latencyBudget !== undefined) extra.latencyBudget = ga.latencyBudget;
  const t = b.finish(extra);
  if (ga.description !== undefined) t.description = ga.description;
  return t;
}
