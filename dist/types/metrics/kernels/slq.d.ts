import type { SymmetricOperator } from './lanczos.js';
export interface TraceOptions {
    probes: number;
    /** Most Lanczos steps per probe. */
    steps: number;
    /** Stop a probe when the quadrature changes by less than this, relatively. */
    tol: number;
}
export declare function createTraceEstimator(capacity: number, maxSteps: number): {
    /**
     * Estimate Σ f(λ) over the eigenvalues of `op` whose eigenvectors are orthogonal to
     * the `dc` orthonormal vectors in `defl` (packed with stride op.n).
     */
    estimate(op: SymmetricOperator, f: (x: number) => number, keys: Int32Array, defl: Float64Array, dc: number, opts: TraceOptions): number;
};
