import type { CompactGraph } from './compact.js';
export interface Mask {
    /** 1 = node removed (its links are then dead too). */
    readonly node: Uint8Array;
    /** 1 = link removed. */
    readonly link: Uint8Array;
}
export declare function createMask(g: CompactGraph): Mask;
export declare function copyMask(from: Mask, to: Mask): void;
/** A link carries traffic iff it and both of its ends are present. */
export declare function isLinkAlive(g: CompactGraph, mask: Mask, e: number): boolean;
