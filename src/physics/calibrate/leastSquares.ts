/**
 * Bounded nonlinear least squares: Levenberg-Marquardt with a finite-difference
 * Jacobian, box bounds, and constraints beyond the box.
 *
 * Minimises F(x) = 1/2 |r(x)|^2 over lower <= x <= upper with r(x) defined (feasible).
 * Each iteration solves the damped normal equations with Marquardt's scaling,
 *     (J^T J + mu diag(J^T J)) d = -J^T r,
 * (D. W. Marquardt, J. SIAM 11, 431-441, 1963; the diagonal is floored so a column
 * of zeros gives a zero step rather than a singular system), and updates the damping
 * by the gain ratio rho = (F(x) - F(x + d)) / (L(0) - L(d)), L the linear model:
 * accepted when rho > 0, mu *= max(1/3, 1 - (2 rho - 1)^3), nu = 2; rejected,
 * mu *= nu, nu *= 2 (H. B. Nielsen, IMM-REP-1999-05; K. Madsen, H. B. Nielsen and
 * O. Tingleff, Methods for Non-Linear Least Squares Problems, 2nd ed., 2004, eq. 3.16
 * and Algorithm 3.16).
 *
 * Constraints, by an active set of linearised ones (e.g. J. Nocedal and S. J. Wright,
 * Numerical Optimization, 2nd ed., 2006, ch. 16 and 18): the step is solved with the
 * equalities of every constraint it would otherwise cross,
 *   - box: e_j . d = bound - x_j (it stops at the bound; one already there stays);
 *   - beyond the box (`margins`: functions of x that must stay positive; here the seam
 *     model's cross-parameter checks), linearised at x: grad(g) . d = -g (it stops on
 *     the edge and slides along it instead of stopping at it),
 * on the null space of those rows (Gram-Schmidt), rows being added while the step
 * crosses one. The step is then clipped into the box; if r is not defined there (a
 * curved edge left by the linearisation's error), the point is moved back inside the
 * broken margins by the shortest move (`restore`: a second-order correction, e.g.
 * Nocedal and Wright, sec. 15.4; the gain ratio then uses the linear model's reduction
 * for the step before the correction), and failing that the step is cut back along
 * itself by bisection to the farthest defined point (BISECTIONS halvings), so every
 * iterate is feasible.
 *
 * The Jacobian is by forward (or, with `central`, central) differences with a step per unknown (given: the model
 * this serves is a staircase at fine scales, so the steps are chosen, not derived from
 * machine precision); where x + h leaves the box or the feasible set, the backward
 * difference is taken instead, and a column is zero when neither is possible.
 *
 * Stops (the first that holds): every free column's cosine with r below
 * GRADIENT_TOLERANCE; the Gauss-Newton decrement, or the size of the damped step to be
 * tried, at or below the caller's resolution of the cost (`costResolution`); without
 * one, an accepted step moving every unknown by less than STEP_TOLERANCE of its
 * difference step, or lowering F by a relative COST_TOLERANCE or less; F = 0; the
 * damping above MAX_DAMPING; or the iteration cap (then `converged` is false).
 */
import { choleskySolve } from "./linearAlgebra.js";

const GRADIENT_TOLERANCE = 1e-10;
const STEP_TOLERANCE = 1e-6;
const COST_TOLERANCE = 1e-12;
const MAX_DAMPING = 1e16;
const INITIAL_DAMPING = 1e-3;
/** Damping of the step whose decrement is tested (near Gauss-Newton, still defined when J^T J is singular). */
const DECREMENT_DAMPING = 1e-10;
/** Floor of diag(J^T J) in the damping term, relative to its largest entry. */
const DIAGONAL_FLOOR = 1e-12;
/** Halvings of a step that leaves the feasible set. */
const BISECTIONS = 30;
/** Passes of the restoration onto a curved edge, and how far inside it aims (fraction of one step's effect). */
const RESTORATIONS = 8;
const RESTORE_INSIDE = 1e-9;
/** Difference step for a margin's gradient, as a fraction of the unknowns' steps (margins are cheap closed forms). */
const MARGIN_STEP = 1e-4;
/** Basis vectors shorter than this after orthogonalising are dropped (unit-length inputs). */
const BASIS_TOLERANCE = 1e-10;
const DEFAULT_MAX_ITERATIONS = 100;

