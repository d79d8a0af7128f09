import type { ChallengeDef, Requirement } from '../policy/types.js';
/** R values and deltas: three decimals, a true minus sign, no "-0.000". */
export declare function formatR(x: number): string;
export declare function formatDelta(delta: number, se: number | null): string;
/** One line naming what a requirement judges, e.g. `10 % quantile of R at 20 % of nodes removed, "fail" (random nodes) ≥ 0.6`. */
export declare function describeRequirement(r: Requirement, challenges: readonly ChallengeDef[]): string;
