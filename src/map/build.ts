// The map of a design, base and head together: every site and link of either side (links
// matched by their stable key, sites by id), with its side of the change, its line, and a
// position — at its coordinates when the design has them (project.ts), else from a seeded
// ForceAtlas2 layout (force.ts) of the union. Sites without coordinates on a geographic map
// are placed at the mean of their located neighbours (repeated, so chains fill in), and
// flagged. Shared-risk groups that strand sites at head are listed (stranding.ts). Pure.

import type { CompactGraph } from '../graph/compact.js';
import { forceLayout } from './force.js';
import { MAP_MARGIN, projectGeographic, round1 } from './project.js';
import { strandingGroups } from './stranding.js';
import type { DesignMap, MapLink, MapNode, MapSide, OmittedMap } from './types.js';

/** Beyond this many sites (or links), base and head together, a map is not drawn: it would not be legible. */
export const MAP_MAX_NODES = 1000;
export const MAP_MAX_LINKS = 4000;

export interface MapSideInput {
  graph: CompactGraph;
  /** Display names by node id. */
  labels?: ReadonlyMap<string, string>;
}

export function buildDesignMap(head: MapSideInput, base?: MapSideInput): DesignMap | OmittedMap {
  const h = head.graph;
  const b = base?.graph;
  const nodes: MapNode[] = [];
  const index = new Map<string, number>();
  const lat: number[] = [];
  const lon: number[] = [];
  const addNode = (g: CompactGraph, v: number, side: MapSide, labels?: ReadonlyMap<string, string>) => {
    const id = g.nodeIds[v];
    index.set(id, nodes.length);
    const node: MapNode = { id, x: 0, y: 0, line: g.nodeLine[v], side };
    const label = labels?.get(id);
    if (label !== undefined && label !== id) node.label = label;
    if (g.nodeHardened[v]) node.hardened = true;
    nodes.push(node);
    lat.push(g.lat ? g.lat[v] : Number.NaN);
    lon.push(g.lon ? g.lon[v] : Number.NaN);
  };
  for (let v = 0; v < h.n; v++) addNode(h, v, b && !b.nodeIndex.has(h.nodeIds[v]) ? 'head' : 'both', head.labels);
  if (b) for (let v = 0; v < b.n; v++) if (!h.nodeIndex.has(b.nodeIds[v])) addNode(b, v, 'base', base?.labels);

  const links: MapLink[] = [];
  const edges: [number, number][] = [];
  const addLink = (g: CompactGraph, e: number, side: MapSide) => {
    const source = g.nodeIds[g.linkSource[e]];
    const target = g.nodeIds[g.linkTarget[e]];
    const link: MapLink = { id: g.linkIds[e], source, target, line: g.linkLine[e], side };
    if (g.linkHardened[e]) link.hardened = true;
    const groups: string[] = [];
    for (let k = 0; k < g.groupIds.length; k++) {
      for (let p = g.groupOffsets[k]; p < g.groupOffsets[k + 1]; p++)
        if (g.groupLinks[p] === e) groups.push(g.groupIds[k]);
    }
    if (groups.length) link.groups = groups;
    links.push(link);
    edges.push([index.get(source)!, index.get(target)!]);
  };
  const baseKeys = new Set(b?.linkKeys ?? []);
  const headKeys = new Set(h.linkKeys);
  for (let e = 0; e < h.m; e++) addLink(h, e, b && !baseKeys.has(h.linkKeys[e]) ? 'head' : 'both');
  if (b) for (let e = 0; e < b.m; e++) if (!headKeys.has(b.linkKeys[e])) addLink(b, e, 'base');

  if (nodes.length > MAP_MAX_NODES || links.length > MAP_MAX_LINKS) {
    return {
      omitted: `${nodes.length} sites and ${links.length} links, base and head together: more than a map shows legibly (${MAP_MAX_NODES} sites, ${MAP_MAX_LINKS} links)`,
    };
  }

  const located = nodes.map((_, i) => Number.isFinite(lat[i]) && Number.isFinite(lon[i]));
  const nLocated = located.filter(Boolean).length;
  let layout: DesignMap['layout'];
  let method: string;
  let width: number;
  let height: number;
  if (nLocated >= 2) {
    layout = 'geographic';
    const idx = nodes.map((_, i) => i).filter((i) => located[i]);
    const placed = projectGeographic(
      idx.map((i) => lat[i]),
      idx.map((i) => lon[i]),
    );
    width = placed.width;
    height = placed.height;
    const x = new Float64Array(nodes.length).fill(Number.NaN);
    const y = new Float64Array(nodes.length).fill(Number.NaN);
    idx.forEach((i, k) => {
      x[i] = placed.x[k];
      y[i] = placed.y[k];
    });
    placeUnlocated(nodes.length, edges, x, y, width, height);
    nodes.forEach((node, i) => {
      node.x = x[i];
      node.y = y[i];
      if (!located[i]) node.placed = true;
    });
    method =
      'sites at their coordinates: equirectangular projection centred on the design, fitted to its extent' +
      (nLocated < nodes.length
        ? `; ${nodes.length - nLocated} site${nodes.length - nLocated === 1 ? '' : 's'} without coordinates placed beside their neighbours`
        : '');
  } else {
    layout = 'force';
    const placed = forceLayout(
      nodes.map((n) => n.id),
      edges,
    );
    width = placed.width;
    height = placed.height;
    nodes.forEach((node, i) => {
      node.x = placed.x[i];
      node.y = placed.y[i];
    });
    method =
      'no coordinates: a seeded ForceAtlas2 layout of the links, with an anti-overlap pass (positions carry no geographic meaning)';
  }

  const headStrand = strandingGroups(h);
  const baseStrand = b ? strandingGroups(b) : new Map<string, number>();
  const strandingGroupsList = [...headStrand.entries()].map(([id, strands]) => ({
    id,
    line: h.groupLine[h.groupIds.indexOf(id)] ?? 0,
    strands,
    isNew: b !== undefined && !baseStrand.has(id),
  }));
  return { layout, width, height, nodes, links, strandingGroups: strandingGroupsList, method };
}

/** Sites without coordinates: the mean of their placed neighbours (a few rounds), the rest along the bottom edge. */
function placeUnlocated(
  n: number,
  edges: readonly [number, number][],
  x: Float64Array,
  y: Float64Array,
  width: number,
  height: number,
): void {
  const adj: number[][] = Array.from({ length: n }, () => []);
  for (const [a, b] of edges) {
    adj[a].push(b);
    adj[b].push(a);
  }
  for (let round = 0; round < 16; round++) {
    let changed = false;
    const nx = Float64Array.from(x);
    const ny = Float64Array.from(y);
    for (let i = 0; i < n; i++) {
      if (Number.isFinite(x[i])) continue;
      const near = adj[i].filter((j) => Number.isFinite(x[j]));
      if (!near.length) continue;
      // A small offset by index keeps two such sites with the same neighbours apart.
      nx[i] = round1(near.reduce((s, j) => s + x[j], 0) / near.length + 9 * Math.cos(i));
      ny[i] = round1(near.reduce((s, j) => s + y[j], 0) / near.length + 9 * Math.sin(i));
      changed = true;
    }
    x.set(nx);
    y.set(ny);
    if (!changed) break;
  }
  const rest = [];
  for (let i = 0; i < n; i++) if (!Number.isFinite(x[i])) rest.push(i);
  rest.forEach((i, k) => {
    x[i] = round1(MAP_MARGIN + ((width - 2 * MAP_MARGIN) * (k + 0.5)) / rest.length);
    y[i] = round1(height - MAP_MARGIN / 2);
  });
}
