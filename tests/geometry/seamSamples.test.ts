import { describe, expect, it } from "vitest";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { sampleSeam, seamLength, assertSeamPointCount } from "../../geometry/seamSamples.js";
import { enclosedArea } from "../../geometry/sphereArea.js";
import { applySymmetry, SEAM_SYMMETRIES } from "../../geometry/symmetry.js";

// The published two-harmonic seam curve and its symmetries (mathcurve.com, "seam line of a
// tennis ball"; Allison, Diaz & Miller, "Generalized Baseball Curves", MAA Loci, 2008): the
// half-turns about x, y and z map the curve to itself, only those about x and y swap its two
// congruent halves, and with the rotoreflection (x, y, z) -> (-y, x, -z) the group has order 8.

describe("arc-length samples", () => {
  it("are equally spaced in arc length: every chord equals 2 sin(L / 2N) to 1e-9 relative (closed form for equal arcs on a smooth curve, to O(h^3))", () => {
    const s = sampleSeam(DEFAULT_SEAM_SHAPE, 4096);
    const h = s.length / s.count;
    for (let i = 0; i < s.count; i++) {
      const j = (i + 1) % s.count;
      const chord = Math.hypot(s.points[3 * i] - s.points[3 * j], s.points[3 * i + 1] - s.points[3 * j + 1], s.points[3 * i + 2] - s.points[3 * j + 2]);
      // chord of an arc of length h with curvature k: h - k^2 h^3 / 24; seam curvature on the unit sphere is below 8
      expect(Math.abs(chord - h) / h).toBeLessThan((64 * h * h) / 24 + 1e-12);
    }
    expect(s.length).toBeCloseTo(seamLength(DEFAULT_SEAM_SHAPE), 13);
  });

  it("form a set mapped onto itself by all 8 symmetries of the curve (to 1e-12)", () => {
    const s = sampleSeam(DEFAULT_SEAM_SHAPE, 512);
    for (const g of SEAM_SYMMETRIES) {
      for (let i = 0; i < s.count; i++) {
        const p = applySymmetry(g, [s.points[3 * i], s.points[3 * i + 1], s.points[3 * i + 2]]);
        let best = Infinity;
        for (let j = 0; j < s.count; j++) {
          best = Math.min(best, Math.hypot(p[0] - s.points[3 * j], p[1] - s.points[3 * j + 1], p[2] - s.points[3 * j + 2]));
        }
        expect(best).toBeLessThan(1e-12);
      }
    }
  });

  it("split the sphere into two halves of area 2 pi each (published property: congruent halves; areas by the Van Oosterom & Strackee solid angle), to 1e-5", () => {
    for (const b of [0.25, DEFAULT_SEAM_SHAPE, 0.4]) {
      const s = sampleSeam(b, 8192);
      const a = enclosedArea(s.points, [0, 0, 1]);
      const other = enclosedArea(s.points, [0, 0, -1]);
      expect(Math.abs(a - 2 * Math.PI)).toBeLessThan(1e-5);
      expect(Math.abs(a + other - 4 * Math.PI) < 1e-9 || Math.abs(a - other) < 1e-9).toBe(true);
    }
  });

  it("reject counts that are not multiples of 4 or out of range", () => {
    for (const n of [63, 1022, 0, 1e7, 2.5]) expect(() => assertSeamPointCount(n)).toThrow(/seam points/);
    expect(() => assertSeamPointCount(2048)).not.toThrow();
  });
});
