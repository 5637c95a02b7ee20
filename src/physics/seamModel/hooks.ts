/**
 * Flight hooks (src/physics/forces.ts's SeamForceHook) for the seam-force model.
 *
 * Frames: the hook works in the field frame of the flight (geometry/frames.ts); at each
 * call it rebuilds the flow frame's across and Magnus directions from the current
 * velocity v and spin omega,
 *     a = unit(omega - (omega . v^) v^),   m = unit(omega x v^),
 * and adds F = 1/2 rho pi R^2 |v|^2 (C_a a + C_m m), newtons, with rho and R from the
 * hook input. The coefficients come from the release orientation (spin axis in the ball
 * frame and gyro): the seams stay fixed relative to the spin axis, and the few degrees
 * the velocity turns in flight change the gyro, and the time-resolved hook's phase, only
 * slightly (neither is re-evaluated). No spin, or spin along the velocity, leaves a and
 * m undefined: the hooks then add nothing.
 *
 * Two hooks:
 *   - seamHookTurnAverage: the quasi-steady turn average, the fast path when the ball
 *     makes many turns on the way (a fastball at 2,400 rpm turns about 17 times);
 *   - seamHookTimeResolved: the ball turns at its spin rate from a release phase phi_0
 *     (geometry/flow.ts's phase), phi(t) = phi_0 + integral_0^t |omega| dt, which with the
 *     exponential decay of spinDecay.ts, |omega| = omega_0 exp(-t / tau), is
 *     phi_0 + omega_0 tau (1 - exp(-t / tau))  (phi_0 + omega_0 t without decay);
 *     the instantaneous coefficient is read from a timeline precomputed at the hook's
 *     construction, linearly interpolated between its phases. For a knuckleball (about
 *     one turn on the way, or less) the release phase decides the movement.
 * Both are allocation-free per call.
 */
import type { Vec3 } from "../../../geometry/vec.js";
import type { SeamForceHook } from "../forces.js";
import type { SeamModel } from "./model.js";
import { assertMultipleOfFour, PHASES_RANGE } from "./resolution.js";
import { forceTimeline, turnAverage, type TurnAverage } from "./turn.js";

/** Default phases of the time-resolved hook's timeline (one per degree). */
export const DEFAULT_HOOK_TIMELINE_PHASES = 360;

/** Largest release spin accepted by the time-resolved hook, rad/s (flight.ts's limit). */
const MAX_SPIN_RAD_PER_S = 1000;

/** Spin below this fraction of |omega| across the flight line counts as along it (no a, m). */
const ALONG_FLIGHT_TOLERANCE = 1e-12;

/** Adds 1/2 rho pi R^2 |v|^2 (ca a + cm m) to forceN (field frame). */
function addSeamForce(
  v: Float64Array,
  w: Float64Array,
  densityKgM3: number,
  radiusM: number,
  ca: number,
  cm: number,
  forceN: Float64Array,
): void {
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
  if (!(perp > ALONG_FLIGHT_TOLERANCE * Math.sqrt(wx * wx + wy * wy + wz * wz))) return;
  const invPerp = 1 / perp;
  const mx = (wy * uz - wz * uy) * invPerp;
  const my = (wz * ux - wx * uz) * invPerp;
  const mz = (wx * uy - wy * ux) * invPerp;
  const k = 0.5 * densityKgM3 * Math.PI * radiusM * radiusM * speed2;
  const ka = k * ca * invPerp;
  const km = k * cm;
  forceN[0] += ka * ax + km * mx;
  forceN[1] += ka * ay + km * my;
  forceN[2] += ka * az + km * mz;
}

/**
 * The quasi-steady hook: the turn average for the release orientation along the current a and m.
 * @param model from seamModel() (its phases set the average).
 * @param axisBall spin axis's positive end in the ball frame (any non-zero length).
 * @param gyroRad gyro angle at release, rad, |gyro| < pi/2.
 * @param coefficient turnAverage(model, axisBall, gyroRad) when already known (not re-checked).
 * @throws RangeError for a zero axis, |gyro| >= pi/2 or a non-finite coefficient.
 */
