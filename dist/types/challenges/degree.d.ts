import type { CompactGraph } from '../graph/compact.js';
import type { AttackChallenge } from './types.js';
export declare function nodeDegrees(g: CompactGraph): Int32Array;
export declare function staticDegreeOrder(g: CompactGraph, steps: number): Int32Array;
export declare function adaptiveDegreeOrder(g: CompactGraph, steps: number): Int32Array;
export declare const degree: AttackChallenge;
export declare const degreeAdaptive: AttackChallenge;
