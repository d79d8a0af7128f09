import type { CompactGraph } from '../graph/compact.js';
import type { BandPlan, ResolvedParams } from '../challenges/types.js';
import type { Contingency, RValueSpec, WorstCase } from './types.js';
import type { ChallengeName } from '../challenges/types.js';
import type { ElementKind } from '../graph/element.js';
import { type RFunction } from './r-value.js';
/**
 * Realizations per band task: about 32 tasks per band (so two or four threads stay evenly
 * loaded), at most 16 realizations each. It depends on M only, never on the thread count —
 * part of what makes results thread-count independent.
 */
export declare function chunkSize(realizations: number): number;
/**
 * Realizations per batch of a sequential run (the gate adds batches until its decisions are
 * settled, gate/sequential.ts). Band tasks are also cut at every multiple of BATCH, so a
 * realization's value depends on its index and the policy's count alone, never on how many
 * batches ran.
 */
export declare const BATCH = 32;
export interface PlannedChallenge {
    params: ResolvedParams;
    type: 'band' | 'attack' | 'contingency';
    /** Contingency cases to evaluate at most. */
    maxCases: number;
    /** Worst-case search: largest exact enumeration allowed (0 = never exact), and beam width. */
    exactLimit: number;
    beam: number;
    /** Why this challenge was reduced, when it was. */
    degraded?: string;
}
export interface EvaluationPlan {
    r: RValueSpec;
    items: PlannedChallenge[];
    /** Reasons the evaluation as a whole was reduced. */
    degraded: string[];
    /** Challenges left out because the design lacks what they need (coordinates, risk groups). */
    notApplicable?: {
        challenge: ChallengeName;
        reason: string;
    }[];
    /** Estimated work in element visits after any reduction (see evaluate.ts). */
    work: number;
}
export type Task = {
    type: 'band';
    item: number;
    from: number;
    to: number;
} | {
    type: 'attack';
    item: number;
    piece?: {
        index: number;
        of: number;
    };
} | {
    type: 'contingency';
    item: number;
} | {
    type: 'worst';
    item: number;
};
export type TaskResult = 
/** `whole`: per realization, R at ⌊c⌋ and ⌈c⌉ of each grid point (StepEvaluator.at), when reusable. */
{
    type: 'band';
    values: Float64Array[];
    whole?: Float64Array[];
}
/** R at this piece's share of the attack's evaluated steps (attackPlan), in order. */
 | {
    type: 'attack';
    sequence: Int32Array;
    values: Float64Array;
    every: number;
} | {
    type: 'contingency';
    result: Contingency;
} | {
    type: 'worst';
    result: WorstCase;
};
export declare function planTasks(plan: EvaluationPlan, g: CompactGraph): Task[];
/** Realizations a band item runs: the requested count, or one per epicentre for regional. */
export declare function realizationCount(g: CompactGraph, it: PlannedChallenge): number;
export declare function bandPlan(g: CompactGraph, params: ResolvedParams): BandPlan;
/** The unit kind a challenge removes. */
export declare function challengeKind(g: CompactGraph, params: ResolvedParams): ElementKind;
/** Steps of an attack: ⌈until · count⌉ (R at `until` may be read between two steps), capped by what may be removed. */
export declare function attackSteps(g: CompactGraph, kind: ElementKind, until: number): number;
/**
 * Most evaluations of R along one attack. A targeted attack is one deterministic curve, but R
 * after every removal costs a full evaluation each: 2,000 of them for a fifth of a 10,000-site
 * design. Past this many steps R is computed every ⌈steps/ATTACK_EVALUATIONS⌉-th removal (and
 * after the last) and read linearly between; the area's trapezoids then span a few removals
 * each, on a curve that moves by about 1/N per removal. Attacks of up to this many steps (a
 * fifth of 1,000 sites) are computed at every step, as before.
 */
