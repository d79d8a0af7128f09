/** Uniform in [-1, 1). */
export declare function noise(a: number, b: number): number;
/** A Rademacher sign, ±1. */
export declare function sign(a: number, b: number): number;
