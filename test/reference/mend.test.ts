// The mend search against an exhaustive search by networkx (test/reference/mend.py, whose
// output mend.json is committed; the library version is recorded in it). On paths, stars,
// trees, a cycle with pendants and two triangles joined by a bridge, with every pair of nodes
// not yet joined as a candidate (Euclidean lengths between seeded points), networkx tries every
// set of 1, 2 and 3 links: the fewest that leave no bridge, and the shortest such set. netbrace's
// branch and bound (src/mend/cover.ts) must find the same number of links and the same total
// length, and its Eswaran–Tarjan bound (Eswaran & Tarjan, SIAM J. Comput. 5:653, 1976) must
// equal the one the script computes from networkx's bridges — and the exhaustive optimum,
// as the theorem says it does when any pair may be joined.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { graphFromEdges } from '../../src/graph/compact.js';
import { findCutElements } from '../../src/graph/structure.js';
import { eswaranTarjanBound } from '../../src/mend/bridge-tree.js';
import { solveCover } from '../../src/mend/cover.js';
import { fiedler, ghoshBoydScore } from '../../src/mend/fiedler.js';
import { repoRoot } from '../topology/helpers.js';

interface RefGraph {
  name: string;
  n: number;
  edges: [number, number][];
  candidates: [number, number, number][];
  leaves: number;
  bound: number;
  best: { links: number; total: number; set: number[] };
}

const ref = JSON.parse(readFileSync(path.join(repoRoot, 'test', 'reference', 'mend.json'), 'utf8')) as {
  library: string;
  graphs: RefGraph[];
};

describe(`mend search against exhaustive search (${ref.library})`, () => {
  it('covers the graphs it should', () => {
    expect(ref.graphs.length).toBeGreaterThanOrEqual(10);
    expect(ref.graphs.map((r) => r.best.links)).toEqual(expect.arrayContaining([1, 2, 3]));
  });
  for (const r of ref.graphs) {
    it(`${r.name}: ${r.best.links} link${r.best.links === 1 ? '' : 's'}, total ${r.best.total}`, () => {
      const g = graphFromEdges(r.n, r.edges);
      const bound = eswaranTarjanBound(g);
      expect(bound.leaves).toBe(r.leaves);
      expect(bound.links).toBe(r.bound);
      expect(r.best.links, 'the exhaustive optimum meets the Eswaran–Tarjan bound').toBe(r.bound);
      const pairs = r.candidates.map(([a, b]) => [a, b] as const);
      const f = fiedler(g);
      const result = solveCover({
        g,
        pairs,
        price: r.candidates.map((c) => c[2]),
        score: pairs.map(([a, b]) => ghoshBoydScore(f, a, b)),
        bridges: findCutElements(g).bridges,
        cutNodes: [],
        maxLinks: 3,
        keep: 3,
      });
      expect(result.sets.length).toBeGreaterThan(0);
      const best = result.sets[0];
      expect(best.length).toBe(r.best.links);
      expect(best.reduce((s, c) => s + r.candidates[c][2], 0)).toBeCloseTo(r.best.total, 6);
      expect(result.minimal).toBe(true);
    });
  }
});
