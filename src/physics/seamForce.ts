/**
 * A quasi-steady seam-shifted-wake (SSW) side-force model.
 *
 * Picture at one instant (flow frame of geometry/flow.ts: unit ball, v = +z,
 * polar angle theta from the front stagnation point, azimuth psi about v). For each
 * of n equally spaced azimuths psi_j = 2 pi j / n the separation line sits
 *   - at the seam's polar angle where the seam crosses the meridian psi_j inside the
 *     separation band [c - w/2, c + w/2] (src/sampling/band.ts, default 80 to 120 deg);
 *     of several such crossings the one nearest the front (smallest theta) wins, since
 *     the boundary layer separates at the first obstacle it meets;
 *   - elsewhere at the undisturbed angle theta_0, at or beyond the band's far edge
 *     (default c + w/2 = 120 deg, Achenbach's supercritical smooth-sphere separation
 *     angle, J. Fluid Mech. 54(3), 565-575, 1972, from memory), so a seam in the band
 *     always moves separation forward, never back.
 * Surface pressure: potential flow ahead of separation, a constant wake pressure Cp_b
 * behind it; the side-force coefficient is the closed-form sum of wakePressure.ts,
 *     C = -(2/n) sum_j [G(theta_s,j) - G(theta_0)] (cos psi_j, sin psi_j),
 * (subtracting G(theta_0), whose sum over a full turn is zero, keeps the unseamed
 * azimuths out of the sum). Earlier separation on one side pushes the ball toward the
 * other side, so the force points away from the seamed side, as the sampler's
 * asymmetry vector does (README, `asymmetry`). Seam crossings are found on the
 * arc-length polyline of geometry/seamSamples.ts, with theta interpolated linearly in
 * cos(theta) along each segment.
 *
 * Quasi-steady turn average: the ball turns by +phi about the spin axis w (the phase
 * convention of geometry/flow.ts), the
 * instantaneous coefficient is averaged over equally spaced phases, and its parts
 * along a = unit(w - (w.v) v) and m = unit(w x v) are reported. F = 1/2 rho A C v^2,
 * A = pi R^2, times a calibration `scale` (default 1).
 *
 * Assumptions and accuracy (read before using the numbers):
 *   - quasi-steady: the separation line follows the seam instantly; no boundary-layer
 *     history, no transition physics, no dependence on Reynolds number or seam height;
 *   - no spin-induced asymmetry: that is the Magnus force, modelled in lift.ts, and is
 *     not included here (a non-spinning ball gets only the seam force);
 *   - potential-flow pressure right up to separation over-states the suction between
 *     about 70 deg and separation (real sphere pressures recover earlier), and one
 *     wake pressure is used whatever the separation line's shape;
 *   - the band, theta_0 and Cp_b are choices, not measurements of a baseball.
 * Expect order-of-magnitude accuracy; calibrate `scale` to your own measurements.
 * Against Watts & Sawyer's knuckleball (Am. J. Phys. 43, 1975; about half the ball's
 * weight, 0.71 N, at 65 mph) the largest instantaneous side force over 5000 random
 * orientations is 0.29 N (ratio 0.41; 0.23 N turning about the ball's z axis alone).
 * Turning about z the lateral force repeats every quarter turn, as measured, but at the
 * default band each quarter holds two maxima and two minima (a seam element crossing
 * the band's 80 deg edge swings the force), so eight of each per turn, not four.
 * Because the band edge is sharp, the force jumps where a crossing enters or leaves
 * the band; at azimuth resolution n it is a staircase with steps of order 1/n.
 *
 * The turn-averaged coefficient's Magnus part: see turnAveragedSeamForceCoefficient.
 * Its part along a agrees in sign with the band sampler's alongAxis where that is
 * large (the 20 largest of 1500 random axes and gyros), less often where it is small.
 */
