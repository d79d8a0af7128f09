import { DesignError } from '../errors.js';
import { type DesignFormat, type RiskGroup, type SourcePos, type Topology } from './model.js';
export interface NodeInput {
    id: string;
    pos: SourcePos;
    label?: string;
    kind?: string;
    lat?: number;
    lon?: number;
    hardened?: boolean;
    attrs?: Record<string, unknown>;
}
export interface LinkInput {
    /** How messages name this link (default: `link "id"` or `link`), e.g. `links[3]`. */
    what?: string;
    /** The file's own id, if it gives one. */
    id?: string;
    source: string;
    target: string;
    pos: SourcePos;
    /** Where each end is written, for "unknown node" errors (defaults to pos). */
    sourcePos?: SourcePos;
    targetPos?: SourcePos;
    length?: number;
    latency?: number;
    capacity?: number;
    weight?: number;
    riskGroups?: string[];
    hardened?: boolean;
    attrs?: Record<string, unknown>;
    /**
     * A directed arc source → target (GraphML `directed`, GML `directed 1`). Links are
     * undirected: an arc and a later arc the other way between the same nodes are one link.
     */
    arc?: boolean;
}
export interface BuilderOptions {
    maxElements?: number;
    /**
     * What to do when two links carry the same file id: interchange formats (written by
     * many tools) fall back to the derived id with a warning; our own format refuses.
     */
    duplicateLinkIds?: 'warn' | 'error';
}
/**
 * Longest element id accepted, in UTF-16 code units. Ids are repeated in every message,
 * table row, annotation and fingerprint that names an element, and compared by edit distance
 * for "did you mean"; a bound keeps a hostile 1 MB id from multiplying into every output.
 * Long human names belong in `label`.
 */
export declare const MAX_ID_LENGTH = 256;
export declare class TopologyBuilder {
    readonly file: string;
    readonly format: DesignFormat;
    private readonly maxElements;
    private readonly duplicateLinkIds;
    private readonly nodes;
    private readonly links;
    private readonly nodeLine;
    private readonly linkIds;
    /** Occurrences of each unordered end pair so far, for parallel-link keys. */
    private readonly pairCount;
    private readonly warnings;
    private readonly riskGroups;
    private readonly riskGroupPos;
    private readonly demands;
    /** Arcs not yet paired with a reverse arc, by `source\0target`, oldest first. */
    private readonly openArcs;
    private directedAt;
    private mergedArcs;
    constructor(file: string, format: DesignFormat, options?: BuilderOptions);
    get nodeCount(): number;
    hasNode(id: string): boolean;
    /** A located DesignError in this file. */
    error(message: string, pos: SourcePos | undefined, hint?: string): DesignError;
    warn(message: string, pos: SourcePos | undefined, hint?: string): void;
    /** Refuses an id longer than MAX_ID_LENGTH (LimitError at the element). */
    checkId(id: string, what: string, pos: SourcePos | undefined): void;
    private countElement;
    addNode(input: NodeInput): void;
    private requireNode;
    /**
     * Says the file declares direction (`how`, e.g. `edgedefault="directed"`), once; finish()
     * warns that direction is ignored and how many reverse arcs were merged.
     */
    directed(pos: SourcePos, how: string): void;
    /**
     * Adds a link; returns false when it was dropped (a self-loop) or merged into the link of
     * the reverse arc. Arcs pair up in file order, so the links between two nodes are as many
     * as the arcs in the more frequent direction: u→v with v→u is one link, u→v twice is two.
     */
    addLink(input: LinkInput): boolean;
    /** The reverse arc joins its partner's link; values that differ are reported, the first kept. */
    private mergeArc;
    addRiskGroup(group: RiskGroup): void;
    addDemand(source: string, target: string, volume: number, pos: SourcePos, endPos?: [SourcePos, SourcePos], what?: string): void;
    finish(extra?: {
        name?: string;
        latencyBudget?: number;
        metadata?: Record<string, unknown>;
    }): Topology;
}
