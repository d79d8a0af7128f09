/** Smallest positive normal double (2^-1022); anything non-zero and smaller is subnormal. */
export declare const MIN_NORMAL = 2.2250738585072014e-308;
export type Quantity = 'length' | 'latency' | 'capacity' | 'weight' | 'volume';
export interface QuantityRange {
    /** Smallest positive value accepted (0 itself is accepted too). */
    min: number;
    max: number;
    unit: string;
}
export declare const QUANTITY_RANGE: Readonly<Record<Quantity, QuantityRange>>;
/** Why `n` is not a number anyone computes with (non-finite or subnormal), else undefined. */
export declare function nonNormal(n: number): string | undefined;
/** 1e9 rather than 1000000000, 0.5 as it is. */
/**
 * The first number in a parsed document (design or policy) that is NaN, infinite or
 * subnormal, with its path; top-level keys in `skip` (free-form metadata) are not searched.
 */
export declare function firstNonNormal(v: unknown, path: (string | number)[], skip?: ReadonlySet<string>): {
    path: (string | number)[];
    why: string;
} | undefined;
export declare const fmt: (n: number) => string;
/**
 * What is wrong with `value` as a `kind` (a sentence starting after its name, with a hint), or
 * undefined when it is fine. Negative values are refused; 0 is accepted.
 */
export declare function quantityProblem(kind: Quantity, value: number, written?: string): {
    message: string;
    hint: string;
} | undefined;
