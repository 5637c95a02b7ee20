import { describe, expect, it } from "vitest";
import { findLandmarks, landmarkByName } from "../../geometry/landmarks.js";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { sampleSeam } from "../../geometry/seamSamples.js";
import { cross3, dot3, mat3, newQuat, quat, type Vec3 } from "../../geometry/vec.js";
import {
  depthRuns, projectPoint, projectPoints, viewFromDirections, viewFromRotation, viewLookingAlong, type DiscPlacement,
} from "../../src/render/projection.js";
import { lcg, randomUnit } from "../support/random.js";

const lm = findLandmarks(DEFAULT_SEAM_SHAPE);
const dir = (name: string) => landmarkByName(lm, name)!.direction;
const disc: DiscPlacement = { radiusPx: 100, centerXPx: 200, centerYPx: 150 };
/** Pixel tolerance for closed-form positions (R = 100 px; landmarks are found to ~1e-13). */
const PX_TOL = 1e-9;

describe("orthographic projection of the ball", () => {
  it("builds right-handed orthonormal views (right x up = toViewer), to 1e-12, for 50 random directions", () => {
    const rnd = lcg(7);
    for (let k = 0; k < 50; k++) {
      const v = viewFromDirections(randomUnit(rnd), randomUnit(rnd));
      for (const a of [v.right, v.up, v.toViewer]) expect(Math.abs(dot3(a, a) - 1)).toBeLessThan(1e-12);
      expect(Math.abs(dot3(v.right, v.up))).toBeLessThan(1e-12);
      const z = cross3(v.right, v.up);
      expect(Math.hypot(z[0] - v.toViewer[0], z[1] - v.toViewer[1], z[2] - v.toViewer[2])).toBeLessThan(1e-12);
    }
  });

  it("looking along -z (at waist-A), up +y: waist-A lands at the disc centre with depth +R, node-1 (+x) on the right limb (closed form)", () => {
    const view = viewLookingAlong([0, 0, -1], [0, 1, 0]);
    const w = projectPoint(view, disc, dir("waist-A"));
    expect(Math.abs(w.xPx - 200)).toBeLessThan(PX_TOL);
    expect(Math.abs(w.yPx - 150)).toBeLessThan(PX_TOL);
    expect(Math.abs(w.depthPx - 100)).toBeLessThan(PX_TOL);
    const n1 = projectPoint(view, disc, dir("node-1"));
    expect(Math.abs(n1.xPx - 300)).toBeLessThan(PX_TOL);
    expect(Math.abs(n1.yPx - 150)).toBeLessThan(PX_TOL);
    // node-2 (+y) shows up, which is toward the top of the drawing (SVG y grows down)
    expect(Math.abs(projectPoint(view, disc, dir("node-2")).yPx - 50)).toBeLessThan(PX_TOL);
  });

  it("from (1, 1, 1)/sqrt 3 with +z up: node-1 at (cx - R/sqrt 2, cy + R/sqrt 6), depth R/sqrt 3 (closed form: right = (-1, 1, 0)/sqrt 2, up = (-1, -1, 2)/sqrt 6)", () => {
    const view = viewFromDirections([1, 1, 1], [0, 0, 1]);
    const p = projectPoint(view, disc, dir("node-1"));
    expect(Math.abs(p.xPx - (200 - 100 / Math.SQRT2))).toBeLessThan(PX_TOL);
    expect(Math.abs(p.yPx - (150 + 100 / Math.sqrt(6)))).toBeLessThan(PX_TOL);
    expect(Math.abs(p.depthPx - 100 / Math.sqrt(3))).toBeLessThan(PX_TOL);
    const w = projectPoint(view, disc, dir("waist-A"));
    expect(Math.abs(w.xPx - 200)).toBeLessThan(PX_TOL);
    expect(Math.abs(w.yPx - (150 - 200 / Math.sqrt(6)))).toBeLessThan(PX_TOL);
  });

  it("gives the far side negative depth: node-3 (-x) and waist-B (-z) at -R/sqrt 3 from (1, 1, 1)/sqrt 3 (closed form)", () => {
    const view = viewFromDirections([1, 1, 1], [0, 0, 1]);
    for (const name of ["node-3", "waist-B"]) {
      const p = projectPoint(view, disc, dir(name));
      expect(p.depthPx).toBeLessThan(0);
      expect(Math.abs(p.depthPx + 100 / Math.sqrt(3))).toBeLessThan(PX_TOL);
    }
  });

  it("agrees with the same view given as a ball-to-view quaternion (two routes), to 1e-12", () => {
    const rnd = lcg(11);
    for (let k = 0; k < 20; k++) {
      const v = viewFromDirections(randomUnit(rnd), randomUnit(rnd));
      // gl-matrix mat3 is column-major: the rows of the rotation are the view axes
      const m = Float64Array.of(
        v.right[0], v.up[0], v.toViewer[0],
        v.right[1], v.up[1], v.toViewer[1],
        v.right[2], v.up[2], v.toViewer[2],
      );
      const back = viewFromRotation(quat.normalize(newQuat(), quat.fromMat3(newQuat(), m as unknown as mat3)));
      const keys = ["right", "up", "toViewer"] as const;
      for (const key of keys) for (let j = 0; j < 3; j++) expect(Math.abs(back[key][j] - v[key][j])).toBeLessThan(1e-12);
    }
  });

  it("projects flat point arrays exactly as point by point, to 1e-12 px", () => {
    const view = viewFromDirections([0.3, -0.5, 0.8], [0, 0, 1]);
    const seam = sampleSeam(DEFAULT_SEAM_SHAPE, 256);
    const flat = projectPoints(view, disc, seam.points);
    for (let i = 0; i < seam.count; i++) {
      const p = projectPoint(view, disc, [seam.points[3 * i], seam.points[3 * i + 1], seam.points[3 * i + 2]] as Vec3);
      expect(Math.abs(flat[3 * i] - p.xPx) + Math.abs(flat[3 * i + 1] - p.yPx) + Math.abs(flat[3 * i + 2] - p.depthPx)).toBeLessThan(1e-12);
    }
  });

  it("splits a closed curve into visible runs joined across its start, and an open one not", () => {
    const depths = [1, 1, -1, -1, 1];
    const projected = new Float64Array(depths.flatMap((d) => [0, 0, d]));
    expect(depthRuns(projected, true)).toEqual([[4, 0, 1]]);
    expect(depthRuns(projected, false)).toEqual([[0, 1], [4]]);
    expect(depthRuns(projected, true, false)).toEqual([[2, 3]]);
  });

  it("rejects an up direction along the line of sight with a RangeError", () => {
    expect(() => viewFromDirections([0, 0, 2], [0, 0, -1])).toThrow(RangeError);
  });
});
