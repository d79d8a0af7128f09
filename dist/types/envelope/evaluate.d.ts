import { type CompactGraph } from '../graph/compact.js';
import type { Evaluation, StructureSummary } from './types.js';
import type { RValueSpec } from './types.js';
import type { ChallengeName, ChallengeParams } from '../challenges/types.js';
import { type EvaluationPlan, type Task, type TaskResult } from './engine.js';
export interface EvaluationSpec {
    r: RValueSpec;
    challenges: ChallengeParams[];
    seed: number;
    budget?: {
        maxWork?: number;
    };
}
export interface DesignEvaluation {
    evaluation: Evaluation;
    /** Per band challenge, per realization: R at each grid point. Kept for pairing, not serialised. */
    samples: Map<ChallengeName, Float64Array[]>;
    /** What each realization stands for when it is not its index (regional: epicentre ids). */
    labels: Map<ChallengeName, string[]>;
    /**
     * Set by a sequential run (the gate's stopping rule): its random requirements are judged by
     * confidence sequences, and `needed` holds, by requirement id, the realizations after which
     * each decision stayed settled.
     */
    sequential?: {
        needed: Map<string, number>;
    };
}
/** Work budget when a spec sets none (see above): 200 s at the budget's rate (policy/budget.ts). */
export declare const DEFAULT_MAX_WORK = 10000000000;
/** Fewest realizations a budget may leave a band with. */
export declare const MIN_REALIZATIONS = 10;
/** Largest exact worst-case enumeration (subsets) before the search goes greedy. */
export declare const EXACT_LIMIT = 1000000;
/** How many of the weakest realizations an envelope keeps. */
export declare const WEAKEST_KEPT = 3;
/** Steps of an attack curve at which R's cost is taken (the rest interpolated). */
export declare const ATTACK_SAMPLES = 9;
/** Removal orders of a band whose survivors are costed (their mean stands for every realization). */
export declare const BAND_SAMPLES = 2;
/** Resolves parameters, skips challenges the design cannot support, and applies the budget. */
export declare function planEvaluation(g: CompactGraph, spec: EvaluationSpec): EvaluationPlan;
export declare function evaluateDesign(g: CompactGraph, spec: EvaluationSpec): DesignEvaluation;
/**
 * An evaluation run in stages: the first stage runs every task but the random bands beyond the
 * first batch; later stages add band realizations by index range (engine.ts BATCH), so the
 * realizations a snapshot holds are exactly those of a full run with the same plan. Regional
 * bands (one realization per epicentre) run whole in the first stage.
 */
export interface StagedEvaluation {
    g: CompactGraph;
    plan: EvaluationPlan;
    tasks: Task[];
    results: (TaskResult | undefined)[];
}
export declare function stageEvaluation(g: CompactGraph, spec: EvaluationSpec): StagedEvaluation;
/** Most realizations a staged band of this evaluation runs (0 when it has none). */
export declare function stagedMaximum(st: StagedEvaluation): number;
/** Indices of the tasks not yet run that realizations below `upto` need (and every other task). */
export declare function pendingTasks(st: StagedEvaluation, upto: number): number[];
/**
 * The evaluation of the realizations below `upto` (all tasks it needs must have run). A band
 * stopped before the count its plan allows records that count as `maxRealizations`, and loses
 * the note that the budget reduced it: the budget did not decide where it stopped.
 */
export declare function snapshotEvaluation(st: StagedEvaluation, upto: number): DesignEvaluation;
export declare function structureSummary(g: CompactGraph): StructureSummary;
/** Merges task results (in task order) into the evaluation. */
export declare function assembleEvaluation(g: CompactGraph, plan: EvaluationPlan, tasks: Task[], results: TaskResult[]): DesignEvaluation;
