// One extremal eigenvalue of a connected local graph — the Fiedler value μ₂ of its
// Laplacian or the spectral radius λ₁ of its adjacency matrix — by the dense values-only
// solver up to `denseLimit` nodes and by Lanczos above: μ₂ by the plain recurrence without
// reorthogonalisation (extremal-lanczos.ts, the Laplacian's constant null vector deflated),
// λ₁ by thick-restart Lanczos. With `warmStart`, Lanczos starts from the previous call's
// eigenvector restricted to the surviving nodes (docs/METHODS.md §8.4's warm start); for μ₂
// the option is ignored: the plain recurrence would need a second pass to form the vector,
// and a warm start saves it less than that costs (40 evaluations along a link-removal
// sequence on BA(5000, 2): 1.32 s cold, 1.70 s warm), so μ₂ is always a pure function of the mask.

import type { CompactGraph } from '../../graph/compact.js';
import { createDenseSpectrum } from './dense-spectrum.js';
import { createExtremalLanczos } from './extremal-lanczos.js';
import { createLanczos } from './lanczos.js';
import { createAdjacencyOperator, createLaplacianOperator } from './operators.js';
import type { LocalGraph } from './subgraph.js';

export function createExtremalSolver(
  g: CompactGraph,
  kind: 'fiedler' | 'radius',
  denseLimit: number,
  warmStart: boolean,
): (part: LocalGraph, keys: Int32Array) => number {
  const limit = Math.min(g.n, denseLimit);
  const fiedler = kind === 'fiedler';
  const dense = createDenseSpectrum(limit);
  // The Fiedler value sits in the clustered low end of the Laplacian spectrum, where the
  // thick-restart solver spent most of its time reorthogonalising (BA(5000, 2): 1.6 s with a
  // basis of 48); the plain recurrence needs ~1,000 products there and no basis (0.08 s).
  // λ₁ is well separated and converges with the thick-restart default basis of 24.
  const lanczos = createLanczos(fiedler ? 0 : g.n, 1);
  const plain = createExtremalLanczos(fiedler ? g.n : 0);
  const op = fiedler ? createLaplacianOperator() : createAdjacencyOperator();
  const one = new Float64Array(fiedler ? g.n : 0);
  const previous = new Float64Array(warmStart && !fiedler ? g.n : 0);
  const start = new Float64Array(warmStart && !fiedler ? g.n : 0);
  let hasPrevious = false;
  return (part, keys) => {
    const n = part.n;
    if (n <= limit) {
      const d = fiedler ? dense.laplacian(part) : dense.adjacency(part);
      return fiedler ? d[1] : d[n - 1];
    }
    op.bind(part);
    if (fiedler) {
      one.fill(1 / Math.sqrt(n), 0, n);
      return plain.solve(op, { which: 'smallest', deflate: one, keys }).value;
    }
    const warm = warmStart && hasPrevious;
    if (warm) for (let i = 0; i < n; i++) start[i] = previous[part.toOriginal[i]];
    const r = lanczos.solve(op, { which: 'largest', count: 1, start: warm ? start : null, keys });
    if (warmStart) {
      previous.fill(0);
      for (let i = 0; i < n; i++) previous[part.toOriginal[i]] = r.vectors[i];
      hasPrevious = true;
    }
    return r.values[0];
  };
}
