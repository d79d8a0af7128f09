// diameter: the largest hop distance between two nodes of the LARGEST component of the
// surviving graph (the graph-theoretic diameter restricted to that component). Our
// normalisation is 1/D: 1 for a complete graph, 1/(N−1) for a path. Like average_hop it
// ignores how large that component still is (combine it with largest_component); a
// component of fewer than two nodes has no diameter: raw NaN, score 0.
// Cost: bit-parallel BFS from the component's nodes (see kernels/bit-bfs.ts).

import { createLargestComponentHops } from './kernels/lcc-sources.js';
import type { Metric } from './types.js';

export const diameter: Metric = {
  id: 'diameter',
  description: 'Longest shortest path (hops) within the largest component.',
  normalization: '1 / D (1 for a complete graph); taken on the largest component; 0 when it has under two nodes.',
  cost: 'all-pairs',
  appliesTo: () => true,
  create(g) {
    const hops = createLargestComponentHops(g);
    return (mask) => {
      const { hops: h, count } = hops(mask);
      if (count < 2) return { raw: Number.NaN, normalized: 0 };
      return { raw: h.maxDistance, normalized: 1 / h.maxDistance };
    };
  },
};
