// Targeted link attacks by link (edge) betweenness, static and adaptive (Holme, Kim, Yoon &
// Han, PRE 65:056109, 2002, the link variants; Brandes 2001 gives link scores from the same
// pass). Adaptive: after a link is cut, only the component that held it is recomputed.

import type { CompactGraph } from '../graph/compact.js';
import { createMask } from '../graph/mask.js';
import type { AttackChallenge } from './types.js';
import { accumulateBetweenness, adaptiveBetweenness, allNodes } from './brandes.js';
import { rankScores } from './rank.js';
import { eligibleUnits } from './units.js';

export function linkBetweenness(g: CompactGraph): Float64Array {
  const score = new Float64Array(g.m);
  accumulateBetweenness(g, createMask(g), allNodes(g), null, score);
  return score;
}

export function staticLinkBetweennessOrder(g: CompactGraph, steps: number): Int32Array {
  return rankScores(linkBetweenness(g), eligibleUnits(g, 'link'), steps);
}

export function adaptiveLinkBetweennessOrder(g: CompactGraph, steps: number): Int32Array {
  return adaptiveBetweenness(g, 'link', steps);
}

export const linkBetweennessStatic: AttackChallenge = {
  name: 'link-betweenness',
  type: 'attack',
  kind: 'link',
  summary: 'targeted attack: links by link betweenness on the intact design, highest first',
  sequence: (g, steps) => staticLinkBetweennessOrder(g, steps),
};

export const linkBetweennessAdaptive: AttackChallenge = {
  name: 'link-betweenness-adaptive',
  type: 'attack',
  kind: 'link',
  summary: 'targeted attack: the link with the highest current link betweenness, recomputed after every cut',
  sequence: (g, steps) => adaptiveLinkBetweennessOrder(g, steps),
};
