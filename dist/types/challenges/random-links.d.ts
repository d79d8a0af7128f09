import type { BandChallenge } from './types.js';
export declare const randomLinks: BandChallenge;
