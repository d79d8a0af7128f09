import type { Topology } from '../topology/model.js';
/** Natural order of element ids (see the header); negative when a comes first. */
export declare function compareIds(a: string, b: string): number;
/** Indices of `ids` in natural order (ties: lower index first); each id is parsed once. */
export declare function naturalOrder(ids: readonly string[]): number[];
/**
 * Code point order of two strings. JavaScript's `<` compares UTF-16 code units, which puts
 * characters above U+FFFF (surrogate pairs, 0xD800–0xDFFF) before U+E000–U+FFFF; ranking
 * surrogates above the rest of the BMP gives the order of code points.
 */
export declare function compareCodePoints(a: string, b: string): number;
export interface CanonicalOrder {
    /** File indices of the nodes, in canonical order. */
    nodes: number[];
    /** File indices of the links, in canonical order. */
    links: number[];
    /**
     * Link keys in canonical order. A link without parallels keeps its own key; the parallel links
     * between two nodes share out their keys (the reader's "a—b", "a—b#2", …) in canonical order,
     * so the key that seeds a parallel link's dice does not depend on which one the file lists first.
     */
    keys: string[];
    /** File indices of the demands, in canonical order. */
    demands: number[];
    /** Each link's ends as canonical node indices, smaller first (−1: unknown node), by file index. */
    lo: Int32Array;
    hi: Int32Array;
}
export declare function canonicalOrder(t: Topology): CanonicalOrder;
