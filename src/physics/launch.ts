/**
 * Building a release (position and velocity, field frame, SI) from the numbers
 * people quote. Defaults for release extension 6.0 ft, height 6.0 ft and side
 * 1.5 ft toward the arm side are common practice (no source).
 *
 * Arm side: the pitcher faces -y, so a right-hander's throwing arm is on the
 * catcher's left (x < 0) and a left-hander's on the catcher's right (x > 0).
 */
import { armSideSign, type Hand } from "../../geometry/frames.js";
import { assertInRange } from "../../geometry/check.js";
import { RUBBER_Y_M } from "./field.js";
import { M_PER_FT } from "../../geometry/units.js";
import type { Vec3 } from "../../geometry/vec.js";

/** Default release extension in front of the rubber, m (6.0 ft). */
export const DEFAULT_RELEASE_EXTENSION_M = 6.0 * M_PER_FT;
/** Default release height above the ground, m (6.0 ft). */
export const DEFAULT_RELEASE_HEIGHT_M = 6.0 * M_PER_FT;
/** Default release side, m toward the arm side (1.5 ft). */
export const DEFAULT_RELEASE_SIDE_M = 1.5 * M_PER_FT;


/** Accepted release extension, m (0 to 3 m, about 0 to 9.8 ft). */
export const RELEASE_EXTENSION_RANGE_M: readonly [number, number] = [0, 3];
/** Accepted release height above the ground, m. */
export const RELEASE_HEIGHT_RANGE_M: readonly [number, number] = [0, 3];
/** Accepted release side toward the arm side, m (negative: glove side). */
export const RELEASE_SIDE_RANGE_M: readonly [number, number] = [-2, 2];

export interface ReleasePoint {
  /** Distance in front of the rubber toward home, m, 0 to 3; default 1.8288 (6 ft). */
  readonly extensionM?: number;
  /** Height above the ground, m, 0 to 3; default 1.8288 (6 ft). */
  readonly heightM?: number;
  /** Lateral offset toward the arm side, m, -2 to 2 (negative: glove side); default 0.4572 (1.5 ft). */
  readonly armSideM?: number;
  /** Throwing hand; default "right". */
  readonly hand?: Hand;
}

/**
 * Release position in the field frame, m.
 * @throws RangeError for an extension or height outside 0 to 3 m, a side outside
 *   -2 to 2 m, or an unknown hand.
 */
export function releasePosition(point: ReleasePoint = {}): Vec3 {
  const extensionM = point.extensionM ?? DEFAULT_RELEASE_EXTENSION_M;
  const heightM = point.heightM ?? DEFAULT_RELEASE_HEIGHT_M;
  const armSideM = point.armSideM ?? DEFAULT_RELEASE_SIDE_M;
  const hand = point.hand ?? "right";
  assertInRange("release extension", extensionM, RELEASE_EXTENSION_RANGE_M[0], RELEASE_EXTENSION_RANGE_M[1], "m");
  assertInRange("release height", heightM, RELEASE_HEIGHT_RANGE_M[0], RELEASE_HEIGHT_RANGE_M[1], "m");
  assertInRange("release side", armSideM, RELEASE_SIDE_RANGE_M[0], RELEASE_SIDE_RANGE_M[1], "m");
  if (hand !== "right" && hand !== "left") throw new RangeError(`throwing hand "${hand}" must be "right" or "left"`);
  return [armSideSign(hand) * armSideM, RUBBER_Y_M - extensionM, heightM];
}

/** Largest speed accepted at release, m/s (about 224 mph: beyond any thrown ball). */
export const RELEASE_SPEED_MAX_M_PER_S = 100;

/**
 * Release velocity from speed and two angles, m/s in the field frame:
 *   v = speed (cos(vert) sin(horiz), -cos(vert) cos(horiz), sin(vert)).
 *
 * @param speedMPerS release speed, m/s, from 0 (exclusive) to 100.
 * @param verticalAngleRad angle above the horizontal plane, rad, in (-pi/2, pi/2); positive is upward.
 * @param horizontalAngleRad angle of the horizontal projection from the -y
 *   direction, rad, in (-pi/2, pi/2); positive is toward +x (the catcher's right).
 * @throws RangeError for a value outside its range.
 */
export function releaseVelocity(speedMPerS: number, verticalAngleRad: number, horizontalAngleRad: number): Vec3 {
  if (!Number.isFinite(speedMPerS) || speedMPerS <= 0 || speedMPerS > RELEASE_SPEED_MAX_M_PER_S) {
    throw new RangeError(`release speed ${speedMPerS} m/s must be greater than 0 and at most ${RELEASE_SPEED_MAX_M_PER_S} m/s`);
  }
  const half = Math.PI / 2;
  if (!Number.isFinite(verticalAngleRad) || Math.abs(verticalAngleRad) >= half) {
    throw new RangeError(`vertical release angle ${verticalAngleRad} rad must be strictly between -pi/2 and pi/2 rad`);
  }
  if (!Number.isFinite(horizontalAngleRad) || Math.abs(horizontalAngleRad) >= half) {
    throw new RangeError(`horizontal release angle ${horizontalAngleRad} rad must be strictly between -pi/2 and pi/2 rad`);
  }
  const horizontal = speedMPerS * Math.cos(verticalAngleRad);
  return [horizontal * Math.sin(horizontalAngleRad), -horizontal * Math.cos(horizontalAngleRad), speedMPerS * Math.sin(verticalAngleRad)];
}
