import type { SymmetricOperator } from './lanczos.js';
import type { LocalGraph } from './subgraph.js';
export interface GraphOperator extends SymmetricOperator {
    /** Point the operator at a (new) local graph; recomputes the norm bound. */
    bind(graph: LocalGraph): void;
}
export declare function maxDegree(g: LocalGraph): number;
export declare function createLaplacianOperator(): GraphOperator;
export declare function createAdjacencyOperator(): GraphOperator;
/** Write the dense n×n Laplacian (laplacian = true) or adjacency matrix of `g` into `out`. */
export declare function denseMatrix(g: LocalGraph, laplacian: boolean, out: Float64Array): void;
