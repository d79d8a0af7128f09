import type { ContingencyChallenge } from './types.js';
export declare const nMinus1: ContingencyChallenge;
export declare const nMinus2: ContingencyChallenge;