import { ballToFlowAtPhase } from "../../geometry/flow.js";
import { unit3, type Vec3 } from "../../geometry/vec.js";
import type { SeamSamples } from "../../geometry/seamSamples.js";
import { assertGyro, DEFAULT_BAND, type Band } from "../sampling/band.js";
import { seamFor } from "../sampling/measure.js";
import type { SeamForceHook } from "./forces.js";
import { meridianSideIntegralFromCos, potentialPressureCoefficient, type SideCoefficient } from "./wakePressure.js";

/**
 * Default wake (base) pressure coefficient behind separation: about -0.4 behind
 * laminar separation on a smooth sphere at Re = 1.62e5, Achenbach 1972 (pressure
 * distributions, figure number not recalled; value from memory). Subcritical sphere
 * wakes sit near -0.3 to -0.4.
 */
export const DEFAULT_WAKE_PRESSURE_COEFFICIENT = -0.4;
/** Default azimuth bins around the flow axis (2 deg each). */
export const DEFAULT_AZIMUTH_BINS = 180;
/** Default phases per turn for the time average (1 deg each, as the sampler's timeline). */
export const DEFAULT_SEAM_FORCE_PHASES = 360;
/** Accepted azimuth-bin and phase counts (multiples of 4, so the ball's mirror and quarter-turn symmetries map bins and phases onto themselves). */
export const AZIMUTH_BINS_RANGE: readonly [number, number] = [8, 4096];
export const SEAM_FORCE_PHASES_RANGE: readonly [number, number] = [4, 36000];
/** Accepted calibration scale range (0 switches the force off; 10 is already far outside the model's stated accuracy). */
export const SEAM_FORCE_SCALE_RANGE: readonly [number, number] = [0, 10];

/** Model parameters; every field optional. */
export interface SeamForceParams {
  /** Separation band; default 80 to 120 deg (band.ts). */
  readonly band?: Band;
  /** Undisturbed separation angle theta_0, rad, from the band's far edge c + w/2 up to (not including) pi; default c + w/2. */
  readonly undisturbedSeparationRad?: number;
  /**
   * Wake pressure coefficient Cp_b, dimensionless, default -0.4. Must lie above the
   * potential-flow Cp everywhere from the band's near edge to theta_0 (above -0.6875
   * for the default band) and at most 0, so earlier separation always pushes away.
   */
  readonly wakePressureCoefficient?: number;
  /** Azimuth bins around the flow axis, a multiple of 4 from 8 to 4096; default 180. */
  readonly azimuthBins?: number;
  /** Phases per turn in the time average, a multiple of 4 from 4 to 36000; default 360. */
  readonly phases?: number;
  /** Calibration factor on the coefficient, dimensionless, 0 to 10; default 1. */
  readonly scale?: number;
  /** Seam shape b (seamCurve.ts); default Thompson's 0.3012. */
  readonly seamShape?: number;
  /** Seam arc-length samples (seamSamples.ts); default 2048. */
  readonly seamPoints?: number;
}

/**
 * A validated model with its tables and scratch space. The scratch space makes a
 * model non-reentrant: do not share one between concurrently running workers.
 */
export interface SeamForceModel {
  readonly bandNearRad: number;
  readonly bandFarRad: number;
  readonly undisturbedSeparationRad: number;
  readonly wakePressureCoefficient: number;
  readonly azimuthBins: number;
  readonly phases: number;
  readonly scale: number;
  readonly seam: SeamSamples;
  /** cos and sin of psi_j, built with the quadrant symmetries exact. */
  readonly cosPsi: Float64Array;
  readonly sinPsi: Float64Array;
  /** Scratch: cos(theta) of the first in-band seam crossing per azimuth (-2 when none). */
  readonly firstCrossingCos: Float64Array;
  /** Scratch rotation state for the turn average. */
  readonly scratch: { readonly m: Float64Array; readonly side: SideCoefficient };
}

