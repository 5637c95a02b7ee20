import { describe, expect, it } from "vitest";
import { fixed, percent, signed } from "../../src/cli/format.js";
import { fmtScore } from "../../src/cli/screen.js";
import { fixedDigits, oppositeClock, percentText, signedDigits, thousandthsText } from "../../src/render/page3d/numbers.js";
import { lcg } from "../helpers.js";

// values that exercise rounding to zero, the sign, halves and large magnitudes
const EDGE = [0, -0, 1e-9, -1e-9, -0.000004, 0.000005, -0.000005, 0.0286314, -0.0286314, 0.5, -0.00049, 0.00049, 0.0015, 12.345, -99.995, 1e-3];

describe("page number formatting (the terminal's rules, restated for the browser)", () => {
  it("prints score, push and robustness exactly as the terminal's fmtScore, for edge values and 2,000 random ones", () => {
    const rnd = lcg(7);
    const values = [...EDGE, ...Array.from({ length: 2000 }, () => (rnd() - 0.5) * 10 ** (1 - 6 * rnd()))];
    for (const x of values) expect(thousandthsText(x)).toBe(fmtScore(x));
  });

  it("prints fixed, signed and percent exactly as src/cli/format.ts does", () => {
    const rnd = lcg(11);
    const values = [...EDGE, ...Array.from({ length: 500 }, () => (rnd() - 0.5) * 10 ** (2 - 5 * rnd()))];
    for (const x of values) {
      for (const digits of [0, 1, 2, 5]) {
        expect(fixedDigits(x, digits)).toBe(fixed(x, digits));
        expect(signedDigits(x, digits)).toBe(signed(x, digits));
      }
      expect(percentText(Math.abs(x) / 100)).toBe(percent(Math.abs(x) / 100));
    }
  });

  it("gives the clock reading six hours on (12-hour face), and '-' for no reading", () => {
    expect(oppositeClock("1:45")).toBe("7:45");
    expect(oppositeClock("6:00")).toBe("12:00");
    expect(oppositeClock("12:00")).toBe("6:00");
    expect(oppositeClock("9:30")).toBe("3:30");
    expect(oppositeClock(null)).toBe("-");
    expect(oppositeClock("noon")).toBe("-");
  });
});
