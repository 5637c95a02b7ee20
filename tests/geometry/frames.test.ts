import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  armSideDirection,
  armSideSign,
  clockDirection,
  directionToClockAngle,
  gyroFromEfficiency,
  spinAxisFromTilt,
  spinEfficiency,
  tiltFromSpinAxis,
  toArmSide,
  type ClockView,
  type Hand,
} from "../../geometry/frames.js";
import { angleToClock, clockToAngle, formatClock, parseClock } from "../../geometry/clock.js";
import { cross3 } from "../../geometry/vec.js";
import { DEG } from "../../geometry/units.js";
import { uniform } from "../support/arbitraries.js";

// Field frame of the published baseball flight papers (A. M. Nathan, "The effect of spin on
// the flight of a baseball", Am. J. Phys. 76(2), 119 (2008)): x toward the catcher's right,
// y toward the pitcher, z up; the pitch flies along -y. The clock and the arm side are the
// trade's conventions (common practice, no source).

const close3 = (a: readonly number[], b: readonly number[], tol: number) => a.forEach((v, i) => expect(Math.abs(v - b[i])).toBeLessThan(tol));
const VIEW = fc.constantFrom<ClockView>("pitcher", "catcher");
const HAND = fc.constantFrom<Hand>("right", "left");
/** Clock minutes in [0, 720), not necessarily whole. */
const MINUTES = uniform(0, 720);
/** Gyro angles strictly inside (-89, 89) deg, radians. */
const GYRO = uniform(-89 * DEG, 89 * DEG);
/** Angle between two clock readings in minutes, taking the wrap at 12:00 into account. */
const clockGap = (a: number, b: number) => Math.abs(((b - a + 1080) % 720) - 360);

/**
 * The spin axis written out by hand for v = -y (the right-hand rule on the definitions in
 * geometry/frames.ts): the Magnus direction at clock angle t is (-sin t, 0, cos t) from behind
 * the pitcher (whose right is -x) and (sin t, 0, cos t) from behind the catcher; then
 * w = cos g (v x m) + sin g v gives the two closed forms below.
 */
function axisClosedForm(tiltRad: number, gyroRad: number, view: ClockView): [number, number, number] {
  const side = view === "pitcher" ? -1 : 1;
  return [-Math.cos(gyroRad) * Math.cos(tiltRad), -Math.sin(gyroRad), side * Math.cos(gyroRad) * Math.sin(tiltRad)];
}

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

  it("gives the axis the right-hand rule gives, (-cos g cos t, -sin g, -+cos g sin t) from behind the pitcher / catcher, for 500 random tilts, gyros and views, within 1e-15 (closed form)", () => {
    fc.assert(
      fc.property(MINUTES, GYRO, VIEW, (m, g, view) => {
        close3(spinAxisFromTilt(clockToAngle(m), g, view), axisClosedForm(clockToAngle(m), g, view), 1e-15);
      }),
      { seed: 1, numRuns: 500 },
    );
  });

  it("reads mirror-image clocks from the two views: 1:30 from behind the pitcher is 10:30 from behind the catcher", () => {
    const w = spinAxisFromTilt(clockToAngle(parseClock("1:30")), 15 * DEG, "pitcher");
    const back = tiltFromSpinAxis(w, "catcher");
    expect(formatClock(angleToClock(back.tiltRad!))).toBe("10:30");
    expect(back.gyroRad / DEG).toBeCloseTo(15, 12);
  });

  it("reads minutes m from behind the pitcher as 720 - m from behind the catcher: the same axis, to 4e-15 (720 - m rounds), and the same reading back, to 1e-9 min (500 random tilts and gyros)", () => {
    fc.assert(
      fc.property(MINUTES, GYRO, (m, g) => {
        const fromPitcher = spinAxisFromTilt(clockToAngle(m), g, "pitcher");
        close3(spinAxisFromTilt(clockToAngle(720 - m), g, "catcher"), fromPitcher, 4e-15);
        const read = tiltFromSpinAxis(fromPitcher, "catcher");
        expect(clockGap(angleToClock(read.tiltRad!), 720 - m)).toBeLessThan(1e-9);
      }),
      { seed: 2, numRuns: 500 },
    );
  });

  it("round-trips tilt and gyro through the axis vector for both views: unit axis to 1e-15, w . v = sin g to 1e-15, tilt to 1e-9 min and gyro to 1e-12 rad (1000 random cases)", () => {
    fc.assert(
      fc.property(MINUTES, GYRO, VIEW, (m, g, view) => {
        const w = spinAxisFromTilt(clockToAngle(m), g, view);
        expect(Math.abs(Math.hypot(...w) - 1)).toBeLessThan(1e-15);
        // gyro definition: w . v = sin(gyro) with v = -y
        expect(Math.abs(-w[1] - Math.sin(g))).toBeLessThan(1e-15);
        const back = tiltFromSpinAxis(w, view);
        expect(clockGap(angleToClock(back.tiltRad!), m)).toBeLessThan(1e-9);
        expect(Math.abs(back.gyroRad - g)).toBeLessThan(1e-12);
      }),
      { seed: 3, numRuns: 1000, examples: [[0, 0, "pitcher"], [360, 0.5, "catcher"], [180, -1.5, "pitcher"], [719.999999, 1.5, "catcher"]] },
    );
  });

  it("puts a clock hand at angle t along sin t (viewer's right) + cos t (up), and reads it back, for 500 random angles and views within 1e-9 min (closed form)", () => {
    fc.assert(
      fc.property(MINUTES, VIEW, (m, view) => {
        const t = clockToAngle(m);
        const right = view === "pitcher" ? -1 : 1;
        close3(clockDirection(t, view), [right * Math.sin(t), 0, Math.cos(t)], 1e-15);
        expect(clockGap(angleToClock(directionToClockAngle(clockDirection(t, view), view)!), m)).toBeLessThan(1e-9);
      }),
      { seed: 4, numRuns: 500 },
    );
  });

  it("a pure gyro axis has no tilt", () => {
    expect(tiltFromSpinAxis([0, -1, 0], "pitcher").tiltRad).toBeNull();
    expect(tiltFromSpinAxis([0, 1, 0], "catcher").tiltRad).toBeNull();
  });

  it("spin efficiency is cos(gyro) (definition), and its inverse", () => {
    expect(spinEfficiency(60 * DEG)).toBeCloseTo(0.5, 15);
    expect(gyroFromEfficiency(0.5) / DEG).toBeCloseTo(60, 12);
    expect(() => gyroFromEfficiency(0)).toThrow(/efficiency/);
  });
});

