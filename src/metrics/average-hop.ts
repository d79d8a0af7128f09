// average_hop: the mean hop count H between the ordered node pairs of the LARGEST
// component of the surviving graph (docs/METHODS.md §3.2, "report over connected pairs"); the
// normalisation is 1/H, which is 1 for a complete graph and falls as paths lengthen.
// Deviation, on purpose: H is taken on the largest component instead of over all pairs,
// because H over disconnected pairs is infinite. It therefore says nothing about how
// much of the network that component still holds — pair it with largest_component or use
// efficiency when fragmentation matters. A largest component of fewer than two nodes has
// no pairs: raw is NaN and the score 0.
// Cost: bit-parallel BFS from the component's nodes (see kernels/bit-bfs.ts).

import { createLargestComponentHops } from './kernels/lcc-sources.js';
import type { Metric } from './types.js';

export const averageHop: Metric = {
  id: 'average_hop',
  description: 'Mean hop count between the node pairs of the largest component.',
  normalization: '1 / H (1 for a complete graph); taken on the largest component; 0 when it has under two nodes.',
  cost: 'all-pairs',
  appliesTo: () => true,
  create(g) {
    const hops = createLargestComponentHops(g);
    return (mask) => {
      const { hops: h, count } = hops(mask);
      if (count < 2) return { raw: Number.NaN, normalized: 0 };
      let sum = 0;
      for (let d = 1; d <= h.maxDistance; d++) sum += h.hist[d] * d;
      const mean = sum / (count * (count - 1));
      return { raw: mean, normalized: 1 / mean };
    };
  },
};
