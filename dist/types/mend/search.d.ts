import type { CompactGraph } from '../graph/compact.js';
import type { FileReport, Finding } from '../report/report.js';
import type { Topology } from '../topology/model.js';
import type { Change } from './apply.js';
import { type CandidateSet } from './candidates.js';
import type { MendReport, MendTarget } from './types.js';
/** Most links one suggestion adds when the policy does not say (see MendContext.maxLinks). */
export declare const DEFAULT_MAX_LINKS = 3;
/** Candidates judged by the engine per greedy step. */
export declare const GREEDY_POOL = 3;
/** Structural sets judged by the engine. */
export declare const STRUCTURAL_KEEP = 3;
/** Link suggestions kept in the report. */
export declare const SUGGESTIONS_KEPT = 5;
/** Above this many sites candidates are not ranked by Ghosh–Boyd (the eigenvector costs too much); ties then go by price. */
export declare const FIEDLER_LIMIT = 20000;
export declare const R_DEFINITION = "R\u0304: the mean area of the policy\u2019s random-failure envelopes (the mean of each median R over its grid); without envelopes, of its attack curves";
export interface MendContext {
    /** The head design as parsed, and compiled. */
    topology: Topology;
    graph: CompactGraph;
    /** The head's judged report (compareDesign). */
    report: FileReport;
    candidates: CandidateSet;
    /** Most links one suggestion may add; default: DEFAULT_MAX_LINKS, or one more than the Eswaran–Tarjan bound of the new bridges when that is larger. */
    maxLinks?: number;
    /** Most engine evaluations the search may run (the hardening alternative included). */
    maxEvaluations: number;
    /** The design with a change applied, judged as `check` judges it. */
    judge: (change: Change) => Promise<FileReport>;
    /** Candidate file path (for the report). */
    candidatePath?: string;
    notes?: string[];
}
/** A finding's stable key: spof findings by element, value findings by requirement. */
export declare function targetKey(f: Pick<Finding, 'rule' | 'requirement' | 'elements'>): string;
/** The findings a change to the design can fix: severity fail or warn, on a requirement that fell short or weakened. */
export declare function mendTargets(report: FileReport): MendTarget[];
/** R̄ of a judged design (see the header); null when the policy evaluates neither envelopes nor attacks. */
export declare function meanArea(report: FileReport): number | null;
/** Latency of a new link from the design's own links: a least-squares line through latency against length. */
export declare function latencyModel(t: Topology): ((km: number) => number) | null;
export declare function mendDesign(ctx: MendContext): Promise<MendReport>;
