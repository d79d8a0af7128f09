import type { CompactGraph } from '../graph/compact.js';
import type { AttackChallenge } from './types.js';
export declare function eigenvectorCentrality(g: CompactGraph, tolerance?: number, maxRounds?: number): Float64Array;
export declare const eigenvector: AttackChallenge;
