import { describe, expect, it } from "vitest";
import { airState } from "../../src/physics/air.js";
import { sawickiLiftCoefficient } from "../../src/physics/lift.js";
import { BALL_RADIUS_M, crossSectionM2 } from "../../geometry/ball.js";
import { PLATE_FRONT_Y_M } from "../../src/physics/field.js";
import { simulateFlight, type Launch } from "../../src/physics/flight.js";
import { releaseVelocity } from "../../src/physics/launch.js";
import { movementVersusSpinless } from "../../src/physics/movement.js";
import { M_PER_S_PER_MPH, DEG, RAD_PER_S_PER_RPM } from "../../geometry/units.js";
import type { Vec3 } from "../../geometry/vec.js";
import { expectAbsolute, expectRelative } from "../support/tolerance.js";

const air = airState();
const MASS_KG = 0.145;
const AREA_M2 = crossSectionM2(BALL_RADIUS_M);
const Y0_M = 16.6116;
const RPM = RAD_PER_S_PER_RPM;

/** A pitch released on the x = 0 line, straight down the middle with a slight downward angle. */
function pitch(spinRadPerS: Vec3, mph = 95): Launch {
  return {
    releasePositionM: [0, Y0_M, 1.8288],
    releaseVelocityMPerS: releaseVelocity(mph * M_PER_S_PER_MPH, -1.5 * DEG, 0),
    spinRadPerS,
  };
}

describe("Magnus force alone: uniform circular motion (closed form)", () => {
  // Gravity and drag off, spin along z, velocity in the xy-plane: the Magnus force is
  // perpendicular to v and of constant size, so the speed, S and C_L stay constant and
  // the path is a circle of radius r = m v^2 / F = 2 m / (rho A C_L), turning toward
  // omega x v = +x for omega = +z and v = -y. At distance d down range: x = r - sqrt(r^2 - d^2).
  const v0 = 40;
  const omega = 2000 * RPM;
  const r = simulateFlight(
    { releasePositionM: [0, Y0_M, 1.8], releaseVelocityMPerS: [0, -v0, 0], spinRadPerS: [0, 0, omega] },
    { drag: { name: "constant", dragCoefficient: 0 }, gravityMPerS2: 0 },
  );
  const radiusM = (2 * MASS_KG) / (air.densityKgM3 * AREA_M2 * sawickiLiftCoefficient((BALL_RADIUS_M * omega) / v0));
  const d = Y0_M - PLATE_FRONT_Y_M;

  it("crosses the plate at x = r - sqrt(r^2 - d^2) within 1e-9 relative, z unchanged within 1e-12 m", () => {
    expectRelative(r.plateCrossingM[0], radiusM - Math.sqrt(radiusM * radiusM - d * d), 1e-9);
    expectAbsolute(r.plateCrossingM[2], 1.8, 1e-12);
  });

  it("keeps the speed at 40 m/s within 1e-12 relative and takes t = r asin(d / r) / v within 1e-9 relative", () => {
    expectRelative(r.speedAtPlateMPerS, v0, 1e-12);
    expectRelative(r.timeToPlateS, (radiusM * Math.asin(d / radiusM)) / v0, 1e-9);
  });
});

describe("Magnus deflection in a full pitch (gravity, Giordano drag, Sawicki lift)", () => {
  const sideBreakM = (rpm: number) => movementVersusSpinless(pitch([0, 0, rpm * RPM])).breakM.xM;

  it("spin along +z pushes a pitch toward +x (omega x v with v along -y), and more spin pushes further (1000 < 2000 < 3000 rpm)", () => {
    const b1 = sideBreakM(1000);
    const b2 = sideBreakM(2000);
    const b3 = sideBreakM(3000);
    expect(b1).toBeGreaterThan(0.01);
    expect(b2).toBeGreaterThan(b1);
    expect(b3).toBeGreaterThan(b2);
  });

  it("reversing the spin axis reverses the break exactly (mirror symmetry x -> -x) within 1e-12 m", () => {
    for (const rpm of [1000, 2500]) expectAbsolute(sideBreakM(-rpm), -sideBreakM(rpm), 1e-12);
  });

  it("backspin (omega along -x) makes a 95 mph, 2300 rpm pitch drop less than spinless (common practice)", () => {
    const m = movementVersusSpinless(pitch([-2300 * RPM, 0, 0]));
    expect(m.breakM.zM).toBeGreaterThan(0);
    expect(m.flight.plateCrossingM[2]).toBeGreaterThan(m.spinless.plateCrossingM[2]);
  });

  it("backspin rise matches the small-deflection estimate a t^2 / 2 (a: mean Magnus acceleration at release and plate) within 3 %", () => {
    const omega = 2300 * RPM;
    const launch = pitch([-omega, 0, 0]);
    const m = movementVersusSpinless(launch);
    const accel = (v: number) => (0.5 * air.densityKgM3 * AREA_M2 * sawickiLiftCoefficient((BALL_RADIUS_M * omega) / v) * v * v) / MASS_KG;
    const v0 = Math.hypot(...launch.releaseVelocityMPerS);
    const t = m.flight.timeToPlateS;
    const estimate = 0.5 * ((accel(v0) + accel(m.flight.speedAtPlateMPerS)) / 2) * t * t;
    expectRelative(m.breakM.zM, estimate, 0.03);
  });

  it("only transverse spin lifts (Sawicki et al. 2003): 2400 rpm at 60 deg gyro rises like 1200 rpm pure backspin within 1 %", () => {
    const w0 = 2400 * RPM;
    const phi = 60 * DEG;
    const base = { releasePositionM: [0, Y0_M, 1.8] as Vec3, releaseVelocityMPerS: [0, -40, 0] as Vec3 };
    const gyro = movementVersusSpinless({ ...base, spinRadPerS: [-w0 * Math.cos(phi), -w0 * Math.sin(phi), 0] });
    const back = movementVersusSpinless({ ...base, spinRadPerS: [-w0 * Math.cos(phi), 0, 0] });
    expectRelative(gyro.breakM.zM, back.breakM.zM, 0.01);
  });

  it("pure gyro spin (omega along v, gravity off) gives no Magnus deflection: |break| below 1e-12 m", () => {
    const launch: Launch = { releasePositionM: [0, Y0_M, 1.8], releaseVelocityMPerS: [0, -40, 0], spinRadPerS: [0, -2500 * RPM, 0] };
    const m = movementVersusSpinless(launch, { gravityMPerS2: 0 });
    expectAbsolute(m.breakM.xM, 0, 1e-12);
    expectAbsolute(m.breakM.zM, 0, 1e-12);
  });
});
