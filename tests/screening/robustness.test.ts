import { describe, expect, it } from "vitest";
import { DEG } from "../../geometry/units.js";
import { dot3, unit3, type Vec3 } from "../../geometry/vec.js";
import { robustness, SCATTER_SAMPLES, scatterAxes } from "../../src/screening/robustness.js";

// The scatter model (src/screening/robustness.ts): the pierce point wanders by an isotropic 2-D
// Gaussian of standard deviation sigma per direction, so its angular distance r from the axis is
// Rayleigh distributed: E[r^2] = 2 sigma^2, P(r > x) = exp(-x^2 / (2 sigma^2)) (closed forms of the
// Rayleigh distribution, any probability text).

const axis = unit3([0.3, 0.4, 0.866]);
const SIGMA = 5 * DEG;

describe("robustness to release scatter", () => {
  const pts = scatterAxes(axis, SIGMA);
  const angles = Array.from({ length: SCATTER_SAMPLES }, (_, j) => Math.acos(Math.min(1, dot3([pts[3 * j], pts[3 * j + 1], pts[3 * j + 2]], axis))));

  it("scatters unit axes whose mean square angle from the axis is the Rayleigh 2 sigma^2 within 1 % (the midpoint rule's last cell costs (1 - ln 2) / N, 0.48 % at N = 64)", () => {
    for (let j = 0; j < SCATTER_SAMPLES; j++) expect(Math.abs(Math.hypot(pts[3 * j], pts[3 * j + 1], pts[3 * j + 2]) - 1)).toBeLessThan(1e-15);
    const meanSquare = angles.reduce((a, r) => a + r * r, 0) / SCATTER_SAMPLES;
    expect(Math.abs(meanSquare / (2 * SIGMA * SIGMA) - 1)).toBeLessThan(1e-2);
  });

  it("puts the 10th percentile of cos r at cos(sigma sqrt(2 ln 10)), the Rayleigh 90 % quantile, within 5e-4, and its mean at 1 - sigma^2 + sigma^4 / 3 (series of E[cos r]) within 5e-5", () => {
    const r = robustness(axis, SIGMA, (x, y, z) => dot3([x, y, z], axis));
    expect(Math.abs(r.p10 - Math.cos(SIGMA * Math.sqrt(2 * Math.log(10))))).toBeLessThan(5e-4);
    expect(Math.abs(r.mean - (1 - SIGMA ** 2 + SIGMA ** 4 / 3))).toBeLessThan(5e-5);
  });

  it("tends to the plain score as the scatter goes to zero: mean and p10 within 2e-8 of f(axis) at 1e-9 rad, for a smooth score f (bound: |grad f| <= 4.1 times the largest scatter, sqrt(2 ln 256) sigma = 3.33e-9)", () => {
    const u: Vec3 = [0.8, -0.1, 0.3];
    const f = (x: number, y: number, z: number) => dot3([x, y, z], u) + 2 * z * z;
    const tiny = robustness(axis, 1e-9, f);
    const plain = f(axis[0], axis[1], axis[2]);
    expect(Math.abs(tiny.mean - plain)).toBeLessThan(2e-8);
    expect(Math.abs(tiny.p10 - plain)).toBeLessThan(2e-8);
  });

  it("never scores a scattered axis above a maximum: for f = p . axis the mean and p10 fall below 1, more for wider scatter", () => {
    const f = (x: number, y: number, z: number) => dot3([x, y, z], axis);
    const narrow = robustness(axis, 2 * DEG, f);
    const wide = robustness(axis, 10 * DEG, f);
    expect(narrow.mean).toBeLessThan(1);
    expect(wide.mean).toBeLessThan(narrow.mean);
    expect(wide.p10).toBeLessThan(narrow.p10);
  });

  it("rejects a negative spread", () => {
    expect(() => robustness(axis, -1e-3, () => 0)).toThrow(/scatter spread/);
  });
});
