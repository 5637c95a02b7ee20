import { describe, expect, it } from "vitest";
import { BALL_MASS_KG } from "../../geometry/ball.js";
import type { Launch } from "../../src/physics/flight.js";
import { releasePosition, releaseVelocity } from "../../src/physics/launch.js";
import { tradeMovement } from "../../src/physics/tradeMovement.js";
import { tradeMovementParts } from "../../src/physics/tradeMovementParts.js";
import { recordFlight } from "../../src/physics/trajectory.js";
import { DEG, M_PER_IN, M_PER_S_PER_MPH, RAD_PER_S_PER_RPM } from "../../geometry/units.js";
import { expectAbsolute, expectRelative } from "../support/tolerance.js";

describe("the trade's movement split into drag, Magnus and seam parts", () => {
  const straight: Launch = {
    releasePositionM: releasePosition(),
    releaseVelocityMPerS: releaseVelocity(90 * M_PER_S_PER_MPH, -1.5 * DEG, 1.5 * DEG),
    spinRadPerS: [-2300 * RAD_PER_S_PER_RPM, 0, 500 * RAD_PER_S_PER_RPM],
  };

  it("a constant 0.05 N seam force with drag off has the closed-form seam part (F / m) T^2 / 2 within 1e-9 relative", () => {
    // Closed form: without drag and Magnus the seamOnly flight is the spinless one plus a constant F/m
    // along +x; the force does not touch y, so the two share the window time T.
    const hook = (_input: unknown, forceN: Float64Array) => void (forceN[0] = 0.05);
    const parts = tradeMovementParts(straight, { seamForce: hook, drag: { name: "constant", dragCoefficient: 0 } });
    const T = parts.spinless.windowTimeS;
    expectRelative(parts.seamM.horizontalBreakM, (0.05 / BALL_MASS_KG) * 0.5 * T * T, 1e-9);
    expectAbsolute(parts.seamM.inducedVerticalBreakM, 0, 1e-12);
    expectAbsolute(parts.dragM.horizontalBreakM, 0, 1e-12);
    expectAbsolute(parts.dragM.inducedVerticalBreakM, 0, 1e-9);
  });

  it("with drag, Magnus and a seam force, the parts add up to the whole: interaction under 1 % of the break (small-perturbation superposition)", () => {
    const hook = (_input: unknown, forceN: Float64Array) => void (forceN[0] = 0.05);
    const parts = tradeMovementParts(straight, { seamForce: hook });
    const total = Math.hypot(parts.total.horizontalBreakM, parts.total.inducedVerticalBreakM);
    expect(Math.hypot(parts.interactionM.horizontalBreakM, parts.interactionM.inducedVerticalBreakM)).toBeLessThan(0.01 * total);
    // the drag part is the spinless flight's own trade break, on the same window
    const spinless = tradeMovement(recordFlight(straight, { magnus: false }).samples);
    expect(parts.dragM.horizontalBreakM).toBe(spinless.horizontalBreakM);
    expect(parts.dragM.inducedVerticalBreakM).toBe(spinless.inducedVerticalBreakM);
    expect(parts.seamM.horizontalBreakM).toBeGreaterThan(0.5 * M_PER_IN);
    expect(parts.magnusM.inducedVerticalBreakM).toBeGreaterThan(10 * M_PER_IN);
    // without a hook: no seam part, no interaction, two flights
    const plain = tradeMovementParts(straight);
    expect(plain.seamM).toEqual({ horizontalBreakM: 0, inducedVerticalBreakM: 0 });
    expect(plain.interactionM).toEqual({ horizontalBreakM: 0, inducedVerticalBreakM: 0 });
    expect(plain.flights.magnusOnly).toBe(plain.flights.full);
  });
});
