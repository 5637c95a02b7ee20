/**
 * The one ball: its size and weight, used by the seam geometry (lengths in
 * inches on the cover, finger distances), the drawings and the flight alike.
 *
 * Official Baseball Rules, rule 3.01: circumference 9 to 9 1/4 in, weight 5 to
 * 5 1/4 oz. We use the nominal 9 1/8 in circumference that cover design starts
 * from (R. B. Thompson, "Designing a Baseball Cover", College Math. J. 29(1), 1998),
 * the middle of the rulebook's range, and a mass of 0.145 kg (5.11 oz, the value of
 * A. M. Nathan, "The effect of spin on the flight of a baseball", Am. J. Phys. 76(2),
 * 119 (2008)). Flight models that quote a 0.0364 m radius (a 9.0 in ball) sit at the
 * rulebook's lower edge; ours is 1.4 % larger in radius.
 */
import { assertInRange } from "./check.js";
import { KG_PER_OZ, M_PER_IN } from "./units.js";

/** Nominal circumference, inches (Thompson 1998; inside rule 3.01's 9 to 9 1/4 in). */
export const BALL_CIRCUMFERENCE_IN = 9.125;
/** Rulebook circumference limits, inches (Official Baseball Rules, rule 3.01). */
export const RULEBOOK_CIRCUMFERENCE_IN: readonly [number, number] = [9.0, 9.25];
/** Rulebook weight limits, kilograms (rule 3.01: 5 to 5 1/4 oz). */
export const RULEBOOK_MASS_KG: readonly [number, number] = [5 * KG_PER_OZ, 5.25 * KG_PER_OZ];
/** Ball radius, inches. */
export const BALL_RADIUS_IN = BALL_CIRCUMFERENCE_IN / (2 * Math.PI);
/** Ball radius, metres (about 0.03689). */
export const BALL_RADIUS_M = BALL_RADIUS_IN * M_PER_IN;
/** Ball mass, kg (Nathan 2008; 5.11 oz, inside rule 3.01). */
export const BALL_MASS_KG = 0.145;
/** Double stitches on a baseball (common practice, no source). */
export const DOUBLE_STITCH_COUNT = 108;
/**
 * Seam-to-seam arc across a cover's narrow waist, inches, on the 9 1/8 in ball
 * (Thompson 1998).
 */
export const COVER_WAIST_ARC_IN = 1.1875;

/** Accepted mass range for flights, kg: generous around a baseball, so test balls and softballs fit. */
export const BALL_MASS_RANGE_KG: readonly [number, number] = [0.001, 1];
/** Accepted radius range for flights, m. */
export const BALL_RADIUS_RANGE_M: readonly [number, number] = [0.005, 0.1];

/** Throws RangeError unless mass (kg) and radius (m) are in the accepted ranges. */
export function assertBall(massKg: number, radiusM: number): void {
  assertInRange("ball mass", massKg, BALL_MASS_RANGE_KG[0], BALL_MASS_RANGE_KG[1], "kg");
  assertInRange("ball radius", radiusM, BALL_RADIUS_RANGE_M[0], BALL_RADIUS_RANGE_M[1], "m");
}

/** Frontal (cross-section) area pi R^2, m^2, of a ball of radius `radiusM` (m). */
export function crossSectionM2(radiusM: number): number {
  return Math.PI * radiusM * radiusM;
}