/** Builds and validates a model. Throws RangeError (one line, naming the value and range) for any bad parameter. */
export function seamForceModel(params: SeamForceParams = {}): SeamForceModel {
  const band = params.band ?? DEFAULT_BAND;
  const near = band.centerRad - band.widthRad / 2;
  const far = band.centerRad + band.widthRad / 2;
  if (!(near > 0 && far < Math.PI && band.widthRad > 0)) {
    throw new RangeError(`band ${near} to ${far} rad must lie inside (0, pi) rad with positive width`);
  }
  const theta0 = params.undisturbedSeparationRad ?? far;
  if (!(theta0 >= far && theta0 < Math.PI)) {
    throw new RangeError(`undisturbed separation angle ${theta0} rad must be from the band's far edge ${far} rad up to (not including) pi rad`);
  }
  const cpb = params.wakePressureCoefficient ?? DEFAULT_WAKE_PRESSURE_COEFFICIENT;
  // Potential-flow Cp falls to its minimum at 90 deg and rises either side, so its
  // largest value on [near, theta_0] is at an end; above that, dG/dtheta_s < 0 throughout.
  const cpFloor = Math.max(potentialPressureCoefficient(near), potentialPressureCoefficient(theta0));
  if (!(cpb > cpFloor && cpb <= 0)) {
    throw new RangeError(
      `wake pressure coefficient ${cpb} must be above ${cpFloor.toPrecision(6)} (the potential-flow Cp at the band's edges and theta_0) and at most 0`,
    );
  }
  const nb = params.azimuthBins ?? DEFAULT_AZIMUTH_BINS;
  assertMultipleOfFour("azimuth bins", nb, AZIMUTH_BINS_RANGE);
  const phases = params.phases ?? DEFAULT_SEAM_FORCE_PHASES;
  assertMultipleOfFour("phases per turn", phases, SEAM_FORCE_PHASES_RANGE);
  const scale = params.scale ?? 1;
  if (!(scale >= SEAM_FORCE_SCALE_RANGE[0] && scale <= SEAM_FORCE_SCALE_RANGE[1])) {
    throw new RangeError(`seam force scale ${scale} must be a number from ${SEAM_FORCE_SCALE_RANGE[0]} to ${SEAM_FORCE_SCALE_RANGE[1]}`);
  }
  const seam = seamFor(params.seamShape, params.seamPoints);
  const cosPsi = new Float64Array(nb);
  const sinPsi = new Float64Array(nb);
  const quarter = nb / 4;
  for (let j = 0; j <= quarter; j++) {
    // Exact quadrant images, so mirror-symmetric separation lines cancel to the last bit.
    const c = j === quarter ? 0 : Math.cos((2 * Math.PI * j) / nb);
    const s = j === 0 ? 0 : j === quarter ? 1 : Math.sin((2 * Math.PI * j) / nb);
    cosPsi[j] = c;
    sinPsi[j] = s;
    cosPsi[2 * quarter - j] = -c;
    sinPsi[2 * quarter - j] = s;
    if (j > 0) {
      cosPsi[2 * quarter + j] = -c;
      sinPsi[2 * quarter + j] = -s;
      if (j < quarter) {
        cosPsi[nb - j] = c;
        sinPsi[nb - j] = -s;
      }
    }
  }
  return {
    bandNearRad: near,
    bandFarRad: far,
    undisturbedSeparationRad: theta0,
    wakePressureCoefficient: cpb,
    azimuthBins: nb,
    phases,
    scale,
    seam,
    cosPsi,
    sinPsi,
    firstCrossingCos: new Float64Array(nb),
    scratch: { m: new Float64Array(9), side: { x: 0, y: 0 } },
  };
}

function assertMultipleOfFour(label: string, n: number, range: readonly [number, number]): void {
  if (!Number.isInteger(n) || n < range[0] || n > range[1] || n % 4 !== 0) {
    throw new RangeError(`${label} ${n} must be a whole number from ${range[0]} to ${range[1]} divisible by 4`);
  }
}

