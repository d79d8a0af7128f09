// Random link failures: like random-nodes, over links keyed by their stable key (end ids plus
// occurrence among parallel links), so renumbered positional ids do not change the dice.
// x = fraction of the original link count.

import type { BandChallenge } from './types.js';
import { randomOrderPlan } from './random-nodes.js';

export const randomLinks: BandChallenge = {
  name: 'random-links',
  type: 'band',
  summary: 'random link failures: links fail in a seeded random order; band over realizations',
  plan: (g, params) => randomOrderPlan(g, 'link', params),
};
