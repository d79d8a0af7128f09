import type { CompactGraph } from '../../graph/compact.js';
import type { Mask } from '../../graph/mask.js';
import { type LocalGraph } from './subgraph.js';
/** Default dense-size limits: extremal eigenvalues (a, λ₁) and whole-spectrum traces. */
export declare const EXTREMAL_DENSE_LIMIT = 48;
export declare const TRACE_DENSE_LIMIT = 300;
export interface ComponentList {
    count: number;
    /** Local node indices grouped by component: component c is order[start[c] .. start[c+1]). */
    order: Int32Array;
    start: Int32Array;
}
export declare function createSpectralSurvivors(g: CompactGraph): {
    survivors(mask: Mask): LocalGraph;
    /** Components of a local graph by breadth-first search. */
    components(local: LocalGraph): ComponentList;
    /** Per-node keys of a local graph for start and probe vectors (shared buffer). */
    keysOf(graph: LocalGraph): Int32Array;
    /** Component c of `local` as its own local graph (valid until the next call). */
    component(local: LocalGraph, comps: ComponentList, c: number): LocalGraph;
};
