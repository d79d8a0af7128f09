import type { CompactGraph } from '../graph/compact.js';
import type { AttackChallenge } from './types.js';
export declare function linkBetweenness(g: CompactGraph): Float64Array;
export declare function staticLinkBetweennessOrder(g: CompactGraph, steps: number): Int32Array;
export declare function adaptiveLinkBetweennessOrder(g: CompactGraph, steps: number): Int32Array;
export declare const linkBetweennessStatic: AttackChallenge;
export declare const linkBetweennessAdaptive: AttackChallenge;
