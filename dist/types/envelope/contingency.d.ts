import type { CompactGraph } from '../graph/compact.js';
import type { Contingency } from './types.js';
import type { RFunction } from './r-value.js';
/** How many of the worst cases a contingency result keeps. */
export declare const WORST_KEPT = 10;
export declare function contingencyTotal(g: CompactGraph, kind: 'node' | 'link', order: 1 | 2): number;
export declare function evaluateContingency(g: CompactGraph, kind: 'node' | 'link', order: 1 | 2, rfn: RFunction, maxCases: number): Contingency;