export interface LeastSquaresProblem {
  /** Number of unknowns n. */
  readonly size: number;
  /** Number of residuals m. */
  readonly residualCount: number;
  readonly lower: ArrayLike<number>;
  readonly upper: ArrayLike<number>;
  /** Finite-difference step per unknown, in its units, > 0. */
  readonly step: ArrayLike<number>;
  /**
   * Writes r(x) into `out` (length m); returns false, leaving `out` unspecified, when x
   * breaks a constraint beyond the box.
   */
  residuals(x: Float64Array, out: Float64Array): boolean;
  /**
   * Optional: the constraints beyond the box as margins (positive inside), cheap to
   * evaluate, agreeing with `residuals`' feasibility; used to slide along their edges.
   */
  margins?(x: Float64Array): ArrayLike<number>;
}

export type StopReason = "gradient" | "decrement" | "step" | "cost" | "exact" | "damping" | "iterations";

export interface LeastSquaresResult {
  readonly x: Float64Array;
  readonly residuals: Float64Array;
  /** 1/2 |r|^2 at x. */
  readonly cost: number;
  readonly iterations: number;
  /** Calls of residuals(). */
  readonly evaluations: number;
  readonly converged: boolean;
  readonly stopReason: StopReason;
}

export interface LeastSquaresOptions {
  /** Iteration cap, default DEFAULT_MAX_ITERATIONS. */
  readonly maxIterations?: number;
  /** Central differences for the Jacobian (twice the evaluations); default forward. */
  readonly central?: boolean;
  /** Called after each iteration with its number and the cost. */
  readonly onIteration?: (iteration: number, cost: number) => void;
  /**
   * The smallest change of cost that matters, as a function of the current cost (for a
   * statistical fit: a small fraction of the residual variance). The search stops when
   * the Gauss-Newton decrement 1/2 g^T (J^T J)^-1 g (the cost the full undamped step
   * would remove, by the linear model) is at most this ("decrement"), or when the damped
   * step to be tried would change the linear model's cost by at most this, 1/2 d^T J^T J d
   * ("step": the damping has shrunk the steps below what matters). Default: neither.
   */
  readonly costResolution?: (cost: number) => number;
}

function sumSquares(r: Float64Array): number {
  let s = 0;
  for (let i = 0; i < r.length; i++) s += r[i] * r[i];
  return s;
}

/**
 * The finite-difference Jacobian at x (column-major m x n): forward differences, or
 * central ones when `central`, falling back to one side where the other leaves the box
 * or the feasible set; zero columns where neither side can be taken.
 * @param r0 r(x).
 * @returns the Jacobian and the number of residual evaluations made.
 */
export function finiteDifferenceJacobian(problem: LeastSquaresProblem, x: Float64Array, r0: Float64Array, central = false): { jacobian: Float64Array; evaluations: number } {
  const n = problem.size;
  const m = problem.residualCount;
  const jac = new Float64Array(m * n);
  const xp = Float64Array.from(x);
  const rp = new Float64Array(m);
  const rm = new Float64Array(m);
  let evaluations = 0;
  const at = (j: number, value: number, out: Float64Array): boolean => {
    if (value < problem.lower[j] || value > problem.upper[j]) return false;
    xp[j] = value;
    evaluations++;
    const ok = problem.residuals(xp, out);
    xp[j] = x[j];
    return ok;
  };
  for (let j = 0; j < n; j++) {
    const h = problem.step[j];
    const plus = at(j, x[j] + h, rp);
    const minus = (central || !plus) && at(j, x[j] - h, rm);
    const col = m * j;
    if (plus && minus) for (let i = 0; i < m; i++) jac[col + i] = (rp[i] - rm[i]) / (2 * h);
    else if (plus) for (let i = 0; i < m; i++) jac[col + i] = (rp[i] - r0[i]) / h;
    else if (minus) for (let i = 0; i < m; i++) jac[col + i] = (r0[i] - rm[i]) / h;
  }
  return { jacobian: jac, evaluations };
}

