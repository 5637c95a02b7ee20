/**
 * How far, and which way, to turn the ball in the hand from a classic hold to a
 * grip, in a player's terms.
 *
 * The arm sets the spin axis in the field (w_f); the grip sets which point of the
 * ball it pierces. Going from the classic hold (ball-to-field rotation R_c at
 * release, ball axis a_c with R_c a_c = w_f) to a grip whose ball axis is a_g, the
 * ball must turn so that a_g comes to w_f. Among the rotations that do it, the
 * smallest turns by theta = angle(a_g, a_c) about k = unit(u x w_f), u = R_c a_g,
 * an axis across w_f. The seam pattern is the same after the ball's own half-turns,
 * so a_g is first replaced by its image under the seam's rotations nearest a_c
 * (geometry/symmetry.ts): the same grip, the shortest turn. A further turn about w_f
 * (sliding the fingers along the spin equator) changes no prediction and is left to
 * the fingers.
 *
 * In the pitcher's view at release (behind the ball, looking along the flight, the
 * fingers on the ball's back, whose middle is the trailing point P = T_f):
 *   twist  the part of theta k along the line of sight, positive clockwise as the
 *          pitcher sees it (rotation vector pointing away from the pitcher, -P);
 *   roll   the rest: the face under the fingers moves by theta k x P, read as
 *          arm-side and up components (field up; arm side from the throwing hand).
 * Field frame: geometry/frames.ts (x toward the catcher's right, y toward the
 * pitcher, z up).
 */
import { applySymmetry, SEAM_SYMMETRIES } from "../../geometry/symmetry.js";
import { angleBetween, cross3, dot3, unit3, type Vec3 } from "../../geometry/vec.js";
import { applyRotation } from "./hand.js";
import type { PitchFrame } from "./pitch.js";

const PROPER = SEAM_SYMMETRIES.filter((g) => g.proper);

export interface HoldTurn {
  /** The whole turn, radians (0 when the grip is the hold). */
  readonly angleRad: number;
  /** Clockwise twist as the pitcher sees the ball, radians (negative: counter-clockwise). */
  readonly twistRad: number;
  /** The roll of the face under the fingers, radians, and its direction: arm-side and up parts (unit, or zeros when there is no roll). */
  readonly rollRad: number;
  readonly rollArmSide: number;
  readonly rollUp: number;
}

/**
 * The turn from a classic hold to a grip.
 * @param gripAxisBall the grip's spin axis, ball frame (any length > 0)
 * @param holdAxisBall the hold's spin axis, ball frame
 * @param holdBallToField the hold's release rotation, row-major (src/screening/hand.ts)
 * @param frame the pitch's field directions
 */
export function turnFromHold(gripAxisBall: Readonly<Vec3>, holdAxisBall: Readonly<Vec3>, holdBallToField: readonly number[], frame: PitchFrame): HoldTurn {
  const ac = unit3(holdAxisBall);
  let b = unit3(gripAxisBall);
  let best = Infinity;
  for (const g of PROPER) {
    const img = applySymmetry(g, unit3(gripAxisBall));
    const a = angleBetween(img, ac);
    if (a < best - 1e-12) {
      best = a;
      b = img;
    }
  }
  const wf = unit3(frame.spinAxis);
  const u = applyRotation(holdBallToField, b);
  const theta = angleBetween(u, wf);
  const axis = cross3(u, wf);
  const n = Math.hypot(axis[0], axis[1], axis[2]);
  if (!(theta > 1e-9) || n < 1e-12) return { angleRad: 0, twistRad: 0, rollRad: 0, rollArmSide: 0, rollUp: 0 };
  const r: Vec3 = [(theta * axis[0]) / n, (theta * axis[1]) / n, (theta * axis[2]) / n];
  // the trailing point at release: behind the centre, across the spin axis
  const v = frame.flight;
  const vw = dot3(v, wf);
  const p = unit3([-(v[0] - vw * wf[0]), -(v[1] - vw * wf[1]), -(v[2] - vw * wf[2])]);
  const twist = -dot3(r, p);
  const dp = cross3(r, p);
  const roll = Math.hypot(dp[0], dp[1], dp[2]);
  const arm = roll > 1e-12 ? dot3(dp, frame.armSide) / roll : 0;
  const up = roll > 1e-12 ? dp[2] / roll : 0;
  return { angleRad: theta, twistRad: twist, rollRad: roll, rollArmSide: arm, rollUp: up };
}
