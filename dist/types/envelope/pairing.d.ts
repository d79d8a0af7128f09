import type { ChallengeName } from '../challenges/types.js';
import type { DesignEvaluation } from './evaluate.js';
export type Statistic = {
    kind: 'quantile';
    q: number;
} | {
    kind: 'mean';
} | {
    kind: 'min';
} | {
    kind: 'area';
} | {
    kind: 'spread';
};
export interface PairedStatistic {
    base: number;
    head: number;
    delta: number;
    se: number;
}
export declare const BOOTSTRAP_ROUNDS = 400;
export declare function pairedStatistic(base: DesignEvaluation, head: DesignEvaluation, challenge: ChallengeName, statistic: Statistic, x?: number): PairedStatistic;