/** The margins at x and their gradients (central differences; margins are cheap closed forms). */
interface Linearised {
  readonly values: number[];
  readonly grads: Float64Array[];
}

function linearise(problem: LeastSquaresProblem, x: Float64Array): Linearised {
  if (!problem.margins) return { values: [], grads: [] };
  const n = problem.size;
  const values = Array.from(problem.margins(x));
  const xp = Float64Array.from(x);
  const grads = values.map(() => new Float64Array(n));
  for (let j = 0; j < n; j++) {
    const h = MARGIN_STEP * problem.step[j];
    xp[j] = x[j] + h;
    const mp = problem.margins(xp);
    xp[j] = x[j] - h;
    const mm = problem.margins(xp);
    xp[j] = x[j];
    for (let c = 0; c < values.length; c++) grads[c][j] = (mp[c] - mm[c]) / (2 * h);
  }
  return { values, grads };
}

/**
 * Minimises 1/2 |r(x)|^2 in the box from a feasible x0 (see the module header).
 * @throws RangeError when x0 is outside the box or r(x0) is not defined.
 */
export function boundedLevenbergMarquardt(problem: LeastSquaresProblem, x0: ArrayLike<number>, options: LeastSquaresOptions = {}): LeastSquaresResult {
  const n = problem.size;
  const m = problem.residualCount;
  const maxIterations = options.maxIterations ?? DEFAULT_MAX_ITERATIONS;
  const x = Float64Array.from(x0);
  for (let j = 0; j < n; j++) {
    if (!(x[j] >= problem.lower[j] && x[j] <= problem.upper[j])) throw new RangeError(`start value ${x[j]} of unknown ${j} is outside ${problem.lower[j]} to ${problem.upper[j]}`);
  }
  let r = new Float64Array(m);
  let evaluations = 1;
  if (!problem.residuals(x, r)) throw new RangeError(`the start point breaks a constraint`);
  let cost = 0.5 * sumSquares(r);
  let rTrial = new Float64Array(m);
  const xTrial = new Float64Array(n);
  const a = new Float64Array(n * n);
  const g = new Float64Array(n);
  const d = new Float64Array(n);
  let mu = INITIAL_DAMPING;
  let nu = 2;
  let stopReason: StopReason = "iterations";
  let iterations = 0;
  let linear: Linearised = { values: [], grads: [] };
  let fresh = true;
  const clipped = (t: number) => {
    for (let j = 0; j < n; j++) xTrial[j] = Math.min(problem.upper[j], Math.max(problem.lower[j], x[j] + t * d[j]));
  };
  while (true) {
    if (cost === 0) {
      stopReason = "exact";
      break;
    }
    if (fresh) {
      const fd = finiteDifferenceJacobian(problem, x, r, options.central ?? false);
      const jac = fd.jacobian;
      evaluations += fd.evaluations;
      // A = J^T J, g = J^T r
      for (let p = 0; p < n; p++) {
        let s = 0;
        for (let i = 0; i < m; i++) s += jac[m * p + i] * r[i];
        g[p] = s;
        for (let q = 0; q <= p; q++) {
          let t = 0;
          for (let i = 0; i < m; i++) t += jac[m * p + i] * jac[m * q + i];
          a[n * p + q] = t;
          a[n * q + p] = t;
        }
      }
      fresh = false;
      linear = linearise(problem, x);
      // gradient test: cosine of each column with r, box-held columns pointing outward excluded
      const rNorm = Math.sqrt(2 * cost);
      let worst = 0;
      for (let j = 0; j < n; j++) {
        if (heldAtBound(problem, x, j, -g[j])) continue;
        const colNorm = Math.sqrt(a[n * j + j]);
        if (colNorm > 0) worst = Math.max(worst, Math.abs(g[j]) / (colNorm * rNorm));
      }
      if (worst <= GRADIENT_TOLERANCE) {
        stopReason = "gradient";
        break;
      }
      if (options.costResolution) {
        constrainedStep(problem, x, linear, a, g, DECREMENT_DAMPING, d);
        let decrement = 0;
        for (let j = 0; j < n; j++) decrement -= 0.5 * d[j] * g[j];
        if (decrement <= options.costResolution(cost)) {
          stopReason = "decrement";
          break;
        }
      }
    }
    if (iterations >= maxIterations) {
      stopReason = "iterations";
      break;
    }
    if (mu > MAX_DAMPING) {
      stopReason = "damping";
      break;
    }
    constrainedStep(problem, x, linear, a, g, mu, d);
    if (options.costResolution && 0.5 * quadraticForm(a, d, n) <= options.costResolution(cost)) {
      stopReason = "step";
      break;
    }
    iterations++;
    clipped(1);
    // the linear model's reduction for the step the model chose (clipped into the box);
    // a restoration's move back inside a curved edge is judged by the actual cost alone
    const modelled = linearReduction(a, g, x, xTrial, n);
    evaluations++;
    let feasible = problem.residuals(xTrial, rTrial);
    let restored = false;
    if (!feasible && problem.margins && restore(problem, xTrial)) {
      evaluations++;
      feasible = problem.residuals(xTrial, rTrial);
      restored = feasible;
    }
    if (!feasible) {
      // bisect along the step for the farthest feasible point
      let lo = 0;
      let hi = 1;
      for (let k = 0; k < BISECTIONS; k++) {
        const t = 0.5 * (lo + hi);
        clipped(t);
        evaluations++;
        if (problem.residuals(xTrial, rTrial)) lo = t;
        else hi = t;
      }
      if (lo > 0) {
        clipped(lo);
        evaluations++;
        feasible = problem.residuals(xTrial, rTrial);
      }
    }
    let accepted = false;
    let smallStep = true;
    if (feasible) {
      const predicted = restored ? modelled : linearReduction(a, g, x, xTrial, n);
      for (let p = 0; p < n; p++) if (Math.abs(xTrial[p] - x[p]) > STEP_TOLERANCE * problem.step[p]) smallStep = false;
      const trialCost = 0.5 * sumSquares(rTrial);
      const actual = cost - trialCost;
      const rho = predicted > 0 ? actual / predicted : -1;
      if (rho > 0 && actual > 0) {
        accepted = true;
        x.set(xTrial);
        [r, rTrial] = [rTrial, r];
        const previous = cost;
        cost = trialCost;
        mu *= Math.max(1 / 3, 1 - (2 * rho - 1) ** 3);
        nu = 2;
        fresh = true;
        options.onIteration?.(iterations, cost);
        if (!options.costResolution && smallStep) {
          stopReason = "step";
          break;
        }
        if (!options.costResolution && actual <= COST_TOLERANCE * previous) {
          stopReason = "cost";
          break;
        }
      }
    }
    if (!accepted) {
      mu *= nu;
      nu *= 2;
      options.onIteration?.(iterations, cost);
    }
  }
  return { x, residuals: r, cost, iterations, evaluations, converged: stopReason !== "iterations", stopReason };
}

