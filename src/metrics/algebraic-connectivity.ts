// algebraic_connectivity: the Fiedler value a = μ₂, the second-smallest eigenvalue of the
// Laplacian of the SURVIVING graph (Fiedler, Czech. Math. J. 23:298, 1973; docs/METHODS.md §3.1).
// Taken on the whole survivor graph, so it is 0 as soon as the survivors are disconnected;
// that is detected by counting components, never read off a tiny eigenvalue. The simple
// graph is used (parallel links merged). Normalisation: a / N0 (a ≤ N' ≤ N0, with a = N
// only for the complete graph), so the scale is the same at every removal step.
// Solvers: survivors of up to `denseLimit` nodes (default 48) use the dense values-only
// tridiagonal QL; above that, the plain Lanczos recurrence (no reorthogonalisation, Paige
// 1980; kernels/extremal-lanczos.ts) on the matrix-free Laplacian with the constant vector
// deflated, converged to a residual of 1e-10·a (so a is correct to about 1e-10 relative).
// Lanczos is faster than the dense solver from a few dozen nodes up.

import { createExtremalSolver } from './kernels/extremal-eigen.js';
import { createSpectralSurvivors, EXTREMAL_DENSE_LIMIT } from './kernels/spectral-survivors.js';
import type { Metric } from './types.js';

export const algebraicConnectivity: Metric = {
  id: 'algebraic_connectivity',
  description: 'Fiedler value: second-smallest Laplacian eigenvalue of the surviving graph (0 if disconnected).',
  normalization: 'a / N0 (a = N only for the complete graph); 0 when the survivors are disconnected.',
  cost: 'spectral',
  appliesTo: () => true,
  create(g, options = {}) {
    const spectral = createSpectralSurvivors(g);
    const solve = createExtremalSolver(
      g,
      'fiedler',
      options.denseLimit ?? EXTREMAL_DENSE_LIMIT,
      options.warmStart ?? false,
    );
    return (mask) => {
      const local = spectral.survivors(mask);
      if (local.n < 2 || spectral.components(local).count > 1) return { raw: 0, normalized: 0 };
      const a = Math.max(0, solve(local, spectral.keysOf(local)));
      return { raw: a, normalized: Math.min(1, a / g.n) };
    };
  },
};
