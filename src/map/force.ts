// Positions for a design without coordinates: ForceAtlas2 (Jacomy, Venturini, Heymann &
// Bastian, PLoS ONE 9:e98679, 2014) as graphology-layout-forceatlas2 implements it, then
// graphology-layout-noverlap's anti-overlap pass so no two sites sit on each other.
// Deterministic: each site starts at a position hashed from (seed, its id) with our own
// hash (src/random.ts), so a site keeps its start between base and head; the iteration
// counts are fixed (no convergence test, no clock), the library draws no random numbers, and
// the result is rounded to 0.1 drawing units. Parallel links are one edge of weight = their
// number.

import { UndirectedGraph } from 'graphology';
import forceAtlas2Module from 'graphology-layout-forceatlas2';
import noverlapModule from 'graphology-layout-noverlap';
import { hashString, seedWord } from '../random.js';
import { fitToBox, type Placed } from './project.js';

// Both layout packages are CommonJS whose module.exports is the layout function; their type
// files declare it as a default export, which TypeScript's NodeNext resolution reads as a
// `default` property. Node (and esbuild) hand the function itself to a default import.
const forceAtlas2 = forceAtlas2Module as unknown as typeof forceAtlas2Module.default;
const noverlap = noverlapModule as unknown as typeof noverlapModule.default;

export const LAYOUT_SEED = 0x6d6170; // "map"

/** Fixed iteration counts: enough to settle designs of a few hundred sites. */
export function iterationsFor(n: number): number {
  return n <= 300 ? 500 : n <= 1000 ? 250 : 120;
}

export function forceLayout(
  ids: readonly string[],
  edges: readonly (readonly [number, number])[],
  seed = LAYOUT_SEED,
): Placed {
  const n = ids.length;
  if (n === 0) return fitToBox([], []);
  const graph = new UndirectedGraph({ multi: false, allowSelfLoops: false });
  const s = seedWord(seed);
  const spread = 10 * Math.sqrt(n);
  ids.forEach((id, i) => {
    const hx = hashString(id, s) / 0x1_0000_0000;
    const hy = hashString(id, s ^ 0x9e3779b9) / 0x1_0000_0000;
    graph.addNode(String(i), { x: (hx * 2 - 1) * spread, y: (hy * 2 - 1) * spread, size: 1 });
  });
  for (const [a, b] of edges) {
    if (a === b) continue;
    const u = String(a);
    const v = String(b);
    const e = graph.edge(u, v);
    if (e === undefined) graph.addEdge(u, v, { weight: 1 });
    else graph.updateEdgeAttribute(e, 'weight', (w: number | undefined) => (w ?? 1) + 1);
  }
  if (n > 1) {
    const settings = { ...forceAtlas2.inferSettings(n), barnesHutOptimize: n > 600 };
    forceAtlas2.assign(graph, { iterations: iterationsFor(n), settings, getEdgeWeight: 'weight' });
    noverlap.assign(graph, { maxIterations: 80, settings: { margin: 2, ratio: 1.2 } });
  }
  const px: number[] = [];
  const py: number[] = [];
  for (let i = 0; i < n; i++) {
    const a = graph.getNodeAttributes(String(i)) as { x: number; y: number };
    px.push(Number.isFinite(a.x) ? a.x : 0);
    py.push(Number.isFinite(a.y) ? a.y : 0);
  }
  return fitToBox(px, py);
}
