import type { SymmetricOperator } from './lanczos.js';
export interface TraceOptions {
    /** Probes (the fixed count; with `targetSe`, the least). */
    probes: number;
    /**
     * With it, probes continue in blocks of `probes` until the standard error of the mean is at
     * most targetSe(mean so far) (in the trace's units) or `maxProbes` is reached.
     */
    targetSe?: (mean: number) => number;
    maxProbes?: number;
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
    /**
     * The estimate and its standard error: the probes' sample standard deviation over √probes
     * (each probe is an unbiased Hutchinson sample of the trace, up to the quadrature's error,
     * which `tol` keeps far below it).
     */
    estimateWithError(op: SymmetricOperator, f: (x: number) => number, keys: Int32Array, defl: Float64Array, dc: number, opts: TraceOptions): {
        mean: number;
        se: number;
        probes: number;
    };
};
