export declare function makeGrid(until: number, points: number, at?: readonly number[]): number[];
export declare function round12(x: number): number;
/**
 * Index of x on a grid made by makeGrid, or −1: x is rounded as the grid's values were, then
 * matched exactly (the one lookup that pairing, measuring and deciding share).
 */
export declare function gridIndex(grid: readonly number[], x: number): number;
