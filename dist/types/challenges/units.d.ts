import type { CompactGraph } from '../graph/compact.js';
import type { Mask } from '../graph/mask.js';
import type { ElementKind } from '../graph/element.js';
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
/**
 * Units removed at fraction x of the original count: the real number x·count, capped by what
 * may be removed. It is whole when x·count is (up to the grid's 12-decimal rounding); otherwise
 * R there is read between the two neighbouring whole counts (valueAtCount), so that a value at
 * a fraction moves continuously with the design's size instead of jumping where rounding does.
 */
export declare function countAt(x: number, count: number, eligible: number): number;
/** Whole units a removal order must hold to reach fraction x: ⌈countAt⌉. */
export declare function stepsAt(x: number, count: number, eligible: number): number;
/**
 * R at a real removal count c from R after whole counts (values[k] after k removals): linear
 * between ⌊c⌋ and ⌈c⌉, exactly values[c] when c is whole. NaN when ⌈c⌉ is beyond the values.
 */
export declare function valueAtCount(values: ArrayLike<number>, c: number): number;
/** a + w·(b − a): exactly a at w = 0 and when a = b (so equal neighbours never drift). */
export declare function lerp(a: number, b: number, w: number): number;
export declare function countOnes(a: Uint8Array): number;
