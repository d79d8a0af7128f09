import type { LocalGraph } from './subgraph.js';
export interface FlowNetwork {
    /** Build the network of `graph`: node-split when `split`, else one node per graph node. */
    build(graph: LocalGraph, split: boolean): void;
    /** Max flow from s to t (graph node indices), capped at `limit`. */
    flow(s: number, t: number, limit: number): number;
}
export declare function createFlowNetwork(nodeCapacity: number, entryCapacity: number): FlowNetwork;
