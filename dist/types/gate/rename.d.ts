import type { CompactGraph } from '../graph/compact.js';
export interface Matching {
    /** Base index → head index, -1 when the element has no counterpart. */
    nodeToHead: Int32Array;
    nodeToBase: Int32Array;
    linkToHead: Int32Array;
    linkToBase: Int32Array;
    groupToHead: Int32Array;
    groupToBase: Int32Array;
    /** Matched pairs [base, head] whose ids differ, in head file order. */
    renamedNodes: [number, number][];
    renamedGroups: [number, number][];
}
/** The identity matching of a design with itself (base and head are one evaluation). */
export declare function identityMatching(g: CompactGraph): Matching;
export declare function matchDesigns(base: CompactGraph, head: CompactGraph): Matching;
/**
 * Whether base and head are the same design once renamed ids are read through the matching:
 * every node, link and shared-risk group matched, with the same ends, flags, coordinates,
 * lengths, latencies, weights and group memberships, and the same demands. Such a change only
 * spells ids differently, so it is judged on one evaluation (every delta exactly 0).
 */
export declare function sameDesign(base: CompactGraph, head: CompactGraph, m: Matching): boolean;
