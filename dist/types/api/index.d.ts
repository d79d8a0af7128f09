import type { FileReport, Report } from '../report/report.js';
import type { ParseOptions, Topology } from '../topology/model.js';
export { toGraph, fromGraph, type DesignGraph, type NodeAttributes, type LinkAttributes, type DesignAttributes, type FromGraphOptions, } from './graph.js';
export type { Topology, TopoNode, TopoLink, RiskGroup, Demand, DesignFormat } from '../topology/model.js';
export type { Report, FileReport, Finding, RequirementResult, Evaluation } from '../report/report.js';
export { serializeReport } from '../report/report.js';
export { writeNativeJson } from '../topology/write-native.js';
/** Parse a design file's text; the format comes from the file name unless `options.format` is given. */
export declare function readDesign(text: string, file: string, options?: ParseOptions): Topology;
/** A design given as file text, or as a Topology (written in our format for the gate). */
export type DesignInput = string | Topology;
export interface CheckInput {
    /** Repository path → design at the base (absent: every design is new, thresholds only). */
    base?: Record<string, DesignInput>;
    /** Repository path → design at the head. A path missing here that the base has is deleted. */
    head: Record<string, DesignInput>;
    /** The policy's YAML text (default: the built-in policy). Files it inherits go in `policyFiles`. */
    policy?: string;
    /** Further policy files by path, for a policy that inherits others. */
    policyFiles?: Record<string, string>;
    /** block (default): exitCode 1 when the change fails; inform: report the same, exitCode 0. */
    mode?: 'block' | 'inform';
    seed?: number;
}
export interface CheckResult {
    report: Report;
    /** 0: the change passes; 1: it fails (what `netbrace check` exits with). */
    exitCode: 0 | 1;
}
/** Judge a change: every design that differs between base and head, under the policy. */
export declare function check(input: CheckInput): Promise<CheckResult>;
export interface EvaluateOptions {
    /** The path the design is judged under (policy scopes match it); default "design.net.json". */
    path?: string;
    policy?: string;
    policyFiles?: Record<string, string>;
    seed?: number;
}
/** Evaluate one design against the policy's floors (no comparison): its file report. */
export declare function evaluate(design: DesignInput, options?: EvaluateOptions): Promise<FileReport>;
