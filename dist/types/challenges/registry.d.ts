import type { CompactGraph } from '../graph/compact.js';
import type { ChallengeName, ChallengeParams } from './types.js';
import type { Challenge, ResolvedParams } from './types.js';
export declare const challenges: readonly Challenge[];
export declare function getChallenge(name: ChallengeName): Challenge;
export declare function isChallengeName(name: string): name is ChallengeName;
export declare const DEFAULTS: {
    until: number;
    points: number;
    realizations: number;
    band: [number, number];
    worstCase: number;
    element: "node";
};
/** Fills every default and checks ranges; `seed` is the evaluation's seed unless the challenge sets one. */
export declare function resolveParams(g: CompactGraph, p: ChallengeParams, seed: number): ResolvedParams;
