// demand_served: the share of the design's traffic demand volume that the surviving network
// still carries — a demand counts when both its end sites survive and are connected, and,
// when a latency budget b is set (options.latencyBudget, else the design's latencyBudget),
// only when its cheapest surviving path costs at most b × its cost in the intact design.
// This is the service view (in the spirit of the service-specific weights of the R-model,
// docs/METHODS.md §4; the definition here is ours). Path cost: latency if every link has one,
// else length, else weight (kernels/link-cost.ts), else hop count. The intact costs are
// computed once in create(). A demand that the intact design cannot carry is never served;
// a demand from a site to itself is served while the site survives. Comparisons allow a
// relative 1e-12 so that an unchanged path is never rejected by rounding.
// Cost: without a budget one union–find pass, O((N + L)·α); with one, a Dijkstra from each
// distinct demand source, stopped once all of that source's targets are settled or out of
// budget.

import { createDijkstra } from './kernels/dijkstra.js';
import { chooseLinkCost } from './kernels/link-cost.js';
import { createSurvivorBuilder } from './kernels/subgraph.js';
import { createComponentCounter, findRoot } from './kernels/union-find.js';
import { createMask } from '../graph/mask.js';
import type { CompactGraph } from '../graph/compact.js';
import type { Metric } from './types.js';

function totalVolume(g: CompactGraph): number {
  let total = 0;
  for (let k = 0; k < g.demandVolume.length; k++) {
    if (g.demandSource[k] >= 0 && g.demandTarget[k] >= 0 && g.demandVolume[k] > 0) total += g.demandVolume[k];
  }
  return total;
}

export const demandServed: Metric = {
  id: 'demand_served',
  description:
    'Share of traffic demand volume whose ends are still connected (within the latency budget, if one is set).',
  normalization: 'served volume / total demand volume; raw = served volume.',
  cost: 'linear',
  appliesTo: (g) => totalVolume(g) > 0,
  needs: {
    what: 'demands',
    hint: 'declare demands (a volume > 0 between two sites) in the design, or take demand_served out of the r-value',
  },
  create(g, options = {}) {
    const total = totalVolume(g);
    const budget = options.latencyBudget ?? g.latencyBudget;
    const k = g.demandVolume.length;
    const { demandSource: src, demandTarget: dst, demandVolume: vol } = g;
    if (budget === undefined) {
      const counter = createComponentCounter(g);
      return (mask) => {
        if (total <= 0) return { raw: 0, normalized: 0 };
        counter.run(mask);
        const parent = counter.uf.parent;
        let served = 0;
        for (let d = 0; d < k; d++) {
          const s = src[d];
          const t = dst[d];
          if (s < 0 || t < 0 || !(vol[d] > 0) || mask.node[s] || mask.node[t]) continue;
          if (s === t || findRoot(parent, s) === findRoot(parent, t)) served += vol[d];
        }
        return { raw: served, normalized: served / total };
      };
    }
    if (!(budget > 0)) throw new RangeError(`latency budget must be positive, got ${budget}`);

    const chosen = chooseLinkCost(g);
    const cost = chosen ? chosen.values : new Float64Array(g.m).fill(1);
    // Demands grouped by source: bySource[first[s] .. first[s+1]) are demand indices.
    const first = new Int32Array(g.n + 1);
    for (let d = 0; d < k; d++) if (src[d] >= 0 && dst[d] >= 0 && vol[d] > 0) first[src[d] + 1]++;
    for (let v = 0; v < g.n; v++) first[v + 1] += first[v];
    const bySource = new Int32Array(first[g.n]);
    const fill = first.slice(0, g.n);
    for (let d = 0; d < k; d++) if (src[d] >= 0 && dst[d] >= 0 && vol[d] > 0) bySource[fill[src[d]]++] = d;

    const survivors = createSurvivorBuilder(g, false);
    const dijkstra = createDijkstra(g.n);
    // Intact cheapest costs, and the budget they allow.
    const allowed = new Float64Array(k).fill(-1);
    {
      const local = survivors(createMask(g));
      for (let s = 0; s < g.n; s++) {
        if (first[s] === first[s + 1]) continue;
        dijkstra.run(local, cost, s);
        for (let i = first[s]; i < first[s + 1]; i++) {
          const d = bySource[i];
          const c = dijkstra.dist[dst[d]];
          if (c < Infinity) allowed[d] = c * budget * (1 + 1e-12);
        }
      }
    }
    // Early stop: the farthest allowed cost among the current source's demands.
    let reach = 0;
    const stopWhenBeyond = (_v: number, dist: number) => dist > reach;
    return (mask) => {
      if (total <= 0) return { raw: 0, normalized: 0 };
      const local = survivors(mask);
      let served = 0;
      for (let s = 0; s < g.n; s++) {
        if (first[s] === first[s + 1] || mask.node[s]) continue;
        reach = 0;
        for (let i = first[s]; i < first[s + 1]; i++) reach = Math.max(reach, allowed[bySource[i]]);
        if (reach < 0) continue;
        dijkstra.run(local, cost, local.toLocal[s], stopWhenBeyond);
        for (let i = first[s]; i < first[s + 1]; i++) {
          const d = bySource[i];
          const t = dst[d];
          if (allowed[d] < 0 || mask.node[t]) continue;
          if (dijkstra.dist[local.toLocal[t]] <= allowed[d]) served += vol[d];
        }
      }
      return { raw: served, normalized: served / total };
    };
  },
};
