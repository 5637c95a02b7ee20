import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { angleToClock, CLOCK_MINUTES, clockDifferenceMinutes, clockToAngle, formatClock, oppositeClock, parseClock } from "../../geometry/clock.js";
import { uniform } from "../support/arbitraries.js";

// A 12-hour clock face: 720 minutes to the turn, so one minute of clock is half a degree
// and six hours is the opposite direction (common practice, no source).

/** Every reading "H:MM" the tool prints, 12:00 first. */
const READINGS = Array.from({ length: 720 }, (_, m) => `${Math.floor(m / 60) === 0 ? 12 : Math.floor(m / 60)}:${String(m % 60).padStart(2, "0")}`);
const minutes = uniform(-5000, 5000);

describe("clock readings", () => {
  it("parses and formats clock readings (12:00 = 0 min, 6:00 = 360 min)", () => {
    expect(parseClock("12:00")).toBe(0);
    expect(parseClock("0:00")).toBe(0);
    expect(parseClock("6:00")).toBe(360);
    expect(parseClock("1:45")).toBe(105);
    expect(formatClock(0)).toBe("12:00");
    expect(formatClock(719.6)).toBe("12:00");
    expect(formatClock(105)).toBe("1:45");
    for (const bad of ["13:00", "1:60", "noon", "1.30", ""]) expect(() => parseClock(bad)).toThrow(/tilt/);
  });

  it("round-trips every one of the 720 readings, text -> minutes -> text, and minutes m to 60 H + MM (exhaustive)", () => {
    READINGS.forEach((text, m) => {
      expect(parseClock(text)).toBe(m);
      expect(formatClock(m)).toBe(text);
    });
    expect(CLOCK_MINUTES).toBe(720);
  });

  it("formats any number of minutes as the reading of the nearest whole minute, wrapped into one turn (1000 random values from -5000 to 5000 min)", () => {
    fc.assert(
      fc.property(minutes, (m) => {
        const wrapped = ((Math.round(m) % 720) + 720) % 720;
        expect(parseClock(formatClock(m))).toBe(wrapped);
      }),
      { seed: 720, numRuns: 1000, examples: [[0], [-0.5], [359.5], [719.5], [-720], [1440.49]] },
    );
  });

  it("turns minutes into the clockwise angle from 12:00 at 0.5 deg per minute and back, within 1e-9 min (1000 random values)", () => {
    expect(clockToAngle(180)).toBeCloseTo(Math.PI / 2, 15);
    fc.assert(
      fc.property(uniform(0, 719.999), (m) => {
        expect(Math.abs(clockToAngle(m) - (m * 0.5 * Math.PI) / 180)).toBeLessThan(1e-12);
        expect(Math.abs(angleToClock(clockToAngle(m)) - m)).toBeLessThan(1e-9);
        // whole turns do not change the reading
        const back = angleToClock(clockToAngle(m) + 2 * Math.PI * 3);
        expect(Math.min(Math.abs(back - m), 720 - Math.abs(back - m))).toBeLessThan(1e-9);
      }),
      { seed: 721, numRuns: 1000 },
    );
  });

  it("gives a signed difference in (-360, 360] that is b - a modulo 720 and changes sign when a and b swap (except at exactly 360), for 1000 random pairs, within 1e-9 min", () => {
    fc.assert(
      fc.property(minutes, minutes, (a, b) => {
        const d = clockDifferenceMinutes(a, b);
        expect(d).toBeGreaterThan(-360);
        expect(d).toBeLessThanOrEqual(360);
        const k = (b - a - d) / 720;
        expect(Math.abs(k - Math.round(k))).toBeLessThan(1e-9);
        const back = clockDifferenceMinutes(b, a);
        if (d === 360) expect(back).toBe(360);
        else expect(Math.abs(back + d)).toBeLessThan(1e-9);
      }),
      { seed: 722, numRuns: 1000 },
    );
    expect(clockDifferenceMinutes(710, 10)).toBe(20);
    expect(clockDifferenceMinutes(10, 710)).toBe(-20);
    expect(clockDifferenceMinutes(0, 360)).toBe(360);
    expect(clockDifferenceMinutes(360, 0)).toBe(360);
  });

  it("names the opposite direction six hours on, and twice opposite is the reading itself, for all 720 readings (exhaustive)", () => {
    expect(oppositeClock("1:30")).toBe("7:30");
    expect(oppositeClock("10:15")).toBe("4:15");
    expect(oppositeClock(null)).toBeNull();
    for (const text of READINGS) {
      const opposite = oppositeClock(text)!;
      expect(Math.abs(clockDifferenceMinutes(parseClock(text), parseClock(opposite)))).toBe(360);
      expect(oppositeClock(opposite)).toBe(text);
    }
  });
});
