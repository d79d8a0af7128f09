import type { AttackChallenge, BandChallenge } from './types.js';
export declare const riskGroups: BandChallenge;
export declare const riskGroupsWorst: AttackChallenge;
