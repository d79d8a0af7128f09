import type { Topology } from '../topology/model.js';
export interface CompactGraph {
    /** Number of nodes (original, N0). */
    readonly n: number;
    /** Number of links (original, L0), parallel links included. */
    readonly m: number;
    /** CSR row offsets, length n + 1. Neighbours of v are neighbors[offsets[v] .. offsets[v+1]). */
    readonly offsets: Int32Array;
    /** CSR column indices, length 2m (each undirected link appears twice). */
    readonly neighbors: Int32Array;
    /** For each adjacency entry, the index of the link it belongs to. */
    readonly linkOf: Int32Array;
    /** Link ends, length m. */
    readonly linkSource: Int32Array;
    readonly linkTarget: Int32Array;
    /** Link lengths in km (NaN where unknown), or null when no link has one. */
    readonly length: Float64Array | null;
    /** Link latencies in ms (NaN where unknown), or null when no link has one. */
    readonly latency: Float64Array | null;
    /** Generic link weights from interchange formats (NaN where unknown), or null. */
    readonly weight: Float64Array | null;
    /** 1 where the node / link is hardened (never removed by challenges). */
    readonly nodeHardened: Uint8Array;
    readonly linkHardened: Uint8Array;
    /** Site coordinates in degrees (NaN where unknown), or null when no node has both. */
    readonly lat: Float64Array | null;
    readonly lon: Float64Array | null;
    /** Element ids in canonical order (canonical.ts: natural id order); index i ↔ id. */
    readonly nodeIds: readonly string[];
    /** Human labels of nodes (GraphML/GML `label` or `name`, our format's `label`), else undefined. */
    readonly nodeLabels: readonly (string | undefined)[];
    readonly linkIds: readonly string[];
    /** Stable link keys (TopoLink.key; parallel links share theirs out in canonical order) that seed random orders. */
    readonly linkKeys: readonly string[];
    readonly nodeIndex: ReadonlyMap<string, number>;
    readonly linkIndex: ReadonlyMap<string, number>;
    /** 1-based source lines, for reports. */
    readonly nodeLine: Int32Array;
    readonly linkLine: Int32Array;
    /** Shared-risk link groups: group g holds groupLinks[groupOffsets[g] .. groupOffsets[g+1]). */
    readonly groupIds: readonly string[];
    readonly groupLine: Int32Array;
    readonly groupOffsets: Int32Array;
    readonly groupLinks: Int32Array;
    /** Traffic demands between node indices. */
    readonly demandSource: Int32Array;
    readonly demandTarget: Int32Array;
    readonly demandVolume: Float64Array;
    /** Latency budget factor for demand_served, if the design sets one. */
    readonly latencyBudget: number | undefined;
}
/** The CSR adjacency of links given by their ends (each link listed at both ends, in link order). */
export declare function adjacency(n: number, linkSource: Int32Array, linkTarget: Int32Array, degree: Int32Array): {
    offsets: Int32Array;
    neighbors: Int32Array;
    linkOf: Int32Array;
};
/**
 * Compile a parsed design into its compact graph. Nodes, links, groups and demands are numbered
 * in canonical order (canonical.ts), not file order: the same topology listed in another order
 * compiles to the same graph, so every result is the same. Lines stay with their elements.
 */
export declare function compileTopology(t: Topology): CompactGraph;
/** Build a compact graph straight from an edge list (tests, generators, benchmarks). */
export declare function graphFromEdges(n: number, edges: readonly (readonly [number, number])[]): CompactGraph;
/**
 * Node indices in the order the file lists them (by source line, then index): for lists a
 * person reads next to the file. Computations use the canonical index order instead.
 */
export declare function nodesByLine(g: CompactGraph, nodes: Iterable<number>): number[];
/** Link indices in the order the file lists them (by source line, then index). */
export declare function linksByLine(g: CompactGraph, links: Iterable<number>): number[];
