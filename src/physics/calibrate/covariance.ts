/**
 * The Gauss-Newton covariance of a least-squares fit, with rank decisions.
 *
 * At the optimum of min |r(x)|^2 with m residuals and n unknowns, the covariance of x
 * is estimated by
 *     C = s^2 (J^T J)^-1,   s^2 = |r|^2 / (m - n),
 * J the Jacobian of r (e.g. D. M. Bates and D. G. Watts, Nonlinear Regression Analysis
 * and Its Applications, Wiley 1988, sec. 2.3; the "approximate standard errors" of the
 * NIST StRD nonlinear regression datasets are the square roots of its diagonal).
 *
 * Rank: the columns are first scaled by the caller's typical sizes of the unknowns
 * (here the parameters' ranges), so a singular value compares how much the data
 * respond to moving each unknown across its size. A singular value of the scaled J at
 * or below `nullRelative` times the largest marks a direction the data do not see; C
 * is then taken on the other directions only (a pseudo-inverse), and the unknowns with
 * a share of at least `nullLoading` in such a direction's unit vector are reported.
 */
import { singularValues } from "./linearAlgebra.js";

export interface NullDirection {
  /** Its singular value over the largest. */
  readonly relative: number;
  /** The unit right singular vector in scaled coordinates (length n). */
  readonly loadings: Float64Array;
  /** The unknowns with |loading| >= nullLoading. */
  readonly members: readonly number[];
}

export interface GaussNewtonCovariance {
  /** n x n, row-major, in the unknowns' own units (pseudo-inverse where directions are null). */
  readonly covariance: Float64Array;
  readonly residualVariance: number;
  readonly degreesOfFreedom: number;
  /** Singular values of the scaled Jacobian over the largest, largest first. */
  readonly relativeSingularValues: readonly number[];
  readonly nullDirections: readonly NullDirection[];
}

/**
 * C = s^2 (J^T J)^-1 with rank decisions (module header).
 * @param jacobian column-major m x n, m > n; not modified.
 * @param residuals r at the optimum (length m).
 * @param columnScales typical size of each unknown (> 0); default 1 each.
 * @throws RangeError unless m > n.
 */
export function gaussNewtonCovariance(
  jacobian: ArrayLike<number>,
  residuals: ArrayLike<number>,
  m: number,
  n: number,
  options: { columnScales?: ArrayLike<number>; nullRelative?: number; nullLoading?: number } = {},
): GaussNewtonCovariance {
  if (!(m > n)) throw new RangeError(`${m} residuals for ${n} unknowns; a covariance needs more residuals than unknowns`);
  const scales = options.columnScales ?? new Float64Array(n).fill(1);
  const nullRelative = options.nullRelative ?? 1e-7;
  const nullLoading = options.nullLoading ?? 0.1;
  const scaled = new Float64Array(m * n);
  for (let j = 0; j < n; j++) for (let i = 0; i < m; i++) scaled[m * j + i] = jacobian[m * j + i] * scales[j];
  const svd = singularValues(scaled, m, n);
  const largest = svd.values[0];
  let rss = 0;
  for (let i = 0; i < m; i++) rss += residuals[i] * residuals[i];
  const dof = m - n;
  const s2 = rss / dof;
  const covariance = new Float64Array(n * n);
  const nullDirections: NullDirection[] = [];
  for (let k = 0; k < n; k++) {
    const sk = svd.values[k];
    const loadings = Float64Array.from({ length: n }, (_, i) => svd.vectors[n * i + k]);
    if (!(largest > 0) || sk <= nullRelative * largest) {
      const members: number[] = [];
      loadings.forEach((l, i) => {
        if (Math.abs(l) >= nullLoading) members.push(i);
      });
      nullDirections.push({ relative: largest > 0 ? sk / largest : 0, loadings, members });
      continue;
    }
    const w = s2 / (sk * sk);
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) covariance[n * i + j] += w * loadings[i] * loadings[j] * scales[i] * scales[j];
  }
  return {
    covariance,
    residualVariance: s2,
    degreesOfFreedom: dof,
    relativeSingularValues: Array.from(svd.values, (s) => (largest > 0 ? s / largest : 0)),
    nullDirections,
  };
}
