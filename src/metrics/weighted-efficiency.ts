// weighted_efficiency: global efficiency with link costs, E_w = 1/(N0(N0−1)) Σ_{i≠j} 1/d_ij
// where d_ij is the cheapest path by latency (ms) if every link has one, else by length
// (km), else by the generic weight (Latora & Marchiori, PRL 87:198701, 2001, and
// EPJ B 32:249, 2003; docs/METHODS.md §3.1). Applies only when one of those columns is complete
// and positive (kernels/link-cost.ts). Unreachable pairs add 0; N0 is the original count.
// Normalisation E_w / E_ideal, with E_ideal the efficiency of the ideal complete graph in
// which each pair is joined directly at cost δ_ij = max(ℓ_min, direct_ij): direct_ij is the
// great-circle distance between the two sites when both have coordinates (converted to ms
// at 0.0049 ms/km, light in fibre, for latency; coordinates are not used for a generic
// weight), and ℓ_min, the cheapest link of the intact design, bounds every path from
// below. So without coordinates the score is ℓ_min·E_w, netbrace's own fallback (docs/METHODS.md §3.2). When link
// costs are at least the straight-line cost, d_ij ≥ δ_ij and the score is in [0, 1]; data
// that breaks this (a link shorter than its great circle) is clamped to 1.
// Cost: one Dijkstra per surviving node, O(N (N + L) log N) per evaluation; E_ideal is an
// O(N²) sum done once in create().

import { createDijkstra } from './kernels/dijkstra.js';
import { chooseLinkCost, FIBRE_MS_PER_KM, greatCircleKm } from './kernels/link-cost.js';
import { createSurvivorBuilder } from './kernels/subgraph.js';
import type { CompactGraph } from '../graph/compact.js';
import type { Metric } from './types.js';

/** Σ_{i≠j} 1/δ_ij for the ideal complete graph described above. */
function idealInverseSum(g: CompactGraph, kind: 'latency' | 'length' | 'weight', lMin: number): number {
  const n = g.n;
  const { lat, lon } = g;
  if (!lat || !lon || kind === 'weight') return (n * (n - 1)) / lMin;
  const factor = kind === 'latency' ? FIBRE_MS_PER_KM : 1;
  let sum = 0;
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      let delta = lMin;
      if (Number.isFinite(lat[i]) && Number.isFinite(lon[i]) && Number.isFinite(lat[j]) && Number.isFinite(lon[j])) {
        delta = Math.max(lMin, greatCircleKm(lat[i], lon[i], lat[j], lon[j]) * factor);
      }
      sum += 2 / delta;
    }
  }
  return sum;
}

export const weightedEfficiency: Metric = {
  id: 'weighted_efficiency',
  description:
    'Global efficiency by latency (else length, else weight): mean inverse cheapest-path cost over original pairs.',
  normalization:
    'E_w / E_ideal, ideal = every pair joined directly (great-circle distance, at least the cheapest link).',
  cost: 'all-pairs',
  appliesTo: (g) => chooseLinkCost(g) !== null,
  needs: {
    what: 'a latency, length or weight > 0 on every link',
    hint: 'give every link latency_ms or length_km, or take weighted_efficiency out of the r-value',
  },
  create(g) {
    const cost = chooseLinkCost(g);
    if (!cost) throw new RangeError('weighted_efficiency needs latency, length or weight on every link');
    const survivors = createSurvivorBuilder(g, false);
    const dijkstra = createDijkstra(g.n);
    const pairs = g.n * (g.n - 1);
    const ideal = pairs > 0 ? idealInverseSum(g, cost.kind, cost.min) : 0;
    return (mask) => {
      if (pairs === 0) return { raw: 0, normalized: 0 };
      const local = survivors(mask);
      const dist = dijkstra.dist;
      let sum = 0;
      for (let s = 0; s < local.n; s++) {
        dijkstra.run(local, cost.values, s);
        let row = 0;
        for (let t = 0; t < local.n; t++) {
          const d = dist[t];
          if (t !== s && d < Infinity) row += 1 / d;
        }
        sum += row;
      }
      return { raw: sum / pairs, normalized: Math.min(1, sum / ideal) };
    };
  },
};
