import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { simulateFlight, type Launch } from "../../src/physics/flight.js";
import { releasePosition, releaseVelocity } from "../../src/physics/launch.js";
import { movementVersusSpinless } from "../../src/physics/movement.js";
import { assertSpinDecayTimeConstant, spinDecayFactor } from "../../src/physics/spinDecay.js";
import { M_PER_S_PER_MPH, DEG, RAD_PER_S_PER_RPM } from "../../geometry/units.js";
import { expectRelative } from "../support/tolerance.js";
import { uniform } from "../support/arbitraries.js";

describe("exponential spin decay (off by default)", () => {
  const launch: Launch = {
    releasePositionM: releasePosition(),
    releaseVelocityMPerS: releaseVelocity(90 * M_PER_S_PER_MPH, -1 * DEG, 1 * DEG),
    spinRadPerS: [-2300 * RAD_PER_S_PER_RPM, 0, 0],
  };

  it("falls to 1/e after one time constant and multiplies over consecutive intervals, f(t1 + t2) = f(t1) f(t2), for 200 random times and constants within 1e-14 relative (the exponential's closed form)", () => {
    expectRelative(spinDecayFactor(2, 2), Math.exp(-1), 1e-15);
    expect(spinDecayFactor(0.4, Infinity)).toBe(1);
    fc.assert(
      fc.property(uniform(0, 1), uniform(0, 1), uniform(0.1, 100), (t1, t2, tau) => {
        expectRelative(spinDecayFactor(t1 + t2, tau), spinDecayFactor(t1, tau) * spinDecayFactor(t2, tau), 1e-14);
      }),
      { seed: 2300, numRuns: 200 },
    );
  });

  it("spin at the plate is omega0 exp(-t / tau) for tau = 2 s within 1e-12 relative (closed form)", () => {
    const r = simulateFlight(launch, { spinDecayTimeConstantS: 2 });
    expectRelative(r.spinAtPlateRadPerS[0], launch.spinRadPerS[0] * Math.exp(-r.timeToPlateS / 2), 1e-12);
  });

  it("decaying spin gives less backspin rise than constant spin", () => {
    const steady = movementVersusSpinless(launch).breakM.zM;
    const decaying = movementVersusSpinless(launch, { spinDecayTimeConstantS: 2 }).breakM.zM;
    expect(decaying).toBeLessThan(steady);
    expect(decaying).toBeGreaterThan(0);
  });

  it("rejects a time constant of 0 s", () => {
    expect(() => simulateFlight(launch, { spinDecayTimeConstantS: 0 })).toThrow(/spin decay time constant 0 s/);
    expect(() => assertSpinDecayTimeConstant(-1)).toThrow(RangeError);
  });
});
