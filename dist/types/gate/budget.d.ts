import { type DesignEvaluation, type EvaluationSpec } from '../envelope/evaluate.js';
import type { ChallengeName } from '../challenges/types.js';
import type { CompactGraph } from '../graph/compact.js';
/** A random challenge both sides run with fewer realizations than asked. */
export interface PairedCut {
    /** Index of the engine run (spec) it belongs to. */
    spec: number;
    challenge: ChallengeName;
    /** Realizations the policy asks for, and those both sides run. */
    from: number;
    to: number;
    maxWork: number;
}
export interface BudgetedSpecs {
    head: EvaluationSpec[];
    base?: EvaluationSpec[];
    cuts: PairedCut[];
}
/** Each run's share of a design's budget (see the file comment). */
export declare function shareBudget(specs: readonly EvaluationSpec[], maxWork: number, graphs: readonly CompactGraph[]): number[];
/** The engine requests for one design under a budget of `maxWork` element visits, paired across base and head. */
export declare function budgetSpecs(specs: readonly EvaluationSpec[], maxWork: number, head: CompactGraph, base?: CompactGraph): BudgetedSpecs;
/**
 * The head's engine requests with the realizations the policy asks for: pairing's lowered
 * counts undone. A design's size (its unreduced work, gate-request.ts) is judged on these; the
 * lowered counts are a budget's doing and would make a large design look small.
 */
export declare function askedSpecs(b: BudgetedSpecs): EvaluationSpec[];
/**
 * Restate, on one side's result of engine run `spec`, the cuts that pairing made: the engine
 * saw only the lowered count, so its own words would start from it, or say nothing.
 */
export declare function notePairedCuts(result: DesignEvaluation, cuts: readonly PairedCut[], spec: number): void;
