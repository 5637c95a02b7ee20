import { describe, expect, it } from "vitest";
import {
  assertBall,
  BALL_CIRCUMFERENCE_IN,
  BALL_MASS_KG,
  BALL_RADIUS_IN,
  BALL_RADIUS_M,
  COVER_WAIST_ARC_IN,
  crossSectionM2,
  DOUBLE_STITCH_COUNT,
  RULEBOOK_CIRCUMFERENCE_IN,
  RULEBOOK_MASS_KG,
} from "../../geometry/ball.js";
import { KG_PER_OZ } from "../../geometry/units.js";

describe("the one ball", () => {
  it("has the rulebook's limits: circumference 9 to 9 1/4 in and weight 5 to 5 1/4 oz, 0.14175 to 0.14884 kg (Official Baseball Rules, rule 3.01), to 1e-12", () => {
    expect(RULEBOOK_CIRCUMFERENCE_IN).toEqual([9, 9.25]);
    expect(Math.abs(RULEBOOK_MASS_KG[0] - 5 * 0.028349523125)).toBeLessThan(1e-15);
    expect(Math.abs(RULEBOOK_MASS_KG[1] - 0.148835)).toBeLessThan(1e-6);
    expect(Math.abs(RULEBOOK_MASS_KG[0] - 0.141748)).toBeLessThan(1e-6);
  });

  it("is the 9 1/8 in cover-design ball (R. B. Thompson, \"Designing a Baseball Cover\", College Math. J. 29(1), 1998), inside rule 3.01, with radius C / (2 pi) = 1.452289 in = 0.03688814 m (closed form, hand-computed) to 1e-6 in and 1e-8 m", () => {
    expect(BALL_CIRCUMFERENCE_IN).toBe(9.125);
    expect(BALL_CIRCUMFERENCE_IN).toBeGreaterThanOrEqual(RULEBOOK_CIRCUMFERENCE_IN[0]);
    expect(BALL_CIRCUMFERENCE_IN).toBeLessThanOrEqual(RULEBOOK_CIRCUMFERENCE_IN[1]);
    expect(Math.abs(BALL_RADIUS_IN - 1.452289)).toBeLessThan(1e-6);
    expect(Math.abs(BALL_RADIUS_M - 0.03688814)).toBeLessThan(1e-8);
    // 1.4 % larger in radius than the 0.0364 m ball of the flight papers (Nathan 2008)
    expect(Math.abs(BALL_RADIUS_M / 0.0364 - 1.0134)).toBeLessThan(1e-3);
  });

  it("weighs 0.145 kg, 5.11 oz (A. M. Nathan, Am. J. Phys. 76(2), 119 (2008)), inside rule 3.01's 5 to 5 1/4 oz, to 0.01 oz", () => {
    expect(BALL_MASS_KG).toBe(0.145);
    expect(Math.abs(BALL_MASS_KG / KG_PER_OZ - 5.11)).toBeLessThan(0.01);
    expect(BALL_MASS_KG).toBeGreaterThan(RULEBOOK_MASS_KG[0]);
    expect(BALL_MASS_KG).toBeLessThan(RULEBOOK_MASS_KG[1]);
  });

  it("carries Thompson's 1 3/16 in waist arc and 108 double stitches (common practice, no source)", () => {
    expect(COVER_WAIST_ARC_IN).toBe(1 + 3 / 16);
    expect(DOUBLE_STITCH_COUNT).toBe(108);
  });

  it("has frontal area pi R^2: 4.16248e-3 m^2 for the flight papers' 0.0364 m radius (closed form, hand-computed) to 1e-8 m^2", () => {
    expect(Math.abs(crossSectionM2(0.0364) - 4.16248e-3)).toBeLessThan(1e-8);
  });

  it("rejects a mass or radius outside the accepted ranges with a RangeError naming it", () => {
    expect(() => assertBall(0.145, 0.0369)).not.toThrow();
    expect(() => assertBall(0, 0.0369)).toThrow(/ball mass 0 kg/);
    expect(() => assertBall(0.145, 0.5)).toThrow(/ball radius 0.5 m/);
  });
});
