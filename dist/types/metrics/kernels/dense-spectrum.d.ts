import type { LocalGraph } from './subgraph.js';
export declare function createDenseSpectrum(limit: number): {
    /** Laplacian eigenvalues, ascending, in the first g.n entries (shared buffer). */
    laplacian: (g: LocalGraph) => Float64Array<ArrayBufferLike>;
    /** Adjacency eigenvalues, ascending, in the first g.n entries (shared buffer). */
    adjacency: (g: LocalGraph) => Float64Array<ArrayBufferLike>;
};
