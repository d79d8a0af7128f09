import type { CompactGraph } from '../graph/compact.js';
import type { MendBound } from './types.js';
export interface BridgeForest {
    /** Piece of each node: the component left when the chosen bridges are cut. */
    piece: Int32Array;
    pieces: number;
    /** Chosen bridges incident to each piece (its degree in the forest). */
    degree: Int32Array;
}
/** Pieces of the design with the links in `cut` removed (the other links kept), and each piece's forest degree. */
export declare function bridgeForest(g: CompactGraph, cut: readonly number[]): BridgeForest;
/**
 * The Eswaran–Tarjan bound. `bridges` absent: every bridge of the design, and the design is to
 * become one 2-edge-connected whole (isolated pieces count). Given: only those bridges are to
 * go (isolated pieces do not count: joining components is not asked for).
 */
export declare function eswaranTarjanBound(g: CompactGraph, bridges?: readonly number[]): MendBound;
