import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { fixed, formatInches, formatMovementIn, percent, rounded, signed } from "../../src/render/numbers.js";
import { uniform } from "../support/arbitraries.js";

describe("numbers written for people", () => {
  it("writes fixed decimals with no minus sign on a value that rounds to zero, and an explicit sign when asked", () => {
    expect(fixed(-0.004, 2)).toBe("0.00");
    expect(fixed(-0.005001, 2)).toBe("-0.01");
    expect(signed(0.4, 2)).toBe("+0.40");
    expect(signed(-0.0001, 2)).toBe("+0.00");
    expect(rounded(-0.04, 1)).toBe(0);
    expect(Object.is(rounded(-0.04, 1), -0)).toBe(false);
    expect(formatInches(1.1875)).toBe("1.19");
    expect(formatMovementIn(-16.54)).toBe("-16.5");
    expect(percent(0.123456)).toBe("12.35 %");
  });

  it("reads back to within half a unit of the last printed digit: rounded cells read as their text, inches to 0.005 and 0.05, for 1000 random values (round trip)", () => {
    fc.assert(
      fc.property(uniform(-0.2, 0.2), uniform(-30, 30), (score, inches) => {
        expect(String(rounded(score, 3))).toBe(String(Number(fixed(score, 3))));
        expect(Math.abs(rounded(score, 3) - score)).toBeLessThanOrEqual(0.0005 + 1e-15);
        expect(Math.abs(Number(formatInches(inches)) - inches)).toBeLessThanOrEqual(0.005 + 1e-12);
        const m = formatMovementIn(inches);
        expect(m).toMatch(/^[+-]\d+\.\d$/);
        expect(Math.abs(Number(m) - inches)).toBeLessThanOrEqual(0.05 + 1e-12);
        expect(fixed(inches, 3)).not.toMatch(/^-0\.000$/);
      }),
      { seed: 1000, numRuns: 1000 },
    );
  });
});
