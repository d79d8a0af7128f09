// The compact graph: a design compiled once into CSR typed arrays so that every metric,
// challenge and envelope works on integer indices with no per-step allocation.
// Removal never copies the graph: it is expressed by a Mask (see mask.ts).

import type { Topology } from '../topology/model.js';
import { canonicalOrder, compareIds } from './canonical.js';

export interface CompactGraph {
  /** Number of nodes (original, N0). */
  readonly n: number;
  /** Number of links (original, L0), parallel links included. */
  readonly m: number;
  /** CSR row offsets, length n + 1. Neighbours of v are neighbors[offsets[v] .. offsets[v+1]). */
  readonly offsets: Int32Array;
  /** CSR column indices, length 2m (each undirected link appears twice). */
  readonly neighbors: Int32Array;
  /** For each adjacency entry, the index of the link it belongs to. */
  readonly linkOf: Int32Array;
  /** Link ends, length m. */
  readonly linkSource: Int32Array;
  readonly linkTarget: Int32Array;
  /** Link lengths in km (NaN where unknown), or null when no link has one. */
  readonly length: Float64Array | null;
  /** Link latencies in ms (NaN where unknown), or null when no link has one. */
  readonly latency: Float64Array | null;
  /** Generic link weights from interchange formats (NaN where unknown), or null. */
  readonly weight: Float64Array | null;
  /** 1 where the node / link is hardened (never removed by challenges). */
  readonly nodeHardened: Uint8Array;
  readonly linkHardened: Uint8Array;
  /** Site coordinates in degrees (NaN where unknown), or null when no node has both. */
  readonly lat: Float64Array | null;
  readonly lon: Float64Array | null;
  /** Element ids in canonical order (canonical.ts: natural id order); index i ↔ id. */
  readonly nodeIds: readonly string[];
  /** Human labels of nodes (GraphML/GML `label` or `name`, our format's `label`), else undefined. */
  readonly nodeLabels: readonly (string | undefined)[];
  readonly linkIds: readonly string[];
  /** Stable link keys (TopoLink.key; parallel links share theirs out in canonical order) that seed random orders. */
  readonly linkKeys: readonly string[];
  readonly nodeIndex: ReadonlyMap<string, number>;
  readonly linkIndex: ReadonlyMap<string, number>;
  /** 1-based source lines, for reports. */
  readonly nodeLine: Int32Array;
  readonly linkLine: Int32Array;
  /** Shared-risk link groups: group g holds groupLinks[groupOffsets[g] .. groupOffsets[g+1]). */
  readonly groupIds: readonly string[];
  readonly groupLine: Int32Array;
  readonly groupOffsets: Int32Array;
  readonly groupLinks: Int32Array;
  /** Traffic demands between node indices. */
  readonly demandSource: Int32Array;
  readonly demandTarget: Int32Array;
  readonly demandVolume: Float64Array;
  /** Latency budget factor for demand_served, if the design sets one. */
  readonly latencyBudget: number | undefined;
}

/** The CSR adjacency of links given by their ends (each link listed at both ends, in link order). */
export function adjacency(
  n: number,
  linkSource: Int32Array,
  linkTarget: Int32Array,
  degree: Int32Array,
): { offsets: Int32Array; neighbors: Int32Array; linkOf: Int32Array } {
  const m = linkSource.length;
  const offsets = new Int32Array(n + 1);
  for (let v = 0; v < n; v++) offsets[v + 1] = offsets[v] + degree[v];
  const neighbors = new Int32Array(2 * m);
  const linkOf = new Int32Array(2 * m);
  const fill = offsets.slice(0, n);
  for (let e = 0; e < m; e++) {
    const s = linkSource[e];
    const d = linkTarget[e];
    neighbors[fill[s]] = d;
    linkOf[fill[s]++] = e;
    neighbors[fill[d]] = s;
    linkOf[fill[d]++] = e;
  }
  return { offsets, neighbors, linkOf };
}

/**
 * Compile a parsed design into its compact graph. Nodes, links, groups and demands are numbered
 * in canonical order (canonical.ts), not file order: the same topology listed in another order
 * compiles to the same graph, so every result is the same. Lines stay with their elements.
 */
