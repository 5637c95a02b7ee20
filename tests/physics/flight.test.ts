import { describe, expect, it } from "vitest";
import { airState } from "../../src/physics/air.js";
import { BALL_RADIUS_M, crossSectionM2 } from "../../geometry/ball.js";
import { PLATE_FRONT_Y_M } from "../../src/physics/field.js";
import { simulateFlight, type Launch } from "../../src/physics/flight.js";
import { releasePosition, releaseVelocity } from "../../src/physics/launch.js";
import { M_PER_S_PER_MPH, DEG, RAD_PER_S_PER_RPM } from "../../geometry/units.js";
import { expectAbsolute, expectRelative } from "../support/tolerance.js";

const G = 9.80665;
const seaLevel = airState();

describe("vacuum flight equals the closed-form parabola", () => {
  // Constant gravity only: x = x0 + vx t, y = y0 + vy t, z = z0 + vz t - g t^2 / 2.
  const p0: [number, number, number] = [-0.45, 16.6, 1.85];
  const v0: [number, number, number] = [0.9, -38.5, -0.6];
  const t = (PLATE_FRONT_Y_M - p0[1]) / v0[1];
  const spin: [number, number, number] = [-200, 30, 80];
  const r = simulateFlight({ releasePositionM: p0, releaseVelocityMPerS: v0, spinRadPerS: spin }, { vacuum: true });

  it("time to the plate is (y_plate - y0) / vy within 1e-12 relative", () => {
    expectRelative(r.timeToPlateS, t, 1e-12);
  });

  it("plate crossing x, y, z within 1e-9 relative", () => {
    expectRelative(r.plateCrossingM[0], p0[0] + v0[0] * t, 1e-9);
    expectRelative(r.plateCrossingM[1], PLATE_FRONT_Y_M, 1e-9);
    expectRelative(r.plateCrossingM[2], p0[2] + v0[2] * t - 0.5 * G * t * t, 1e-9);
  });

  it("velocity (vz = vz0 - g t) and approach angles at the plate within 1e-9 relative", () => {
    const vz = v0[2] - G * t;
    expectRelative(r.velocityAtPlateMPerS[0], v0[0], 1e-9);
    expectRelative(r.velocityAtPlateMPerS[1], v0[1], 1e-9);
    expectRelative(r.velocityAtPlateMPerS[2], vz, 1e-9);
    expectRelative(r.verticalApproachAngleRad, Math.atan2(vz, Math.hypot(v0[0], v0[1])), 1e-9);
    expectRelative(r.horizontalApproachAngleRad, Math.atan2(v0[0], -v0[1]), 1e-9);
    expect(r.verticalApproachAngleRad).toBeLessThan(0);
  });
});

describe("drag only, gravity off, constant C_D: closed-form quadratic drag", () => {
  // dv/dt = -k v^2, k = rho A C_D / (2 m):  v(t) = v0 / (1 + k v0 t),  s(t) = ln(1 + k v0 t) / k,
  // so the time to travel d is (exp(k d) - 1) / (k v0) and the speed there v0 exp(-k d).
  const rho = 1.225;
  const cd = 0.35;
  const y0 = 16.6116;
  const d = y0 - PLATE_FRONT_Y_M;
  const v0 = 40;
  const fly = (massKg: number, stepS: number) =>
    simulateFlight(
      { releasePositionM: [0, y0, 1.8], releaseVelocityMPerS: [0, -v0, 0], spinRadPerS: [0, 0, 0] },
      { air: { ...seaLevel, densityKgM3: rho }, drag: { name: "constant", dragCoefficient: cd }, gravityMPerS2: 0, ballMassKg: massKg, stepS },
    );
  const exact = (massKg: number) => {
    const k = (rho * crossSectionM2(BALL_RADIUS_M) * cd) / (2 * massKg);
    return { tS: (Math.exp(k * d) - 1) / (k * v0), vMPerS: v0 * Math.exp(-k * d) };
  };

  it("a 0.145 kg ball reaches the plate at the closed-form time and speed within 1e-9 relative (1 ms steps)", () => {
    const r = fly(0.145, 0.001);
    const e = exact(0.145);
    expectRelative(r.timeToPlateS, e.tS, 1e-9);
    expectRelative(r.speedAtPlateMPerS, e.vMPerS, 1e-9);
    expectAbsolute(r.plateCrossingM[0], 0, 1e-12);
    expectAbsolute(r.plateCrossingM[2], 1.8, 1e-12);
  });

  it("halving the RK4 step from 20 ms to 10 ms divides the time error by 12 to 20 (4th order: 16)", () => {
    // A 0.01 kg ball makes drag strong (k v0 = 3.6 /s) so the errors stand well above rounding.
    const e = exact(0.01);
    const coarse = Math.abs(fly(0.01, 0.02).timeToPlateS - e.tS);
    const fine = Math.abs(fly(0.01, 0.01).timeToPlateS - e.tS);
    const ratio = coarse / fine;
    expect(ratio).toBeGreaterThan(12);
    expect(ratio).toBeLessThan(20);
  });
});

