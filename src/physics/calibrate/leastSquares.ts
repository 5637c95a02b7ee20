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
 * Constraints, by an active set (e.g. J. Nocedal and S. J. Wright, Numerical
 * Optimization, 2nd ed., 2006, ch. 16):
 *   - box: an unknown at a bound whose step points outward is held there;
 *   - beyond the box (`margins`: functions of x that must stay positive; here the seam
 *     model's cross-parameter checks): one at its edge (margin within ACTIVE_MARGIN of
 *     one difference step's effect) that the step would cross is linearised there,
 *     grad(margin) . d = 0, so the step slides along the edge instead of stopping at it.
 * The damped system is solved on the null space of the active constraints (an
 * orthonormal basis by Gram-Schmidt), constraints being added while the step breaks
 * one. A step is then clipped into the box; if r is not defined there (a constraint
 * crossed, or a curved one left), the step is cut back along itself by bisection to
 * the farthest defined point (BISECTIONS halvings), so every iterate is feasible.
 *
 * The Jacobian is by forward differences with a step per unknown (given: the model
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
/** A margin is at its edge when below this fraction of the change one difference step in every unknown makes in it. */
const ACTIVE_MARGIN = 1e-6;
/** Difference step for a margin's gradient, as a fraction of the unknowns' steps (margins are cheap closed forms). */
const MARGIN_STEP = 1e-4;
/** Basis vectors shorter than this after orthogonalising are dropped (unit-length inputs). */
const BASIS_TOLERANCE = 1e-10;
export const DEFAULT_MAX_ITERATIONS = 100;

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

/** The edges a step must respect at x: box-held unknowns and margins at their edge, with gradients. */
interface Edges {
  /** Gradients (length n each) of the margins at their edge. */
  readonly active: Float64Array[];
}

function edgesAt(problem: LeastSquaresProblem, x: Float64Array): Edges {
  const active: Float64Array[] = [];
  if (!problem.margins) return { active };
  const n = problem.size;
  const m0 = Array.from(problem.margins(x));
  const xp = Float64Array.from(x);
  const grads = m0.map(() => new Float64Array(n));
  for (let j = 0; j < n; j++) {
    const h = MARGIN_STEP * problem.step[j];
    xp[j] = x[j] + h;
    const mp = problem.margins(xp);
    xp[j] = x[j] - h;
    const mm = problem.margins(xp);
    xp[j] = x[j];
    for (let c = 0; c < m0.length; c++) grads[c][j] = (mp[c] - mm[c]) / (2 * h);
  }
  m0.forEach((margin, c) => {
    let reach = 0;
    for (let j = 0; j < n; j++) reach += Math.abs(grads[c][j]) * problem.step[j];
    if (reach > 0 && margin <= ACTIVE_MARGIN * reach) active.push(grads[c]);
  });
  return { active };
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
  let edges: Edges = { active: [] };
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
      edges = edgesAt(problem, x);
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
        constrainedStep(problem, x, edges, a, g, DECREMENT_DAMPING, d);
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
    constrainedStep(problem, x, edges, a, g, mu, d);
    if (options.costResolution && 0.5 * quadraticForm(a, d, n) <= options.costResolution(cost)) {
      stopReason = "step";
      break;
    }
    iterations++;
    clipped(1);
    evaluations++;
    let feasible = problem.residuals(xTrial, rTrial);
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
      // the step actually taken, and the linear model's reduction for it
      let predicted = 0;
      for (let p = 0; p < n; p++) {
        const dp = xTrial[p] - x[p];
        let ad = 0;
        for (let q = 0; q < n; q++) ad += a[n * p + q] * (xTrial[q] - x[q]);
        predicted -= dp * g[p] + 0.5 * dp * ad;
        if (Math.abs(dp) > STEP_TOLERANCE * problem.step[p]) smallStep = false;
      }
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

/** An orthonormal basis (rows) of the vectors orthogonal to every row of `rows`. */
function nullSpaceBasis(rows: readonly Float64Array[], n: number): Float64Array[] {
  const span: Float64Array[] = [];
  const orthogonalise = (v: Float64Array, against: Float64Array[]): boolean => {
    for (let pass = 0; pass < 2; pass++) {
      for (const q of against) {
        let dot = 0;
        for (let i = 0; i < n; i++) dot += v[i] * q[i];
        for (let i = 0; i < n; i++) v[i] -= dot * q[i];
      }
    }
    const len = Math.hypot(...v);
    if (!(len > BASIS_TOLERANCE)) return false;
    for (let i = 0; i < n; i++) v[i] /= len;
    return true;
  };
  for (const row of rows) {
    const len = Math.hypot(...row);
    if (!(len > 0)) continue;
    const v = Float64Array.from(row, (c) => c / len);
    if (orthogonalise(v, span)) span.push(v);
  }
  const basis: Float64Array[] = [];
  for (let j = 0; j < n && span.length + basis.length < n; j++) {
    const v = new Float64Array(n);
    v[j] = 1;
    if (orthogonalise(v, [...span, ...basis])) basis.push(v);
  }
  return basis;
}

/**
 * The damped step on the null space of the active constraints (module header): box-held
 * unknowns and margins at their edge that the step would cross are added until none is.
 */
function constrainedStep(problem: LeastSquaresProblem, x: Float64Array, edges: Edges, a: Float64Array, g: Float64Array, mu: number, d: Float64Array): void {
  const n = problem.size;
  let maxDiag = 0;
  for (let j = 0; j < n; j++) maxDiag = Math.max(maxDiag, a[n * j + j]);
  const floor = Math.max(DIAGONAL_FLOOR * maxDiag, Number.MIN_VALUE);
  // H = A + mu diag(A) (floored)
  const h = Float64Array.from(a);
  for (let j = 0; j < n; j++) h[n * j + j] += mu * Math.max(a[n * j + j], floor);
  const rows: Float64Array[] = [];
  const held = new Set<number>();
  const used = new Set<number>();
  for (let round = 0; round <= n + edges.active.length; round++) {
    const z = nullSpaceBasis(rows, n);
    const k = z.length;
    d.fill(0);
    if (k === 0) return;
    // (Z^T H Z) c = -Z^T g, d = Z c
    const sub = new Float64Array(k * k);
    const rhs = new Float64Array(k);
    const c = new Float64Array(k);
    const hz = z.map((zv) => {
      const out = new Float64Array(n);
      for (let i = 0; i < n; i++) {
        let s = 0;
        for (let l = 0; l < n; l++) s += h[n * i + l] * zv[l];
        out[i] = s;
      }
      return out;
    });
    for (let p = 0; p < k; p++) {
      let s = 0;
      for (let i = 0; i < n; i++) s += z[p][i] * g[i];
      rhs[p] = -s;
      for (let q = 0; q < k; q++) {
        let t = 0;
        for (let i = 0; i < n; i++) t += z[p][i] * hz[q][i];
        sub[k * p + q] = t;
      }
    }
    if (!choleskySolve(sub, rhs, k, c)) {
      // not positive definite (rounding in a near-zero block): a scaled gradient step instead
      for (let p = 0; p < k; p++) c[p] = rhs[p] / Math.max(sub[k * p + p], floor);
    }
    for (let p = 0; p < k; p++) for (let i = 0; i < n; i++) d[i] += c[p] * z[p][i];
    let added = false;
    for (let j = 0; j < n; j++) {
      if (!held.has(j) && heldAtBound(problem, x, j, d[j])) {
        held.add(j);
        const e = new Float64Array(n);
        e[j] = 1;
        rows.push(e);
        added = true;
      }
    }
    edges.active.forEach((grad, idx) => {
      if (used.has(idx)) return;
      let s = 0;
      for (let i = 0; i < n; i++) s += grad[i] * d[i];
      if (s < 0) {
        used.add(idx);
        rows.push(grad);
        added = true;
      }
    });
    if (!added) return;
  }
}
