import type { CompactGraph } from './compact.js';
import { type Mask } from './mask.js';
export interface Components {
    /** Component label per node, -1 for removed nodes. Labels follow file order of first node. */
    label: Int32Array;
    /** Size of each component. */
    sizes: number[];
    /** Index of the largest component (the first one on ties), -1 when no node is left. */
    largest: number;
}
export declare function findComponents(g: CompactGraph, mask?: Mask): Components;
export interface CutElements {
    /** Link indices whose loss disconnects their component, ascending. */
    bridges: number[];
    /** Node indices whose loss disconnects their component, ascending. */
    cutNodes: number[];
}
export declare function findCutElements(g: CompactGraph, mask?: Mask): CutElements;
