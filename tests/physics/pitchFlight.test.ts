import { describe, expect, it } from "vitest";
import { clockToAngle, parseClock } from "../../geometry/clock.js";
import { flyPitch, spinVector, ZONE_CENTRE_M } from "../../src/physics/pitchFlight.js";
import { seamModel } from "../../src/physics/seamModel/model.js";
import { resolveProfile } from "../../src/physics/seamModel/parameters.js";
import type { Pitch } from "../../src/screening/pitch.js";
import { sinkerPitch } from "../support/pitches.js";
import { DEG } from "../../geometry/units.js";

const model = seamModel();
const fastball: Pitch = sinkerPitch({ name: "four-seam", speedMPerS: 94 * 0.44704, spinRadPerS: (2350 * 2 * Math.PI) / 60, tiltRad: clockToAngle(parseClock("12:45")), gyroRad: 0, want: "any" });

describe("a screened pitch in flight", () => {
  it("aims the full flight at the middle of the zone to 1e-5 m", () => {
    const f = flyPitch({ pitch: fastball, axisBall: [0, 0, 1], model });
    expect(Math.abs(f.flight.plateCrossingM[0] - ZONE_CENTRE_M[0])).toBeLessThan(1e-5);
    expect(Math.abs(f.flight.plateCrossingM[2] - ZONE_CENTRE_M[1])).toBeLessThan(1e-5);
  });

  it("gives the four-seam hold at zero gyro no seam movement (its turn-averaged seam force is zero by symmetry), to 1e-6 in", () => {
    const f = flyPitch({ pitch: fastball, axisBall: [0, 0, 1], model });
    expect(Math.abs(f.fromRelease.seamM.xM) / 0.0254).toBeLessThan(1e-6);
    expect(Math.abs(f.fromRelease.seamM.zM) / 0.0254).toBeLessThan(1e-6);
    expect(Math.abs(f.trade.seamM.horizontalBreakM) / 0.0254).toBeLessThan(1e-6);
    expect(Math.abs(f.trade.seamM.inducedVerticalBreakM) / 0.0254).toBeLessThan(1e-6);
  });

  it("makes a backspin fastball rise against the spinless flight by 10 to 25 in (common practice, no source: four-seamers show about 15 to 20 in of induced vertical break)", () => {
    const f = flyPitch({ pitch: fastball, axisBall: [0, 0, 1], model });
    const up = f.fromRelease.magnusM.zM / 0.0254;
    expect(up).toBeGreaterThan(10);
    expect(up).toBeLessThan(25);
  });

  it("points the spin vector by the tilt: 12:00 from behind the pitcher is pure backspin about -x (right-hand rule)", () => {
    const w = spinVector({ ...fastball, tiltRad: 0 });
    expect(w[0] / fastball.spinRadPerS).toBeCloseTo(-1, 12);
  });

  it("has no air force in a vacuum: the seam and Magnus parts vanish", () => {
    const f = flyPitch({ pitch: fastball, axisBall: [0.3, 0.4, 0.866], vacuum: true, model });
    expect(Math.hypot(f.fromRelease.breakM.xM, f.fromRelease.breakM.zM)).toBeLessThan(1e-12);
    expect(Math.hypot(f.trade.seamM.horizontalBreakM, f.trade.seamM.inducedVerticalBreakM)).toBeLessThan(1e-12);
  });

  it("scales the seam movement with the profile's scale (linear to 2 %: the seam force is small beside gravity and drag)", () => {
    const axis: [number, number, number] = [0.2, 0.9, 0.39];
    const doubled = seamModel(resolveProfile({ name: "double", parameters: { scale: 2 } }, "test"));
    const one = flyPitch({ pitch: { ...fastball, gyroRad: 15 * DEG }, axisBall: axis, model, launch: { verticalRad: -1 * DEG, horizontalRad: 0 } });
    const two = flyPitch({ pitch: { ...fastball, gyroRad: 15 * DEG }, axisBall: axis, model: doubled, launch: { verticalRad: -1 * DEG, horizontalRad: 0 } });
    const a = Math.hypot(one.trade.seamM.horizontalBreakM, one.trade.seamM.inducedVerticalBreakM);
    const b = Math.hypot(two.trade.seamM.horizontalBreakM, two.trade.seamM.inducedVerticalBreakM);
    expect(a).toBeGreaterThan(1e-4);
    expect(Math.abs(b / a - 2)).toBeLessThan(0.04);
  });
});
