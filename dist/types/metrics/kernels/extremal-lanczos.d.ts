import type { SymmetricOperator } from './lanczos.js';
export interface ExtremalRequest {
    which: 'smallest' | 'largest';
    /** A unit vector to keep out of the search space (e.g. the constant vector of a Laplacian). */
    deflate?: Float64Array;
    /** Stop when the Ritz residual ≤ tol·|θ| (default 1e-10), floored at 1e-14·normBound. */
    tol?: number;
    /** Start vector (length ≥ n; 1e-3 of the default is mixed in); null for the default. */
    start?: Float64Array | null;
    /** Original index per entry, for the default start vector (identity when absent). */
    keys?: Int32Array | null;
    /** Upper limit on operator applications (default 60·n, at least 2000). */
    maxApplications?: number;
    /** Also form the unit eigenvector (in `vector`); costs a second pass. */
    wantVector?: boolean;
}
export interface ExtremalResult {
    value: number;
    /** The eigenvector in entries 0..n-1 when `wantVector` was set. */
    vector: Float64Array;
    /** Operator applications of the first pass (the second pass repeats them). */
    applications: number;
    /** Lanczos steps taken (the order of T). */
    steps: number;
    converged: boolean;
}
export declare function createExtremalLanczos(capacity: number): {
    result: ExtremalResult;
    solve(op: SymmetricOperator, req: ExtremalRequest): ExtremalResult;
};
