import { describe, expect, it } from "vitest";
import { findLandmarks, landmarkByName } from "../../geometry/landmarks.js";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { measureOrientation, TIMELINE_STEPS } from "../../src/sampling/measure.js";

const lm = findLandmarks(DEFAULT_SEAM_SHAPE);

describe("measureOrientation", () => {
  it("finds 4 crossings per revolution for the four-seam axis (through a waist) and 2 for the two-seam axis (equator under a tip), as the trade names them (common practice, no source; Nathan, Am. J. Phys. 2008: 2 and 4 seam passes)", () => {
    expect(measureOrientation({ axis: landmarkByName(lm, "waist-A")!.direction, gyroRad: 0 }).crossingsPerRevolution).toBe(4);
    expect(measureOrientation({ axis: [1, 1, 0], gyroRad: 0 }).crossingsPerRevolution).toBe(2);
  });

  it("gives the classic symmetric holds no net asymmetry (common practice, no source: they average out over a turn), to 1e-12", () => {
    for (const axis of [landmarkByName(lm, "waist-A")!.direction, [1, 1, 0] as [number, number, number]]) {
      expect(measureOrientation({ axis, gyroRad: 0 }).magnitude).toBeLessThan(1e-12);
    }
  });

  it("has a 360-phase timeline whose average equals the exact turn average to 3e-3 (rectangle rule over one turn)", () => {
    const m = measureOrientation({ axis: [0.4, 0.3, 0.87], gyroRad: 0.25 });
    expect(m.timeline!.axisPlus.length).toBe(TIMELINE_STEPS);
    let plus = 0;
    let minus = 0;
    for (let i = 0; i < TIMELINE_STEPS; i++) {
      plus += m.timeline!.axisPlus[i];
      minus += m.timeline!.axisMinus[i];
    }
    expect(Math.abs(plus / TIMELINE_STEPS - m.axisPlus)).toBeLessThan(3e-3);
    expect(Math.abs(minus / TIMELINE_STEPS - m.axisMinus)).toBeLessThan(3e-3);
  });

  it("normalises the axis and rejects a zero axis and |gyro| >= 90 deg", () => {
    const m = measureOrientation({ axis: [0, 0, 5], gyroRad: 0 });
    expect(m.axis).toEqual([0, 0, 1]);
    expect(() => measureOrientation({ axis: [0, 0, 0], gyroRad: 0 })).toThrow(/zero/);
    expect(() => measureOrientation({ axis: [0, 0, 1], gyroRad: Math.PI / 2 })).toThrow(/gyro/);
  });
});
