import type { QuantileBand } from './types.js';
export interface GridStats {
    min: number[];
    max: number[];
    mean: number[];
    median: number[];
    quantiles: Record<string, QuantileBand>;
}
/** The quantile key as written in reports: 0.1 → "0.1". */
export declare function quantileKey(q: number): string;
/** Column j of the realizations' grid values, sorted ascending. */
export declare function sortedColumn(samples: readonly Float64Array[], j: number, out?: Float64Array<ArrayBuffer>): Float64Array;
export declare function gridStats(samples: readonly Float64Array[], points: number, band: readonly [number, number]): GridStats;
/** Mean over the grid points after the first (x = 0): the common form of area and spread. */
export declare function gridMean(values: ArrayLike<number>): number;
export declare function area(median: ArrayLike<number>): number;
export declare function spread(lo: ArrayLike<number>, hi: ArrayLike<number>): number;
/**
 * Area of an attack curve (values[k] = R after k removals) up to a real count c of removals:
 * the right-endpoint sum Σ_{k=1..⌊c⌋} R(k) + (c − ⌊c⌋)·R(c), over c, with R(c) interpolated
 * between ⌊c⌋ and ⌈c⌉. For whole c it is the mean of values[1..c] (Schneider's R when c = N and
 * R is the LCC share: Schneider et al., PNAS 108:3838, 2011); between whole counts it moves
 * continuously with c instead of jumping by a whole step. c = 0: R of the intact design.
 */
export declare function attackArea(values: ArrayLike<number>, c: number): number;
/** Attack gap over the grid points x_1..x_K the attack reaches: mean of q_lo − R_attack. */
export declare function attackGap(lo: ArrayLike<number>, attackAtGrid: ArrayLike<number | null>): number | null;
