import type { LocalGraph } from './subgraph.js';
/**
 * Distances from `source` into `dist[0..g.n)` (Infinity where unreachable), with `heap` and
 * `pos` as scratch. `visit(v, d)` is called as each node is settled, in order of distance;
 * returning true stops early, leaving the unsettled distances as upper bounds.
 */
export declare function shortestPaths(g: LocalGraph, cost: Float64Array, source: number, dist: Float64Array, heap: Int32Array, pos: Int32Array, visit?: (v: number, d: number) => boolean): void;
export declare function createDijkstra(capacity: number): {
    dist: Float64Array<ArrayBuffer>;
    /** See shortestPaths; results in `dist`. */
    run(g: LocalGraph, cost: Float64Array, source: number, visit?: (v: number, d: number) => boolean): void;
};
