/**
 * Small dense linear algebra for the calibration: a Cholesky solve for the damped
 * normal equations (a handful of unknowns) and the singular value decomposition of a
 * tall Jacobian (thousands of rows, a handful of columns).
 *
 * Layouts: an n x n matrix is row-major, entry (i, j) at n * i + j; an m x n Jacobian
 * is column-major, column j at [m * j, m * (j + 1)), so a column is one contiguous run.
 */

/** Largest sweeps of the one-sided Jacobi SVD (it converges quadratically; 6-10 sweeps are usual). */
const SVD_MAX_SWEEPS = 60;
/** Columns count as orthogonal when |a.b| <= this times |a| |b|. */
const SVD_ORTHOGONALITY = 1e-15;

/**
 * Solves A x = b for symmetric positive definite A by Cholesky (A = L L^T).
 * @param a n x n, row-major; only the lower triangle is read; not modified.
 * @param b right-hand side, length n; not modified.
 * @param out overwritten with x.
 * @returns false when a pivot is not positive (A not positive definite); `out` is then unspecified.
 */
export function choleskySolve(a: ArrayLike<number>, b: ArrayLike<number>, n: number, out: Float64Array): boolean {
  const l = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      let s = a[n * i + j];
      for (let k = 0; k < j; k++) s -= l[n * i + k] * l[n * j + k];
      if (i === j) {
        if (!(s > 0)) return false;
        l[n * i + i] = Math.sqrt(s);
      } else l[n * i + j] = s / l[n * j + j];
    }
  }
  // forward (L y = b), then back (L^T x = y)
  for (let i = 0; i < n; i++) {
    let s = b[i];
    for (let k = 0; k < i; k++) s -= l[n * i + k] * out[k];
    out[i] = s / l[n * i + i];
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = out[i];
    for (let k = i + 1; k < n; k++) s -= l[n * k + i] * out[k];
    out[i] = s / l[n * i + i];
  }
  return true;
}

/** A thin singular value decomposition J = U S V^T (U not kept). */
export interface SingularValues {
  /** Singular values, largest first, length n. */
  readonly values: Float64Array;
  /** Right singular vectors: column k (entries n * i + k, row-major n x n) goes with values[k]. */
  readonly vectors: Float64Array;
  /** Whether the sweeps met the orthogonality test within SVD_MAX_SWEEPS. */
  readonly converged: boolean;
}

/**
 * Singular values and right singular vectors of an m x n matrix (m >= n) by the
 * one-sided Jacobi method (Hestenes 1958; e.g. Golub & Van Loan, Matrix Computations,
 * 4th ed., sec. 8.6.3): plane rotations of column pairs until all columns are
 * orthogonal; the column norms are then the singular values and the accumulated
 * rotations V. Accurate for small singular values (relative to the matrix), which is
 * what rank decisions need, where the eigenvalues of J^T J would square the condition.
 * @param jacobian column-major m x n; not modified.
 */
export function singularValues(jacobian: ArrayLike<number>, m: number, n: number): SingularValues {
  const a = Float64Array.from(jacobian as ArrayLike<number>);
  const v = new Float64Array(n * n);
  for (let i = 0; i < n; i++) v[n * i + i] = 1;
  let converged = n < 2;
  for (let sweep = 0; sweep < SVD_MAX_SWEEPS && !converged; sweep++) {
    converged = true;
    for (let p = 0; p < n - 1; p++) {
      for (let q = p + 1; q < n; q++) {
        let alpha = 0;
        let beta = 0;
        let gamma = 0;
        const op = m * p, oq = m * q;
        for (let i = 0; i < m; i++) {
          const x = a[op + i], y = a[oq + i];
          alpha += x * x;
          beta += y * y;
          gamma += x * y;
        }
        if (!(Math.abs(gamma) > SVD_ORTHOGONALITY * Math.sqrt(alpha * beta))) continue;
        converged = false;
        // rotation that zeroes the (p, q) entry of the 2 x 2 Gram matrix
        const zeta = (beta - alpha) / (2 * gamma);
        const t = Math.sign(zeta || 1) / (Math.abs(zeta) + Math.sqrt(1 + zeta * zeta));
        const c = 1 / Math.sqrt(1 + t * t);
        const s = c * t;
        for (let i = 0; i < m; i++) {
          const x = a[op + i], y = a[oq + i];
          a[op + i] = c * x - s * y;
          a[oq + i] = s * x + c * y;
        }
        for (let i = 0; i < n; i++) {
          const x = v[n * i + p], y = v[n * i + q];
          v[n * i + p] = c * x - s * y;
          v[n * i + q] = s * x + c * y;
        }
      }
    }
  }
  const norms = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    let s = 0;
    for (let i = 0; i < m; i++) s += a[m * j + i] * a[m * j + i];
    norms[j] = Math.sqrt(s);
  }
  const order = Array.from({ length: n }, (_, j) => j).sort((x, y) => norms[y] - norms[x]);
  const values = new Float64Array(n);
  const vectors = new Float64Array(n * n);
  order.forEach((j, k) => {
    values[k] = norms[j];
    for (let i = 0; i < n; i++) vectors[n * i + k] = v[n * i + j];
  });
  return { values, vectors, converged };
}