/**
 * Moves x back inside the margins it breaks (a second-order correction for curved
 * constraints: the linearised step leaves a curved edge by its curvature times the step
 * squared). Each pass takes the most broken margin g to a hair inside by the shortest
 * move in the metric of the difference steps S, x -= (g - target) S^2 grad g / |S grad g|^2,
 * then clips x into the box. Returns whether x ends inside every margin.
 */
function restore(problem: LeastSquaresProblem, x: Float64Array): boolean {
  const n = problem.size;
  const xp = new Float64Array(n);
  for (let pass = 0; pass < RESTORATIONS; pass++) {
    const margins = Array.from(problem.margins!(x));
    let worst = -1;
    for (let c = 0; c < margins.length; c++) if (margins[c] <= 0 && (worst < 0 || margins[c] < margins[worst])) worst = c;
    if (worst < 0) return true;
    const grad = new Float64Array(n);
    xp.set(x);
    for (let j = 0; j < n; j++) {
      const h = MARGIN_STEP * problem.step[j];
      xp[j] = x[j] + h;
      const gp = problem.margins!(xp)[worst];
      xp[j] = x[j] - h;
      const gm = problem.margins!(xp)[worst];
      xp[j] = x[j];
      grad[j] = (gp - gm) / (2 * h);
    }
    let reach = 0;
    let norm2 = 0;
    for (let j = 0; j < n; j++) {
      reach += Math.abs(grad[j]) * problem.step[j];
      norm2 += (grad[j] * problem.step[j]) ** 2;
    }
    if (!(norm2 > 0)) return false;
    const shift = (margins[worst] - RESTORE_INSIDE * reach) / norm2;
    for (let j = 0; j < n; j++) x[j] = Math.min(problem.upper[j], Math.max(problem.lower[j], x[j] - shift * problem.step[j] * problem.step[j] * grad[j]));
  }
  return Array.from(problem.margins!(x)).every((g) => g > 0);
}

