// efficiency: global efficiency by hop count, E = 1/(N0(N0−1)) Σ_{i≠j} 1/d_ij (Latora &
// Marchiori, PRL 87:198701, 2001), with unreachable pairs contributing 1/∞ = 0 and the
// ORIGINAL node count N0 in the denominator so that removals never raise it (docs/METHODS.md §2.2).
// Parallel links do not change hop distances. Cost: all-pairs bit-parallel BFS,
// O(N/64 · levels · (N + L)) word operations per evaluation.
// With `sources: k` (k < N0) the search starts from a seeded sample of k nodes instead
// (kernels/source-sample.ts): E is then estimated by the sample mean of the per-source terms
// y_s = Σ_t 1/d(s,t) / (N0 − 1), unbiased, with its standard error in `se`; the cost falls to
// k/N0 of the exact one. An estimate, not the value: the se says how far it may be off.

import { createHopHistogram } from './kernels/bit-bfs.js';
import { sampleMean, sampleSources } from './kernels/source-sample.js';
import { createSurvivorBuilder } from './kernels/subgraph.js';
import type { Metric } from './types.js';

export const efficiency: Metric = {
  id: 'efficiency',
  description: 'Global efficiency: mean inverse hop distance over all pairs of original nodes.',
  normalization: 'Already in [0, 1] with N0 in the denominator; 1 only for a complete graph.',
  cost: 'all-pairs',
  appliesTo: () => true,
  create(g, options = {}) {
    const survivors = createSurvivorBuilder(g, true);
    const bfs = createHopHistogram(g.n);
    const pairs = g.n * (g.n - 1);
    const sample = sampleSources(g.nodeIds, options.sources, options.sourceSeed ?? 0);
    if (sample) {
      const k = sample.length;
      const local = new Int32Array(k);
      const at = new Int32Array(k);
      const sums = new Float64Array(k);
      const y = new Float64Array(k);
      return (mask) => {
        const graph = survivors(mask);
        let alive = 0;
        for (let i = 0; i < k; i++) {
          const v = graph.toLocal[sample[i]];
          if (v >= 0) {
            local[alive] = v;
            at[alive++] = i;
          }
        }
        y.fill(0);
        bfs.run(graph, local, alive, sums);
        for (let i = 0; i < alive; i++) y[at[i]] = sums[i] / (g.n - 1);
        const { mean, se } = sampleMean(y, k, g.n);
        return { raw: mean, normalized: Math.min(1, Math.max(0, mean)), se };
      };
    }
    const sources = new Int32Array(g.n);
    for (let i = 0; i < g.n; i++) sources[i] = i;
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