describe("hands: arm side", () => {
  it("is the pitcher's right (-x) for a right-hander and +x for a left-hander, by direction, sign and plate offsets (common practice, no source), for 300 random offsets", () => {
    expect(armSideDirection("right")).toEqual([-1, 0, 0]);
    expect(armSideDirection("left")).toEqual([1, 0, 0]);
    expect(armSideSign("right")).toBe(-1);
    expect(armSideSign("left")).toBe(1);
    const offset = uniform(-1, 1);
    fc.assert(
      fc.property(offset, offset, (xM, zM) => {
        expect(toArmSide(xM, zM, "right")).toEqual({ armSideM: -xM, upM: zM });
        expect(toArmSide(xM, zM, "left")).toEqual({ armSideM: xM, upM: zM });
      }),
      { seed: 5, numRuns: 300 },
    );
  });

  it("gives a mirrored pitch (x -> -x, the other hand, tilt m -> 720 - m, gyro g -> -g) the mirrored axis (wx, -wy, -wz), the mirrored Magnus direction (-x) and the same arm-side and up numbers, for 500 random pitches, within 4e-15 (720 - m rounds)", () => {
    // The spin axis is an axial vector: under the mirror M = diag(-1, 1, 1) it becomes -M w, so its
    // part along the flight (the gyro) changes sign while the polar Magnus direction w x v becomes M (w x v).
    const v: [number, number, number] = [0, -1, 0];
    fc.assert(
      fc.property(MINUTES, GYRO, VIEW, HAND, (m, g, view, hand) => {
        const other: Hand = hand === "right" ? "left" : "right";
        const w = spinAxisFromTilt(clockToAngle(m), g, view);
        const wMirror = spinAxisFromTilt(clockToAngle(720 - m), -g, view);
        close3(wMirror, [w[0], -w[1], -w[2]], 4e-15);
        const f = cross3(w, v);
        const fMirror = cross3(wMirror, v);
        close3(fMirror, [-f[0], f[1], f[2]], 4e-15);
        const a = toArmSide(f[0], f[2], hand);
        const b = toArmSide(fMirror[0], fMirror[2], other);
        expect(Math.abs(a.armSideM - b.armSideM)).toBeLessThan(4e-15);
        expect(Math.abs(a.upM - b.upM)).toBeLessThan(4e-15);
      }),
      { seed: 6, numRuns: 500 },
    );
  });
});