/** The linear model's cost reduction for the move x -> y: -(g.d + 1/2 d^T A d), d = y - x. */
function linearReduction(a: Float64Array, g: Float64Array, x: Float64Array, y: Float64Array, n: number): number {
  let predicted = 0;
  for (let p = 0; p < n; p++) {
    const dp = y[p] - x[p];
    let ad = 0;
    for (let q = 0; q < n; q++) ad += a[n * p + q] * (y[q] - x[q]);
    predicted -= dp * g[p] + 0.5 * dp * ad;
  }
  return predicted;
}

/** d^T A d for n x n row-major A. */
function quadraticForm(a: Float64Array, d: Float64Array, n: number): number {
  let s = 0;
  for (let p = 0; p < n; p++) {
    let ad = 0;
    for (let q = 0; q < n; q++) ad += a[n * p + q] * d[q];
    s += d[p] * ad;
  }
  return s;
}

/** Whether unknown j sits at a bound with `direction` pointing out of the box. */
function heldAtBound(problem: LeastSquaresProblem, x: Float64Array, j: number, direction: number): boolean {
  return (x[j] <= problem.lower[j] && direction < 0) || (x[j] >= problem.upper[j] && direction > 0);
}

/**
 * The damped step subject to linear equalities C d = b (module header): the rows are
 * orthonormalised by Gram-Schmidt, C = R Q with R lower triangular (a row that depends
 * on earlier ones is dropped); the particular solution d_p = Q^T y, R y = b, is the
 * shortest one; the rest lies in the null space Z (orthonormal, completing Q), where
 * (Z^T H Z) c = -Z^T (g + H d_p), d = d_p + Z c. Rows are added while the step crosses a
 * box bound (row e_j, b = bound - x_j: stop at it) or a linearised margin
 * (row grad, b = -margin: stop on its edge).
 */
