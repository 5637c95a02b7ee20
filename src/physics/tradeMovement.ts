/**
 * Movement the way the trade reads it: induced vertical break and horizontal break
 * from a constant-acceleration ("nine-parameter") fit of the tracked path.
 *
 * Field frame (geometry/frames.ts): x toward the catcher's right, y from the rear
 * point of home plate toward the pitcher, z up; the pitch flies along -y. The
 * window's ends are planes y = const in this frame: the window start (default
 * y = 50 ft; older data used 40 ft) and the front of home plate.
 *
 * Definition (A. M. Nathan, notes on determining pitch movement from tracking
 * data; from memory, REFERENCES.md "Movement as the trade reads it"):
 *   1. Keep the samples with plate <= y <= window start.
 *   2. Fit x(t), y(t), z(t) each as a quadratic by least squares over them:
 *      nine parameters, a position, velocity and constant acceleration a.
 *   3. From the fitted y(t), the times t_w at y = window start and t_p at
 *      y = plate; the window time is T = t_p - t_w.
 *   4. horizontal break       = 1/2 a_x T^2        (+x, the catcher's right)
 *      induced vertical break = 1/2 (a_z + g) T^2  (up; gravity removed)
 * That is where the fitted path meets the plate minus where a straight line
 * (vertically: a gravity-only parabola) from the fit's position and velocity at
 * the window start meets it. Drag is part of the fitted acceleration, so its own
 * deflection stays in the break (small, and along -v: it shortens the vertical
 * drop of a descending pitch and pulls against any sideways velocity).
 *
 * Numerics: time is centred on the middle of the window's sample times and
 * scaled by their half-span, tau in [-1, 1]. In the basis (1, tau, tau^2) the
 * 3x3 normal equations are well conditioned (condition number about 14 for evenly
 * spaced samples, against about 1e6 in raw seconds over a 0.4 s window), and we
 * solve them by Cholesky. The window times come from the fitted y(tau) by the
 * cancellation-free form of the quadratic formula, taking the root where the
 * ball moves toward the plate.
 */
import { STANDARD_GRAVITY_M_PER_S2 } from "./atmosphere.js";
import { assertInRange } from "../../geometry/check.js";
import { PLATE_FRONT_Y_M } from "./field.js";
import type { TrajectorySamples } from "./trajectory.js";
import { M_PER_FT } from "../../geometry/units.js";
import type { Vec3 } from "../../geometry/vec.js";

/** Window start in current use: y = 50 ft from the rear point of home plate, m (common practice, from memory). */
export const TRADE_WINDOW_START_M = 50 * M_PER_FT;
/** Window start of older data: y = 40 ft, m (common practice, from memory). */
export const OLDER_TRADE_WINDOW_START_M = 40 * M_PER_FT;
/**
 * How far short of the plate plane a sample may lie and still count as in the
 * window, m: a recorded flight's last point is cut to within 1e-12 m of it.
 */
const PLATE_EDGE_TOLERANCE_M = 1e-9;
/** Smallest Cholesky pivot accepted, relative to its diagonal entry (below: the sample times do not fix a quadratic). */
const PIVOT_RELATIVE_MIN = 1e-12;

export interface TradeMovementOptions {
  /** y of the window start, m; must be beyond the plate plane; default TRADE_WINDOW_START_M (50 ft). */
  readonly windowStartM?: number;
  /** y of the window end (the plate plane), m, -100 to 100; default PLATE_FRONT_Y_M (front of home plate). */
  readonly plateYM?: number;
  /** Gravity removed from the vertical, m/s^2, 0 to 30; default 9.80665 (standard gravity). */
  readonly gravityMPerS2?: number;
}

/** The nine parameters of the constant-acceleration fit, at the moment the fitted path is at the window start. */
export interface ConstantAccelerationFit {
  /** When the fitted path crosses y = window start, s, on the samples' clock. */
  readonly referenceTimeS: number;
  /** Fitted position then, m (y equals the window start). */
  readonly positionM: Vec3;
  /** Fitted velocity then, m/s. */
  readonly velocityMPerS: Vec3;
  /** Fitted constant acceleration, m/s^2 (gravity included). */
  readonly accelerationMPerS2: Vec3;
}

/** A plate-plane break, m: horizontal toward the catcher's right (+x), vertical up with gravity removed. */
export interface TradeBreak {
  readonly horizontalBreakM: number;
  readonly inducedVerticalBreakM: number;
}

