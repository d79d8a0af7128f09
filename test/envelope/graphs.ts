// Seeded graph generators for the engine's tests (not a reference: the outside checks use
// networkx's own graphs, committed under test/reference/).
import { graphFromEdges, type CompactGraph } from '../../src/graph/compact.js';
import { Xoshiro128 } from '../../src/envelope/rng.js';

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
