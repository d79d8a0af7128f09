import type { CompactGraph } from '../../graph/compact.js';
import type { LocalGraph } from './subgraph.js';
/** Lanczos basis size for the Fiedler value (see below). */
export declare const FIEDLER_BASIS = 48;
export declare function createExtremalSolver(g: CompactGraph, kind: 'fiedler' | 'radius', denseLimit: number, warmStart: boolean): (part: LocalGraph, keys: Int32Array) => number;
