// The generated designs of the parts-split-design fixture case: a 20 × 20 torus grid with 80
// seeded chords (test/cases/sparse-design.ts), gaining one chord at the head, and a five-site
// ring that loses a link. Under the case's policy (all-pairs efficiency, 8,000 realizations cut
// by a small work budget) the grid's unreduced work is above the threshold for batches and for
// splitting across parts, while its real work stays below a second; the ring stays whole.
import { sparseCsv, sparseLinks, type SparseOptions } from './sparse-design.js';

export const PARTS_GRID: SparseOptions = { rows: 20, cols: 20, chords: 80, seed: 7 };

export function partsVariants(): { gridBase: string; gridHead: string; ringBase: string; ringHead: string } {
  const links = sparseLinks(PARTS_GRID);
  const ring: [string, string][] = ['a', 'b', 'c', 'd', 'e'].map((s, i, all) => [s, all[(i + 1) % all.length]]);
  return {
    gridBase: sparseCsv(links),
    gridHead: sparseCsv([...links, ['g01-02', 'g07-06']]),
    ringBase: sparseCsv(ring),
    ringHead: sparseCsv([...ring, ['a', 'c']]),
  };
}
