/**
 * The ball as the flight model sees it: a sphere of given mass and radius.
 * Defaults are those of A. M. Nathan, "The effect of spin on the flight of a
 * baseball", Am. J. Phys. 76(2), 119 (2008): 0.145 kg and 0.0364 m (inside the
 * Official Baseball Rules 3.01 limits of 5 to 5 1/4 oz and 9 to 9 1/4 in round).
 */
import { assertInRange } from "./check.js";

/** Default ball mass, kg (Nathan 2008). */
export const BALL_MASS_KG = 0.145;
/** Default ball radius, m (Nathan 2008). */
export const BALL_RADIUS_M = 0.0364;

/** Accepted mass range, kg: generous around a baseball, so test balls and softballs fit. */
export const BALL_MASS_MIN_KG = 0.001;
export const BALL_MASS_MAX_KG = 1;
/** Accepted radius range, m. */
export const BALL_RADIUS_MIN_M = 0.005;
export const BALL_RADIUS_MAX_M = 0.1;

/** Throws RangeError unless mass (kg) and radius (m) are in the accepted ranges. */
export function assertBall(massKg: number, radiusM: number): void {
  assertInRange("ball mass", massKg, BALL_MASS_MIN_KG, BALL_MASS_MAX_KG, "kg");
  assertInRange("ball radius", radiusM, BALL_RADIUS_MIN_M, BALL_RADIUS_MAX_M, "m");
}

/** Frontal (cross-section) area pi R^2, m^2, of a ball of radius `radiusM` (m). */
export function crossSectionM2(radiusM: number): number {
  return Math.PI * radiusM * radiusM;
}
