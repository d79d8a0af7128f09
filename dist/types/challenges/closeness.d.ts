import type { CompactGraph } from '../graph/compact.js';
import type { AttackChallenge } from './types.js';
export declare function closenessCentrality(g: CompactGraph): Float64Array;
export declare const closeness: AttackChallenge;
