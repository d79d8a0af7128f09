// The shared shape of the bridges and cut_nodes metrics: one low-link DFS over the
// surviving multigraph, a count as the raw value and a pair share as the score.

import type { Metric, MetricId } from '../types.js';
import { createCutFinder, type CutSummary } from './cut-elements.js';
import { createSurvivorBuilder } from './subgraph.js';

export function cutMetric(
  id: MetricId,
  description: string,
  normalization: string,
  pick: (s: CutSummary) => { count: number; protectedPairs: number },
): Metric {
  return {
    id,
    description,
    normalization,
    cost: 'linear',
    appliesTo: () => true,
    create(g) {
      const survivors = createSurvivorBuilder(g, false);
      const find = createCutFinder(g.n);
      const allPairs = (g.n * (g.n - 1)) / 2;
      return (mask) => {
        const { count, protectedPairs } = pick(find(survivors(mask)));
        return { raw: count, normalized: allPairs > 0 ? protectedPairs / allPairs : 0 };
      };
    },
  };
}
