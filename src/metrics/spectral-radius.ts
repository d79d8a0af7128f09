// spectral_radius: λ₁, the largest adjacency eigenvalue of the SURVIVING graph (simple,
// parallel links merged) — the maximum over its components (docs/METHODS.md §3.1). Normalisation
// λ₁ / (N0 − 1): λ₁ ≤ N' − 1 ≤ N0 − 1 with equality only for the complete graph.
// Components that cannot beat the best so far (size − 1 or their largest degree is no
// more than it) are skipped. Solvers: dense for components of up to `denseLimit` nodes
// (default 48), thick-restart Lanczos above (residual 1e-10·λ₁).

import { createExtremalSolver } from './kernels/extremal-eigen.js';
import { maxDegree } from './kernels/operators.js';
import { createSpectralSurvivors, EXTREMAL_DENSE_LIMIT } from './kernels/spectral-survivors.js';
import type { Metric } from './types.js';

export const spectralRadius: Metric = {
  id: 'spectral_radius',
  description: 'Largest adjacency eigenvalue of the surviving graph.',
  normalization: 'λ1 / (N0 − 1) (1 only for the complete graph).',
  cost: 'spectral',
  appliesTo: () => true,
  create(g, options = {}) {
    const spectral = createSpectralSurvivors(g);
    const solve = createExtremalSolver(
      g,
      'radius',
      options.denseLimit ?? EXTREMAL_DENSE_LIMIT,
      options.warmStart ?? false,
    );
    return (mask) => {
      const local = spectral.survivors(mask);
      const comps = spectral.components(local);
      let best = 0;
      for (let c = 0; c < comps.count; c++) {
        const size = comps.start[c + 1] - comps.start[c];
        if (size < 2 || size - 1 <= best) continue;
        const part = spectral.component(local, comps, c);
        if (maxDegree(part) <= best) continue; // λ₁ ≤ the largest degree
        const rho = size === 2 ? 1 : solve(part, spectral.keysOf(part));
        if (rho > best) best = rho;
      }
      return { raw: best, normalized: g.n > 1 ? Math.min(1, best / (g.n - 1)) : 0 };
    };
  },
};
