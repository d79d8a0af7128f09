import { type DesignEvaluation, type EvaluationSpec } from './envelope/evaluate.js';
import { type CompactGraph } from './graph/compact.js';
import { type PairedCut } from './gate/budget.js';
import { type DesignSide } from './gate/compare.js';
import type { FilePolicy } from './policy/types.js';
import { type Report } from './report/report.js';
import type { Topology } from './topology/model.js';
export { joinReports } from './gate/join.js';
/** A revision as git names it, or "worktree" for the files on disk. */
export type Revision = string;
export interface ChangedFile {
    status: 'added' | 'modified' | 'deleted' | 'renamed';
    path: string;
    /** For renames: the path at base. */
    previousPath?: string;
}
type MaybePromise<T> = T | Promise<T>;
export interface GateDeps {
    /** Files changed between two revisions (head may be "worktree"), with rename detection. */
    listChanged(base: Revision, head: Revision): MaybePromise<ChangedFile[]>;
    /** A file's text at a revision; null when it does not exist there. */
    readAt(rev: Revision, path: string): MaybePromise<string | null>;
    /** Every file at a revision (for scheduled runs over all designs). */
    listAll(rev: Revision): MaybePromise<string[]>;
    /** A file of the organisation policy's folder (request.orgPolicyPath), outside the history. */
    readOrgPolicy?: (path: string) => MaybePromise<string | null>;
    /** The envelope engine; defaults to evaluateDesign on this thread. */
    evaluate?: (g: CompactGraph, spec: EvaluationSpec, threads?: number) => MaybePromise<DesignEvaluation>;
}
export interface GateRequest {
    /** Base revision; absent: no comparison, thresholds only. */
    base?: Revision;
    /** Head revision; ignored when `worktree` is set. */
    head?: Revision;
    /** Judge the files on disk instead of a head commit. */
    worktree?: boolean;
    /** Judge these repository paths instead of the changed files. */
    paths?: string[];
    /** Repository path of the policy file (default .netbrace.yaml; missing then means the built-in policy). */
    policyPath?: string;
    /** Where the policy is read: the base (trusted, the default) or the head. */
    policySource: 'base' | 'head';
    /**
     * The organisation's policy, which the repository's policy must inherit (and may only
     * tighten): its path as the repository's policy names it in `inherits`. Its files are read
     * with `GateDeps.readOrgPolicy` (a second checkout), never from the change under review.
     */
    orgPolicyPath?: string;
    mode: 'block' | 'inform';
    /** Overrides the policy's seed. */
    seed?: number;
    threads?: number;
    /** Evaluate part `index` (1-based) of `total`: a deterministic slice by path hash. */
    part?: {
        index: number;
        total: number;
    };
    /** Scheduled runs judge every design against thresholds only. */
    eventKind?: 'pull-request' | 'push' | 'schedule' | 'local';
    /** Draw each design's map (default true), and search what would mend a design: when it fails (default), always, or never. */
    map?: boolean;
    mend?: 'failing' | 'always' | 'never';
}
export interface GateResult {
    report: Report;
    exitCode: 0 | 1;
}
/** FNV-1a 32-bit hash of a path (Fowler, Noll, Vo; common practice for stable bucketing). */
export declare function pathHash(path: string): number;
/** Whether a path belongs to part `index` (1-based) of `total`. */
export declare function inPart(path: string, part: {
    index: number;
    total: number;
}): boolean;
/**
 * The engine request for one file: its challenges, every threshold's x on the grid, N−1 where
 * required, and the policy's work budget (runGate shares it out between the requests of a
 * design and pairs it across base and head: gate/budget.ts).
 */
export declare function evaluationSpecs(fp: FilePolicy, seed: number): EvaluationSpec[];
export declare function evaluateGraph(g: CompactGraph, topology: Topology | undefined, specs: EvaluationSpec[], cuts: readonly PairedCut[], request: GateRequest, deps: GateDeps): Promise<DesignSide>;
export declare function runGate(request: GateRequest, deps: GateDeps): Promise<GateResult>;
