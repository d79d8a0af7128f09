import type { CompactGraph } from '../graph/compact.js';
export declare const BRANCH_WIDTH = 8;
export declare const MAX_EXPANSIONS = 3000;
/** Element visits the search may spend in all (each state costs one pass over the design). */
export declare const MAX_VISITS = 50000000;
export interface CoverProblem {
    g: CompactGraph;
    /** Candidate links as node index pairs. */
    pairs: readonly (readonly [number, number])[];
    /** Price of each candidate (km, cost, or 1 per link). */
    price: readonly number[];
    /** Secondary order (higher first), e.g. the Ghosh–Boyd score. */
    score: readonly number[];
    /** Link indices of g that must stop being bridges. */
    bridges: readonly number[];
    /** Node indices of g that must stop being cut nodes. */
    cutNodes: readonly number[];
    maxLinks: number;
    /** How many of the best sets of the smallest size to return. */
    keep: number;
}
export interface CoverResult {
    /** Candidate index sets, ascending within each; best (lowest price) first. */
    sets: number[][];
    /** ⌈leaves/2⌉ of the target bridges at the start (0 when only cut nodes are targets, 1 if any). */
    lowerBound: number;
    /** True when the size of the sets is proven the smallest (it meets the bound, or the search below it was complete). */
    minimal: boolean;
    /** Set when the search stopped at a limit. */
    truncated: boolean;
    expansions: number;
    /** Why nothing was found, when nothing was. */
    reason?: string;
}
export declare function solveCover(p: CoverProblem): CoverResult;