/** Below every cos(theta): marks an azimuth with no in-band seam crossing. */
const NO_CROSSING = -2;

/**
 * Instantaneous SSW side-force coefficient (scale applied) for one ball orientation.
 * @param model from seamForceModel.
 * @param ballToFlow rotation taking ball-frame vectors to the flow frame (v = +z), a
 *   column-major 3x3 matrix as gl-matrix's mat3 (9 numbers).
 * @param out receives the coefficient across v: x and y in the flow frame, dimensionless.
 * @returns out.
 */
export function instantaneousSeamForceCoefficient(
  model: SeamForceModel,
  ballToFlow: ArrayLike<number>,
  out: SideCoefficient = { x: 0, y: 0 },
): SideCoefficient {
  const m0 = ballToFlow[0], m1 = ballToFlow[1], m2 = ballToFlow[2];
  const m3 = ballToFlow[3], m4 = ballToFlow[4], m5 = ballToFlow[5];
  const m6 = ballToFlow[6], m7 = ballToFlow[7], m8 = ballToFlow[8];
  const pts = model.seam.points;
  const n = model.seam.count;
  const nb = model.azimuthBins;
  const half = nb / 2;
  const binsPerRad = nb / (2 * Math.PI);
  const cosNear = Math.cos(model.bandNearRad); // upper limit of cos(theta)
  const cosFar = Math.cos(model.bandFarRad); // lower limit
  const first = model.firstCrossingCos;
  first.fill(NO_CROSSING);
  // previous polyline vertex (the closed seam starts from its last sample)
  let px = m0 * pts[3 * n - 3] + m3 * pts[3 * n - 2] + m6 * pts[3 * n - 1];
  let py = m1 * pts[3 * n - 3] + m4 * pts[3 * n - 2] + m7 * pts[3 * n - 1];
  let pz = m2 * pts[3 * n - 3] + m5 * pts[3 * n - 2] + m8 * pts[3 * n - 1];
  let pu = 0; // azimuth of the previous vertex in bin units, valid when pHave
  let pHave = false;
  for (let i = 0; i < n; i++) {
    const bx = pts[3 * i], by = pts[3 * i + 1], bz = pts[3 * i + 2];
    const x = m0 * bx + m3 * by + m6 * bz;
    const y = m1 * bx + m4 * by + m7 * bz;
    const z = m2 * bx + m5 * by + m8 * bz;
    const zLo = z < pz ? z : pz;
    const zHi = z < pz ? pz : z;
    // Only segments reaching the band need azimuths: about a third of them by default.
    if (zHi >= cosFar && zLo <= cosNear) {
      if (!pHave) pu = Math.atan2(py, px) * binsPerRad;
      const u = Math.atan2(y, x) * binsPerRad;
      let du = u - pu;
      if (du > half) du -= nb;
      else if (du < -half) du += nb;
      const uEnd = pu + du;
      const jLo = Math.ceil(du >= 0 ? pu : uEnd);
      const jHi = Math.floor(du >= 0 ? uEnd : pu);
      // |du| <= nb / 2, so at most nb / 2 + 1 bins per segment (usually 0 or 1).
      for (let j = jLo; j <= jHi; j++) {
        const t = du !== 0 ? (j - pu) / du : 0;
        const zc = pz + t * (z - pz);
        if (zc < cosFar || zc > cosNear) continue;
        let jj = j % nb;
        if (jj < 0) jj += nb;
        if (zc > first[jj]) first[jj] = zc; // larger cos = nearer the front
      }
      pu = u;
      pHave = true;
    } else pHave = false;
    px = x;
    py = y;
    pz = z;
  }
  const cpb = model.wakePressureCoefficient;
  const theta0 = model.undisturbedSeparationRad;
  const g0 = meridianSideIntegralFromCos(Math.cos(theta0), theta0, cpb);
  const cosPsi = model.cosPsi;
  const sinPsi = model.sinPsi;
  let sx = 0;
  let sy = 0;
  for (let j = 0; j < nb; j++) {
    const c = first[j];
    if (c === NO_CROSSING) continue;
    const dg = meridianSideIntegralFromCos(c, Math.acos(c), cpb) - g0;
    sx += dg * cosPsi[j];
    sy += dg * sinPsi[j];
  }
  const k = (-2 / nb) * model.scale;
  out.x = k * sx;
  out.y = k * sy;
  return out;
}

