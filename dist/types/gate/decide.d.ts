import { type Bounds } from '../envelope/confidence-sequence.js';
import type { DesignEvaluation } from '../envelope/evaluate.js';
import type { Envelope } from '../envelope/types.js';
import type { ChallengeDef, FilePolicy, Requirement } from '../policy/types.js';
/** Error probability of each decision (floor, weakening) of a requirement: 5 % (common practice). */
export declare const DECISION_ALPHA = 0.05;
export type FloorDecision = 'above' | 'below' | 'open';
export type WeakeningDecision = 'beyond' | 'within' | 'open';
export interface Decision {
    head: Bounds;
    delta?: Bounds;
    floor?: FloorDecision;
    weakening?: WeakeningDecision;
    /** True for a minimum: it is settled only by all realizations (or a value below its floor). */
    needsAll?: boolean;
}
/** The statistic of a random-challenge requirement, as the bounds need it; undefined for others. */
type Stat = {
    kind: 'quantile';
    q: number;
    x: number;
} | {
    kind: 'mean';
    x: number;
} | {
    kind: 'min';
    x: number;
} | {
    kind: 'area';
} | {
    kind: 'spread';
};
/** Bounds of the statistic on one side; undefined when the side lacks the envelope or the grid point. */
export declare function sideBounds(stat: Stat, env: Envelope, samples: readonly Float64Array[], alpha: number): Bounds | undefined;
export interface DecisionInput {
    requirement: Requirement;
    challenge: ChallengeDef | undefined;
    head: DesignEvaluation;
    base?: DesignEvaluation;
    weakening: FilePolicy['weakening'];
    /** Point estimates of the base value, for a relative allowance. */
    baseValue: number | null;
    /** The head's point estimate (a floor it misses at the maximum is short, as without a CS). */
    threshold: number | null;
    higherIsBetter: boolean;
}
/** The allowed drop, as compare.ts applies it. */
export declare function allowanceOf(weakening: FilePolicy['weakening'], base: number): number;
/** The decisions of one requirement on a random challenge; undefined for any other requirement. */
export declare function decide(input: DecisionInput): Decision | undefined;
/** Whether a decision still waits for realizations. */
export declare function isOpen(d: Decision): boolean;
export {};
