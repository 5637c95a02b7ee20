import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { clockToAngle, parseClock, angleToClock, formatClock } from "../../geometry/clock.js";
import { directionToClockAngle, type ClockView, type Hand } from "../../geometry/frames.js";
import { DEG } from "../../geometry/units.js";
import { pitchFrame, pushInField, scoreFactor, type Pitch } from "../../src/screening/pitch.js";
import { uniform } from "../support/arbitraries.js";
import { sinkerPitch } from "../support/pitches.js";

const pitch = (over: Partial<Pitch> = {}): Pitch => sinkerPitch({ name: "test", ...over });
/** Angle between two clock readings in minutes, taking the wrap at 12:00 into account. */
const clockGap = (a: number, b: number) => Math.abs(((b - a + 1080) % 720) - 360);
const MINUTES = uniform(0, 720);
const GYRO = uniform(-80 * DEG, 80 * DEG);
const VIEW = fc.constantFrom<ClockView>("pitcher", "catcher");
const HAND = fc.constantFrom<Hand>("right", "left");

describe("a pitch's frame and its push in field terms", () => {
  it("reads the same direction from both views as mirror clocks, and arm side flips with the hand", () => {
    for (const hand of ["right", "left"] as const) {
      const pp = pitch({ hand, view: "pitcher" });
      const pc = pitch({ hand, view: "catcher", tiltRad: clockToAngle(parseClock("10:15")) }); // 1:45 from behind the pitcher is 10:15 from behind the catcher
      const fp = pitchFrame(pp);
      const fc = pitchFrame(pc);
      fp.spinAxis.forEach((x, k) => expect(Math.abs(x - fc.spinAxis[k])).toBeLessThan(1e-12));
      const a = pushInField(fp, "pitcher", 0.01);
      const b = pushInField(fc, "catcher", 0.01);
      expect(clockGap(angleToClock(a.clockRad!), 720 - angleToClock(b.clockRad!))).toBeLessThan(1e-6);
      expect(Math.abs(a.armSide - b.armSide)).toBeLessThan(1e-15);
      // arm side: the pitcher's right (-x) for a right-hander (common practice, no source)
      expect(Math.sign(a.armSide)).toBe(Math.sign(hand === "right" ? -a.vector[0] : a.vector[0]));
    }
    // the same field push is arm side for one hand and glove side for the other
    const r = pushInField(pitchFrame(pitch({ hand: "right" })), "pitcher", 0.01);
    const l = pushInField(pitchFrame(pitch({ hand: "left" })), "pitcher", 0.01);
    expect(Math.abs(r.armSide + l.armSide)).toBeLessThan(1e-15);
    // the push line is a quarter turn (3 hours) clockwise of the 1:45 Magnus direction (closed form)
    expect(formatClock(angleToClock(r.clockRad!))).toBe("4:45");
  });

  it("puts the push across the Magnus direction: for pure backspin it is horizontal (arm or glove side)", () => {
    const f = pitchFrame(pitch({ tiltRad: 0, gyroRad: 0 }));
    const push = pushInField(f, "pitcher", 0.01);
    expect(Math.abs(push.up)).toBeLessThan(1e-15);
    expect(Math.abs(Math.abs(push.armSide) - 0.01)).toBeLessThan(1e-15);
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

  it("scores a push by its component toward the wanted side: cos t toward a right-hander's arm side, -cos t toward a left-hander's, the negatives toward the glove side, a_z up (closed form from a above; arm side -x for a right-hander, common practice), for 500 random pitches, to 1e-14", () => {
    fc.assert(
      fc.property(MINUTES, GYRO, VIEW, HAND, (m, g, view, hand) => {
        const t = clockToAngle(m);
        const f = pitchFrame(pitch({ tiltRad: t, gyroRad: g, view, hand }));
        const arm = hand === "right" ? Math.cos(t) : -Math.cos(t);
        const up = (view === "pitcher" ? -1 : 1) * Math.sin(t);
        expect(Math.abs(scoreFactor(f, "arm")! - arm)).toBeLessThan(1e-14);
        expect(Math.abs(scoreFactor(f, "glove")! + arm)).toBeLessThan(1e-14);
        expect(Math.abs(scoreFactor(f, "up")! - up)).toBeLessThan(1e-14);
        expect(Math.abs(scoreFactor(f, "down")! + up)).toBeLessThan(1e-14);
        expect(scoreFactor(f, "any")).toBeNull();
      }),
      { seed: 2, numRuns: 500 },
    );
  });

  it("gives a mirrored pitch (the other hand, tilt m -> 720 - m, gyro g -> -g, the mirrored seam's alongAxis -A) the same arm-side and up push and the mirror-image clock, for 500 random pitches, to 1e-14 and 1e-9 min", () => {
    // Under x -> -x the spin axis, an axial vector, goes to (wx, -wy, -wz), so the push line a to
    // (ax, 0, -az); the seam's asymmetry changes sign with the mirror, so the push A a goes to (-Ax, 0, Az).
    fc.assert(
      fc.property(MINUTES, GYRO, VIEW, HAND, uniform(-0.2, 0.2), (m, g, view, hand, along) => {
        fc.pre(Math.abs(along) > 1e-6);
        const other: Hand = hand === "right" ? "left" : "right";
        const f = pitchFrame(pitch({ tiltRad: clockToAngle(m), gyroRad: g, view, hand }));
        const fm = pitchFrame(pitch({ tiltRad: clockToAngle(720 - m), gyroRad: -g, view, hand: other }));
        const push = pushInField(f, view, along);
        const mirrored = pushInField(fm, view, -along);
        expect(Math.abs(mirrored.armSide - push.armSide)).toBeLessThan(1e-14);
        expect(Math.abs(mirrored.up - push.up)).toBeLessThan(1e-14);
        expect(Math.abs(mirrored.vector[0] + push.vector[0])).toBeLessThan(1e-14);
        expect(clockGap(angleToClock(mirrored.clockRad!), 720 - angleToClock(push.clockRad!))).toBeLessThan(1e-9);
      }),
      { seed: 3, numRuns: 500 },
    );
  });
});