export function seamHookTurnAverage(
  model: SeamModel,
  axisBall: Readonly<Vec3>,
  gyroRad: number,
  coefficient?: Readonly<TurnAverage>,
): SeamForceHook {
  const c = coefficient ?? turnAverage(model, axisBall, gyroRad);
  const ca = c.across;
  const cm = c.alongMagnus;
  if (!Number.isFinite(ca) || !Number.isFinite(cm)) {
    throw new RangeError(`seam force coefficient (${ca}, ${cm}) must be two finite numbers`);
  }
  return (input, forceN) => {
    addSeamForce(input.velocityMPerS, input.spinRadPerS, input.densityKgM3, input.ballRadiusM, ca, cm, forceN);
  };
}

export interface TimeResolvedHookOptions {
  /** Release phase phi_0, rad (geometry/flow.ts's convention), any finite number. */
  readonly phaseRad: number;
  /** Spin rate at release omega_0, rad/s, 0 to 1000; must be the flight's. */
  readonly spinRadPerS: number;
  /** Exponential spin decay time constant tau, s, > 0; Infinity (default) for none; must be the flight's. */
  readonly spinDecayTimeConstantS?: number;
  /** Phases of the precomputed timeline, a multiple of 4 from 4 to 36000; default 360. */
  readonly timelinePhases?: number;
}

/**
 * The time-resolved hook: the instantaneous coefficient at the ball's phase at each call.
 * Builds the timeline once (forceTimeline at `timelinePhases`).
 * @throws RangeError for a zero axis, |gyro| >= pi/2, a non-finite phase, a spin rate
 *   outside 0 to 1000 rad/s, a non-positive decay constant or a bad phase count.
 */
export function seamHookTimeResolved(
  model: SeamModel,
  axisBall: Readonly<Vec3>,
  gyroRad: number,
  options: TimeResolvedHookOptions,
): SeamForceHook {
  const phase0 = options.phaseRad;
  if (!Number.isFinite(phase0)) throw new RangeError(`release phase ${phase0} rad must be a finite number`);
  const omega0 = options.spinRadPerS;
  if (!Number.isFinite(omega0) || omega0 < 0 || omega0 > MAX_SPIN_RAD_PER_S) {
    throw new RangeError(`spin rate ${omega0} rad/s must be a number from 0 to ${MAX_SPIN_RAD_PER_S} rad/s`);
  }
  const tau = options.spinDecayTimeConstantS ?? Infinity;
  if (!(tau === Infinity || (Number.isFinite(tau) && tau > 0))) {
    throw new RangeError(`spin decay time constant ${tau} s must be a number greater than 0 (or Infinity for none)`);
  }
  const phases = options.timelinePhases ?? DEFAULT_HOOK_TIMELINE_PHASES;
  assertMultipleOfFour("hook timeline phases", phases, PHASES_RANGE);
  const t = forceTimeline(model, axisBall, gyroRad, phases);
  // one extra entry closes the turn, so interpolation needs no wrap test
  const across = new Float64Array(phases + 1);
  const magnus = new Float64Array(phases + 1);
  across.set(t.across);
  magnus.set(t.alongMagnus);
  across[phases] = across[0];
  magnus[phases] = magnus[0];
  const perRad = phases / (2 * Math.PI);
  const decays = tau !== Infinity;
  return (input, forceN) => {
    const time = input.timeS;
    // turned angle since release: omega_0 tau (1 - exp(-t / tau)) = -omega_0 tau expm1(-t / tau)
    const turned = decays ? -omega0 * tau * Math.expm1(-time / tau) : omega0 * time;
    let u = (phase0 + turned) * perRad;
    u -= phases * Math.floor(u / phases);
    let j = Math.floor(u);
    if (j >= phases) j = phases - 1; // u rounded up to phases
    const f = u - j;
    const ca = across[j] + f * (across[j + 1] - across[j]);
    const cm = magnus[j] + f * (magnus[j + 1] - magnus[j]);
    addSeamForce(input.velocityMPerS, input.spinRadPerS, input.densityKgM3, input.ballRadiusM, ca, cm, forceN);
  };
}