export declare const ATTACK_EVALUATIONS = 200;
/** Removals between two evaluations of R along an attack of `steps` steps (1: every step). */
export declare function attackStride(steps: number, free: boolean): number;
/** The removal counts at which R is computed along an attack of `len` steps: every `every`-th, and the last. */
export declare function attackEvaluationSteps(len: number, every: number): number[];
/**
 * Evaluations of R one task of a long attack takes on. A strided attack's steps are independent
 * once its removal order is known, so they are shared out between tasks that each rank the
 * order again (only for rankings that cost a few passes, not R) and evaluate their share: the
 * pieces are fixed by the plan, never by the thread count, so the values stay the same.
 */
export declare const ATTACK_PIECE_EVALUATIONS = 25;
/** How many tasks an attack is shared out to (1: one task). */
export declare function attackPieces(g: CompactGraph, params: ResolvedParams): number;
/**
 * An attack's order and stride, as runTask takes them. A join that serves a piece from a part's
 * values (gate-request.ts servedTasks) ranks it again without R: pieces exist only for
 * CHEAP_RANKINGS, which never ask for it.
 */
export declare function attackOrder(g: CompactGraph, plan: EvaluationPlan, item: number, rvalue?: RFunction): {
    sequence: Int32Array;
    every: number;
};
/** The removal counts a piece of an attack evaluates, and their range [from, to) among all its evaluated steps. */
export declare function pieceSteps(len: number, every: number, piece: {
    index: number;
    of: number;
} | undefined): {
    steps: number[];
    from: number;
    to: number;
};
/** The share [from, to) of `count` evaluated steps that piece `index` of `of` takes. */
export declare function pieceRange(count: number, piece: {
    index: number;
    of: number;
} | undefined): [number, number];
/** R after every step 0..len from R at the evaluated steps `at`, read linearly between them. */
export declare function fillAttackCurve(at: readonly number[], computed: ArrayLike<number>, len: number): Float64Array;
/** True when every metric of R gives the same value on a mask whatever was evaluated before. */
export declare function historyFree(spec: RValueSpec): boolean;
/** Evaluates R along one removal order at the given step counts (non-decreasing). */
export declare class StepEvaluator {
    private readonly g;
    private readonly rfn;
    private readonly ufr;
    private readonly ws;
    private readonly mask;
    /** R on the intact design once known (shared by `scope`), or null when R keeps history. */
    private readonly intact;
    /** `scope`: the evaluation this evaluator works for (its plan); evaluators of one scope share R of the intact design. */
    constructor(g: CompactGraph, spec: RValueSpec, scope?: object);
    get r(): RFunction;
    /** True when every step is free (union–find curve). */
    get stepsAreFree(): boolean;
    /**
     * True when R after k removals of an order is the same number however it is reached, so
     * values kept from a band task (`whole` of `at`) may stand for a recomputation.
     */
    get valuesAreReusable(): boolean;
    /**
     * R after steps[j] units of `order` are removed, for each j (non-decreasing). A real count c
     * (a fraction of the units, units.ts countAt) reads R linearly between ⌊c⌋ and ⌈c⌉ removals of
     * this same order, so `order` must hold ⌈c⌉ units; a whole count is R there exactly.
     * `whole`, when given, receives R at ⌊c⌋ and ⌈c⌉ for each j (2j, 2j + 1).
     */
    at(kind: ElementKind, order: ArrayLike<number>, len: number, steps: ArrayLike<number>, out: Float64Array, whole?: Float64Array): Float64Array;
    private readonly memo;
    /** R after k removals of `order` on the shared mask; k never below the last two asked. */
    private rAfter;
    /** R on the intact design (the shared mask before any removal), once per scope when R allows. */
    private rIntact;
    /** R after every step k = 0..len. */
    everyStep(kind: ElementKind, order: ArrayLike<number>, len: number): Float64Array;
}
export declare function runTask(g: CompactGraph, plan: EvaluationPlan, task: Task): TaskResult;
