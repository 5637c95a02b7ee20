/**
 * A screened pitch in flight: from the pitch description and a spin-axis position
 * on the ball to the plate, with air, drag, Magnus and the seam-shifted-wake force.
 *
 * Field frame (geometry/frames.ts; origin at the rear point of home plate, see
 * field.ts). Movement is measured against the spinless flight of the same launch
 * (gravity and drag only), at the front plane of home plate, split into the Magnus
 * and the seam parts (movement.ts). Launch angles: given, or solved so that the full
 * flight crosses the front of the plate at the middle of a typical zone (x = 0,
 * z = 2.5 ft: common practice, no source) by a damped Newton iteration.
 */
import { BoundedCache } from "../../geometry/cache.js";
import { spinAxisFromTilt, toArmSide, TOWARD_PLATE } from "../../geometry/frames.js";
import type { Vec3 } from "../../geometry/vec.js";
import type { Pitch } from "../screening/pitch.js";
import { airState, reynoldsNumber, spinFactor, type AirConditions, type AirState } from "./air.js";
import { BALL_RADIUS_M } from "../../geometry/ball.js";
import type { DragModel } from "./drag.js";
import { simulateFlight, type FlightOptions, type FlightResult, type Launch } from "./flight.js";
import { releasePosition, releaseVelocity, type ReleasePoint } from "./launch.js";
import { movementVersusSpinless, type Movement } from "./movement.js";
import {
  seamForceHook,
  seamForceModel,
  turnAveragedSeamForceCoefficient,
  type SeamForceCoefficient,
  type SeamForceModel,
  type SeamForceParams,
} from "./seamForce.js";
import { M_PER_FT, M_PER_IN } from "../../geometry/units.js";

/** Where an aimed pitch crosses the front of the plate: the middle of a typical zone, m. */
export const ZONE_CENTRE_M: readonly [number, number] = [0, 2.5 * M_PER_FT];
const AIM_MAX_ITERATIONS = 12;
/** Aim tolerance at the plate, m. */
const AIM_TOLERANCE_M = 1e-5;
const AIM_PROBE_RAD = 1e-4;

export interface PitchFlightInput {
  readonly pitch: Pitch;
  /** Spin axis in the ball frame (unit). */
  readonly axisBall: Readonly<Vec3>;
  /** Air conditions; standard atmosphere at sea level when empty. */
  readonly air?: AirConditions;
  /** No air at all (a vacuum check). */
  readonly vacuum?: boolean;
  readonly release?: ReleasePoint;
  /** Launch angles, rad; when absent the pitch is aimed at ZONE_CENTRE_M. */
  readonly launch?: { readonly verticalRad: number; readonly horizontalRad: number };
  readonly seamForce?: SeamForceParams;
  /** Drag model (drag.ts); default the Giordano-Nakanishi fit. */
  readonly drag?: DragModel;
  /** Exponential spin decay time constant, s; default none. */
  readonly spinDecayTimeConstantS?: number;
}

export interface PitchFlight {
  readonly air: AirState;
  readonly reynolds: number;
  readonly spinFactor: number;
  readonly launch: Launch;
  readonly launchAngles: { readonly verticalRad: number; readonly horizontalRad: number };
  readonly seamCoefficient: SeamForceCoefficient;
  readonly movement: Movement;
  readonly flight: FlightResult;
}

/** The pitch's spin vector in the field frame, rad/s. */
export function spinVector(pitch: Pitch): Vec3 {
  const w = spinAxisFromTilt(pitch.tiltRad, pitch.gyroRad, pitch.view, TOWARD_PLATE);
  return [w[0] * pitch.spinRadPerS, w[1] * pitch.spinRadPerS, w[2] * pitch.spinRadPerS];
}

const modelCache = new BoundedCache<string, SeamForceModel>("seam-force models per parameter set", 8);
/** The seam-force model for a parameter set (memoised: building it samples the seam). */
export function seamModelFor(params: SeamForceParams = {}): SeamForceModel {
  return modelCache.get(JSON.stringify(params), () => seamForceModel(params));
}

