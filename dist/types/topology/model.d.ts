import type { Diagnostic } from '../errors.js';
export type DesignFormat = 'native-yaml' | 'native-json' | 'graphml' | 'gml' | 'csv' | 'geojson';
export interface SourcePos {
    /** 1-based line of the element in the design file. */
    line: number;
    /** 1-based column. */
    column: number;
}
export interface TopoNode {
    id: string;
    /** Human label when the file has one (ours: `label`; GraphML/GML: `label`, else `name`; CSV has none). */
    label?: string;
    kind?: string;
    lat?: number;
    lon?: number;
    /** Hardened elements are never removed by a challenge. */
    hardened: boolean;
    pos: SourcePos;
    /** Everything else the file said about the node, kept for reports. */
    attrs: Record<string, unknown>;
}
export interface TopoLink {
    /** Display id: the file's own id, else derived from the ends. */
    id: string;
    /**
     * Stable identity used to seed random removal orders: derived from the two end ids
     * (sorted) plus the occurrence number among parallel links, so it survives unrelated
     * edits that renumber positional ids like GraphML's `e12`.
     */
    key: string;
    source: string;
    target: string;
    /** km */
    length?: number;
    /** ms */
    latency?: number;
    /** Gbit/s, informational */
    capacity?: number;
    /** Generic positive weight from interchange formats (treated as a length). */
    weight?: number;
    riskGroups: string[];
    hardened: boolean;
    pos: SourcePos;
    attrs: Record<string, unknown>;
}
export interface RiskGroup {
    id: string;
    description?: string;
    pos: SourcePos;
}
export interface Demand {
    source: string;
    target: string;
    /** Traffic volume in any consistent unit (Gbit/s in our examples). */
    volume: number;
    pos: SourcePos;
}
export interface Topology {
    /** Repository-relative path as given by the caller. */
    file: string;
    format: DesignFormat;
    name?: string;
    /** What the design is, in the author's words (our format's `network.description`). */
    description?: string;
    nodes: TopoNode[];
    links: TopoLink[];
    /** Described risk groups; groups referenced by links but not described are added implicitly. */
    riskGroups: RiskGroup[];
    demands: Demand[];
    /** Latency budget factor for `demand_served` (e.g. 1.5 = 50 % stretch allowed), if the design sets one. */
    latencyBudget?: number;
    metadata: Record<string, unknown>;
    /** Non-fatal problems (self-loops dropped, directed read as undirected, ...). */
    warnings: Diagnostic[];
}
export interface ParseOptions {
    /** Refuse files larger than this many bytes (default 20 MB). */
    maxBytes?: number;
    /** Refuse designs with more nodes + links than this (default 2,000,000). */
    maxElements?: number;
    /** Force a format instead of detecting it from the extension. */
    format?: DesignFormat;
}
export declare const DEFAULT_MAX_BYTES: number;
export declare const DEFAULT_MAX_ELEMENTS = 2000000;
/** The stable key of a link: sorted end ids plus its occurrence among parallels (1-based). */
export declare function linkKey(source: string, target: string, occurrence: number): string;
