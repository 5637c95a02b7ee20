/**
 * The seam curve and the ball frame.
 *
 * Ball frame (binding for the whole tool): the seam curve's own axes.
 *   c(t) = (a cos t + b cos 3t,  a sin t - b sin 3t,  2 sqrt(ab) sin 2t),  a + b = 1,
 * the published two-harmonic spherical seam curve (tennis-ball / baseball seam;
 * e.g. Allison, Diaz & Miller, "Generalized Baseball Curves", MAA Loci 2008).
 * It lies on the unit sphere for every b: x^2 + y^2 = a^2 + b^2 + 2ab cos 4t and
 * z^2 = 2ab (1 - cos 4t) sum to (a + b)^2 = 1. Right-handed axes:
 *   +z passes through the narrow waist of the cover half that contains it
 *      (the two horseshoe tips at t = pi/4 and 5pi/4 face each other across it);
 *   +x and +y point at two of the four places where the seam crosses the
 *      curve's equator (t = 0 and t = pi/2).
 * Latitude is measured from the xy-plane toward +z; longitude from +x toward +y.
 * Lengths are on the unit sphere; multiply by the ball radius for inches.
 *
 * Shape parameter b: b = 1/4 is the tennis ball (astroid projection); the seam is
 * a simple closed curve for 0 < b < 1/2. At b = 1/2 the two facing horseshoe tips
 * meet at the waist (the tip-to-tip angle 2 arccos(2 sqrt(ab)) reaches 0), and
 * b = 0 is a plain great circle.
 */
import { BALL_CIRCUMFERENCE_IN, COVER_WAIST_ARC_IN } from "./ball.js";

/** Smallest and largest b for which the seam is a simple closed curve (exclusive). */
export const SEAM_SHAPE_RANGE: readonly [number, number] = [0, 0.5];

/**
 * The b whose tip-to-tip arc across the waist equals `waistArcIn` on a ball of
 * circumference `circumferenceIn`. The arc between the tips at t = pi/4 and 5pi/4
 * subtends 2 arccos(2 sqrt(ab)), so 2 sqrt(b(1 - b)) = cos(alpha / 2) with
 * alpha = arc / R, which gives b = (1 - sin(alpha / 2)) / 2 (the root below 1/2).
 */
export function seamShapeFromWaist(waistArcIn: number, circumferenceIn: number): number {
  const alpha = waistArcIn / (circumferenceIn / (2 * Math.PI));
  return (1 - Math.sin(alpha / 2)) / 2;
}

/** Default seam shape: Thompson's waist on Thompson's ball (about 0.3012). */
export const DEFAULT_SEAM_SHAPE = seamShapeFromWaist(COVER_WAIST_ARC_IN, BALL_CIRCUMFERENCE_IN);

/** Angle in radians between the two horseshoe tips that face each other across a waist. */
export function waistTipAngleRad(b: number): number {
  const a = 1 - b;
  return 2 * Math.acos(Math.min(1, 2 * Math.sqrt(a * b)));
}

/** True when the seam with shape `b` is a simple closed curve on the sphere. */
export function isValidSeamShape(b: number): boolean {
  return Number.isFinite(b) && b > SEAM_SHAPE_RANGE[0] && b < SEAM_SHAPE_RANGE[1];
}

/** Throws RangeError naming `b` unless the seam with that shape is simple. */
export function assertSeamShape(b: number): void {
  if (!isValidSeamShape(b)) {
    throw new RangeError(
      `seam shape b = ${b} is outside (0, 0.5), the range in which the seam is a simple closed curve`,
    );
  }
}

/** Writes c(t) (unit sphere) into `out` at `offset`. */
export function seamPoint(b: number, t: number, out: Float64Array | number[], offset = 0): void {
  const a = 1 - b;
  const h = 2 * Math.sqrt(a * b);
  out[offset] = a * Math.cos(t) + b * Math.cos(3 * t);
  out[offset + 1] = a * Math.sin(t) - b * Math.sin(3 * t);
  out[offset + 2] = h * Math.sin(2 * t);
}

/** Writes c'(t) into `out` at `offset`. */
export function seamTangent(b: number, t: number, out: Float64Array | number[], offset = 0): void {
  const a = 1 - b;
  const h = 2 * Math.sqrt(a * b);
  out[offset] = -a * Math.sin(t) - 3 * b * Math.sin(3 * t);
  out[offset + 1] = a * Math.cos(t) - 3 * b * Math.cos(3 * t);
  out[offset + 2] = 2 * h * Math.cos(2 * t);
}

/** Speed |c'(t)| of the parametrisation; closed form |c'|^2 = a^2 + 9b^2 - 6ab cos 4t + 16ab cos^2 2t. */
export function seamSpeed(b: number, t: number): number {
  const a = 1 - b;
  const c2 = Math.cos(2 * t);
  return Math.sqrt(a * a + 9 * b * b - 6 * a * b * Math.cos(4 * t) + 16 * a * b * c2 * c2);
}