describe("RK4 order on a full pitch (gravity, Giordano drag, Sawicki Magnus)", () => {
  it("halving the step from 20 ms to 10 ms divides the plate-height error by 12 to 20 (reference: 0.25 ms)", () => {
    const launch: Launch = {
      releasePositionM: releasePosition(),
      releaseVelocityMPerS: releaseVelocity(95 * M_PER_S_PER_MPH, -1.5 * DEG, 1 * DEG),
      spinRadPerS: [-2200 * RAD_PER_S_PER_RPM, 0, 600 * RAD_PER_S_PER_RPM],
    };
    const z = (stepS: number) => simulateFlight(launch, { stepS }).plateCrossingM[2];
    const reference = z(0.00025);
    const ratio = Math.abs(z(0.02) - reference) / Math.abs(z(0.01) - reference);
    expect(ratio).toBeGreaterThan(12);
    expect(ratio).toBeLessThan(20);
  });
});

describe("invalid launches", () => {
  const ok: Launch = { releasePositionM: [0, 16.6, 1.8], releaseVelocityMPerS: [0, -40, 0], spinRadPerS: [0, 0, 0] };

  it("throws RangeError for a ball thrown away from the plate (vy >= 0)", () => {
    expect(() => simulateFlight({ ...ok, releaseVelocityMPerS: [0, 40, 0] })).toThrow(/release velocity y 40 m\/s must be negative/);
  });

  it("throws RangeError when a 1 m/s throw has not reached the plate after 10 s", () => {
    expect(() => simulateFlight({ ...ok, releaseVelocityMPerS: [0, -1, 0] }, { gravityMPerS2: 0 })).toThrow(/did not reach the plate/);
  });

  it("throws RangeError for a release behind the plate, a bad step and a bad mass", () => {
    expect(() => simulateFlight({ ...ok, releasePositionM: [0, 0.2, 1.8] })).toThrow(/release y 0.2 m/);
    expect(() => simulateFlight(ok, { stepS: 0.1 })).toThrow(/step 0.1 s/);
    expect(() => simulateFlight(ok, { ballMassKg: 0 })).toThrow(/ball mass 0 kg/);
    expect(() => simulateFlight({ ...ok, spinRadPerS: [2000, 0, 0] })).toThrow(/spin rate 2000 rad\/s/);
  });

  it("throws a plain Error (not RangeError) when a seam hook returns NaN", () => {
    const nan = (_: unknown, f: Float64Array) => {
      f[0] = Number.NaN;
    };
    expect(() => simulateFlight(ok, { seamForce: nan })).toThrow(/non-finite/);
    expect(() => simulateFlight(ok, { seamForce: nan })).not.toThrow(RangeError);
  });
});
