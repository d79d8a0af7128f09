// Targeted node attacks by shortest-path betweenness (Brandes 2001, see brandes.ts).
// Static: ranked once on the intact design ("IB"); adaptive: recomputed after every removal
// ("RB"; Holme, Kim, Yoon & Han, PRE 65:056109, 2002). After a removal only the component
// that held the removed node is recomputed — every other component's scores are exactly
// unchanged — and components of two nodes or fewer have no betweenness at all (docs/METHODS.md §8.3).
// Cost: O(N·L) static; adaptive at most O(K·N·L) for K steps.

import type { CompactGraph } from '../graph/compact.js';
import { createMask } from '../graph/mask.js';
import type { AttackChallenge } from './types.js';
import { accumulateBetweenness, adaptiveBetweenness, allNodes } from './brandes.js';
import { rankScores } from './rank.js';
import { eligibleUnits } from './units.js';

export function nodeBetweenness(g: CompactGraph): Float64Array {
  const score = new Float64Array(g.n);
  accumulateBetweenness(g, createMask(g), allNodes(g), score, null);
  return score;
}

export function staticBetweennessOrder(g: CompactGraph, steps: number): Int32Array {
  return rankScores(nodeBetweenness(g), eligibleUnits(g, 'node'), steps);
}

export function adaptiveBetweennessOrder(g: CompactGraph, steps: number): Int32Array {
  return adaptiveBetweenness(g, 'node', steps);
}

export const betweenness: AttackChallenge = {
  name: 'betweenness',
  type: 'attack',
  kind: 'node',
  summary: 'targeted attack: nodes by shortest-path betweenness on the intact design, highest first',
  sequence: (g, steps) => staticBetweennessOrder(g, steps),
};

export const betweennessAdaptive: AttackChallenge = {
  name: 'betweenness-adaptive',
  type: 'attack',
  kind: 'node',
  summary: 'targeted attack: the node with the highest current betweenness, recomputed after every removal',
  sequence: (g, steps) => adaptiveBetweennessOrder(g, steps),
};
