import { describe, expect, it } from "vitest";
import { clockToAngle, parseClock } from "../../geometry/clock.js";
import { flyPitch, spinVector, ZONE_CENTRE_M } from "../../src/physics/pitchFlight.js";
import type { Pitch } from "../../src/screening/pitch.js";
import { sinkerPitch } from "../support/pitches.js";
import { DEG } from "../../geometry/units.js";

const fastball: Pitch = sinkerPitch({ name: "four-seam", speedMPerS: 94 * 0.44704, spinRadPerS: (2350 * 2 * Math.PI) / 60, tiltRad: clockToAngle(parseClock("12:45")), gyroRad: 0, want: "any" });

describe("a screened pitch in flight", () => {
  it("aims the full flight at the middle of the zone to 1e-5 m", () => {
    const f = flyPitch({ pitch: fastball, axisBall: [0, 0, 1] });
    expect(Math.abs(f.flight.plateCrossingM[0] - ZONE_CENTRE_M[0])).toBeLessThan(1e-5);
    expect(Math.abs(f.flight.plateCrossingM[2] - ZONE_CENTRE_M[1])).toBeLessThan(1e-5);
  });

  it("gives the four-seam hold at zero gyro no seam movement (its turn-averaged seam force is zero by symmetry), to 1e-6 in", () => {
    const f = flyPitch({ pitch: fastball, axisBall: [0, 0, 1] });
    expect(Math.abs(f.movement.seamBreakM.xM) / 0.0254).toBeLessThan(1e-6);
    expect(Math.abs(f.movement.seamBreakM.zM) / 0.0254).toBeLessThan(1e-6);
  });

  it("makes a backspin fastball rise against the spinless flight by 10 to 25 in (common practice, from memory: four-seamers show about 14 to 19 in of induced vertical break over the 50 ft window; the bounds leave room for the window and the lift law)", () => {
    const f = flyPitch({ pitch: fastball, axisBall: [0, 0, 1] });
    const up = f.movement.magnusBreakM.zM / 0.0254;
    expect(up).toBeGreaterThan(10);
    expect(up).toBeLessThan(25);
  });

  it("points the spin vector by the tilt: 12:00 from behind the pitcher is pure backspin about -x (right-hand rule)", () => {
    const w = spinVector({ ...fastball, tiltRad: 0 });
    expect(w[0] / fastball.spinRadPerS).toBeCloseTo(-1, 12);
  });

  it("has no air force in a vacuum: the seam and Magnus parts vanish", () => {
    const f = flyPitch({ pitch: fastball, axisBall: [0.3, 0.4, 0.866], vacuum: true });
    expect(Math.hypot(f.movement.breakM.xM, f.movement.breakM.zM)).toBeLessThan(1e-12);
  });

  it("scales the seam movement with the calibration factor (linear to 2 %)", () => {
    const axis: [number, number, number] = [0.2, 0.9, 0.39];
    const one = flyPitch({ pitch: { ...fastball, gyroRad: 15 * DEG }, axisBall: axis, launch: { verticalRad: -1 * DEG, horizontalRad: 0 } });
    const two = flyPitch({ pitch: { ...fastball, gyroRad: 15 * DEG }, axisBall: axis, launch: { verticalRad: -1 * DEG, horizontalRad: 0 }, seamForce: { scale: 2 } });
    const a = Math.hypot(one.movement.seamBreakM.xM, one.movement.seamBreakM.zM);
    const b = Math.hypot(two.movement.seamBreakM.xM, two.movement.seamBreakM.zM);
    expect(a).toBeGreaterThan(1e-4);
    expect(Math.abs(b / a - 2)).toBeLessThan(0.04);
  });
});
