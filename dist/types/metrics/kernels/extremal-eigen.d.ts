import type { CompactGraph } from '../../graph/compact.js';
import type { LocalGraph } from './subgraph.js';
export declare function createExtremalSolver(g: CompactGraph, kind: 'fiedler' | 'radius', denseLimit: number, warmStart: boolean): (part: LocalGraph, keys: Int32Array) => number;
