import { describe, expect, it } from "vitest";
import { DOUBLE_STITCH_COUNT } from "../../geometry/ball.js";
import { DEFAULT_SEAM_SHAPE, seamPoint } from "../../geometry/seamCurve.js";
import { seamLength } from "../../geometry/seamSamples.js";
import { stitchLayout } from "../../geometry/stitches.js";

describe("stitch layout", () => {
  const s = stitchLayout(DEFAULT_SEAM_SHAPE);
  const at = (a: Float64Array, j: number) => [a[3 * j], a[3 * j + 1], a[3 * j + 2]];
  const dot = (p: number[], q: number[]) => p[0] * q[0] + p[1] * q[1] + p[2] * q[2];

  it("has 108 double stitches (common practice, no source) whose centres sit on the seam curve, one every L / 108 of arc: consecutive chords equal 2 sin(L / 216) to 1e-4 relative (closed form for equal arcs, curvature below 8)", () => {
    expect(s.count).toBe(DOUBLE_STITCH_COUNT);
    const arc = seamLength(DEFAULT_SEAM_SHAPE) / s.count;
    for (let j = 0; j < s.count; j++) {
      const p = at(s.centres, j);
      const q = at(s.centres, (j + 1) % s.count);
      const chord = Math.hypot(p[0] - q[0], p[1] - q[1], p[2] - q[2]);
      // a chord of an arc h with curvature k is h - k^2 h^3 / 24 + ...; k < 8 bounds the gap
      expect(Math.abs(chord - arc) / arc).toBeLessThan((64 * arc * arc) / 24);
    }
    // the first stitch is half a spacing past c(0): nearer c(0) than the spacing, on the curve's first quarter
    const c0 = [0, 0, 0];
    seamPoint(DEFAULT_SEAM_SHAPE, 0, c0);
    const first = at(s.centres, 0);
    expect(Math.abs(Math.hypot(first[0] - c0[0], first[1] - c0[1], first[2] - c0[2]) - arc / 2) / (arc / 2)).toBeLessThan(1e-2);
  });

  it("gives each stitch an orthonormal frame: unit centre, unit tangent across from it, across = centre x tangent, to 1e-12", () => {
    for (let j = 0; j < s.count; j++) {
      const c = at(s.centres, j), t = at(s.tangents, j), a = at(s.across, j);
      for (const v of [c, t, a]) expect(Math.abs(Math.hypot(...v) - 1)).toBeLessThan(1e-12);
      expect(Math.abs(dot(c, t))).toBeLessThan(1e-12);
      expect(Math.abs(dot(c, a))).toBeLessThan(1e-12);
      expect(Math.abs(dot(t, a))).toBeLessThan(1e-12);
    }
  });

  it("rejects a stitch count that is not a whole multiple of 4", () => {
    expect(() => stitchLayout(DEFAULT_SEAM_SHAPE, 106)).toThrow(/stitch count 106/);
  });
});
