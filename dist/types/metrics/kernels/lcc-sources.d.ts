import type { CompactGraph } from '../../graph/compact.js';
import type { Mask } from '../../graph/mask.js';
import { type HopHistogram } from './bit-bfs.js';
import { type LocalGraph } from './subgraph.js';
export declare function createLargestComponentSources(g: CompactGraph): (mask: Mask, local: LocalGraph) => {
    sources: Int32Array;
    count: number;
};
/** `(mask) → histogram of the largest component`, with `count` its node count. */
export declare function createLargestComponentHops(g: CompactGraph): (mask: Mask) => {
    hops: HopHistogram;
    count: number;
};