/** Launch angles that put `options`' flight through `target` (x, z) at the plate (a `trajectory` callback in `options` is not called). */
export function aimLaunch(
  position: Readonly<Vec3>,
  speedMPerS: number,
  spin: Readonly<Vec3>,
  options: FlightOptions,
  target: readonly [number, number] = ZONE_CENTRE_M,
): { verticalRad: number; horizontalRad: number } {
  // first guess: the straight line to the target, plus gravity's drop over the flight
  const dy = position[1];
  let v = Math.atan2(target[1] - position[2], dy) + (9.80665 * dy) / (2 * speedMPerS * speedMPerS);
  let h = Math.atan2(target[0] - position[0], dy);
  // the trial flights report no trajectory
  const trial: FlightOptions = { ...options, trajectory: undefined };
  const miss = (vr: number, hr: number): [number, number] => {
    const f = simulateFlight({ releasePositionM: position, releaseVelocityMPerS: releaseVelocity(speedMPerS, vr, hr), spinRadPerS: spin }, trial);
    return [f.plateCrossingM[0] - target[0], f.plateCrossingM[2] - target[1]];
  };
  for (let it = 0; it < AIM_MAX_ITERATIONS; it++) {
    const [ex, ez] = miss(v, h);
    if (Math.hypot(ex, ez) < AIM_TOLERANCE_M) return { verticalRad: v, horizontalRad: h };
    const [exv, ezv] = miss(v + AIM_PROBE_RAD, h);
    const [exh, ezh] = miss(v, h + AIM_PROBE_RAD);
    // Jacobian of (ex, ez) in (v, h), by forward differences
    const a = (exv - ex) / AIM_PROBE_RAD, b = (exh - ex) / AIM_PROBE_RAD;
    const c = (ezv - ez) / AIM_PROBE_RAD, d = (ezh - ez) / AIM_PROBE_RAD;
    const det = a * d - b * c;
    if (!(Math.abs(det) > 1e-12)) break;
    v -= (d * ex - b * ez) / det;
    h -= (-c * ex + a * ez) / det;
  }
  const [ex, ez] = miss(v, h);
  if (!(Math.hypot(ex, ez) < 1e-3)) throw new RangeError(`could not aim the pitch at the zone: it misses by ${Math.hypot(ex, ez).toFixed(3)} m after ${AIM_MAX_ITERATIONS} steps`);
  return { verticalRad: v, horizontalRad: h };
}

/** Flies a pitch with the seam orientation `axisBall`. */
export function flyPitch(input: PitchFlightInput): PitchFlight {
  const { pitch } = input;
  const air = airState(input.air ?? {});
  const spin = spinVector(pitch);
  const coefficient = turnAveragedSeamForceCoefficient(seamModelFor(input.seamForce), input.axisBall, pitch.gyroRad);
  const hook = seamForceHook({ axis: input.axisBall, gyroRad: pitch.gyroRad, params: input.seamForce, coefficient });
  const options: FlightOptions = {
    air,
    seamForce: hook,
    vacuum: input.vacuum ?? false,
    ...(input.drag ? { drag: input.drag } : {}),
    ...(input.spinDecayTimeConstantS !== undefined ? { spinDecayTimeConstantS: input.spinDecayTimeConstantS } : {}),
  };
  const position = releasePosition({ ...input.release, hand: pitch.hand });
  const angles = input.launch ?? aimLaunch(position, pitch.speedMPerS, spin, options);
  const launch: Launch = {
    releasePositionM: position,
    releaseVelocityMPerS: releaseVelocity(pitch.speedMPerS, angles.verticalRad, angles.horizontalRad),
    spinRadPerS: spin,
  };
  const movement = movementVersusSpinless(launch, options);
  const diameter = 2 * BALL_RADIUS_M;
  return {
    air,
    reynolds: reynoldsNumber(pitch.speedMPerS, diameter, air.densityKgM3, air.viscosityPaS),
    spinFactor: spinFactor(BALL_RADIUS_M, pitch.spinRadPerS, pitch.speedMPerS),
    launch,
    launchAngles: angles,
    seamCoefficient: coefficient,
    movement,
    flight: movement.flight,
  };
}


/** The seam part of the movement at the plate, inches toward the arm side and up (standard air unless given, aimed at the zone). */
export function seamMovementIn(pitch: Pitch, axisBall: Readonly<Vec3>, seamForce: SeamForceParams = {}, air?: AirConditions): { armSideIn: number; upIn: number } {
  const f = flyPitch({ pitch, axisBall, seamForce, air });
  const m = toArmSide(f.movement.seamBreakM.xM, f.movement.seamBreakM.zM, pitch.hand);
  return { armSideIn: m.armSideM / M_PER_IN, upIn: m.upM / M_PER_IN };
}
