// The Eswaran–Tarjan bound (Eswaran & Tarjan, "Augmentation problems", SIAM J. Comput.
// 5:653–665, 1976): the fewest links that leave a graph without a bridge is ⌈p/2⌉ + q, where
// the bridge tree (2-edge-connected pieces contracted, bridges as its edges) has p leaves and
// q isolated pieces, unless it is a single piece (0). Checked by hand on the graphs below and
// by brute force (every set of candidate pairs, smallest first) on them and on seeded random
// graphs; test/reference/mend.test.ts checks the same against networkx.
import { describe, expect, it } from 'vitest';
import { graphFromEdges, type CompactGraph } from '../../src/graph/compact.js';
import { findCutElements } from '../../src/graph/structure.js';
import { withExtraLinks } from '../../src/mend/apply.js';
import { eswaranTarjanBound } from '../../src/mend/bridge-tree.js';
import { Xoshiro128 } from '../../src/random.js';

const path = (n: number) =>
  graphFromEdges(
    n,
    Array.from({ length: n - 1 }, (_, i) => [i, i + 1] as [number, number]),
  );
const star = (k: number) =>
  graphFromEdges(
    k + 1,
    Array.from({ length: k }, (_, i) => [0, i + 1] as [number, number]),
  );
const twoTrianglesBridge = () =>
  graphFromEdges(6, [
    [0, 1],
    [1, 2],
    [2, 0],
    [3, 4],
    [4, 5],
    [5, 3],
    [2, 3],
  ]);

/** The fewest added links (any pairs, parallels allowed) after which the graph is connected and has no bridge; up to `max`. */
function bruteForce(g: CompactGraph, max = 4): number {
  const pairs: [number, number][] = [];
  for (let a = 0; a < g.n; a++) for (let b = a + 1; b < g.n; b++) pairs.push([a, b]);
  const ok = (h: CompactGraph) => {
    if (findCutElements(h).bridges.length > 0) return false;
    // connected
    const seen = new Uint8Array(h.n);
    const stack = [0];
    seen[0] = 1;
    let count = 1;
    while (stack.length) {
      const v = stack.pop()!;
      for (let p = h.offsets[v]; p < h.offsets[v + 1]; p++) {
        const w = h.neighbors[p];
        if (!seen[w]) {
          seen[w] = 1;
          count++;
          stack.push(w);
        }
      }
    }
    return count === h.n;
  };
  if (ok(g)) return 0;
  const choose = (k: number, from: number, acc: [number, number][]): boolean => {
    if (acc.length === k) return ok(withExtraLinks(g, acc));
    for (let i = from; i < pairs.length; i++) if (choose(k, i, [...acc, pairs[i]])) return true;
    return false;
  };
  for (let k = 1; k <= max; k++) if (choose(k, 0, [])) return k;
  return Infinity;
}

describe('Eswaran–Tarjan bound', () => {
  it('a path of 6 sites needs 1 link: its bridge tree is the path itself, 2 leaves, ⌈2/2⌉ = 1 (join the two ends)', () => {
    const g = path(6);
    expect(eswaranTarjanBound(g)).toEqual({ leaves: 2, isolated: 0, links: 1 });
    expect(bruteForce(g)).toBe(1);
  });

  it('a star with 5 leaves needs 3 links: every leaf must get a new link end and a link has two, ⌈5/2⌉ = 3', () => {
    const g = star(5);
    expect(eswaranTarjanBound(g)).toEqual({ leaves: 5, isolated: 0, links: 3 });
    expect(bruteForce(g)).toBe(3);
  });

  it('two triangles joined by a bridge need 1 link: each triangle is one piece, the bridge tree is one edge with 2 leaves', () => {
    const g = twoTrianglesBridge();
    expect(eswaranTarjanBound(g)).toEqual({ leaves: 2, isolated: 0, links: 1 });
    expect(bruteForce(g)).toBe(1);
  });

  it('a ring has no bridge: 0; two separate rings are two isolated pieces: 2 links (q = 2)', () => {
    const ring = graphFromEdges(4, [
      [0, 1],
      [1, 2],
      [2, 3],
      [3, 0],
    ]);
    expect(eswaranTarjanBound(ring).links).toBe(0);
    const rings = graphFromEdges(6, [
      [0, 1],
      [1, 2],
      [2, 0],
      [3, 4],
      [4, 5],
      [5, 3],
    ]);
    expect(eswaranTarjanBound(rings)).toEqual({ leaves: 0, isolated: 2, links: 2 });
    expect(bruteForce(rings)).toBe(2);
  });

  it('only the given bridges: the new ones of a change (the rest contracted)', () => {
    // A path 0–1–2–3 plus the pendant 4 on 1: bridges 0-1, 1-2, 2-3, 1-4. Only 2-3 is "new": one piece
    // {0,1,2,4} and {3}, two leaves: one link.
    const g = graphFromEdges(5, [
      [0, 1],
      [1, 2],
      [2, 3],
      [1, 4],
    ]);
    expect(eswaranTarjanBound(g).links).toBe(2);
    expect(eswaranTarjanBound(g, [2]).links).toBe(1);
  });

  it('agrees with brute force on seeded random sparse graphs', () => {
    const rng = new Xoshiro128(20240611, 3);
    let checked = 0;
    for (let t = 0; t < 40; t++) {
      const n = 4 + rng.nextInt(4);
      const edges: [number, number][] = [];
      // a random tree, plus a few extra links
      for (let v = 1; v < n; v++) edges.push([rng.nextInt(v), v]);
      const extra = rng.nextInt(3);
      for (let k = 0; k < extra; k++) {
        const a = rng.nextInt(n);
        const b = rng.nextInt(n);
        if (a !== b) edges.push([a, b]);
      }
      const g = graphFromEdges(n, edges);
      const bound = eswaranTarjanBound(g).links;
      if (bound > 3) continue;
      expect(bruteForce(g), JSON.stringify(edges)).toBe(bound);
      checked++;
    }
    expect(checked).toBeGreaterThan(30);
  });
});
