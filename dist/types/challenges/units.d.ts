import type { CompactGraph } from '../graph/compact.js';
import type { Mask } from '../graph/mask.js';
import type { ElementKind } from '../envelope/types.js';
export declare function unitCount(g: CompactGraph, kind: ElementKind): number;
/** Display ids (what reports show). */
export declare function unitIds(g: CompactGraph, kind: ElementKind): readonly string[];
/** Stable ids that seed random orders: node ids, link keys (end ids + occurrence), group ids. */
export declare function unitKeys(g: CompactGraph, kind: ElementKind): readonly string[];
/** 1 for units a challenge may remove: not hardened; a group needs one link that is not hardened. */
export declare function eligibleUnits(g: CompactGraph, kind: ElementKind): Uint8Array;
export declare function isEligible(g: CompactGraph, kind: ElementKind, u: number): boolean;
/** Marks unit u removed in the mask. A group removes its links that are not hardened. */
export declare function removeUnit(g: CompactGraph, mask: Mask, kind: ElementKind, u: number): void;
/** Undoes removeUnit (for searches that try a unit and put it back). */
export declare function restoreUnit(g: CompactGraph, mask: Mask, kind: ElementKind, u: number): void;
/** Number of units removed at fraction x of the original count, capped by what may be removed. */
export declare function stepsAt(x: number, count: number, eligible: number): number;
export declare function countOnes(a: Uint8Array): number;
