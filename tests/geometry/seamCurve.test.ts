import { describe, expect, it } from "vitest";
import { assertSeamShape, DEFAULT_SEAM_SHAPE, isValidSeamShape, seamPoint, seamShapeFromWaist, seamSpeed, seamTangent, waistTipAngleRad } from "../../geometry/seamCurve.js";
import { BALL_CIRCUMFERENCE_IN, COVER_WAIST_ARC_IN } from "../../geometry/ball.js";
import { sampleSeam, seamLength } from "../../geometry/seamSamples.js";
import { DEG } from "../../geometry/units.js";

// The published two-harmonic seam curve (mathcurve.com, "seam line of a tennis ball";
// Allison, Diaz & Miller, "Generalized Baseball Curves", MAA Loci, 2008):
//   x = a cos t + b cos 3t,  y = a sin t - b sin 3t,  z = 2 sqrt(ab) sin 2t,  a + b = 1.

/** |c'(t)| written out from the published parametrisation, independently of geometry/seamCurve.ts. */
function publishedSpeed(b: number, t: number): number {
  const a = 1 - b;
  const dx = -a * Math.sin(t) - 3 * b * Math.sin(3 * t);
  const dy = a * Math.cos(t) - 3 * b * Math.cos(3 * t);
  const dz = 4 * Math.sqrt(a * b) * Math.cos(2 * t);
  return Math.hypot(dx, dy, dz);
}

