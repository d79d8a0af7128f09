import type { CompactGraph } from '../graph/compact.js';
import type { WorstCase } from './types.js';
import type { ElementKind } from '../graph/element.js';
import type { RFunction } from './r-value.js';
export interface WorstCaseOptions {
    /** Largest number of subsets the exact search may evaluate. */
    exactLimit: number;
    /** Beam width; 1 = greedy. */
    beam: number;
}
/** Number of k-subsets of e elements, as a float (k ≤ 2 is all that is needed). */
export declare function subsets(e: number, k: number): number;
export declare function searchWorstCase(g: CompactGraph, kind: ElementKind, k: number, rfn: RFunction, options: WorstCaseOptions): WorstCase;
