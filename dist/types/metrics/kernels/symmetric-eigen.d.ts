/**
 * Eigenvalues of the symmetric n×n matrix held row-major in `a` (destroyed), written to
 * `d[0..n)` in ascending order. `e` is scratch of length ≥ n.
 */
export declare function symmetricEigenvalues(a: Float64Array, n: number, d: Float64Array, e: Float64Array): void;
/**
 * Eigenvalues (ascending, in `d`) and eigenvectors of the symmetric n×n matrix in `a`:
 * on return column j of `a` (a[i*n + j]) is the unit eigenvector of d[j].
 */
export declare function symmetricEigen(a: Float64Array, n: number, d: Float64Array, e: Float64Array): void;
/**
 * Eigen-decomposition of the symmetric tridiagonal matrix with diagonal `diag[0..k)` and
 * off-diagonal `off[0..k-1)` (off[i] joins i and i+1). Writes the eigenvalues ascending into
 * `d` and, when `z` is given (k×k row-major scratch), the eigenvectors into its columns.
 * With `firstRowOnly`, only row 0 of the eigenvector matrix is formed (z needs length k):
 * the Gauss-quadrature weights of Golub & Welsch (Math. Comp. 23:221, 1969) in O(k²).
 */
export declare function tridiagonalEigen(diag: Float64Array, off: Float64Array, k: number, d: Float64Array, e: Float64Array, z: Float64Array | null, firstRowOnly?: boolean): void;