export interface TradeMovement extends TradeBreak {
  /** Flight time from the window start to the plate plane on the fitted path, s. */
  readonly windowTimeS: number;
  /** Fitted constant acceleration [ax, ay, az], m/s^2 (gravity included). */
  readonly accelerationMPerS2: Vec3;
  readonly fit: ConstantAccelerationFit;
  /** Samples inside the window that the fit used. */
  readonly samplesUsed: number;
  /** Root-mean-square distance of those samples from the fitted path, m (zero for a truly constant acceleration). */
  readonly rmsResidualM: number;
}

/**
 * Induced vertical break and horizontal break of a sampled flight (see the file
 * header for the definition).
 *
 * @param samples positions and times of one flight, field frame; only those with
 *   plate <= y <= window start are used (a recorded flight from trajectory.ts, or
 *   tracking data converted to SI and this frame). The fitted quadratic is
 *   evaluated at the window's two planes, so it extrapolates if the samples do
 *   not reach them.
 * @throws RangeError for a window start not beyond the plate plane, fewer than
 *   three samples in the window, sample times that do not fix a quadratic,
 *   arrays of unequal length, a non-finite sample in the window, or a fitted path
 *   that does not move toward the plate across the whole window.
 */
export function tradeMovement(samples: TrajectorySamples, options: TradeMovementOptions = {}): TradeMovement {
  const plateYM = options.plateYM ?? PLATE_FRONT_Y_M;
  assertInRange("plate plane y", plateYM, -100, 100, "m");
  const windowStartM = options.windowStartM ?? TRADE_WINDOW_START_M;
  if (!(Number.isFinite(windowStartM) && windowStartM > plateYM)) {
    throw new RangeError(`window start y ${windowStartM} m must be a finite number beyond the plate plane y = ${plateYM} m`);
  }
  const g = options.gravityMPerS2 ?? STANDARD_GRAVITY_M_PER_S2;
  assertInRange("gravity", g, 0, 30, "m/s^2");
  const { tS, xM, yM, zM } = samples;
  const n = tS.length;
  if (xM.length !== n || yM.length !== n || zM.length !== n) {
    throw new RangeError(`trajectory samples have unequal lengths: t ${n}, x ${xM.length}, y ${yM.length}, z ${zM.length}`);
  }
  const yLow = plateYM - PLATE_EDGE_TOLERANCE_M;
  const inWindow = (y: number): boolean => y <= windowStartM && y >= yLow;

  // pass 1: which samples, and their time span
  let count = 0;
  let tMin = Infinity;
  let tMax = -Infinity;
  let first = -1;
  for (let i = 0; i < n; i++) {
    const y = yM[i];
    if (!inWindow(y)) continue;
    const t = tS[i];
    if (!Number.isFinite(t + xM[i] + y + zM[i])) {
      throw new RangeError(`trajectory sample ${i} (t ${t} s, x ${xM[i]} m, y ${y} m, z ${zM[i]} m) is not finite`);
    }
    if (first < 0) first = i;
    count++;
    if (t < tMin) tMin = t;
    if (t > tMax) tMax = t;
  }
  if (count < 3) {
    throw new RangeError(
      `the window from y = ${windowStartM} m to the plate plane y = ${plateYM} m holds ${count} of the trajectory's samples; the quadratic fit needs at least 3`,
    );
  }
  const tCentre = 0.5 * (tMin + tMax);
  const halfSpan = 0.5 * (tMax - tMin);
  if (!(halfSpan > 0)) throw new RangeError(`the ${count} trajectory samples in the window all have the time ${tMin} s; the fit needs at least 3 distinct times`);

  // pass 2: normal equations in tau = (t - tCentre) / halfSpan; data offset by the first sample
  const x0 = xM[first];
  const y0 = yM[first];
  const z0 = zM[first];
  let s0 = 0, s1 = 0, s2 = 0, s3 = 0, s4 = 0;
  let bx0 = 0, bx1 = 0, bx2 = 0, by0 = 0, by1 = 0, by2 = 0, bz0 = 0, bz1 = 0, bz2 = 0;
  for (let i = first; i < n; i++) {
    const y = yM[i];
    if (!inWindow(y)) continue;
    const tau = (tS[i] - tCentre) / halfSpan;
    const tau2 = tau * tau;
    s0 += 1;
    s1 += tau;
    s2 += tau2;
    s3 += tau2 * tau;
    s4 += tau2 * tau2;
    const dx = xM[i] - x0;
    const dy = y - y0;
    const dz = zM[i] - z0;
    bx0 += dx; bx1 += dx * tau; bx2 += dx * tau2;
    by0 += dy; by1 += dy * tau; by2 += dy * tau2;
    bz0 += dz; bz1 += dz * tau; bz2 += dz * tau2;
  }

  // Cholesky G = L L^T of the Gram matrix [[s0 s1 s2] [s1 s2 s3] [s2 s3 s4]]
  const l11 = Math.sqrt(s0);
  const l21 = s1 / l11;
  const l31 = s2 / l11;
  const d22 = s2 - l21 * l21;
  if (!(d22 > PIVOT_RELATIVE_MIN * s2)) throw distinctTimes(count);
  const l22 = Math.sqrt(d22);
  const l32 = (s3 - l31 * l21) / l22;
  const d33 = s4 - l31 * l31 - l32 * l32;
  if (!(d33 > PIVOT_RELATIVE_MIN * s4)) throw distinctTimes(count);
  const l33 = Math.sqrt(d33);
  const solve = (b0: number, b1: number, b2: number, offset: number): [number, number, number] => {
    const u1 = b0 / l11;
    const u2 = (b1 - l21 * u1) / l22;
    const u3 = (b2 - l31 * u1 - l32 * u2) / l33;
    const c2 = u3 / l33;
    const c1 = (u2 - l32 * c2) / l22;
    const c0 = (u1 - l21 * c1 - l31 * c2) / l11;
    return [c0 + offset, c1, c2];
  };
  const cx = solve(bx0, bx1, bx2, x0);
  const cy = solve(by0, by1, by2, y0);
  const cz = solve(bz0, bz1, bz2, z0);

  // window times on the fitted y(tau) = cy0 + cy1 tau + cy2 tau^2
  const vyMiddle = cy[1] / halfSpan;
  if (!(vyMiddle < 0)) throw new RangeError(`the fitted y velocity ${vyMiddle} m/s at the window's middle must be negative (toward the plate)`);
  const tauStart = crossingTau(cy, windowStartM, "window start");
  const tauPlate = crossingTau(cy, plateYM, "plate plane");
  const windowTimeS = (tauPlate - tauStart) * halfSpan;
  if (!(windowTimeS > 0)) {
    throw new RangeError(`the fitted path reaches the plate plane ${windowTimeS} s after the window start; it must move toward the plate across the window`);
  }

  // pass 3: how well a constant acceleration describes the window
  let sumSquares = 0;
  for (let i = first; i < n; i++) {
    const y = yM[i];
    if (!inWindow(y)) continue;
    const tau = (tS[i] - tCentre) / halfSpan;
    const ex = xM[i] - (cx[0] + tau * (cx[1] + tau * cx[2]));
    const ey = y - (cy[0] + tau * (cy[1] + tau * cy[2]));
    const ez = zM[i] - (cz[0] + tau * (cz[1] + tau * cz[2]));
    sumSquares += ex * ex + ey * ey + ez * ez;
  }

  const perS2 = 2 / (halfSpan * halfSpan);
  const acceleration: Vec3 = [cx[2] * perS2, cy[2] * perS2, cz[2] * perS2];
  const at = (c: readonly number[], tau: number) => c[0] + tau * (c[1] + tau * c[2]);
  const rateAt = (c: readonly number[], tau: number) => (c[1] + 2 * c[2] * tau) / halfSpan;
  const halfT2 = 0.5 * windowTimeS * windowTimeS;
  return {
    horizontalBreakM: halfT2 * acceleration[0],
    inducedVerticalBreakM: halfT2 * (acceleration[2] + g),
    windowTimeS,
    accelerationMPerS2: acceleration,
    fit: {
      referenceTimeS: tCentre + tauStart * halfSpan,
      positionM: [at(cx, tauStart), at(cy, tauStart), at(cz, tauStart)],
      velocityMPerS: [rateAt(cx, tauStart), rateAt(cy, tauStart), rateAt(cz, tauStart)],
      accelerationMPerS2: [acceleration[0], acceleration[1], acceleration[2]],
    },
    samplesUsed: count,
    rmsResidualM: Math.sqrt(sumSquares / count),
  };
}

function distinctTimes(count: number): RangeError {
  return new RangeError(`the ${count} trajectory samples in the window have too few distinct times to fix a quadratic (at least 3 needed)`);
}

/**
 * The tau where c0 + c1 tau + c2 tau^2 = yTarget with the ball moving toward the
 * plate (dy/dtau = -sqrt(D) < 0). Written as 2 (c0 - y) / (-c1 + sqrt(D)), the
 * quadratic formula's root without cancellation when c2 is small; needs c1 < 0.
 */
function crossingTau(c: readonly [number, number, number], yTarget: number, label: string): number {
  const [c0, c1, c2] = c;
  const disc = c1 * c1 - 4 * c2 * (c0 - yTarget);
  if (!(disc >= 0)) throw new RangeError(`the fitted path never reaches the ${label} y = ${yTarget} m`);
  return (2 * (c0 - yTarget)) / (-c1 + Math.sqrt(disc));
}
