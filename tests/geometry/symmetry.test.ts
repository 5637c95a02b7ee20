import { describe, expect, it } from "vitest";
import { DEFAULT_SEAM_SHAPE, seamPoint } from "../../geometry/seamCurve.js";
import { sampleSeam } from "../../geometry/seamSamples.js";
import { applySymmetry, SEAM_SYMMETRIES } from "../../geometry/symmetry.js";
import { angleToSeam } from "../../geometry/landmarks.js";

// The published two-harmonic seam curve and its symmetries (mathcurve.com, "seam line of a
// tennis ball"; Allison, Diaz & Miller, "Generalized Baseball Curves", MAA Loci, 2008): the
// half-turns about x, y and z map the curve to itself, only those about x and y swap its two
// congruent halves, and with the rotoreflection (x, y, z) -> (-y, x, -z) the group has order 8.

const mul = (p: readonly number[], q: readonly number[]) => {
  const r: number[] = [];
  for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) r.push(p[3 * i] * q[j] + p[3 * i + 1] * q[3 + j] + p[3 * i + 2] * q[6 + j]);
  return r;
};
const same = (p: readonly number[], q: readonly number[]) => p.every((v, i) => Math.abs(v - q[i]) < 1e-15);

describe("symmetry group of the seam", () => {
  it("maps the curve onto itself: every image of a curve point lies on the curve (published: half-turns about x, y, z and the rotoreflection (x,y,z) -> (-y,x,-z)), to 1e-9 rad", () => {
    const dense = sampleSeam(DEFAULT_SEAM_SHAPE, 65536).points;
    const p = [0, 0, 0];
    for (const g of SEAM_SYMMETRIES) {
      for (let i = 0; i < 40; i++) {
        seamPoint(DEFAULT_SEAM_SHAPE, 0.157 * i + 0.01, p);
        const image = applySymmetry(g, p as [number, number, number]);
        expect(angleToSeam(image, dense)).toBeLessThan(1e-7);
      }
    }
  });

  it("is a group of order 8: closed under composition, with 4 rotations and 4 improper maps", () => {
    expect(SEAM_SYMMETRIES.length).toBe(8);
    for (const g of SEAM_SYMMETRIES) for (const h of SEAM_SYMMETRIES) {
      const gh = mul(g.matrix, h.matrix);
      expect(SEAM_SYMMETRIES.some((k) => same(k.matrix, gh))).toBe(true);
    }
    expect(SEAM_SYMMETRIES.filter((g) => g.proper).length).toBe(4);
  });

  it("swaps the two cover halves exactly for the x and y half-turns and the rotoreflections (published: only those half-turns swap)", () => {
    for (const g of SEAM_SYMMETRIES) {
      const image = applySymmetry(g, [0, 0, 1]);
      expect(image[2] < 0).toBe(g.swapsHalves);
    }
    const swappingHalfTurns = SEAM_SYMMETRIES.filter((g) => g.proper && g.swapsHalves).map((g) => g.name);
    expect(swappingHalfTurns).toEqual(["half-turn x", "half-turn y"]);
  });

  it("a generic rotation does not map the curve onto itself (the check above can fail)", () => {
    const dense = sampleSeam(DEFAULT_SEAM_SHAPE, 4096).points;
    const c = Math.cos(0.3), s = Math.sin(0.3);
    let worst = 0;
    const p = [0, 0, 0];
    for (let i = 0; i < 40; i++) {
      seamPoint(DEFAULT_SEAM_SHAPE, 0.157 * i, p);
      worst = Math.max(worst, angleToSeam([c * p[0] - s * p[1], s * p[0] + c * p[1], p[2]], dense));
    }
    expect(worst).toBeGreaterThan(0.05);
  });
});
