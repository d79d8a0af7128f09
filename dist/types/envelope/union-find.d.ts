import type { CompactGraph } from '../graph/compact.js';
import type { ElementKind } from '../graph/element.js';
export interface ConnectivityCurve {
    /** Size of the largest component after k removals, k = 0..K. */
    lcc: Float64Array;
    /** Connected node pairs Σ_C C(|C|, 2) after k removals. */
    pairs: Float64Array;
}
/** Scratch space for one graph, reused by every realization. */
export interface UnionFindWorkspace {
    /** Union–find forest (union by size, path halving) over node indices. */
    parent: Int32Array;
    size: Int32Array;
    nodeOn: Uint8Array;
    linkOn: Uint8Array;
    /** For group orders: the position of the group that takes each link first. */
    firstGroup: Int32Array;
}
export declare function createUnionFindWorkspace(g: CompactGraph): UnionFindWorkspace;
/**
 * The curve of a removal order of `count` units of the given kind (`order[0..count)`).
 * Groups remove their links that are not hardened; a link lost with an earlier group stays lost.
 */
export declare function connectivityCurve(g: CompactGraph, kind: ElementKind, order: ArrayLike<number>, count: number, ws?: UnionFindWorkspace, out?: ConnectivityCurve): ConnectivityCurve;
