import type { CompactGraph } from '../../graph/compact.js';
import type { Mask } from '../../graph/mask.js';
export interface LocalGraph {
    /** Nodes in the local graph. */
    n: number;
    /** Adjacency entries used (twice the number of undirected links). */
    entries: number;
    /** Row offsets, valid for 0..n. */
    readonly offsets: Int32Array;
    /** Local neighbour indices. */
    readonly neighbors: Int32Array;
    /** Original link index of each adjacency entry (the first of merged parallels). */
    readonly linkOf: Int32Array;
    /** Local → original node index. */
    readonly toOriginal: Int32Array;
    /** Original → local node index, -1 when the node is not in the local graph. */
    readonly toLocal: Int32Array;
}
export declare function allocateLocalGraph(nodeCapacity: number, entryCapacity: number): LocalGraph;
/**
 * A builder of the surviving graph. With `simple`, parallel links collapse into one
 * adjacency entry (what the simple-graph definitions of docs/METHODS.md §2.1 need).
 */
export declare function createSurvivorBuilder(g: CompactGraph, simple: boolean): (mask: Mask) => LocalGraph;
/**
 * The subgraph of `src` induced by `nodes[from .. from+count)` (local indices of `src`),
 * written into `out` in that order. `out.toOriginal` maps back to the original graph and
 * `out.toLocal` (sized to the original graph) maps original indices into `out` until the
 * next call.
 */
export declare function inducedSubgraph(src: LocalGraph, nodes: Int32Array, from: number, count: number, out: LocalGraph): LocalGraph;
