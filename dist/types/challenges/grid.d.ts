export declare function makeGrid(until: number, points: number, at?: readonly number[]): number[];
export declare function round12(x: number): number;
