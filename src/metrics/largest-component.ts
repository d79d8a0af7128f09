// largest_component: the share of the ORIGINAL nodes that sit in the largest connected
// component of the surviving graph, S = |C_max| / N0 (docs/METHODS.md §3.1; the usual giant-
// component fraction of percolation studies, e.g. Callaway et al., PRL 85:5468, 2000).
// Cost: one union–find pass over the links, O((N + L)·α(N)).

import { createComponentCounter } from './kernels/union-find.js';
import type { Metric } from './types.js';

export const largestComponent: Metric = {
  id: 'largest_component',
  description: 'Share of the original nodes in the largest connected component.',
  normalization: '|largest component| / N0 (original node count); raw = nodes in the largest component.',
  cost: 'linear',
  appliesTo: () => true,
  create(g) {
    const counter = createComponentCounter(g);
    return (mask) => {
      const s = counter.run(mask);
      return { raw: s.largest, normalized: g.n > 0 ? s.largest / g.n : 0 };
    };
  },
};
