// Shared-risk link groups (RFC 4202 §2.3, "Shared Risk Link Group Information": the links of a
// group share one resource, a duct or a span, and fail together). The failure unit is the
// group: removing it removes all of its links that are not hardened. x = fraction of the
// design's groups.
// - risk-groups: groups fail in seeded random order (keys from group ids); band over realizations.
// - risk-groups-worst: worst first — at each step the group whose loss leaves the lowest R
//   (ties to the group whose id comes first in natural order); O(G²) evaluations of R for G groups.

import { copyMask, createMask } from '../graph/mask.js';
import type { AttackChallenge, BandChallenge } from './types.js';
import { randomOrderPlan } from './random-nodes.js';
import { eligibleUnits, removeUnit } from './units.js';

export const riskGroups: BandChallenge = {
  name: 'risk-groups',
  type: 'band',
  summary: 'shared-risk link groups fail together, groups in seeded random order; band over realizations',
  plan: (g, params) => randomOrderPlan(g, 'group', params),
};

export const riskGroupsWorst: AttackChallenge = {
  name: 'risk-groups-worst',
  type: 'attack',
  kind: 'group',
  summary: 'shared-risk link groups, worst first: each step takes the group whose loss leaves the lowest R',
  sequence(g, steps, ctx) {
    const candidate = eligibleUnits(g, 'group');
    const mask = createMask(g);
    const trial = createMask(g);
    const out: number[] = [];
    while (out.length < steps) {
      let best = -1;
      let bestR = Infinity;
      for (let u = 0; u < candidate.length; u++) {
        if (!candidate[u]) continue;
        copyMask(mask, trial);
        removeUnit(g, trial, 'group', u);
        const r = ctx.rvalue(trial);
        if (r < bestR) {
          bestR = r;
          best = u;
        }
      }
      if (best < 0) break;
      out.push(best);
      candidate[best] = 0;
      removeUnit(g, mask, 'group', best);
    }
    return Int32Array.from(out);
  },
};
