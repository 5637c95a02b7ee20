import { describe, expect, it } from "vitest";
import { airState } from "../../src/physics/air.js";
import type { SeamForceHook } from "../../src/physics/forces.js";
import { simulateFlight, type Launch } from "../../src/physics/flight.js";
import { releasePosition, releaseVelocity } from "../../src/physics/launch.js";
import { movementVersusSpinless } from "../../src/physics/movement.js";
import { M_PER_S_PER_MPH, DEG, RAD_PER_S_PER_RPM } from "../../geometry/units.js";
import { expectAbsolute, expectRelative } from "../support/tolerance.js";

const MASS_KG = 0.145;
const noSpin: Launch = {
  releasePositionM: releasePosition(),
  releaseVelocityMPerS: releaseVelocity(90 * M_PER_S_PER_MPH, -1 * DEG, 1 * DEG),
  spinRadPerS: [0, 0, 0],
};
const constantForce =
  (forceXN: number): SeamForceHook =>
  (_input, forceN) => {
    forceN[0] = forceXN;
  };

describe("seam-force hook: a constant 0.05 N along +x", () => {
  it("with drag off, moves the crossing by exactly F t^2 / (2 m) (constant acceleration) within 1e-9 relative", () => {
    const m = movementVersusSpinless(noSpin, { seamForce: constantForce(0.05), drag: { name: "constant", dragCoefficient: 0 } });
    const t = m.flight.timeToPlateS;
    expectRelative(m.seamBreakM.xM, (0.05 * t * t) / (2 * MASS_KG), 1e-9);
    expectAbsolute(m.seamBreakM.zM, 0, 1e-12);
    expectAbsolute(m.magnusBreakM.xM, 0, 1e-15);
  });

  it("with Giordano drag, moves the crossing by about F t^2 / (2 m) (small deflection) within 5 %", () => {
    const m = movementVersusSpinless(noSpin, { seamForce: constantForce(0.05) });
    const t = m.flight.timeToPlateS;
    expectRelative(m.seamBreakM.xM, (0.05 * t * t) / (2 * MASS_KG), 0.05);
  });

  it("is ignored in vacuum (no air, no aerodynamic force): break below 1e-15 m", () => {
    const m = movementVersusSpinless(noSpin, { seamForce: constantForce(0.05), vacuum: true });
    expectAbsolute(m.breakM.xM, 0, 1e-15);
    expectAbsolute(m.seamBreakM.xM, 0, 1e-15);
  });

  it("receives the air density and the spin: sees 1.1117 kg/m^3 at 1000 m within 0.1 % (1976 table, from memory)", () => {
    let seenDensity = 0;
    let seenSpinX = 0;
    const spy: SeamForceHook = (input) => {
      seenDensity = input.densityKgM3;
      seenSpinX = input.spinRadPerS[0];
    };
    simulateFlight({ ...noSpin, spinRadPerS: [-200, 0, 0] }, { seamForce: spy, air: airState({ elevationM: 1000 }) });
    expectRelative(seenDensity, 1.1117, 1e-3);
    expectAbsolute(seenSpinX, -200, 1e-12);
  });
});

describe("movement split into Magnus and seam parts", () => {
  const launch: Launch = { ...noSpin, spinRadPerS: [-2200 * RAD_PER_S_PER_RPM, 0, 400 * RAD_PER_S_PER_RPM] };
  const m = movementVersusSpinless(launch, { seamForce: constantForce(0.05) });

  it("the parts add up to the total break to first order: interaction under 1 % of the break (small-perturbation superposition)", () => {
    const total = Math.hypot(m.breakM.xM, m.breakM.zM);
    expect(Math.hypot(m.interactionM.xM, m.interactionM.zM)).toBeLessThan(0.01 * total);
    expect(m.seamBreakM.xM).toBeGreaterThan(0);
    expect(m.magnusBreakM.zM).toBeGreaterThan(0);
  });

  it("without a hook the seam part is zero and the Magnus part is the whole break, within 1e-15 m", () => {
    const plain = movementVersusSpinless(launch);
    expectAbsolute(plain.seamBreakM.xM, 0, 1e-15);
    expectAbsolute(plain.seamBreakM.zM, 0, 1e-15);
    expectAbsolute(plain.breakM.zM, plain.magnusBreakM.zM, 1e-15);
  });
});
