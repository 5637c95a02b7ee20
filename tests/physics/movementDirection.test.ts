import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { clockDifferenceMinutes, clockToAngle } from "../../geometry/clock.js";
import { type ClockView } from "../../geometry/frames.js";
import { compareMovementDirections, movementClockMinutes } from "../../src/physics/movementDirection.js";
import { expectAbsolute } from "../support/tolerance.js";
import { uniform } from "../support/arbitraries.js";

/** Clock minutes of angle `rad` clockwise from 12:00, in [0, 720) (one minute of clock is half a degree). */
const minutesOf = (rad: number) => ((((rad / (2 * Math.PI)) * 720) % 720) + 720) % 720;
/** Distance between two clock readings in minutes, taking the wrap at 12:00 into account. */
const clockGap = (a: number, b: number) => Math.abs(((b - a + 1080) % 720) - 360);

describe("spin-based against observed direction on the clock (geometry/frames.ts: 12:00 up, 3:00 the viewer's right)", () => {
  const up = { horizontalM: 0, verticalM: 0.4 };
  const plusX = { horizontalM: 0.3, verticalM: 0 };
  const minusX = { horizontalM: -0.3, verticalM: 0 };
  const down = { horizontalM: 0, verticalM: -0.1 };

  it("reads 12:00 up and 6:00 down in both views; -x is 3:00 from behind the pitcher, +x from behind the catcher", () => {
    const p = compareMovementDirections(up, minusX, "pitcher");
    expect(p.spinBased).toEqual({ minutes: 0, text: "12:00" });
    expect(p.observed).toEqual({ minutes: 180, text: "3:00" });
    expect(compareMovementDirections(plusX, down, "pitcher").spinBased?.text).toBe("9:00");
    const c = compareMovementDirections(down, plusX, "catcher");
    expect(c.spinBased?.text).toBe("6:00");
    expect(c.observed?.text).toBe("3:00");
    // up and to -x (a right-hander's arm side) at 45 deg: 1:30 from behind the pitcher, 10:30 from behind the catcher
    const armSideUp = { horizontalM: -0.2, verticalM: 0.2 };
    expect(compareMovementDirections(armSideUp, up, "pitcher").spinBased).toEqual({ minutes: 90, text: "1:30" });
    expect(compareMovementDirections(armSideUp, up, "catcher").spinBased).toEqual({ minutes: 630, text: "10:30" });
  });

  it("gives the signed gap across 12:00: 11:50 to 12:10 is +20 min (+10 deg) clockwise, the reverse -20 min, mirrored in the other view", () => {
    // 10 minutes of clock is 5 deg from 12:00: from behind the pitcher 11:50 leans to +x, 12:10 to -x
    const tilt = (minutes: number, view: ClockView) => {
      const a = clockToAngle(minutes);
      const right = view === "pitcher" ? -1 : 1;
      return { horizontalM: right * 0.3 * Math.sin(a), verticalM: 0.3 * Math.cos(a) };
    };
    const spin = tilt(710, "pitcher");
    const observed = tilt(10, "pitcher");
    const p = compareMovementDirections(spin, observed, "pitcher");
    expect(p.spinBased?.text).toBe("11:50");
    expect(p.observed?.text).toBe("12:10");
    expectAbsolute(p.differenceMinutes!, 20, 1e-9);
    expectAbsolute(p.differenceDeg!, 10, 1e-9);
    expectAbsolute(compareMovementDirections(observed, spin, "pitcher").differenceMinutes!, -20, 1e-9);
    const c = compareMovementDirections(spin, observed, "catcher");
    expect(c.spinBased?.text).toBe("12:10");
    expect(c.observed?.text).toBe("11:50");
    expectAbsolute(c.differenceMinutes!, -20, 1e-9);
  });

  it("puts opposite directions 360 minutes (180 deg) apart, and a (near) zero vector has no direction", () => {
    const opposite = compareMovementDirections(up, down, "pitcher");
    expect(opposite.differenceMinutes).toBe(360);
    expect(opposite.differenceDeg).toBe(180);
    const none = compareMovementDirections({ horizontalM: 1e-8, verticalM: 0 }, up, "catcher");
    expect(none.spinBased).toBeNull();
    expect(none.observed?.text).toBe("12:00");
    expect(none.differenceMinutes).toBeNull();
    expect(none.differenceDeg).toBeNull();
  });

  it("rejects an unknown view and a non-finite movement (one-line RangeError)", () => {
    expect(() => compareMovementDirections(up, down, "umpire" as ClockView)).toThrow(/^clock view "umpire"/);
    expect(() => compareMovementDirections(up, { horizontalM: NaN, verticalM: 0 }, "pitcher")).toThrow(/^observed movement \(NaN, 0\) m/);
  });

  it("reads any movement at the clock angle atan2(-x, up) from behind the pitcher and atan2(x, up) from behind the catcher, mirror images m <-> 720 - m, for 300 random movements, within 1e-9 min (geometry/frames.ts conventions; closed form)", () => {
    const component = uniform(-0.6, 0.6);
    fc.assert(
      fc.property(component, component, (horizontalM, verticalM) => {
        fc.pre(Math.hypot(horizontalM, verticalM) > 1e-3);
        const m = { horizontalM, verticalM };
        const p = movementClockMinutes(m, "pitcher")!;
        const c = movementClockMinutes(m, "catcher")!;
        expect(clockGap(p, minutesOf(Math.atan2(-horizontalM, verticalM)))).toBeLessThan(1e-9);
        expect(clockGap(c, minutesOf(Math.atan2(horizontalM, verticalM)))).toBeLessThan(1e-9);
        expect(clockGap(p, (720 - c) % 720)).toBeLessThan(1e-9);
      }),
      { seed: 630, numRuns: 300 },
    );
  });

  it("gives the gap the clock module gives (geometry/clock.ts clockDifferenceMinutes), and its negative with the two swapped, for 300 random pairs within 1e-9 min", () => {
    const component = uniform(-0.6, 0.6);
    const movement = fc.record({ horizontalM: component, verticalM: component }).filter((m) => Math.hypot(m.horizontalM, m.verticalM) > 1e-3);
    fc.assert(
      fc.property(movement, movement, fc.constantFrom<ClockView>("pitcher", "catcher"), (spin, observed, view) => {
        const d = compareMovementDirections(spin, observed, view).differenceMinutes!;
        const viaClock = clockDifferenceMinutes(movementClockMinutes(spin, view)!, movementClockMinutes(observed, view)!);
        expectAbsolute(d, viaClock, 1e-9);
        const back = compareMovementDirections(observed, spin, view).differenceMinutes!;
        // antisymmetric except at exactly opposite directions, where both read +360
        if (Math.abs(Math.abs(d) - 360) > 1e-9) expectAbsolute(back, -d, 1e-9);
      }),
      { seed: 631, numRuns: 300 },
    );
  });
});
