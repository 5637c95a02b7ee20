import { describe, expect, it } from "vitest";
import { hexToOklab, oklabToHex, rampColor, VERDIGRIS_ANCHORS } from "../../src/render/colorScale.js";
import { lcg } from "../support/random.js";

describe("the verdigris colour scale in OKLab", () => {
  it("maps sRGB white to L = 1, a = b = 0 and black to 0 (Ottosson 2020: OKLab is normalised so), to 1e-6", () => {
    const [L, a, b] = hexToOklab("#ffffff");
    expect(Math.abs(L - 1) + Math.abs(a) + Math.abs(b)).toBeLessThan(1e-6);
    expect(hexToOklab("#000000").every((x) => Math.abs(x) < 1e-12)).toBe(true);
  });

  it("round-trips 8-bit colours through OKLab exactly (the two matrices are inverses)", () => {
    const rnd = lcg(3);
    for (let k = 0; k < 200; k++) {
      const hex = `#${Array.from({ length: 3 }, () => Math.floor(256 * rnd()).toString(16).padStart(2, "0")).join("")}`;
      expect(oklabToHex(hexToOklab(hex))).toBe(hex);
    }
  });

  it("starts and ends on its first and last anchors", () => {
    expect(rampColor(0)).toBe(VERDIGRIS_ANCHORS[0]);
    expect(rampColor(1)).toBe(VERDIGRIS_ANCHORS[VERDIGRIS_ANCHORS.length - 1]);
    expect(rampColor(-3)).toBe(VERDIGRIS_ANCHORS[0]);
  });

  it("rises in OKLab lightness at every one of 64 steps (the map's default), by more than 0.005 each, from below 0.3 to above 0.9", () => {
    let prev = -Infinity;
    for (let k = 0; k < 64; k++) {
      const L = hexToOklab(rampColor((k + 0.5) / 64))[0];
      expect(L - prev).toBeGreaterThan(0.005);
      prev = L;
    }
    expect(hexToOklab(rampColor(0))[0]).toBeLessThan(0.3);
    expect(hexToOklab(rampColor(1))[0]).toBeGreaterThan(0.9);
  });

  it("refuses NaN with a RangeError", () => {
    expect(() => rampColor(Number.NaN)).toThrow(RangeError);
  });
});