/** Turn-averaged coefficient in the flow frame's (a, m) split, dimensionless, scale applied. */
export interface SeamForceCoefficient {
  /** Along a = unit(w - (w.v) v): the spin axis's part across the flow. */
  alongAxis: number;
  /** Along m = unit(w x v): the Magnus direction. */
  alongMagnus: number;
  /** Length of (alongAxis, alongMagnus). */
  magnitude: number;
}

/**
 * Runs `visit(phaseIndex, coefficient)` at each phase phi_j = 2 pi j / phases of one
 * turn (the ball turns by +phi about w, geometry/flow.ts's convention). Coefficients are in
 * the flow frame (x = a, -y = m).
 */
function forEachPhase(
  model: SeamForceModel,
  axis: Readonly<Vec3>,
  gyroRad: number,
  visit: (j: number, side: SideCoefficient) => void,
): void {
  const w = unit3(axis);
  assertGyro(gyroRad);
  const { m, side } = model.scratch;
  const steps = model.phases;
  for (let j = 0; j < steps; j++) {
    ballToFlowAtPhase(w[0], w[1], w[2], gyroRad, (2 * Math.PI * j) / steps, m);
    instantaneousSeamForceCoefficient(model, m, side);
    visit(j, side);
  }
}

/**
 * Quasi-steady (turn-averaged) SSW coefficient for a spin axis and gyro.
 *
 * Magnus part: the brute-force sampler's alongMagnus vanishes because each seam point
 * counts on its own and its circle about w is mirror-symmetric about the plane of w
 * and v. Here a point's weight also depends on the seam's local direction (how much
 * azimuth it covers) and on which crossing is nearest the front, so that argument does
 * not carry over and alongMagnus is in general small but not zero. It is exactly zero
 * (to rounding) when the spin axis lies in one of the seam's mirror planes x = y or
 * x = -y (any gyro): that mirror, combined with the flow-frame mirror m -> -m, maps the
 * turn onto itself with the phase reversed.
 *
 * @param model from seamForceModel.
 * @param axis spin axis's positive end in the ball frame (any non-zero length).
 * @param gyroRad gyro angle, rad, |gyro| < pi/2.
 * @param out overwritten and returned.
 * @throws RangeError for a zero axis or |gyro| >= pi/2.
 */
export function turnAveragedSeamForceCoefficient(
  model: SeamForceModel,
  axis: Readonly<Vec3>,
  gyroRad: number,
  out: SeamForceCoefficient = { alongAxis: 0, alongMagnus: 0, magnitude: 0 },
): SeamForceCoefficient {
  let sa = 0;
  let sm = 0;
  forEachPhase(model, axis, gyroRad, (_j, side) => {
    sa += side.x;
    sm -= side.y;
  });
  out.alongAxis = sa / model.phases;
  out.alongMagnus = sm / model.phases;
  out.magnitude = Math.hypot(out.alongAxis, out.alongMagnus);
  return out;
}

/**
 * The instantaneous coefficient through one turn (scale applied), for plots and for
 * comparing with once-per-turn measurements.
 * @param alongAxis receives the part along a at each phase (length model.phases).
 * @param alongMagnus receives the part along m at each phase (length model.phases).
 * @throws RangeError for arrays of the wrong length, a zero axis or |gyro| >= pi/2.
 */
