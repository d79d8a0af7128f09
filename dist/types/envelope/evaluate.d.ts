import { type CompactGraph } from '../graph/compact.js';
import type { Evaluation, StructureSummary } from '../report/report.js';
import type { ChallengeName, ChallengeParams, RValueSpec } from './types.js';
import { type EvaluationPlan, type Task, type TaskResult } from './engine.js';
export { pairedStatistic, type PairedStatistic, type Statistic } from './pairing.js';
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
}
/** Default work budget in element visits (see above); about a minute of engine time. */
export declare const DEFAULT_MAX_WORK = 10000000000;
/** Fewest realizations a budget may leave a band with. */
export declare const MIN_REALIZATIONS = 10;
/** Largest exact worst-case enumeration (subsets) before the search goes greedy. */
export declare const EXACT_LIMIT = 1000000;
/** How many of the weakest realizations an envelope keeps. */
export declare const WEAKEST_KEPT = 3;
/** Resolves parameters, skips challenges the design cannot support, and applies the budget. */
export declare function planEvaluation(g: CompactGraph, spec: EvaluationSpec): EvaluationPlan;
export declare function evaluateDesign(g: CompactGraph, spec: EvaluationSpec): DesignEvaluation;
export declare function structureSummary(g: CompactGraph): StructureSummary;
/** Merges task results (in task order) into the evaluation. */
export declare function assembleEvaluation(g: CompactGraph, plan: EvaluationPlan, tasks: Task[], results: TaskResult[]): DesignEvaluation;
