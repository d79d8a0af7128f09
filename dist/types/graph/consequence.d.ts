import type { CompactGraph } from './compact.js';
import { type Mask } from './mask.js';
import { type Components } from './structure.js';
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
