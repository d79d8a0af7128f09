// Random node failures: each realization removes the nodes that are not hardened in the order
// of their keys hash(seed, realization, node id) (envelope/rng.ts), so versions of a design
// share the dice for the nodes they have in common. x = fraction of the original node count;
// x·N nodes are removed at grid point x (a fixed count, "microcanonical"); when x·N is not whole,
// R there is interpolated between ⌊x·N⌋ and ⌈x·N⌉ removals of the same realization (units.ts).

import type { CompactGraph } from '../graph/compact.js';
import type { ElementKind } from '../graph/element.js';
import { createOrderWorkspace, hashIds, randomOrder, seedWord } from '../envelope/rng.js';
import type { BandChallenge, BandPlan, ResolvedParams } from './types.js';
import { makeGrid } from './grid.js';
import { countAt, countOnes, eligibleUnits, unitCount, unitKeys } from './units.js';

/** The plan shared by every "units in random key order" challenge. */
export function randomOrderPlan(g: CompactGraph, kind: ElementKind, params: ResolvedParams): BandPlan {
  const x = makeGrid(params.until, params.points, params.at);
  const count = unitCount(g, kind);
  const eligible = eligibleUnits(g, kind);
  const available = countOnes(eligible);
  const stepTable = Float64Array.from(x, (xi) => countAt(xi, count, available));
  const maxUnits = stepTable.length ? Math.ceil(stepTable[stepTable.length - 1]) : 0;
  const idHash = hashIds(unitKeys(g, kind));
  const seedW = seedWord(params.seed);
  const full = new Int32Array(count);
  const ws = createOrderWorkspace(count);
  return {
    kind,
    xUnit: 'fraction',
    x,
    realizations: params.realizations,
    maxUnits,
    realize(r, order, steps) {
      randomOrder(idHash, eligible, seedW, r, full, ws);
      order.set(full.subarray(0, maxUnits));
      steps.set(stepTable);
      return maxUnits;
    },
  };
}

export const randomNodes: BandChallenge = {
  name: 'random-nodes',
  type: 'band',
  summary: 'random node failures: nodes fail in a seeded random order; band over realizations',
  plan: (g, params) => randomOrderPlan(g, 'node', params),
};
