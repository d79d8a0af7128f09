// Dense symmetric eigenvalue problems on row-major Float64Arrays: Householder reduction to
// tridiagonal form followed by the implicit QL method with Wilkinson shifts, the EISPACK
// tred2/tql2 pair as transcribed in JAMA (Martin, Reinsch & Wilkinson, Numer. Math. 11:181,
// 1968; Bowdler et al., Numer. Math. 11:293, 1968). ml-matrix's EigenvalueDecomposition is
// the same algorithm but always accumulates eigenvectors and allocates its own matrices;
// here the values-only path skips the accumulation (about 4n³/3 flops instead of ~9n³) and
// works in caller-owned scratch, which is what the metric evaluators need.

const EPS = 2 ** -52;

/**
 * Eigenvalues of the symmetric n×n matrix held row-major in `a` (destroyed), written to
 * `d[0..n)` in ascending order. `e` is scratch of length ≥ n.
 */
export function symmetricEigenvalues(a: Float64Array, n: number, d: Float64Array, e: Float64Array): void {
  if (n === 0) return;
  householderValues(a, n, d, e);
  implicitQL(d, e, n, null, 0);
  sortAscending(d, n, null, 0);
}

/**
 * Eigenvalues (ascending, in `d`) and eigenvectors of the symmetric n×n matrix in `a`:
 * on return column j of `a` (a[i*n + j]) is the unit eigenvector of d[j].
 */
export function symmetricEigen(a: Float64Array, n: number, d: Float64Array, e: Float64Array): void {
  if (n === 0) return;
  householder(a, n, d, e, true);
  implicitQL(d, e, n, a, n);
  sortAscending(d, n, a, n);
}

/**
 * Eigen-decomposition of the symmetric tridiagonal matrix with diagonal `diag[0..k)` and
 * off-diagonal `off[0..k-1)` (off[i] joins i and i+1). Writes the eigenvalues ascending into
 * `d` and, when `z` is given (k×k row-major scratch), the eigenvectors into its columns.
 * With `firstRowOnly`, only row 0 of the eigenvector matrix is formed (z needs length k):
 * the Gauss-quadrature weights of Golub & Welsch (Math. Comp. 23:221, 1969) in O(k²).
 */
export function tridiagonalEigen(
  diag: Float64Array,
  off: Float64Array,
  k: number,
  d: Float64Array,
  e: Float64Array,
  z: Float64Array | null,
  firstRowOnly = false,
): void {
  for (let i = 0; i < k; i++) {
    d[i] = diag[i];
    e[i] = i > 0 ? off[i - 1] : 0;
  }
  const rows = firstRowOnly ? 1 : k;
  if (z) {
    z.fill(0, 0, rows * k);
    for (let i = 0; i < rows; i++) z[i * k + i] = 1;
  }
  implicitQL(d, e, k, z, k, rows);
  sortAscending(d, k, z, k, rows);
}

// Householder tridiagonalisation (tred2). Leaves the diagonal in d and the sub-diagonal in
// e[1..n) (e[0] = 0). With `vectors`, `a` ends up holding the orthogonal transformation.
function householder(V: Float64Array, n: number, d: Float64Array, e: Float64Array, vectors: boolean): void {
  for (let j = 0; j < n; j++) d[j] = V[(n - 1) * n + j];
  for (let i = n - 1; i > 0; i--) {
    let scale = 0;
    let h = 0;
    for (let k = 0; k < i; k++) scale += Math.abs(d[k]);
    if (scale === 0) {
      e[i] = d[i - 1];
      for (let j = 0; j < i; j++) {
        d[j] = V[(i - 1) * n + j];
        V[i * n + j] = 0;
        V[j * n + i] = 0;
      }
    } else {
      for (let k = 0; k < i; k++) {
        d[k] /= scale;
        h += d[k] * d[k];
      }
      let f = d[i - 1];
      let g = Math.sqrt(h);
      if (f > 0) g = -g;
      e[i] = scale * g;
      h -= f * g;
      d[i - 1] = f - g;
      for (let j = 0; j < i; j++) e[j] = 0;
      for (let j = 0; j < i; j++) {
        f = d[j];
        V[j * n + i] = f;
        g = e[j] + V[j * n + j] * f;
        for (let k = j + 1; k <= i - 1; k++) {
          const vkj = V[k * n + j];
          g += vkj * d[k];
          e[k] += vkj * f;
        }
        e[j] = g;
      }
      f = 0;
      for (let j = 0; j < i; j++) {
        e[j] /= h;
        f += e[j] * d[j];
      }
      const hh = f / (h + h);
      for (let j = 0; j < i; j++) e[j] -= hh * d[j];
      for (let j = 0; j < i; j++) {
        f = d[j];
        g = e[j];
        for (let k = j; k <= i - 1; k++) V[k * n + j] -= f * e[k] + g * d[k];
        d[j] = V[(i - 1) * n + j];
        V[i * n + j] = 0;
      }
    }
    d[i] = h;
  }

  if (!vectors) {
    // The reduced diagonal sits on V's diagonal (entry (n-1, n-1) is never touched).
    for (let i = 0; i < n; i++) d[i] = V[i * n + i];
    e[0] = 0;
    return;
  }
  for (let i = 0; i < n - 1; i++) {
    V[(n - 1) * n + i] = V[i * n + i];
    V[i * n + i] = 1;
    const h = d[i + 1];
    if (h !== 0) {
      for (let k = 0; k <= i; k++) d[k] = V[k * n + i + 1] / h;
      for (let j = 0; j <= i; j++) {
        let g = 0;
        for (let k = 0; k <= i; k++) g += V[k * n + i + 1] * V[k * n + j];
        for (let k = 0; k <= i; k++) V[k * n + j] -= g * d[k];
      }
    }
    for (let k = 0; k <= i; k++) V[k * n + i + 1] = 0;
  }
  for (let j = 0; j < n; j++) {
    d[j] = V[(n - 1) * n + j];
    V[(n - 1) * n + j] = 0;
  }
  V[(n - 1) * n + n - 1] = 1;
  e[0] = 0;
}

