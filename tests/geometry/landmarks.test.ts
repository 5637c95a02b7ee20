import { describe, expect, it } from "vitest";
import { findLandmarks, landmarkByName, nearestLandmark } from "../../geometry/landmarks.js";
import { DEFAULT_SEAM_SHAPE, waistTipAngleRad } from "../../geometry/seamCurve.js";
import { angleBetween } from "../../geometry/vec.js";

const b = DEFAULT_SEAM_SHAPE;
const a = 1 - b;
const lm = findLandmarks(b);
const get = (name: string) => landmarkByName(lm, name)!;

describe("landmarks, computed from the curve", () => {
  it("has 4 tips, 2 waists, 4 lobe centres and 4 equator crossings", () => {
    const count = (k: string) => lm.filter((l) => l.kind === k).length;
    expect([count("tip"), count("waist"), count("lobe"), count("node")]).toEqual([4, 2, 4, 4]);
  });

  it("puts the horseshoe tips at height +-2 sqrt(ab) and t = pi/4 + k pi/2 (closed form from z = 2 sqrt(ab) sin 2t), to 1e-12", () => {
    for (const l of lm.filter((x) => x.kind === "tip")) {
      expect(Math.abs(Math.abs(l.direction[2]) - 2 * Math.sqrt(a * b))).toBeLessThan(1e-12);
      const k = (l.t! - Math.PI / 4) / (Math.PI / 2);
      expect(Math.abs(k - Math.round(k))).toBeLessThan(1e-11);
    }
  });

  it("puts the waists at the poles +-z, halfway between facing tips, each 1/2 of the tip-to-tip angle from the seam (closed form)", () => {
    expect(angleBetween(get("waist-A").direction, [0, 0, 1])).toBeLessThan(1e-12);
    expect(angleBetween(get("waist-B").direction, [0, 0, -1])).toBeLessThan(1e-12);
    expect(Math.abs(get("tip-B1").direction[2] - get("tip-B2").direction[2])).toBeLessThan(1e-12);
    // the nearest seam points to a pole are the two tips facing across it
    expect(Math.abs(get("waist-A").seamDistanceRad - waistTipAngleRad(b) / 2)).toBeLessThan(1e-9);
  });

  it("puts the equator crossings at +x, +y, -x, -y (closed form: z = 0 at t = k pi/2), to 1e-12", () => {
    const expected = [
      [1, 0, 0],
      [0, 1, 0],
      [-1, 0, 0],
      [0, -1, 0],
    ] as const;
    expected.forEach((e, i) => expect(angleBetween(get(`node-${i + 1}`).direction, e)).toBeLessThan(1e-12));
  });

  it("puts each lobe centre on its tip's meridian, farther from the seam than the waist middles", () => {
    for (const n of ["A1", "A2", "B1", "B2"]) {
      const tip = get(`tip-${n}`).direction;
      const lobe = get(`lobe-${n}`);
      const lonTip = Math.atan2(tip[1], tip[0]);
      const lonLobe = Math.atan2(lobe.direction[1], lobe.direction[0]);
      expect(Math.abs(lonTip - lonLobe)).toBeLessThan(1e-12);
      expect(lobe.seamDistanceRad).toBeGreaterThan(get("waist-A").seamDistanceRad);
    }
  });

  it("names landmarks case-insensitively and finds the nearest one", () => {
    expect(landmarkByName(lm, "WAIST-a")?.name).toBe("waist-A");
    const near = nearestLandmark(lm, [0.01, 0, 1]);
    expect(near.landmark.name).toBe("waist-A");
    expect(near.angleRad).toBeCloseTo(Math.atan(0.01), 12);
  });
});
