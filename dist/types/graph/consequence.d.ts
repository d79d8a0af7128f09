import type { CompactGraph } from './compact.js';
import { type Mask } from './mask.js';
import { type Components } from './structure.js';
import type { ReportElement } from './element.js';
/**
 * What losing an element (or a whole removal sequence) costs, on connectivity alone: the
 * surviving sites cut off from the largest part and, when the design has demands, the demands
 * whose two ends no longer share a part (latency budgets are not considered here).
 */
export interface Consequence {
    /** Surviving sites cut off from the largest part, in file order (at most MAX_STRANDED listed). */
    stranded: ReportElement[];
    /** How many sites are cut off (the list may be shorter). */
    strandedCount: number;
    /** Demands that were connected and lose every path, and how many demands the design has. */
    demandsLost?: number;
    demandsTotal?: number;
    /** Their volume, and the volume of all demands (the design's own unit). */
    volumeLost?: number;
    volumeTotal?: number;
}
export interface RemovalCost {
    /** Node indices cut off from the largest part, ascending (file order). */
    stranded: number[];
    /** Demands (indices) that were connected and no longer are, ascending. */
    demandsLost: number[];
    volumeLost: number;
    /** Every demand's volume, for "x of y". */
    volumeTotal: number;
}
/** The cost of the removal `mask` against the intact design (`intact`: its components, when the caller has them). */
export declare function removalCost(g: CompactGraph, mask: Mask, intact?: Components): RemovalCost;