function constrainedStep(problem: LeastSquaresProblem, x: Float64Array, linear: Linearised, a: Float64Array, g: Float64Array, mu: number, d: Float64Array): void {
  const n = problem.size;
  let maxDiag = 0;
  for (let j = 0; j < n; j++) maxDiag = Math.max(maxDiag, a[n * j + j]);
  const floor = Math.max(DIAGONAL_FLOOR * maxDiag, Number.MIN_VALUE);
  // H = A + mu diag(A) (floored)
  const h = Float64Array.from(a);
  for (let j = 0; j < n; j++) h[n * j + j] += mu * Math.max(a[n * j + j], floor);
  const q: Float64Array[] = []; // orthonormal rows
  const y: number[] = []; // d_p = sum y_i q_i
  const boxRow = new Set<number>();
  const marginRow = new Set<number>();
  const addRow = (row: Float64Array, rhs: number): void => {
    // row = sum_i r_i q_i + r_new q_new; the constraint row . d = rhs fixes y_new
    const v = Float64Array.from(row);
    const len0 = Math.hypot(...v);
    if (!(len0 > 0)) return;
    let known = 0;
    for (let pass = 0; pass < 2; pass++) {
      for (let i = 0; i < q.length; i++) {
        let dot = 0;
        for (let k = 0; k < n; k++) dot += v[k] * q[i][k];
        for (let k = 0; k < n; k++) v[k] -= dot * q[i][k];
      }
    }
    for (let i = 0; i < q.length; i++) {
      let r = 0;
      for (let k = 0; k < n; k++) r += row[k] * q[i][k];
      known += r * y[i];
    }
    const len = Math.hypot(...v);
    if (!(len > BASIS_TOLERANCE * len0)) return; // depends on the rows already there
    for (let k = 0; k < n; k++) v[k] /= len;
    q.push(v);
    y.push((rhs - known) / len);
  };
  for (let round = 0; round <= n + linear.values.length; round++) {
    // the null space of the rows so far
    const z: Float64Array[] = [];
    for (let j = 0; j < n && q.length + z.length < n; j++) {
      const v = new Float64Array(n);
      v[j] = 1;
      for (let pass = 0; pass < 2; pass++) {
        for (const b of [...q, ...z]) {
          let dot = 0;
          for (let k = 0; k < n; k++) dot += v[k] * b[k];
          for (let k = 0; k < n; k++) v[k] -= dot * b[k];
        }
      }
      const len = Math.hypot(...v);
      if (len > BASIS_TOLERANCE) {
        for (let k = 0; k < n; k++) v[k] /= len;
        z.push(v);
      }
    }
    d.fill(0);
    for (let i = 0; i < q.length; i++) for (let k = 0; k < n; k++) d[k] += y[i] * q[i][k];
    const kz = z.length;
    if (kz > 0) {
      // rhs = -Z^T (g + H d_p)
      const hdp = new Float64Array(n);
      for (let i = 0; i < n; i++) {
        let t = g[i];
        for (let k = 0; k < n; k++) t += h[n * i + k] * d[k];
        hdp[i] = t;
      }
      const sub = new Float64Array(kz * kz);
      const rhs = new Float64Array(kz);
      const c = new Float64Array(kz);
      const hz = z.map((zv) => {
        const out = new Float64Array(n);
        for (let i = 0; i < n; i++) {
          let t = 0;
          for (let k = 0; k < n; k++) t += h[n * i + k] * zv[k];
          out[i] = t;
        }
        return out;
      });
      for (let p = 0; p < kz; p++) {
        let t = 0;
        for (let i = 0; i < n; i++) t += z[p][i] * hdp[i];
        rhs[p] = -t;
        for (let r = 0; r < kz; r++) {
          let u = 0;
          for (let i = 0; i < n; i++) u += z[p][i] * hz[r][i];
          sub[kz * p + r] = u;
        }
      }
      if (!choleskySolve(sub, rhs, kz, c)) {
        // not positive definite (rounding in a near-zero block): a scaled gradient step instead
        for (let p = 0; p < kz; p++) c[p] = rhs[p] / Math.max(sub[kz * p + p], floor);
      }
      for (let p = 0; p < kz; p++) for (let i = 0; i < n; i++) d[i] += c[p] * z[p][i];
    }
    let added = false;
    for (let j = 0; j < n; j++) {
      if (boxRow.has(j)) continue;
      const lo = problem.lower[j] - x[j], hi = problem.upper[j] - x[j];
      if (d[j] < lo || d[j] > hi) {
        boxRow.add(j);
        const e = new Float64Array(n);
        e[j] = 1;
        addRow(e, d[j] < lo ? lo : hi);
        added = true;
      }
    }
    linear.grads.forEach((grad, c) => {
      if (marginRow.has(c)) return;
      let t = linear.values[c];
      for (let i = 0; i < n; i++) t += grad[i] * d[i];
      if (t < 0) {
        marginRow.add(c);
        addRow(grad, -linear.values[c]);
        added = true;
      }
    });
    if (!added) return;
  }
}
