export interface SymmetricOperator {
    /** Dimension. */
    n: number;
    /** y ← A x on entries 0..n-1. */
    apply(x: Float64Array, y: Float64Array): void;
    /** An upper bound on ‖A‖₂ (e.g. Gershgorin); convergence is relative to it. */
    normBound: number;
}
export interface EigenRequest {
    which: 'smallest' | 'largest';
    /** Number of eigenpairs wanted. */
    count: number;
    /** Orthonormal vectors to keep out of the search space: `deflation[k*stride .. +n)`. */
    deflation?: Float64Array;
    deflationCount?: number;
    /**
     * Stop when every wanted Ritz pair has residual ‖Ax − θx‖ ≤ tol·|θ| (default 1e-10): an
     * eigenvalue lies within that distance of θ, so θ is then correct to `tol` relative.
     * A floor of 1e-14·normBound keeps eigenvalues at 0 from iterating forever.
     */
    tol?: number;
    /** Start vector (length ≥ n); null for the fixed default. */
    start?: Float64Array | null;
    /** Original index per entry, for the default start vector (identity when absent). */
    keys?: Int32Array | null;
    /** Upper limit on operator applications (default 60·n, at least 2000). */
    maxApplications?: number;
}
export interface EigenResult {
    /** Eigenvalues, ascending for 'smallest', descending for 'largest'. */
    values: Float64Array;
    /** Eigenvector k is vectors[k*stride .. k*stride + n). */
    vectors: Float64Array;
    stride: number;
    /** How many pairs were found (≤ count; fewer only when the space is smaller). */
    found: number;
    applications: number;
    converged: boolean;
}
export declare function createLanczos(capacity: number, maxCount: number, basis?: number): {
    result: EigenResult;
    solve(op: SymmetricOperator, req: EigenRequest): EigenResult;
};
