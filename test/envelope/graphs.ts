// Seeded graph generators for the engine's tests (not a reference: the outside checks use
// networkx's own graphs, committed under test/reference/).
import { compileTopology, graphFromEdges, type CompactGraph } from '../../src/graph/compact.js';
import { Xoshiro128 } from '../../src/random.js';

/** G(n, L): L distinct links chosen uniformly. */
export function randomGraph(n: number, links: number, seed: number): CompactGraph {
  const rng = new Xoshiro128(seed, 7);
  const seen = new Set<number>();
  const edges: [number, number][] = [];
  while (edges.length < links) {
    const a = rng.nextInt(n);
    const b = rng.nextInt(n);
    if (a === b) continue;
    const key = Math.min(a, b) * n + Math.max(a, b);
    if (seen.has(key)) continue;
    seen.add(key);
    edges.push([a, b]);
  }
  return graphFromEdges(n, edges);
}

/** Preferential attachment, m links per new node (degree-proportional by a repeated-ends list). */
export function preferentialGraph(n: number, m: number, seed: number): CompactGraph {
  const rng = new Xoshiro128(seed, 11);
  const ends: number[] = [];
  const edges: [number, number][] = [];
  for (let v = m; v < n; v++) {
    const chosen = new Set<number>();
    while (chosen.size < m) chosen.add(v === m || ends.length === 0 ? chosen.size : ends[rng.nextInt(ends.length)]);
    for (const w of chosen) {
      edges.push([v, w]);
      ends.push(v, w);
    }
  }
  return graphFromEdges(n, edges);
}

export interface SketchNode {
  id: string;
  lat?: number;
  lon?: number;
  hardened?: boolean;
}
export interface SketchLink {
  a: string;
  b: string;
  groups?: string[];
  hardened?: boolean;
}

/** A small design from nodes and links, as a parser would hand it over. */
export function design(nodes: SketchNode[], links: SketchLink[]): CompactGraph {
  return compileTopology({
    file: 'sketch.yaml',
    format: 'native-yaml',
    nodes: nodes.map((v, i) => ({
      id: v.id,
      lat: v.lat,
      lon: v.lon,
      hardened: v.hardened ?? false,
      pos: { line: i + 2, column: 1 },
      attrs: {},
    })),
    links: links.map((l, e) => ({
      id: `${l.a}-${l.b}`,
      key: l.a < l.b ? `${l.a}-${l.b}` : `${l.b}-${l.a}`,
      source: l.a,
      target: l.b,
      riskGroups: l.groups ?? [],
      hardened: l.hardened ?? false,
      pos: { line: nodes.length + e + 2, column: 1 },
      attrs: {},
    })),
    riskGroups: [],
    demands: [],
    metadata: {},
    warnings: [],
  });
}
