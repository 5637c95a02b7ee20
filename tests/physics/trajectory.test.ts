import { describe, expect, it } from "vitest";
import { PLATE_FRONT_Y_M } from "../../src/physics/field.js";
import { simulateFlight, type Launch } from "../../src/physics/flight.js";
import { releasePosition, releaseVelocity } from "../../src/physics/launch.js";
import { movementVersusSpinless } from "../../src/physics/movement.js";
import { recordFlight, TrajectoryRecorder } from "../../src/physics/trajectory.js";
import { DEG as RAD_PER_DEG, M_PER_S_PER_MPH, RAD_PER_S_PER_RPM } from "../../geometry/units.js";
import { expectAbsolute, expectRelative } from "../support/tolerance.js";

const G = 9.80665;
const launch: Launch = {
  releasePositionM: releasePosition(),
  releaseVelocityMPerS: releaseVelocity(90 * M_PER_S_PER_MPH, -2 * RAD_PER_DEG, 1 * RAD_PER_DEG),
  spinRadPerS: [-2200 * RAD_PER_S_PER_RPM, 0, 300 * RAD_PER_S_PER_RPM],
};

describe("trajectory capture", () => {
  const plain = simulateFlight(launch);
  const { flight, samples } = recordFlight(launch);

  it("does not change the flight: the plate crossing and time are bit-for-bit those of a flight without it", () => {
    expect(flight.plateCrossingM).toEqual(plain.plateCrossingM);
    expect(flight.timeToPlateS).toBe(plain.timeToPlateS);
    expect(flight.velocityAtPlateMPerS).toEqual(plain.velocityAtPlateMPerS);
  });

  it("records release, every full 1 ms step at t = n h, and the plate crossing: steps + 2 points", () => {
    const n = samples.tS.length;
    expect(n).toBe(flight.steps + 2);
    expect(samples.tS[0]).toBe(0);
    expect([samples.xM[0], samples.yM[0], samples.zM[0]]).toEqual(launch.releasePositionM);
    for (let i = 1; i < n - 1; i++) expect(samples.tS[i]).toBe(i * 0.001);
    expect(samples.tS[n - 1]).toBe(flight.timeToPlateS);
    expectAbsolute(samples.yM[n - 1], PLATE_FRONT_Y_M, 1e-12);
    expect([samples.xM[n - 1], samples.yM[n - 1], samples.zM[n - 1]]).toEqual(flight.plateCrossingM);
    // every recorded point but the last lies beyond the plate plane, in time order
    for (let i = 1; i < n; i++) expect(samples.tS[i]).toBeGreaterThan(samples.tS[i - 1]);
    for (let i = 0; i < n - 1; i++) expect(samples.yM[i]).toBeGreaterThan(PLATE_FRONT_Y_M);
  });

  it("in vacuum the recorded points lie on the closed-form parabola (x, y within 1e-12 m; z = z0 + vz t - g t^2 / 2 within 1e-9 relative)", () => {
    const r = recordFlight(launch, { vacuum: true }).samples;
    const [x0, y0, z0] = launch.releasePositionM;
    const [vx, vy, vz] = launch.releaseVelocityMPerS;
    for (let i = 0; i < r.tS.length; i += 37) {
      const t = r.tS[i];
      expectAbsolute(r.xM[i], x0 + vx * t, 1e-12);
      expectAbsolute(r.yM[i], y0 + vy * t, 1e-12);
      expectRelative(r.zM[i], z0 + vz * t - 0.5 * G * t * t, 1e-9);
    }
  });

  it("grows past its initial room: a 0.1 ms step records all of about 4000 points", () => {
    const recorder = new TrajectoryRecorder();
    const f = simulateFlight(launch, { stepS: 1e-4, trajectory: recorder.record });
    expect(recorder.length).toBe(f.steps + 2);
    expect(recorder.length).toBeGreaterThan(2048);
    const s = recorder.samples();
    expect(s.tS[s.tS.length - 1]).toBe(f.timeToPlateS);
    recorder.clear();
    expect(recorder.length).toBe(0);
  });

  it("movementVersusSpinless passes the callback to the full flight only (steps + 2 points, ending at its crossing)", () => {
    const recorder = new TrajectoryRecorder();
    const m = movementVersusSpinless(launch, { trajectory: recorder.record, seamForce: (_input, forceN) => void (forceN[0] = 0.05) });
    expect(recorder.length).toBe(m.flight.steps + 2);
    const s = recorder.samples();
    expect(s.xM[s.xM.length - 1]).toBe(m.flight.plateCrossingM[0]);
  });
});