export function seamForceTimeline(
  model: SeamForceModel,
  axis: Readonly<Vec3>,
  gyroRad: number,
  alongAxis: Float64Array,
  alongMagnus: Float64Array,
): void {
  if (alongAxis.length !== model.phases || alongMagnus.length !== model.phases) {
    throw new RangeError(
      `timeline arrays of length ${alongAxis.length} and ${alongMagnus.length} must both have length ${model.phases} (the model's phases)`,
    );
  }
  forEachPhase(model, axis, gyroRad, (j, side) => {
    alongAxis[j] = side.x;
    alongMagnus[j] = -side.y;
  });
}

/** What seamForceHook needs. */
export interface SeamForceHookOptions {
  /** Spin axis's positive end in the ball frame (any non-zero length). */
  readonly axis: Readonly<Vec3>;
  /** Gyro angle at release, rad, |gyro| < pi/2. */
  readonly gyroRad: number;
  /** Model parameters (band, theta_0, Cp_b, resolution, scale, seam). */
  readonly params?: SeamForceParams;
  /** turnAveragedSeamForceCoefficient for the same axis, gyro and params; computed here when absent. */
  readonly coefficient?: Readonly<SeamForceCoefficient>;
}

/**
 * A flight-model hook (forces.ts) applying the turn-averaged SSW force
 *     F = 1/2 rho pi R^2 |v|^2 (C_a a + C_m m)   newtons, field frame,
 * with a = unit(omega - (omega . v^) v^), m = unit(omega x v^) from the current
 * velocity and spin, and rho, R from the hook input. The coefficient is that of the
 * release orientation: the seams stay fixed relative to the spin axis, and the few
 * degrees the velocity turns in flight change the gyro only slightly (not re-evaluated).
 * No spin, or spin along the velocity, leaves a undefined: the hook then adds nothing
 * (a turn average means nothing without a turn). Allocation-free per call.
 * @throws RangeError for a zero axis, |gyro| >= pi/2, bad params or a non-finite coefficient.
 */
export function seamForceHook(options: SeamForceHookOptions): SeamForceHook {
  const c = options.coefficient ?? turnAveragedSeamForceCoefficient(seamForceModel(options.params), options.axis, options.gyroRad);
  if (options.coefficient !== undefined) {
    unit3(options.axis);
    assertGyro(options.gyroRad);
  }
  const ca = c.alongAxis;
  const cm = c.alongMagnus;
  if (!Number.isFinite(ca) || !Number.isFinite(cm)) {
    throw new RangeError(`seam force coefficient (${ca}, ${cm}) must be two finite numbers`);
  }
  return (input, forceN) => {
    const v = input.velocityMPerS;
    const w = input.spinRadPerS;
    const vx = v[0], vy = v[1], vz = v[2];
    const speed2 = vx * vx + vy * vy + vz * vz;
    if (!(speed2 > 0)) return;
    const inv = 1 / Math.sqrt(speed2);
    const ux = vx * inv, uy = vy * inv, uz = vz * inv;
    const wx = w[0], wy = w[1], wz = w[2];
    const wu = wx * ux + wy * uy + wz * uz;
    const ax = wx - wu * ux, ay = wy - wu * uy, az = wz - wu * uz;
    // |omega x u| = |omega_perp| = |a| before normalising
    const perp = Math.sqrt(ax * ax + ay * ay + az * az);
    if (!(perp > 1e-12 * Math.sqrt(wx * wx + wy * wy + wz * wz))) return;
    const invPerp = 1 / perp;
    const mx = (wy * uz - wz * uy) * invPerp;
    const my = (wz * ux - wx * uz) * invPerp;
    const mz = (wx * uy - wy * ux) * invPerp;
    const r = input.ballRadiusM;
    const k = 0.5 * input.densityKgM3 * Math.PI * r * r * speed2;
    const ka = k * ca * invPerp;
    const km = k * cm;
    forceN[0] += ka * ax + km * mx;
    forceN[1] += ka * ay + km * my;
    forceN[2] += ka * az + km * mz;
  };
}