describe("seam curve", () => {
  it("lies on the unit sphere for every b (published identity x^2 + y^2 + z^2 = (a + b)^2), to 1e-15", () => {
    const p = [0, 0, 0];
    for (const b of [0.05, 0.25, DEFAULT_SEAM_SHAPE, 0.45]) {
      for (let i = 0; i < 1000; i++) {
        seamPoint(b, (i / 1000) * 2 * Math.PI, p);
        expect(Math.abs(Math.hypot(p[0], p[1], p[2]) - 1)).toBeLessThan(1e-15);
      }
    }
  });

  it("at b = 1/4 projects onto the xy-plane as an astroid |x|^(2/3) + |y|^(2/3) = 1 (published property), to 1e-12", () => {
    const p = [0, 0, 0];
    for (let i = 0; i < 997; i++) {
      seamPoint(0.25, (i / 997) * 2 * Math.PI + 0.001, p);
      expect(Math.abs(Math.abs(p[0]) ** (2 / 3) + Math.abs(p[1]) ** (2 / 3) - 1)).toBeLessThan(1e-12);
    }
  });

  it("has unit-sphere length 10.166876 at b = 1/4 and 10.832930 at b = 0.3 (derived: quadrature of the published curve's speed), to 1e-6", () => {
    expect(seamLength(0.25)).toBeCloseTo(10.166876, 6);
    expect(seamLength(0.3)).toBeCloseTo(10.83293, 6);
  });

  it("has the length a periodic trapezoid rule on the published parametrisation gives (4096 nodes, spectrally accurate for a smooth periodic speed), for b from 0.05 to 0.45, to 1e-12 relative", () => {
    for (const b of [0.05, 0.25, DEFAULT_SEAM_SHAPE, 0.45]) {
      const n = 4096;
      let sum = 0;
      for (let i = 0; i < n; i++) sum += publishedSpeed(b, (2 * Math.PI * i) / n);
      const trapezoid = (2 * Math.PI * sum) / n;
      expect(Math.abs(seamLength(b) - trapezoid) / trapezoid).toBeLessThan(1e-12);
    }
  });

  it("speed closed form |c'|^2 = a^2 + 9b^2 - 6ab cos 4t + 16ab cos^2 2t matches the tangent's length and the published parametrisation's speed to 1e-14", () => {
    const d = [0, 0, 0];
    for (let i = 0; i < 100; i++) {
      const t = i * 0.0731;
      seamTangent(0.3, t, d);
      expect(Math.abs(Math.hypot(d[0], d[1], d[2]) - seamSpeed(0.3, t))).toBeLessThan(1e-14);
      expect(Math.abs(publishedSpeed(0.3, t) - seamSpeed(0.3, t))).toBeLessThan(1e-14);
    }
  });

  it("tangent is the derivative of the position (central difference, h = 1e-5, to 1e-9)", () => {
    const p1 = [0, 0, 0];
    const p2 = [0, 0, 0];
    const d = [0, 0, 0];
    const h = 1e-5;
    for (let i = 0; i < 50; i++) {
      const t = i * 0.123;
      seamPoint(0.3, t + h, p1);
      seamPoint(0.3, t - h, p2);
      seamTangent(0.3, t, d);
      for (let k = 0; k < 3; k++) expect(Math.abs((p1[k] - p2[k]) / (2 * h) - d[k])).toBeLessThan(1e-9);
    }
  });

  it("tip-to-tip angle across the waist is 60 deg at b = 1/4 (derived from the published curve: tips at height 2 sqrt(ab), so the angle is 2 arccos(2 sqrt(ab)))", () => {
    expect(waistTipAngleRad(0.25) / DEG).toBeCloseTo(60, 10);
  });

  it("default b reproduces Thompson's 1 3/16 in waist arc on a 9 1/8 in ball (R. B. Thompson, \"Designing a Baseball Cover\", College Math. J. 29(1), 1998) and is about 0.301 (derived from that arc), to 1e-12 in", () => {
    const radiusIn = BALL_CIRCUMFERENCE_IN / (2 * Math.PI);
    expect(waistTipAngleRad(DEFAULT_SEAM_SHAPE) * radiusIn).toBeCloseTo(COVER_WAIST_ARC_IN, 12);
    expect(DEFAULT_SEAM_SHAPE).toBeCloseTo(0.301, 3);
    expect(seamShapeFromWaist(COVER_WAIST_ARC_IN, BALL_CIRCUMFERENCE_IN)).toBe(DEFAULT_SEAM_SHAPE);
  });

  it("is simple (no self-contact) across 0 < b < 1/2 and closes its waist at b = 1/2 (closed form: tip angle -> 0)", () => {
    // smallest distance between seam points more than 1/8 of the seam apart, on a 2048-point polyline
    const minGap = (b: number) => {
      const s = sampleSeam(b, 2048);
      const n = s.count;
      const skip = n / 8;
      let best = Infinity;
      for (let i = 0; i < n; i += 2) {
        for (let j = i + skip; j < i + n - skip; j += 2) {
          const jj = j % n;
          const d = Math.hypot(s.points[3 * i] - s.points[3 * jj], s.points[3 * i + 1] - s.points[3 * jj + 1], s.points[3 * i + 2] - s.points[3 * jj + 2]);
          if (d < best) best = d;
        }
      }
      return best;
    };
    for (const b of [0.1, 0.25, DEFAULT_SEAM_SHAPE, 0.4, 0.45]) {
      // far-apart parts never meet, and the facing tips across a waist bound the gap from above
      const tipChord = 2 * Math.sin(waistTipAngleRad(b) / 2);
      const gap = minGap(b);
      expect(gap).toBeGreaterThan(0.05);
      expect(gap).toBeLessThanOrEqual(tipChord + 0.01);
    }
    expect(waistTipAngleRad(0.5)).toBeLessThan(1e-7);
    expect(minGap(0.499)).toBeLessThan(0.1);
  });

  it("rejects b outside the simple range with a message naming the value", () => {
    expect(isValidSeamShape(DEFAULT_SEAM_SHAPE)).toBe(true);
    for (const b of [0, 0.5, -0.1, 0.7, Number.NaN]) {
      expect(() => assertSeamShape(b)).toThrow(/seam shape b = .* outside \(0, 0.5\)/);
    }
  });
});
