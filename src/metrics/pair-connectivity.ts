// pair_connectivity: the fraction of the ORIGINAL node pairs that can still reach each
// other, P = Σ_C C(|C|, 2) / C(N0, 2) (pairwise connectivity of the critical-node problem,
// Arulselvan et al., Comput. Oper. Res. 36:2193, 2009 — from memory, see docs/METHODS.md §3.1).
// Cost: one union–find pass, O((N + L)·α(N)). A design with fewer than two nodes has no
// pairs and scores 0 (docs/METHODS.md §2.3: an empty graph scores 0).

import { createComponentCounter } from './kernels/union-find.js';
import type { Metric } from './types.js';

export const pairConnectivity: Metric = {
  id: 'pair_connectivity',
  description: 'Fraction of the original node pairs that are still connected.',
  normalization: 'connected pairs / C(N0, 2); raw = number of connected pairs.',
  cost: 'linear',
  appliesTo: () => true,
  create(g) {
    const counter = createComponentCounter(g);
    const allPairs = (g.n * (g.n - 1)) / 2;
    return (mask) => {
      const s = counter.run(mask);
      return { raw: s.connectedPairs, normalized: allPairs > 0 ? s.connectedPairs / allPairs : 0 };
    };
  },
};
