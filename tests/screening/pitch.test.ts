import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { clockToAngle, parseClock, angleToClock, formatClock } from "../../geometry/clock.js";
import { directionToClockAngle, type ClockView, type Hand } from "../../geometry/frames.js";
import { DEG } from "../../geometry/units.js";
import { pitchFrame, type Pitch } from "../../src/screening/pitch.js";
import { uniform } from "../support/arbitraries.js";
import { sinkerPitch } from "../support/pitches.js";

const pitch = (over: Partial<Pitch> = {}): Pitch => sinkerPitch({ name: "test", ...over });
/** Angle between two clock readings in minutes, taking the wrap at 12:00 into account. */
const clockGap = (a: number, b: number) => Math.abs(((b - a + 1080) % 720) - 360);
const MINUTES = uniform(0, 720);
const GYRO = uniform(-80 * DEG, 80 * DEG);
const VIEW = fc.constantFrom<ClockView>("pitcher", "catcher");
const HAND = fc.constantFrom<Hand>("right", "left");

describe("a pitch's field frame: the spin axis, the across direction a and the Magnus direction m", () => {
  it("reads the same spin axis from both views as mirror clocks (1:45 from behind the pitcher is 10:15 from behind the catcher), for both hands", () => {
    for (const hand of ["right", "left"] as const) {
      const fp = pitchFrame(pitch({ hand, view: "pitcher" }));
      const fc = pitchFrame(pitch({ hand, view: "catcher", tiltRad: clockToAngle(parseClock("10:15")) }));
      fp.spinAxis.forEach((x, k) => expect(Math.abs(x - fc.spinAxis[k])).toBeLessThan(1e-12));
      fp.pushLine.forEach((x, k) => expect(Math.abs(x - fc.pushLine[k])).toBeLessThan(1e-12));
      // the across direction a of a 1:45 tilt, read from behind the pitcher, is a quarter turn on: 4:45 (closed form)
      expect(formatClock(angleToClock(directionToClockAngle(fp.pushLine, "pitcher")!))).toBe("4:45");
      // arm side: the pitcher's right (-x) for a right-hander (common practice, no source)
      expect(fp.armSide[0]).toBe(hand === "right" ? -1 : 1);
    }
  });

  it("puts the Magnus direction at the tilt and the push line a quarter turn from it, a = (-cos t, 0, -+sin t): 180 clock minutes clockwise from behind the pitcher, counterclockwise from behind the catcher (closed form of a = unit(w - (w . v) v), an axial vector's part), for 500 random pitches, to 1e-9 min and 1e-14", () => {
    fc.assert(
      fc.property(MINUTES, GYRO, VIEW, HAND, (m, g, view, hand) => {
        const t = clockToAngle(m);
        const f = pitchFrame(pitch({ tiltRad: t, gyroRad: g, view, hand }));
        expect(clockGap(angleToClock(directionToClockAngle(f.magnus, view)!), m)).toBeLessThan(1e-9);
        expect(clockGap(angleToClock(directionToClockAngle(f.pushLine, view)!), (m + (view === "pitcher" ? 180 : 540)) % 720)).toBeLessThan(1e-9);
        const side = view === "pitcher" ? -1 : 1;
        const a = [-Math.cos(t), 0, side * Math.sin(t)];
        for (let k = 0; k < 3; k++) expect(Math.abs(f.pushLine[k] - a[k])).toBeLessThan(1e-14);
      }),
      { seed: 1, numRuns: 500 },
    );
  });

  it("mirrors with the pitch: the other hand, tilt m -> 720 - m and gyro g -> -g give a = (ax, 0, -az) and m = (mx, 0, -mz) under x -> -x (axial vectors), for 500 random pitches, to 1e-14", () => {
    fc.assert(
      fc.property(MINUTES, GYRO, VIEW, HAND, (m, g, view, hand) => {
        const other: Hand = hand === "right" ? "left" : "right";
        const f = pitchFrame(pitch({ tiltRad: clockToAngle(m), gyroRad: g, view, hand }));
        const fm = pitchFrame(pitch({ tiltRad: clockToAngle(720 - m), gyroRad: -g, view, hand: other }));
        expect(Math.abs(fm.pushLine[0] - f.pushLine[0])).toBeLessThan(1e-14);
        expect(Math.abs(fm.pushLine[2] + f.pushLine[2])).toBeLessThan(1e-14);
        expect(Math.abs(fm.magnus[0] + f.magnus[0])).toBeLessThan(1e-14);
        expect(Math.abs(fm.magnus[2] - f.magnus[2])).toBeLessThan(1e-14);
        expect(fm.armSide[0]).toBe(-f.armSide[0]);
      }),
      { seed: 3, numRuns: 500 },
    );
  });
});