export function compileTopology(t: Topology): CompactGraph {
  const order = canonicalOrder(t);
  const nodes = order.nodes.map((i) => t.nodes[i]);
  const links = order.links.map((e) => t.links[e]);
  const keys = order.keys;
  const n = nodes.length;
  const m = links.length;
  const nodeIndex = new Map<string, number>();
  nodes.forEach((node, i) => nodeIndex.set(node.id, i));
  const linkIndex = new Map<string, number>();

  const linkSource = new Int32Array(m);
  const linkTarget = new Int32Array(m);
  const degree = new Int32Array(n);
  const linkLine = new Int32Array(m);
  const linkHardened = new Uint8Array(m);
  let hasLength = false;
  let hasLatency = false;
  let hasWeight = false;
  for (let e = 0; e < m; e++) {
    const link = links[e];
    // Ends in canonical order too: which end a file writes first changes nothing.
    const s = order.lo[order.links[e]];
    const d = order.hi[order.links[e]];
    if (s < 0) {
      // Parsers reject this with a located error; reaching here is a programming error.
      throw new Error(`link ${link.id} refers to a node that is not in the design`);
    }
    linkSource[e] = s;
    linkTarget[e] = d;
    degree[s]++;
    degree[d]++;
    linkLine[e] = link.pos.line;
    linkHardened[e] = link.hardened ? 1 : 0;
    if (!linkIndex.has(link.id)) linkIndex.set(link.id, e);
    hasLength ||= link.length !== undefined;
    hasLatency ||= link.latency !== undefined;
    hasWeight ||= link.weight !== undefined;
  }

  const { offsets, neighbors, linkOf } = adjacency(n, linkSource, linkTarget, degree);

  const column = (pick: (i: number) => number | undefined, present: boolean, count: number) => {
    if (!present) return null;
    const a = new Float64Array(count);
    for (let i = 0; i < count; i++) a[i] = pick(i) ?? Number.NaN;
    return a;
  };

  const hasCoords = nodes.some((v) => v.lat !== undefined && v.lon !== undefined);
  const nodeHardened = new Uint8Array(n);
  const nodeLine = new Int32Array(n);
  nodes.forEach((v, i) => {
    nodeHardened[i] = v.hardened ? 1 : 0;
    nodeLine[i] = v.pos.line;
  });

  // Risk groups: the described ones and those only named by links, by id. A group's line is its
  // description's, else that of the first link in the file that names it.
  const groupLineOf = new Map<string, number>();
  for (const g of t.riskGroups) if (!groupLineOf.has(g.id)) groupLineOf.set(g.id, g.pos.line);
  for (const link of t.links)
    for (const gid of link.riskGroups) if (!groupLineOf.has(gid)) groupLineOf.set(gid, link.pos.line);
  const groupIds = [...groupLineOf.keys()].sort(compareIds);
  const groupPos = new Map<string, number>();
  groupIds.forEach((id, g) => groupPos.set(id, g));
  const members: number[][] = groupIds.map(() => []);
  links.forEach((link, e) => {
    for (const gid of link.riskGroups) {
      const list = members[groupPos.get(gid)!];
      if (list[list.length - 1] !== e) list.push(e);
    }
  });
  const groupOffsets = new Int32Array(groupIds.length + 1);
  members.forEach((list, g) => (groupOffsets[g + 1] = groupOffsets[g] + list.length));
  const groupLinks = new Int32Array(groupOffsets[groupIds.length]);
  members.forEach((list, g) => groupLinks.set(list, groupOffsets[g]));

  const demands = order.demands.map((i) => t.demands[i]);
  const k = demands.length;
  const demandSource = new Int32Array(k);
  const demandTarget = new Int32Array(k);
  const demandVolume = new Float64Array(k);
  demands.forEach((d, i) => {
    demandSource[i] = nodeIndex.get(d.source) ?? -1;
    demandTarget[i] = nodeIndex.get(d.target) ?? -1;
    demandVolume[i] = d.volume;
  });

  return {
    n,
    m,
    offsets,
    neighbors,
    linkOf,
    linkSource,
    linkTarget,
    length: column((e) => links[e].length, hasLength, m),
    latency: column((e) => links[e].latency, hasLatency, m),
    weight: column((e) => links[e].weight, hasWeight, m),
    nodeHardened,
    linkHardened,
    lat: column((i) => nodes[i].lat, hasCoords, n),
    lon: column((i) => nodes[i].lon, hasCoords, n),
    nodeIds: nodes.map((v) => v.id),
    nodeLabels: nodes.map((v) => v.label),
    linkIds: links.map((l) => l.id),
    linkKeys: keys,
    nodeIndex,
    linkIndex,
    nodeLine,
    linkLine,
    groupIds,
    groupLine: Int32Array.from(groupIds, (id) => groupLineOf.get(id)!),
    groupOffsets,
    groupLinks,
    demandSource,
    demandTarget,
    demandVolume,
    latencyBudget: t.latencyBudget,
  };
}

/** Build a compact graph straight from an edge list (tests, generators, benchmarks). */
export function graphFromEdges(n: number, edges: readonly (readonly [number, number])[]): CompactGraph {
  const pos = { line: 0, column: 0 };
  const counts = new Map<string, number>();
  return compileTopology({
    file: '<generated>',
    format: 'csv',
    nodes: Array.from({ length: n }, (_, i) => ({ id: String(i), hardened: false, pos, attrs: {} })),
    links: edges.map(([a, b], e) => {
      const base = a < b ? `${a}-${b}` : `${b}-${a}`;
      const c = (counts.get(base) ?? 0) + 1;
      counts.set(base, c);
      return {
        id: `e${e}`,
        key: c > 1 ? `${base}#${c}` : base,
        source: String(a),
        target: String(b),
        riskGroups: [],
        hardened: false,
        pos,
        attrs: {},
      };
    }),
    riskGroups: [],
    demands: [],
    metadata: {},
    warnings: [],
  });
}

/**
 * Node indices in the order the file lists them (by source line, then index): for lists a
 * person reads next to the file. Computations use the canonical index order instead.
 */
export function nodesByLine(g: CompactGraph, nodes: Iterable<number>): number[] {
  return [...nodes].sort((a, b) => g.nodeLine[a] - g.nodeLine[b] || a - b);
}

/** Link indices in the order the file lists them (by source line, then index). */
export function linksByLine(g: CompactGraph, links: Iterable<number>): number[] {
  return [...links].sort((a, b) => g.linkLine[a] - g.linkLine[b] || a - b);
}
