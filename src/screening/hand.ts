/**
 * A simple hand model: where the finger pads go for a spin-axis position.
 *
 * Model (ours, deliberately simple):
 * - At release the index and middle finger pads straddle the trailing point T of the
 *   spin equator (the great circle across the spin axis): the point of that circle
 *   farthest behind the ball's centre, opposite the flight direction. The two pad
 *   centres sit side by side along the spin axis, `fingerSpacingIn` apart along the
 *   surface (default 0.8 in, about one finger's width: common practice, no source).
 * - The thumb is beneath the ball: at the ball's lowest point at release.
 * - Which point of the ball is T is the grip's one free choice: every point of the
 *   spin equator passes T once per turn, and the turn-averaged numbers do not depend
 *   on it. We choose T so that both pads rest on or beside a seam (the largest of the
 *   two pad-to-seam distances is smallest, searched every 0.5 deg), since the pads
 *   grip the seams; a coach may slide the grip along the spin equator without
 *   changing any prediction.
 * - The index finger is the pad on the glove side (toward the thumb of the throwing
 *   hand when the palm faces the plate), the middle finger the other.
 *
 * Release orientation: the rotation that takes the ball frame to the field frame at
 * release maps the ball-frame axis to the field spin axis and T to the field's
 * trailing point; renderers use it to draw the ball "as held".
 */
import { coverRegion, type CoverModel, type CoverRegion } from "../../geometry/coverRegions.js";
import { angleToSeam } from "../../geometry/landmarks.js";
import { BALL_RADIUS_IN } from "../../geometry/ball.js";
import type { SeamSamples } from "../../geometry/seamSamples.js";
import { cross3, dot3, perpendicularUnit, rotateAbout, unit3, type Vec3 } from "../../geometry/vec.js";
import type { PitchFrame } from "./pitch.js";

export const DEFAULT_FINGER_SPACING_IN = 0.8;
/** Largest accepted finger spacing, inches (above 0 and at most this). */
export const FINGER_SPACING_MAX_IN = 3;
/** Half the stitched seam's width, inches (the seam band is about 3/16 in wide: common practice, no source). */
export const SEAM_HALF_WIDTH_IN = 3 / 32;
const SEARCH_STEPS = 720;

export type Finger = "index" | "middle" | "thumb";

export interface FingerPad {
  readonly finger: Finger;
  /** Pad centre, unit vector in the ball frame. */
  readonly direction: Vec3;
  /** Surface distance from the pad centre to the seam's centre line, inches. */
  readonly seamDistanceIn: number;
  readonly region: CoverRegion;
}

export interface Grip {
  readonly pads: readonly FingerPad[];
  /** Ball-frame trailing point T between the two finger pads. */
  readonly trailingPoint: Vec3;
  /** Row-major 3x3 rotation, ball frame to field frame at release. */
  readonly ballToField: readonly number[];
  readonly fingerSpacingIn: number;
}

/** Row-major rotation taking orthonormal right-handed (a1, a2, a3) to (b1, b2, b3). */
function basisRotation(a: readonly Vec3[], b: readonly Vec3[]): number[] {
  const m: number[] = [];
  for (let r = 0; r < 3; r++) for (let c = 0; c < 3; c++) m.push(b[0][r] * a[0][c] + b[1][r] * a[1][c] + b[2][r] * a[2][c]);
  return m;
}

export function applyRotation(m: readonly number[], v: Readonly<Vec3>): Vec3 {
  return [m[0] * v[0] + m[1] * v[1] + m[2] * v[2], m[3] * v[0] + m[4] * v[1] + m[5] * v[2], m[6] * v[0] + m[7] * v[1] + m[8] * v[2]];
}

/** The inverse (transpose) of a row-major rotation. */
export function transposeRotation(m: readonly number[]): number[] {
  return [m[0], m[3], m[6], m[1], m[4], m[7], m[2], m[5], m[8]];
}

/**
 * Finger placement for a ball-frame spin axis.
 * @param axisBall unit spin axis in the ball frame
 * @param frame the pitch's field-frame directions (src/screening/pitch.ts)
 * @param seam seam samples for distances (dense: 2048 or more)
 * @param cover cover model for region names
 */
export function placeFingers(
  axisBall: Readonly<Vec3>,
  frame: PitchFrame,
  seam: SeamSamples,
  cover: CoverModel,
  fingerSpacingIn: number = DEFAULT_FINGER_SPACING_IN,
): Grip {
  if (!(fingerSpacingIn > 0 && fingerSpacingIn <= FINGER_SPACING_MAX_IN)) {
    throw new RangeError(`finger spacing ${fingerSpacingIn} in must be above 0 and at most ${FINGER_SPACING_MAX_IN} in`);
  }
  const w = unit3(axisBall);
  const halfRad = fingerSpacingIn / 2 / BALL_RADIUS_IN;
  const e1 = perpendicularUnit(w);
  const pads = (t: Vec3): [Vec3, Vec3] => {
    // move from T along the great circle toward +w and toward -w
    const c = Math.cos(halfRad);
    const s = Math.sin(halfRad);
    return [
      unit3([c * t[0] + s * w[0], c * t[1] + s * w[1], c * t[2] + s * w[2]]),
      unit3([c * t[0] - s * w[0], c * t[1] - s * w[1], c * t[2] - s * w[2]]),
    ];
  };
  let bestT: Vec3 = e1;
  let bestCost = Infinity;
  for (let k = 0; k < SEARCH_STEPS; k++) {
    const t = rotateAbout(e1, w, (2 * Math.PI * k) / SEARCH_STEPS);
    const [p1, p2] = pads(t);
    const cost = Math.max(angleToSeam(p1, seam.points), angleToSeam(p2, seam.points));
    if (cost < bestCost - 1e-12) {
      bestCost = cost;
      bestT = t;
    }
  }
  // release orientation: (w, T, w x T) in the ball frame -> (w_f, T_f, w_f x T_f) in the field
  const wf = frame.spinAxis;
  const v = frame.flight;
  const vw = dot3(v, wf);
  const tf = unit3([-(v[0] - vw * wf[0]), -(v[1] - vw * wf[1]), -(v[2] - vw * wf[2])]);
  const ballToField = basisRotation([w, bestT, cross3(w, bestT)], [wf, tf, cross3(wf, tf)]);
  const [pa, pb] = pads(bestT);
  const glove: Vec3 = [-frame.armSide[0], -frame.armSide[1], -frame.armSide[2]];
  const aIsIndex = dot3(applyRotation(ballToField, pa), glove) >= dot3(applyRotation(ballToField, pb), glove);
  const fieldToBall = transposeRotation(ballToField);
  const thumb = applyRotation(fieldToBall, [0, 0, -1]);
  const halfWidthRad = SEAM_HALF_WIDTH_IN / BALL_RADIUS_IN;
  const pad = (finger: Finger, p: Vec3): FingerPad => {
    const region = coverRegion(cover, p, halfWidthRad);
    return { finger, direction: p, seamDistanceIn: region.seamDistanceRad * BALL_RADIUS_IN, region };
  };
  return {
    pads: [pad("index", aIsIndex ? pa : pb), pad("middle", aIsIndex ? pb : pa), pad("thumb", thumb)],
    trailingPoint: bestT,
    ballToField,
    fingerSpacingIn,
  };
}