// tred2 without the accumulation, on the transposed storage: the matrix is symmetric, so
// reading element (k, j) at a[j*n + k] changes nothing mathematically but turns the
// inner loops over k into sequential reads (about 3× faster than the column walk).
function householderValues(V: Float64Array, n: number, d: Float64Array, e: Float64Array): void {
  for (let j = 0; j < n; j++) d[j] = V[j * n + n - 1];
  for (let i = n - 1; i > 0; i--) {
    let scale = 0;
    let h = 0;
    for (let k = 0; k < i; k++) scale += Math.abs(d[k]);
    if (scale === 0) {
      e[i] = d[i - 1];
      for (let j = 0; j < i; j++) {
        d[j] = V[j * n + i - 1];
        V[j * n + i] = 0;
      }
    } else {
      for (let k = 0; k < i; k++) {
        d[k] /= scale;
        h += d[k] * d[k];
      }
      let f = d[i - 1];
      let g = Math.sqrt(h);
      if (f > 0) g = -g;
      e[i] = scale * g;
      h -= f * g;
      d[i - 1] = f - g;
      for (let j = 0; j < i; j++) e[j] = 0;
      for (let j = 0; j < i; j++) {
        f = d[j];
        const row = j * n;
        g = e[j] + V[row + j] * f;
        for (let k = j + 1; k <= i - 1; k++) {
          const vkj = V[row + k];
          g += vkj * d[k];
          e[k] += vkj * f;
        }
        e[j] = g;
      }
      f = 0;
      for (let j = 0; j < i; j++) {
        e[j] /= h;
        f += e[j] * d[j];
      }
      const hh = f / (h + h);
      for (let j = 0; j < i; j++) e[j] -= hh * d[j];
      for (let j = 0; j < i; j++) {
        f = d[j];
        g = e[j];
        const row = j * n;
        for (let k = j; k <= i - 1; k++) V[row + k] -= f * e[k] + g * d[k];
        d[j] = V[row + i - 1];
      }
    }
    d[i] = h;
  }
  for (let i = 0; i < n; i++) d[i] = V[i * n + i];
  e[0] = 0;
}

// Implicit QL with Wilkinson shifts (tql2). On entry d = diagonal, e[1..n) = sub-diagonal.
// When z is given (row stride `stride`), the rotations are applied to its columns.
function implicitQL(
  d: Float64Array,
  e: Float64Array,
  n: number,
  z: Float64Array | null,
  stride: number,
  rows = n,
): void {
  for (let i = 1; i < n; i++) e[i - 1] = e[i];
  e[n - 1] = 0;
  let f = 0;
  let tst1 = 0;
  for (let l = 0; l < n; l++) {
    tst1 = Math.max(tst1, Math.abs(d[l]) + Math.abs(e[l]));
    let m = l;
    while (m < n) {
      if (Math.abs(e[m]) <= EPS * tst1) break;
      m++;
    }
    if (m > l) {
      let iter = 0;
      do {
        if (++iter > 60) throw new Error('symmetric eigen-solver did not converge');
        let g = d[l];
        let p = (d[l + 1] - g) / (2 * e[l]);
        let r = Math.hypot(p, 1);
        if (p < 0) r = -r;
        d[l] = e[l] / (p + r);
        d[l + 1] = e[l] * (p + r);
        const dl1 = d[l + 1];
        let h = g - d[l];
        for (let i = l + 2; i < n; i++) d[i] -= h;
        f += h;
        p = d[m];
        let c = 1;
        let c2 = c;
        let c3 = c;
        const el1 = e[l + 1];
        let s = 0;
        let s2 = 0;
        for (let i = m - 1; i >= l; i--) {
          c3 = c2;
          c2 = c;
          s2 = s;
          g = c * e[i];
          h = c * p;
          r = Math.hypot(p, e[i]);
          e[i + 1] = s * r;
          s = e[i] / r;
          c = p / r;
          p = c * d[i] - s * g;
          d[i + 1] = h + s * (c * g + s * d[i]);
          if (z) {
            for (let k = 0; k < rows; k++) {
              const zk = k * stride;
              const hh = z[zk + i + 1];
              z[zk + i + 1] = s * z[zk + i] + c * hh;
              z[zk + i] = c * z[zk + i] - s * hh;
            }
          }
        }
        p = (-s * s2 * c3 * el1 * e[l]) / dl1;
        e[l] = s * p;
        d[l] = c * p;
      } while (Math.abs(e[l]) > EPS * tst1);
    }
    d[l] += f;
    e[l] = 0;
  }
}

// Selection sort (n is small or the values are nearly sorted); swaps vector columns too.
function sortAscending(d: Float64Array, n: number, z: Float64Array | null, stride: number, rows = n): void {
  for (let i = 0; i < n - 1; i++) {
    let k = i;
    let p = d[i];
    for (let j = i + 1; j < n; j++) {
      if (d[j] < p) {
        k = j;
        p = d[j];
      }
    }
    if (k !== i) {
      d[k] = d[i];
      d[i] = p;
      if (z) {
        for (let r = 0; r < rows; r++) {
          const t = z[r * stride + i];
          z[r * stride + i] = z[r * stride + k];
          z[r * stride + k] = t;
        }
      }
    }
  }
}
