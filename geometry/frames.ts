/**
 * Field frame, tilt clock and gyro angle.
 *
 * Field frame (as in the published baseball flight papers, e.g. Nathan,
 * Am. J. Phys. 76(2), 2008): x toward the catcher's right, y from home plate
 * toward the pitcher, z up. A pitch flies roughly along -y.
 *
 * Spin axis: the angular-velocity direction (right-hand rule: curl the right
 * hand's fingers the way the ball turns, the thumb is the positive end).
 *
 * Gyro angle g: signed angle between the spin axis and the plane across the
 * flight line; positive when the axis's positive end leans toward the direction
 * of flight, so w . v = sin g. Spin efficiency = cos g (the share of spin that
 * makes Magnus lift).
 *
 * Tilt: a clock reading of where the transverse spin's Magnus force points,
 * w x v projected across the flight line, as seen by a viewer looking along the
 * flight direction from behind the pitcher (view "pitcher") or looking back at the
 * pitcher from behind the catcher (view "catcher"). 12:00 is straight up (pure
 * backspin), 6:00 straight down (pure topspin), 3:00 the viewer's right. From
 * behind the pitcher the viewer's right is -x; from behind the catcher it is +x,
 * so the two views read mirror-image clocks: 1:30 from one is 10:30 from the other.
 */
import { angleToClock, formatClock } from "./clock.js";
import { cross3, dot3, norm3, unit3, type Vec3 } from "./vec.js";

export type ClockView = "pitcher" | "catcher";
export type Hand = "right" | "left";

/** Nominal flight direction in the field frame: from the rubber toward home plate. */
export const TOWARD_PLATE: Vec3 = [0, -1, 0];
export const FIELD_UP: Vec3 = [0, 0, 1];

/**
 * The viewer's right and up for a clock view, given the flight direction v (up is
 * the field's up with its part along v removed). From behind the pitcher the viewer
 * looks along v, so right = v x up; from behind the catcher along -v, so right = up x v.
 */
export function clockBasis(view: ClockView, v: Readonly<Vec3> = TOWARD_PLATE): { right: Vec3; up: Vec3 } {
  const vu = unit3(v);
  const d = dot3(FIELD_UP, vu);
  const up = unit3([FIELD_UP[0] - d * vu[0], FIELD_UP[1] - d * vu[1], FIELD_UP[2] - d * vu[2]]);
  const lookRight = cross3(vu, up); // right of a viewer looking along v
  return view === "pitcher" ? { right: lookRight, up } : { right: [-lookRight[0], -lookRight[1], -lookRight[2]], up };
}

/** The direction in the field frame that a clock hand at `angleRad` points to, across v. */
export function clockDirection(angleRad: number, view: ClockView, v: Readonly<Vec3> = TOWARD_PLATE): Vec3 {
  const { right, up } = clockBasis(view, v);
  const s = Math.sin(angleRad);
  const c = Math.cos(angleRad);
  return [s * right[0] + c * up[0], s * right[1] + c * up[1], s * right[2] + c * up[2]];
}

/** Clockwise angle from 12:00 (radians, [0, 2 pi)) of the part of `d` across v, or null when d is along v. */
export function directionToClockAngle(d: Readonly<Vec3>, view: ClockView, v: Readonly<Vec3> = TOWARD_PLATE): number | null {
  const { right, up } = clockBasis(view, v);
  const x = dot3(d, right);
  const y = dot3(d, up);
  if (Math.hypot(x, y) < 1e-12 * Math.max(1, norm3(d))) return null;
  const a = Math.atan2(x, y);
  return a < 0 ? a + 2 * Math.PI : a;
}

/**
 * Spin axis (field frame, unit) from tilt and gyro:
 * w = cos g (v x m) + sin g v, where m is the unit Magnus direction the tilt names.
 */
export function spinAxisFromTilt(tiltRad: number, gyroRad: number, view: ClockView, v: Readonly<Vec3> = TOWARD_PLATE): Vec3 {
  const vu = unit3(v);
  const m = clockDirection(tiltRad, view, vu);
  const t = cross3(vu, m);
  const c = Math.cos(gyroRad);
  const s = Math.sin(gyroRad);
  return unit3([c * t[0] + s * vu[0], c * t[1] + s * vu[1], c * t[2] + s * vu[2]]);
}

/** Tilt (radians clockwise from 12:00, or null for a pure gyro axis) and gyro (radians) of a field-frame spin axis. */
export function tiltFromSpinAxis(
  axis: Readonly<Vec3>,
  view: ClockView,
  v: Readonly<Vec3> = TOWARD_PLATE,
): { tiltRad: number | null; gyroRad: number } {
  const w = unit3(axis);
  const vu = unit3(v);
  const gyroRad = Math.asin(Math.max(-1, Math.min(1, dot3(w, vu))));
  const m = cross3(w, vu);
  return { tiltRad: directionToClockAngle(m, view, vu), gyroRad };
}

/** Spin efficiency (0..1) from the gyro angle. */
export function spinEfficiency(gyroRad: number): number {
  return Math.cos(gyroRad);
}

/** Unsigned gyro angle (radians) from spin efficiency (0 < e <= 1); the sign must come from elsewhere. */
export function gyroFromEfficiency(efficiency: number): number {
  if (!(efficiency > 0 && efficiency <= 1)) throw new RangeError(`spin efficiency ${efficiency} must be above 0 and at most 1`);
  return Math.acos(efficiency);
}

/**
 * Field direction of the arm side for a throwing hand: the pitcher's right (-x) for a
 * right-hander, the pitcher's left (+x) for a left-hander. Glove side is the opposite.
 */
export function armSideDirection(hand: Hand): Vec3 {
  return [armSideSign(hand), 0, 0];
}

/** The sign of field x on the arm side: -1 for a right-hander, +1 for a left-hander (the one home of that rule). */
export function armSideSign(hand: Hand): -1 | 1 {
  return hand === "right" ? -1 : 1;
}

/** A plate-plane offset (x toward the catcher's right, z up) as arm-side and up components for a hand. */
export function toArmSide(xM: number, zM: number, hand: Hand): { armSideM: number; upM: number } {
  return { armSideM: armSideSign(hand) * xM, upM: zM };
}

/**
 * The clock reading ("H:MM") of a movement in the plate plane (horizontal toward the
 * catcher's right, vertical up, any unit) seen from `view`, or null when it is (near) zero.
 */
export function movementClock(horizontal: number, vertical: number, view: ClockView): string | null {
  if (!(Math.hypot(horizontal, vertical) > 1e-9)) return null;
  const a = directionToClockAngle([horizontal, 0, vertical], view);
  return a === null ? null : formatClock(angleToClock(a));
}

export const HANDS: readonly Hand[] = ["right", "left"];
export const VIEWS: readonly ClockView[] = ["pitcher", "catcher"];
