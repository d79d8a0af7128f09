// efficiency: global efficiency by hop count, E = 1/(N0(N0−1)) Σ_{i≠j} 1/d_ij (Latora &
// Marchiori, PRL 87:198701, 2001), with unreachable pairs contributing 1/∞ = 0 and the
// ORIGINAL node count N0 in the denominator so that removals never raise it (docs/METHODS.md §2.2).
// Parallel links do not change hop distances. Cost: all-pairs bit-parallel BFS,
// O(N/32 · levels · (N + L)) word operations per evaluation.

import { createHopHistogram } from './kernels/bit-bfs.js';
import { createSurvivorBuilder } from './kernels/subgraph.js';
import type { Metric } from './types.js';

export const efficiency: Metric = {
  id: 'efficiency',
  description: 'Global efficiency: mean inverse hop distance over all pairs of original nodes.',
  normalization: 'Already in [0, 1] with N0 in the denominator; 1 only for a complete graph.',
  cost: 'all-pairs',
  appliesTo: () => true,
  create(g) {
    const survivors = createSurvivorBuilder(g, true);
    const bfs = createHopHistogram(g.n);
    const sources = new Int32Array(g.n);
    for (let i = 0; i < g.n; i++) sources[i] = i;
    const pairs = g.n * (g.n - 1);
    return (mask) => {
      if (pairs === 0) return { raw: 0, normalized: 0 };
      const local = survivors(mask);
      const { hist, maxDistance } = bfs.run(local, sources, local.n);
      let sum = 0;
      for (let d = 1; d <= maxDistance; d++) sum += hist[d] / d;
      const e = sum / pairs;
      return { raw: e, normalized: e };
    };
  },
};
