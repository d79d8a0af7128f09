// N−1 / N−2 evaluation (challenge: challenges/contingency.ts). Every single element, then every
// pair (i < j in canonical index order, graph/canonical.ts), of the chosen kind is removed and R is taken on what is left.
// Cases run in lexicographic order up to `maxCases`; `evaluated` and `total` say how far it got.

import type { CompactGraph } from '../graph/compact.js';
import { createMask } from '../graph/mask.js';
import { eligibleUnits, unitIds } from '../challenges/units.js';
import type { Contingency } from './types.js';
import type { RFunction } from './r-value.js';
import { subsets } from './worst-case.js';

/** How many of the worst cases a contingency result keeps. */
export const WORST_KEPT = 10;

export function contingencyTotal(g: CompactGraph, kind: 'node' | 'link', order: 1 | 2): number {
  let e = 0;
  const eligible = eligibleUnits(g, kind);
  for (let u = 0; u < eligible.length; u++) e += eligible[u];
  return subsets(e, order);
}

export function evaluateContingency(
  g: CompactGraph,
  kind: 'node' | 'link',
  order: 1 | 2,
  rfn: RFunction,
  maxCases: number,
): Contingency {
  const eligible = eligibleUnits(g, kind);
  const units: number[] = [];
  for (let u = 0; u < eligible.length; u++) if (eligible[u]) units.push(u);
  const total = subsets(units.length, order);
  const mask = createMask(g);
  const bits = kind === 'node' ? mask.node : mask.link;
  const worst: { set: number[]; value: number }[] = [];
  let evaluated = 0;
  let min = Infinity;
  const keep = (set: number[], value: number) => {
    if (value < min) min = value;
    if (worst.length === WORST_KEPT && value >= worst[worst.length - 1].value) return;
    // Stable insertion: earlier (lexicographically smaller) cases stay ahead on equal R.
    let i = worst.length;
    while (i > 0 && worst[i - 1].value > value) i--;
    worst.splice(i, 0, { set, value });
    if (worst.length > WORST_KEPT) worst.pop();
  };
  outer: for (let i = 0; i < units.length; i++) {
    bits[units[i]] = 1;
    if (order === 1) {
      if (evaluated >= maxCases) break;
      keep([units[i]], rfn(mask));
      evaluated++;
    } else {
      for (let j = i + 1; j < units.length; j++) {
        if (evaluated >= maxCases) {
          bits[units[i]] = 0;
          break outer;
        }
        bits[units[j]] = 1;
        keep([units[i], units[j]], rfn(mask));
        bits[units[j]] = 0;
        evaluated++;
      }
    }
    bits[units[i]] = 0;
  }
  const ids = unitIds(g, kind);
  return {
    challenge: order === 1 ? 'n-1' : 'n-2',
    kind,
    evaluated,
    total,
    worst: worst.map((w) => ({ elements: w.set.map((u) => ids[u]), value: w.value })),
    // Nothing removable: R stays at the intact value.
    min: evaluated > 0 ? min : rfn(createMask(g)),
  };
}
