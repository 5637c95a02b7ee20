import { describe, expect, it } from "vitest";
import { armSideDirection, spinAxisFromTilt, spinEfficiency, tiltFromSpinAxis, gyroFromEfficiency } from "../../geometry/frames.js";
import { clockToAngle, formatClock, parseClock, angleToClock } from "../../geometry/clock.js";
import { cross3 } from "../../geometry/vec.js";
import { lcg } from "../support/random.js";
import { DEG } from "../../geometry/units.js";

const close3 = (a: readonly number[], b: readonly number[], tol: number) => a.forEach((v, i) => expect(Math.abs(v - b[i])).toBeLessThan(tol));

describe("field frame, tilt clock and gyro", () => {
  it("12:00 from either view is pure backspin: axis -x for a ball flying along -y, so the top of the ball moves back toward the pitcher (right-hand rule)", () => {
    for (const view of ["pitcher", "catcher"] as const) {
      const w = spinAxisFromTilt(0, 0, view);
      close3(w, [-1, 0, 0], 1e-15);
      // velocity of the ball's top point relative to its centre: w x (0, 0, R) points to +y
      close3(cross3(w, [0, 0, 1]), [0, 1, 0], 1e-15);
    }
  });

  it("3:00 from behind the pitcher pushes toward the pitcher's right (-x); from behind the catcher toward the catcher's right (+x)", () => {
    const wp = spinAxisFromTilt(clockToAngle(parseClock("3:00")), 0, "pitcher");
    close3(cross3(wp, [0, -1, 0]), [-1, 0, 0], 1e-15);
    const wc = spinAxisFromTilt(clockToAngle(parseClock("3:00")), 0, "catcher");
    close3(cross3(wc, [0, -1, 0]), [1, 0, 0], 1e-15);
  });

  it("reads mirror-image clocks from the two views: 1:30 from behind the pitcher is 10:30 from behind the catcher", () => {
    const w = spinAxisFromTilt(clockToAngle(parseClock("1:30")), 15 * DEG, "pitcher");
    const back = tiltFromSpinAxis(w, "catcher");
    expect(formatClock(angleToClock(back.tiltRad!))).toBe("10:30");
    expect(back.gyroRad / DEG).toBeCloseTo(15, 12);
  });

  it("round-trips tilt and gyro through the axis vector for both views (200 random cases, to 1e-12 rad)", () => {
    const rnd = lcg(7);
    for (let i = 0; i < 200; i++) {
      const tilt = rnd() * 2 * Math.PI;
      const gyro = (rnd() * 2 - 1) * 89 * DEG;
      for (const view of ["pitcher", "catcher"] as const) {
        const w = spinAxisFromTilt(tilt, gyro, view);
        expect(Math.abs(Math.hypot(...w) - 1)).toBeLessThan(1e-15);
        // gyro definition: w . v = sin(gyro) with v = -y
        expect(Math.abs(-w[1] - Math.sin(gyro))).toBeLessThan(1e-15);
        const back = tiltFromSpinAxis(w, view);
        const d = Math.abs(((back.tiltRad! - tilt + 3 * Math.PI) % (2 * Math.PI)) - Math.PI);
        expect(d).toBeLessThan(1e-12);
        expect(Math.abs(back.gyroRad - gyro)).toBeLessThan(1e-12);
      }
    }
  });

  it("a pure gyro axis has no tilt", () => {
    expect(tiltFromSpinAxis([0, -1, 0], "pitcher").tiltRad).toBeNull();
  });

  it("parses and formats clock readings (12:00 = 0 min, 6:00 = 360 min)", () => {
    expect(parseClock("12:00")).toBe(0);
    expect(parseClock("6:00")).toBe(360);
    expect(parseClock("1:45")).toBe(105);
    expect(formatClock(0)).toBe("12:00");
    expect(formatClock(719.6)).toBe("12:00");
    expect(formatClock(105)).toBe("1:45");
    for (const bad of ["13:00", "1:60", "noon", "1.30", ""]) expect(() => parseClock(bad)).toThrow(/tilt/);
  });

  it("spin efficiency is cos(gyro) (definition), and its inverse", () => {
    expect(spinEfficiency(60 * DEG)).toBeCloseTo(0.5, 15);
    expect(gyroFromEfficiency(0.5) / DEG).toBeCloseTo(60, 12);
    expect(() => gyroFromEfficiency(0)).toThrow(/efficiency/);
  });

  it("arm side is the pitcher's right (-x) for a right-hander, +x for a left-hander (common practice, no source)", () => {
    expect(armSideDirection("right")).toEqual([-1, 0, 0]);
    expect(armSideDirection("left")).toEqual([1, 0, 0]);
  });
});
