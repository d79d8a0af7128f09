import type { CompactGraph } from '../graph/compact.js';
import type { AttackChallenge } from './types.js';
export declare function nodeBetweenness(g: CompactGraph): Float64Array;
export declare function staticBetweennessOrder(g: CompactGraph, steps: number): Int32Array;
export declare function adaptiveBetweennessOrder(g: CompactGraph, steps: number): Int32Array;
export declare const betweenness: AttackChallenge;
export declare const betweennessAdaptive: AttackChallenge;
