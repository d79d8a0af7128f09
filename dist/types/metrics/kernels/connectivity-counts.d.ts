import type { LocalGraph } from './subgraph.js';
export declare function createConnectivityCounter(nodeCapacity: number, entryCapacity: number): {
    /** λ of a connected multigraph (parallel links count) with at least two nodes. */
    linkConnectivity(g: LocalGraph): number;
    /** κ of a connected simple graph with at least two nodes. */
    nodeConnectivity(g: LocalGraph): number;
};
