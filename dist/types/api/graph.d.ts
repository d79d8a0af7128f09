import { MultiUndirectedGraph } from 'graphology';
import type { AbstractGraph } from 'graphology-types';
import type { Demand, DesignFormat, RiskGroup, Topology } from '../topology/model.js';
export interface NodeAttributes {
    label?: string;
    kind?: string;
    lat?: number;
    lon?: number;
    hardened: boolean;
    /** 1-based line of the element in the file it was read from. */
    line: number;
    /** Everything else the file said about the node. */
    attrs: Record<string, unknown>;
}
export interface LinkAttributes {
    /** The link's display id (graphology's edge key is the link's stable key). */
    id: string;
    length_km?: number;
    latency_ms?: number;
    capacity_gbps?: number;
    weight?: number;
    risk_groups: string[];
    hardened: boolean;
    line: number;
    attrs: Record<string, unknown>;
}
export interface DesignAttributes {
    file: string;
    format: DesignFormat;
    name?: string;
    description?: string;
    riskGroups: RiskGroup[];
    demands: Demand[];
    latencyBudget?: number;
    metadata: Record<string, unknown>;
}
export type DesignGraph = MultiUndirectedGraph<NodeAttributes, LinkAttributes, DesignAttributes>;
/** The design as a graphology multigraph: node keys are ids, edge keys are stable link keys. */
export declare function toGraph(t: Topology): DesignGraph;
export interface FromGraphOptions {
    /** The name reports give the design (default: the graph's `file` attribute, else "graph"). */
    file?: string;
}
/**
 * A Topology from any graphology graph (attributes as toGraph writes them; unknown ones are
 * kept). The same rules as every file reader apply (TopologyBuilder): unique ids, link ends
 * that exist, self-loops dropped with a warning, parallel links kept. Direction is ignored.
 * Elements without a `line` attribute are numbered in graph order.
 */
export type AnyGraph = AbstractGraph<any, any, any>;
export declare function fromGraph(g: AnyGraph, options?: FromGraphOptions): Topology;
