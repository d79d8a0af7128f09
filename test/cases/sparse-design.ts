// The generated sparse design of the engine-sparse-… fixture cases: a rows × cols torus grid
// (every site linked to its four neighbours, so no bridge and no cut node) with seeded random
// chords (long links that shorten paths, a small-world design in the sense of Watts & Strogatz,
// Nature 393:440, 1998), written as a CSV edge list. Deterministic: the same arguments give the
// same text, and test/cases/engine-sparse.test.ts checks that the fixture files are this output.

export interface SparseOptions {
  rows: number;
  cols: number;
  chords: number;
  seed: number;
}

/** mulberry32 (a 32-bit generator; common practice for small seeded streams). */
function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const id = (r: number, c: number) => `g${String(r).padStart(2, '0')}-${String(c).padStart(2, '0')}`;

/** The links of the design: grid links first, then the chords in the order they were drawn. */
export function sparseLinks(o: SparseOptions): [string, string][] {
  const links: [string, string][] = [];
  for (let r = 0; r < o.rows; r++)
    for (let c = 0; c < o.cols; c++) {
      links.push([id(r, c), id(r, (c + 1) % o.cols)]);
      links.push([id(r, c), id((r + 1) % o.rows, c)]);
    }
  const rand = mulberry32(o.seed);
  const seen = new Set(links.map(([a, b]) => `${a}|${b}`));
  while (links.length < 2 * o.rows * o.cols + o.chords) {
    const a = id(Math.floor(rand() * o.rows), Math.floor(rand() * o.cols));
    const b = id(Math.floor(rand() * o.rows), Math.floor(rand() * o.cols));
    if (a === b || seen.has(`${a}|${b}`) || seen.has(`${b}|${a}`)) continue;
    seen.add(`${a}|${b}`);
    links.push([a, b]);
  }
  return links;
}

export function sparseCsv(links: readonly [string, string][]): string {
  return ['source,target', ...links.map(([a, b]) => `${a},${b}`), ''].join('\n');
}

/** The fixture's design and its three changes. */
export const SPARSE: SparseOptions = { rows: 40, cols: 25, chords: 200, seed: 13 };

export function sparseVariants(): { base: string; benign: string; harmful: string; reordered: string } {
  const links = sparseLinks(SPARSE);
  const grid = 2 * SPARSE.rows * SPARSE.cols;
  // Benign: one more chord. Harmful: all chords but ten taken away, and the grid's wrap-around
  // links between the last row and the first (a torus cut open into a cylinder: every site still
  // has two disjoint paths, so no new bridge or cut node appears). Unchanged: the same links,
  // reversed and each written end to end.
  const extra: [string, string] = [id(3, 4), id(27, 19)];
  const wraps = new Set(Array.from({ length: SPARSE.cols }, (_, c) => `${id(SPARSE.rows - 1, c)}|${id(0, c)}`));
  return {
    base: sparseCsv(links),
    benign: sparseCsv([...links, extra]),
    harmful: sparseCsv(links.slice(0, grid + 10).filter(([a, b]) => !wraps.has(`${a}|${b}`))),
    reordered: sparseCsv([...links].reverse().map(([a, b]) => [b, a] as [string, string])),
  };
}
