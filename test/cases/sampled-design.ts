// The design of the engine-sampled-… fixture cases: the generated sparse design of
// sparse-design.ts at 400 sites (a 20 × 20 torus with 60 seeded chords), judged under a policy
// whose efficiency searches from 64 seeded sources (r-value sources), so the cases stay quick
// while R is an estimate. test/cases/engine-sampled.test.ts checks the fixture files are this output.
import { sparseCsv, sparseLinks, type SparseOptions } from './sparse-design.js';

export const SAMPLED: SparseOptions = { rows: 20, cols: 20, chords: 60, seed: 7 };

export function sampledVariants(): { base: string; benign: string; harmful: string; reordered: string } {
  const links = sparseLinks(SAMPLED);
  const grid = 2 * SAMPLED.rows * SAMPLED.cols;
  const name = (r: number, c: number) => `g${String(r).padStart(2, '0')}-${String(c).padStart(2, '0')}`;
  // Benign: one more chord. Harmful: every chord taken away (paths lengthen; the torus keeps two
  // disjoint paths between any two sites, so no bridge or cut node appears). Unchanged: the same
  // links reversed, each written end to end.
  return {
    base: sparseCsv(links),
    benign: sparseCsv([...links, [name(2, 3), name(13, 17)]]),
    harmful: sparseCsv(links.slice(0, grid)),
    reordered: sparseCsv([...links].reverse().map(([a, b]) => [b, a] as [string, string])),
  };
}
