// node_connectivity: κ, the fewest nodes whose loss disconnects the surviving graph (or
// leaves one node), of the simple survivor graph. Computed by unit-capacity max-flow on the
// node-split network with early exit (kernels/connectivity-counts.ts); 0 when the
// survivors are disconnected or fewer than two. Normalisation κ / (N0 − 1) (Whitney:
// κ ≤ δ_min ≤ N' − 1 ≤ N0 − 1, equality only for the complete graph; docs/METHODS.md §3.1).
// Cost: O(N · κ · L) in the worst case; usually far less because of the caps.

import { createConnectivityCounter } from './kernels/connectivity-counts.js';
import { createSurvivorBuilder } from './kernels/subgraph.js';
import { createComponentCounter } from './kernels/union-find.js';
import type { Metric } from './types.js';

export const nodeConnectivity: Metric = {
  id: 'node_connectivity',
  description: 'Node connectivity κ: fewest node failures that disconnect the surviving graph.',
  normalization: 'κ / (N0 − 1) (1 only for the complete graph); 0 when disconnected.',
  cost: 'flow',
  appliesTo: () => true,
  create(g) {
    const survivors = createSurvivorBuilder(g, true);
    const components = createComponentCounter(g);
    const counter = createConnectivityCounter(g.n, 2 * g.m);
    return (mask) => {
      const s = components.run(mask);
      if (s.alive < 2 || s.count > 1) return { raw: 0, normalized: 0 };
      const k = counter.nodeConnectivity(survivors(mask));
      return { raw: k, normalized: Math.min(1, k / (g.n - 1)) };
    };
  },
};
