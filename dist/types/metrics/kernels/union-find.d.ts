import type { CompactGraph } from '../../graph/compact.js';
import type { Mask } from '../../graph/mask.js';
/** Root of i's set, halving the path on the way (module-level so every caller stays monomorphic). */
export declare function findRoot(parent: Int32Array, i: number): number;
/**
 * Join the sets of a and b (union by size); returns false when they were already joined.
 */
export declare function unite(parent: Int32Array, size: Int32Array, a: number, b: number): boolean;
export interface UnionFind {
    readonly parent: Int32Array;
    /** Size of the set rooted at i (meaningful at roots only). */
    readonly size: Int32Array;
    find(i: number): number;
}
/** Summary of the surviving graph's components, refreshed in place by each call. */
export interface ComponentSummary {
    /** Surviving nodes. */
    alive: number;
    /** Number of components among surviving nodes. */
    count: number;
    /** Size of the largest component (0 when nothing survives). */
    largest: number;
    /** The union–find root of the largest component (-1 when nothing survives); on ties, the root with the lowest index. */
    largestRoot: number;
    /** Σ over components of C(|C|, 2): node pairs that can still reach each other. */
    connectedPairs: number;
}
/**
 * Component summary of the masked graph: one pass over the links with union–find.
 * `uf` is left holding the partition, so callers can ask `findRoot(uf.parent, v)` afterwards.
 */
export declare function createComponentCounter(g: CompactGraph): {
    uf: UnionFind;
    summary: ComponentSummary;
    run(mask: Mask): ComponentSummary;
};
