// Graph families with known closed forms (docs/METHODS.md §9) and a seeded random generator,
// built straight into compact graphs.

import { graphFromEdges, type CompactGraph } from '../../src/graph/compact.js';

export type Edge = [number, number];

export const path = (n: number): CompactGraph =>
  graphFromEdges(
    n,
    Array.from({ length: n - 1 }, (_, i): Edge => [i, i + 1]),
  );

export const cycle = (n: number): CompactGraph =>
  graphFromEdges(
    n,
    Array.from({ length: n }, (_, i): Edge => [i, (i + 1) % n]),
  );

export function complete(n: number): CompactGraph {
  const e: Edge[] = [];
  for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) e.push([i, j]);
  return graphFromEdges(n, e);
}

/** Star on n nodes: centre 0. */
export const star = (n: number): CompactGraph =>
  graphFromEdges(
    n,
    Array.from({ length: n - 1 }, (_, i): Edge => [0, i + 1]),
  );

export function hypercube(d: number): CompactGraph {
  const n = 1 << d;
  const e: Edge[] = [];
  for (let v = 0; v < n; v++) for (let b = 0; b < d; b++) if ((v ^ (1 << b)) > v) e.push([v, v ^ (1 << b)]);
  return graphFromEdges(n, e);
}

export function completeBipartite(a: number, b: number): CompactGraph {
  const e: Edge[] = [];
  for (let i = 0; i < a; i++) for (let j = 0; j < b; j++) e.push([i, a + j]);
  return graphFromEdges(a + b, e);
}

export function petersen(): CompactGraph {
  const e: Edge[] = [];
  for (let i = 0; i < 5; i++) {
    e.push([i, (i + 1) % 5]); // outer cycle
    e.push([i, i + 5]); // spokes
    e.push([5 + i, 5 + ((i + 2) % 5)]); // inner pentagram
  }
  return graphFromEdges(10, e);
}

/** Wheel on n nodes: hub 0 joined to a cycle on 1..n-1. */
export function wheel(n: number): CompactGraph {
  const e: Edge[] = [];
  for (let i = 1; i < n; i++) {
    e.push([0, i]);
    e.push([i, i === n - 1 ? 1 : i + 1]);
  }
  return graphFromEdges(n, e);
}

export function grid(rows: number, cols: number): CompactGraph {
  const e: Edge[] = [];
  for (let r = 0; r < rows; r++)
    for (let c = 0; c < cols; c++) {
      const v = r * cols + c;
      if (c + 1 < cols) e.push([v, v + 1]);
      if (r + 1 < rows) e.push([v, v + cols]);
    }
  return graphFromEdges(rows * cols, e);
}

/** Dodecahedron: 20 nodes, 3-regular (outer 5-cycle, middle 10-cycle, inner 5-cycle). */
export function dodecahedron(): CompactGraph {
  const e: Edge[] = [];
  for (let i = 0; i < 5; i++) {
    e.push([i, (i + 1) % 5]);
    e.push([i, 5 + 2 * i]);
    e.push([15 + i, 15 + ((i + 1) % 5)]);
    e.push([15 + i, 5 + 2 * i + 1]);
  }
  for (let i = 0; i < 10; i++) e.push([5 + i, 5 + ((i + 1) % 10)]);
  return graphFromEdges(20, e);
}

/** Seeded 32-bit generator (mulberry32, common practice for reproducible tests). */
export function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** G(n, m): m distinct random links (no self-loops), seeded. */
export function randomEdges(n: number, m: number, seed: number): Edge[] {
  const r = rng(seed);
  const seen = new Set<number>();
  const e: Edge[] = [];
  while (e.length < m) {
    const a = Math.floor(r() * n);
    const b = Math.floor(r() * n);
    if (a === b) continue;
    const k = a < b ? a * n + b : b * n + a;
    if (seen.has(k)) continue;
    seen.add(k);
    e.push([a, b]);
  }
  return e;
}

/** Harmonic number H_k. */
export function harmonic(k: number): number {
  let h = 0;
  for (let i = 1; i <= k; i++) h += 1 / i;
  return h;
}

export function expectRelative(actual: number, expected: number, tol = 1e-9): void {
  const scale = Math.max(Math.abs(expected), 1e-300);
  if (!(Math.abs(actual - expected) <= tol * scale || Math.abs(actual - expected) <= 1e-300)) {
    throw new Error(
      `expected ${expected}, got ${actual} (relative error ${Math.abs(actual - expected) / scale}, tolerance ${tol})`,
    );
  }
}
