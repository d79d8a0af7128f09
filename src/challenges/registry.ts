// Every challenge by name, with its one-line description, and the defaults of its parameters.

import type { CompactGraph } from '../graph/compact.js';
import type { ChallengeName, ChallengeParams } from './types.js';
import type { Challenge, ResolvedParams } from './types.js';
import { betweenness, betweennessAdaptive } from './betweenness.js';
import { closeness } from './closeness.js';
import { nMinus1, nMinus2 } from './contingency.js';
import { degree, degreeAdaptive } from './degree.js';
import { eigenvector } from './eigenvector.js';
import { linkBetweennessAdaptive, linkBetweennessStatic } from './link-betweenness.js';
import { randomLinks } from './random-links.js';
import { randomNodes } from './random-nodes.js';
import { defaultRegionalUntil, regional } from './regional.js';
import { riskGroups, riskGroupsWorst } from './risk-groups.js';

export const challenges: readonly Challenge[] = [
  randomNodes,
  randomLinks,
  degree,
  degreeAdaptive,
  betweenness,
  betweennessAdaptive,
  eigenvector,
  closeness,
  linkBetweennessStatic,
  linkBetweennessAdaptive,
  riskGroups,
  riskGroupsWorst,
  regional,
  nMinus1,
  nMinus2,
];

const byName = new Map<string, Challenge>(challenges.map((c) => [c.name, c]));

export function getChallenge(name: ChallengeName): Challenge {
  const c = byName.get(name);
  if (!c) throw new RangeError(`unknown challenge "${name}"`);
  return c;
}

export function isChallengeName(name: string): name is ChallengeName {
  return byName.has(name);
}

export const DEFAULTS = {
  until: 0.5,
  points: 11,
  realizations: 200,
  band: [0.1, 0.9] as [number, number],
  worstCase: 0,
  element: 'node' as const,
};

/** Fills every default and checks ranges; `seed` is the evaluation's seed unless the challenge sets one. */
export function resolveParams(g: CompactGraph, p: ChallengeParams, seed: number): ResolvedParams {
  const until = p.until ?? (p.challenge === 'regional' ? defaultRegionalUntil(g) : DEFAULTS.until);
  const fraction = p.challenge !== 'regional';
  if (!Number.isFinite(until) || until < 0 || (fraction && until > 1)) {
    throw new RangeError(
      `${p.challenge}: until must be ${fraction ? 'a fraction in [0, 1]' : 'a radius ≥ 0 km'}, got ${until}`,
    );
  }
  const points = p.points ?? DEFAULTS.points;
  if (!Number.isInteger(points) || points < 2)
    throw new RangeError(`${p.challenge}: points must be an integer ≥ 2, got ${points}`);
  const realizations = p.realizations ?? DEFAULTS.realizations;
  if (!Number.isInteger(realizations) || realizations < 1) {
    throw new RangeError(`${p.challenge}: realizations must be an integer ≥ 1, got ${realizations}`);
  }
  const band = p.band ?? DEFAULTS.band;
  if (!(band[0] > 0 && band[0] < band[1] && band[1] < 1)) {
    throw new RangeError(`${p.challenge}: band must be two quantiles 0 < lo < hi < 1, got ${band.join(',')}`);
  }
  const worstCase = p.worstCase ?? DEFAULTS.worstCase;
  if (!Number.isInteger(worstCase) || worstCase < 0)
    throw new RangeError(`${p.challenge}: worstCase must be an integer ≥ 0`);
  if (p.beam !== undefined && (!Number.isInteger(p.beam) || p.beam < 1))
    throw new RangeError(`${p.challenge}: beam must be an integer ≥ 1`);
  const at = p.at ?? [];
  for (const x of at) {
    if (!Number.isFinite(x) || x < 0 || (fraction && x > 1))
      throw new RangeError(`${p.challenge}: grid point ${x} is out of range`);
  }
  return {
    challenge: p.challenge,
    until,
    points,
    realizations,
    band: [band[0], band[1]],
    seed: p.seed ?? seed,
    worstCase,
    element: p.element ?? DEFAULTS.element,
    at,
    beam: p.beam ?? 1,
  };
}
