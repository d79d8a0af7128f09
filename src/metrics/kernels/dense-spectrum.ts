// Full spectra of small local graphs with the dense values-only solver, in scratch sized
// once for the largest graph the caller will pass (its dense-size limit).

import { denseMatrix } from './operators.js';
import type { LocalGraph } from './subgraph.js';
import { symmetricEigenvalues } from './symmetric-eigen.js';

export function createDenseSpectrum(limit: number) {
  const size = Math.max(1, limit);
  const a = new Float64Array(size * size);
  const d = new Float64Array(size);
  const e = new Float64Array(size);
  const run = (g: LocalGraph, laplacian: boolean): Float64Array => {
    if (g.n > size) throw new RangeError(`dense spectrum limited to ${size} nodes, got ${g.n}`);
    denseMatrix(g, laplacian, a);
    symmetricEigenvalues(a, g.n, d, e);
    return d;
  };
  return {
    /** Laplacian eigenvalues, ascending, in the first g.n entries (shared buffer). */
    laplacian: (g: LocalGraph) => run(g, true),
    /** Adjacency eigenvalues, ascending, in the first g.n entries (shared buffer). */
    adjacency: (g: LocalGraph) => run(g, false),
  };
}
