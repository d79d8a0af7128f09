import type { CompactGraph } from './compact.js';
import { type Mask } from './mask.js';
export interface Components {
    /** Component label per node, -1 for removed nodes. Labels follow the index order of each component's first node. */
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
/** The links a shared-risk group takes down: all of them, or (honouring hardening) those not hardened. */
export declare function groupLinkMask(g: CompactGraph, k: number, honourHardening: boolean, mask?: Mask): Mask;
/**
 * Shared-risk groups whose loss (all their links at once) splits the design, ascending. A group
 * counts only for what its members do together: its links that are bridges on their own are
 * left out of the test (each is already a single point of failure), so a group is listed when
 * losing its other links still adds a component. Removing bridges never changes which links
 * lie on a cycle, so this separates the two cleanly. Honouring hardening, hardened links are
 * not lost (as the challenges treat them) and hardened bridges are not counted as bridges.
 * O(groups × (n + m)).
 */
export declare function findStrandingGroups(g: CompactGraph, honourHardening: boolean, cuts?: CutElements): number[];
