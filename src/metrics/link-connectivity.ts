// link_connectivity: λ, the fewest link failures that disconnect the surviving graph. Unlike
// the spectral metrics, parallel links COUNT here: two links between the same sites are two
// cuts to make (they are one failure only if they share a risk group, which is the
// shared-risk challenge's business, not this metric's). Unit-capacity max-flow with early
// exit (kernels/connectivity-counts.ts); 0 when the survivors are disconnected or fewer
// than two. Normalisation λ / (N0 − 1), capped at 1 because parallel links can push λ past
// N − 1 (docs/METHODS.md §3.1 normalises the simple-graph λ ≤ N − 1 the same way).
// Cost: N' − 1 capped max-flows, O(N · λ · L).

import { createConnectivityCounter } from './kernels/connectivity-counts.js';
import { createSurvivorBuilder } from './kernels/subgraph.js';
import { createComponentCounter } from './kernels/union-find.js';
import type { Metric } from './types.js';

export const linkConnectivity: Metric = {
  id: 'link_connectivity',
  description: 'Link connectivity λ: fewest link failures that disconnect the surviving graph (parallel links count).',
  normalization: 'min(1, λ / (N0 − 1)); 0 when disconnected.',
  cost: 'flow',
  appliesTo: () => true,
  create(g) {
    const survivors = createSurvivorBuilder(g, false);
    const components = createComponentCounter(g);
    const counter = createConnectivityCounter(g.n, 2 * g.m);
    return (mask) => {
      const s = components.run(mask);
      if (s.alive < 2 || s.count > 1) return { raw: 0, normalized: 0 };
      const l = counter.linkConnectivity(survivors(mask));
      return { raw: l, normalized: Math.min(1, l / (g.n - 1)) };
    };
  },
};
