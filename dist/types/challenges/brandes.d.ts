import type { CompactGraph } from '../graph/compact.js';
import { type Mask } from '../graph/mask.js';
export interface BrandesWorkspace {
    dist: Int32Array;
    sigma: Float64Array;
    delta: Float64Array;
    order: Int32Array;
}
export declare function createBrandesWorkspace(g: CompactGraph): BrandesWorkspace;
/**
 * Adds each source's dependencies to `nodeScore` and/or `linkScore` (either may be null).
 * Sources that are removed in the mask are skipped.
 */
export declare function accumulateBetweenness(g: CompactGraph, mask: Mask, sources: ArrayLike<number>, nodeScore: Float64Array | null, linkScore: Float64Array | null, ws?: BrandesWorkspace): void;
/** Nodes of the component holding `start` in the masked graph (BFS order), written to `out`. */
export declare function componentOf(g: CompactGraph, mask: Mask, start: number, seen: Uint8Array, out: Int32Array): number;
export declare function allNodes(g: CompactGraph): Int32Array;
/**
 * Adaptive betweenness attack on nodes or links: remove the element with the highest current
 * score (ties to the lowest index), then recompute only the component that held it — every
 * other component's scores are exactly unchanged. Node components left with at most two nodes
 * have no betweenness, so they are not recomputed.
 */
export declare function adaptiveBetweenness(g: CompactGraph, kind: 'node' | 'link', steps: number): Int32Array;
