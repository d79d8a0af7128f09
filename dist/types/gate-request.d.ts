import { type DesignEvaluation, type EvaluationSpec } from './envelope/evaluate.js';
import { type EvaluationPlan, type Task, type TaskResult } from './envelope/engine.js';
import type { RValueSpec } from './envelope/types.js';
import type { CompactGraph } from './graph/compact.js';
import { type BudgetedSpecs, type PairedCut } from './gate/budget.js';
import type { DesignSide } from './gate/compare.js';
import type { FilePolicy } from './policy/types.js';
import type { Report } from './report/report.js';
import type { Topology } from './topology/model.js';
import { type JoinInput } from './gate/split.js';
import type { SplitDesign } from './report/report.js';
/** A revision as git names it, or "worktree" for the files on disk. */
export type Revision = string;
export interface ChangedFile {
    status: 'added' | 'modified' | 'deleted' | 'renamed';
    path: string;
    /** For renames: the path at base. */
    previousPath?: string;
}
export type MaybePromise<T> = T | Promise<T>;
export interface GateDeps {
    /** Files changed between two revisions (head may be "worktree"), with rename detection. */
    listChanged(base: Revision, head: Revision): MaybePromise<ChangedFile[]>;
    /** A file's text at a revision; null when it does not exist there. */
    readAt(rev: Revision, path: string): MaybePromise<string | null>;
    /** Every file at a revision (for scheduled runs over all designs). */
    listAll(rev: Revision): MaybePromise<string[]>;
    /** A file of the organisation policy's folder (request.orgPolicyPath), outside the history. */
    readOrgPolicy?: (path: string) => MaybePromise<string | null>;
    /**
     * A whole evaluation in one go, replacing the engine (tests that alter results). When set, the
     * gate runs every realization the budget allows, without the sequential stopping rule.
     */
    evaluate?: (g: CompactGraph, spec: EvaluationSpec, threads?: number) => MaybePromise<DesignEvaluation>;
    /** Runs engine tasks (worker threads: parallel/pool.ts threadedGate); defaults to this thread. */
    runTasks?: (g: CompactGraph, plan: EvaluationPlan, tasks: Task[], threads?: number) => MaybePromise<TaskResult[]>;
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
    /**
     * Run random bands in batches under the sequential stopping rule (true), or every realization
     * at once (false); left out: by the design's size (SEQUENTIAL_MIN_WORK).
     */
    sequential?: boolean;
    /**
     * Join part reports instead of evaluating every design (gate/split.ts): files the parts
     * judged whole are taken as they are; designs split across the parts are judged here from
     * the parts' samples, with the same code a single run uses. Excludes `part`.
     */
    join?: JoinInput;
    /** Draw each design's map (default true), and search what would mend a design: when it fails (default), always, or never. */
    map?: boolean;
    mend?: 'failing' | 'always' | 'never';
}
export interface GateResult {
    report: Report;
    exitCode: 0 | 1;
}
/** The policy's R as the engine takes it: a source sample is keyed by the seed, as every other random choice. */
export declare function policyR(fp: FilePolicy, seed: number): RValueSpec;
/**
 * The engine request for one file: its challenges, every threshold's x on the grid, N−1 where
 * required, and the policy's work budget (runGate shares it out between the requests of a
 * design and pairs it across base and head: gate/budget.ts).
 */
export declare function evaluationSpecs(fp: FilePolicy, seed: number): EvaluationSpec[];
export declare function evaluateGraph(g: CompactGraph, topology: Topology | undefined, specs: EvaluationSpec[], cuts: readonly PairedCut[], request: GateRequest, deps: GateDeps): Promise<DesignSide>;
/**
 * Estimated work (element visits, unreduced) above which a design runs sequentially: about 10 s
 * at the budget's fixed rate (policy/budget.ts). Below it every realization the policy asks
 * for is cheap, so all of them run and are judged as one fixed sample (§7.3–7.4); above it,
 * batches with confidence sequences (§7.6), so that large designs stop as soon as they are
 * decided instead of running into the budget.
 */
export declare const SEQUENTIAL_MIN_WORK = 500000000;
/**
 * Whether a design runs in batches under the sequential stopping rule (request.sequential
 * overrides). `specs`: the requests as the policy asks them (budget.ts askedSpecs).
 */
export declare function sequentialRun(request: GateRequest, specs: readonly EvaluationSpec[], head: CompactGraph, base: CompactGraph | undefined): boolean;
/**
 * Whether a design's realizations are split across the parts of a run: with more than one
 * part, when its unreduced work estimate exceeds SEQUENTIAL_MIN_WORK (the designs that run in
 * batches: a minute-scale evaluation, where a part's time matters) and its bands run more than
 * one batch. Smaller designs stay whole, in the part their path hashes to: splitting costs
 * every part a parse, and parts cannot stop early (none sees the others' samples). `specs`: the
 * requests as run; `asked`: as the policy asks them (budget.ts askedSpecs), for the size.
 */
export declare function splitAcrossParts(total: number, specs: readonly EvaluationSpec[], head: CompactGraph, base: CompactGraph | undefined, asked?: readonly EvaluationSpec[]): boolean;
type RunTasks = NonNullable<GateDeps['runTasks']>;
/** A part's share of a split design: the band tasks of the batches it owns, on each side evaluated. */
export declare function splitShare(path: string, part: {
    index: number;
    total: number;
}, sides: {
    side: 'head' | 'base';
    graph: CompactGraph;
    specs: EvaluationSpec[];
}[], request: GateRequest, deps: GateDeps): Promise<SplitDesign>;
/**
 * The engine of a join for one split design: its band tasks on head and base are answered from
 * the parts' samples (a task no part holds names the part that should have run it); every other
 * task, and every other graph (mended designs), runs as in a single run.
 */
export declare function servedTasks(join: JoinInput, path: string, head: CompactGraph, base: CompactGraph | undefined, deps: GateDeps): RunTasks;
/**
 * The sequential stopping rule (docs/METHODS.md §7.6): head and base run their random bands in
 * batches of BATCH realizations (by index, the same on both sides and for any thread count),
 * and after each batch every requirement on a random challenge is decided by confidence
 * sequences (gate/decide.ts); the run stops when none is open, or at the most realizations the
 * policy and the budget allow. Attacks, N−1 and worst cases run once, in the first batch.
 */
export declare function evaluateSequentially(fp: FilePolicy, head: {
    graph: CompactGraph;
    topology: Topology;
}, base: {
    graph: CompactGraph;
    topology: Topology;
} | undefined, specs: BudgetedSpecs, comparing: boolean, request: GateRequest, deps: GateDeps): Promise<{
    head: DesignSide;
    base?: DesignSide;
}>;
export {};
