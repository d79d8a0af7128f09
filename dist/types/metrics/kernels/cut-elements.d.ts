import type { LocalGraph } from './subgraph.js';
export interface CutSummary {
    bridges: number;
    cutNodes: number;
    blockPairs: number;
    twoEdgePairs: number;
}
export declare function createCutFinder(nodeCapacity: number): (g: LocalGraph) => CutSummary;
