import { describe, expect, it } from "vitest";
import { coverHalf, coverModel, coverRegion } from "../../geometry/coverRegions.js";
import { findLandmarks } from "../../geometry/landmarks.js";
import { DEFAULT_SEAM_SHAPE, seamPoint } from "../../geometry/seamCurve.js";
import { applySymmetry, SEAM_SYMMETRIES } from "../../geometry/symmetry.js";
import { lcg, randomUnit } from "../support/random.js";

const model = coverModel(DEFAULT_SEAM_SHAPE);

describe("cover halves and regions", () => {
  it("puts waist-A, lobe-A1 and lobe-A2 in half A and their B namesakes in half B", () => {
    for (const l of findLandmarks(DEFAULT_SEAM_SHAPE).filter((x) => x.kind === "lobe" || x.kind === "waist")) {
      expect(coverHalf(model, l.direction)).toBe(l.name.endsWith("B") || l.name.includes("-B") ? "B" : "A");
    }
  });

  it("changes half exactly across the seam: points just either side of it, along the seam's normal, differ", () => {
    const p = [0, 0, 0];
    const q = [0, 0, 0];
    for (let i = 0; i < 50; i++) {
      const t = 0.1257 * i + 0.03;
      seamPoint(DEFAULT_SEAM_SHAPE, t, p);
      seamPoint(DEFAULT_SEAM_SHAPE, t + 1e-4, q);
      const tan = [q[0] - p[0], q[1] - p[1], q[2] - p[2]];
      const nrm = [p[1] * tan[2] - p[2] * tan[1], p[2] * tan[0] - p[0] * tan[2], p[0] * tan[1] - p[1] * tan[0]];
      const len = Math.hypot(nrm[0], nrm[1], nrm[2]);
      const e = 1e-3 / len;
      const a = coverHalf(model, [p[0] + e * nrm[0], p[1] + e * nrm[1], p[2] + e * nrm[2]]);
      const b = coverHalf(model, [p[0] - e * nrm[0], p[1] - e * nrm[1], p[2] - e * nrm[2]]);
      expect(a).not.toBe(b);
    }
  });

  it("agrees with the symmetry group: maps that swap the halves swap every point's half (300 random points)", () => {
    const rnd = lcg(5);
    for (let k = 0; k < 300; k++) {
      const p = randomUnit(rnd);
      const h = coverHalf(model, p);
      for (const g of SEAM_SYMMETRIES) {
        const hg = coverHalf(model, applySymmetry(g, p));
        expect(hg === h).toBe(!g.swapsHalves);
      }
    }
  });

  it("calls a point on the seam 'seam' and a lobe centre 'lobe'", () => {
    const p = [0, 0, 0] as unknown as [number, number, number];
    seamPoint(DEFAULT_SEAM_SHAPE, 0.4, p);
    expect(coverRegion(model, p, 0.06).part).toBe("seam");
    const lobe = findLandmarks(DEFAULT_SEAM_SHAPE).find((l) => l.name === "lobe-A1")!;
    expect(coverRegion(model, lobe.direction, 0.06)).toMatchObject({ half: "A", part: "lobe", near: "lobe-A1" });
  });
});
