import { describe, expect, it } from "vitest";
import { equalAreaGrid } from "../../../geometry/sphereGrid.js";
import { applySymmetry, SEAM_SYMMETRIES } from "../../../geometry/symmetry.js";
import { coefficientMap, forceTimeline, seamModel, turnAverage } from "../../../src/physics/seamModel/index.js";
import { lcg, randomUnit } from "../../support/random.js";
import { expectAbsolute } from "../../support/tolerance.js";
import { DEG } from "./helpers.js";

const model = seamModel();

describe("the seam's eight symmetries acting on the spin axis, gyro fixed (derivation in src/physics/seamModel/map.ts)", () => {
  it("rotations keep (C_a, C_m); mirrors and rotoreflections keep C_a and reverse C_m: all 8 elements at 12 random axes and gyros (|gyro| < 70 deg), to 1e-12", () => {
    const rnd = lcg(8);
    let largestMagnus = 0;
    for (let k = 0; k < 12; k++) {
      const axis = randomUnit(rnd);
      const gyro = (2 * rnd() - 1) * 70 * DEG;
      const base = { ...turnAverage(model, axis, gyro) };
      largestMagnus = Math.max(largestMagnus, Math.abs(base.alongMagnus));
      for (const g of SEAM_SYMMETRIES) {
        const c = turnAverage(model, applySymmetry(g, axis), gyro);
        expectAbsolute(c.across, base.across, 1e-12);
        expectAbsolute(c.alongMagnus, g.proper ? base.alongMagnus : -base.alongMagnus, 1e-12);
      }
    }
    expect(largestMagnus).toBeGreaterThan(1e-3); // the flip is checked on values that are not zero
  });

  it("the timelines behind the rule: a rotation shifts the phase by 0 (keeps z) or half a turn (reverses z); an improper element reverses the phase (phi -> -phi or pi - phi) and reverses C_m, to 1e-12", () => {
    const rnd = lcg(19);
    const n = 72;
    for (let k = 0; k < 3; k++) {
      const axis = randomUnit(rnd);
      const gyro = (2 * rnd() - 1) * 50 * DEG;
      const base = forceTimeline(model, axis, gyro, n);
      for (const g of SEAM_SYMMETRIES) {
        const t = forceTimeline(model, applySymmetry(g, axis), gyro, n);
        const keepsZ = g.matrix[8] === 1;
        const shift = keepsZ ? 0 : n / 2;
        for (let j = 0; j < n; j++) {
          const src = g.proper ? (j + shift) % n : (n - j + shift) % n;
          expectAbsolute(t.across[j], base.across[src], 1e-12);
          expectAbsolute(t.alongMagnus[j], g.proper ? base.alongMagnus[src] : -base.alongMagnus[src], 1e-12);
        }
      }
    }
  });

  it("an axis in a mirror plane (x = y) has no Magnus part at any gyro, to 1e-12", () => {
    for (const [axis, gyroDeg] of [
      [[0.5, 0.5, 0.7], 20],
      [[-0.3, -0.3, 0.4], -35],
      [[Math.SQRT1_2, Math.SQRT1_2, 0], 40],
    ] as [[number, number, number], number][]) {
      expectAbsolute(turnAverage(model, axis, gyroDeg * DEG).alongMagnus, 0, 1e-12);
    }
  });

  it("coefficientMap evaluates one cell per orbit (about an eighth) and equals direct evaluation at every cell of a 12 deg grid at gyro 25 deg, to 1e-12", () => {
    const grid = equalAreaGrid(12 * DEG);
    const map = coefficientMap(model, 25 * DEG, grid);
    expect(map.evaluated).toBeLessThan(grid.count / 8 + grid.count / 16);
    expect(map.evaluated).toBeGreaterThanOrEqual(grid.count / 8);
    for (let i = 0; i < grid.count; i++) {
      const axis: [number, number, number] = [grid.points[3 * i], grid.points[3 * i + 1], grid.points[3 * i + 2]];
      const c = turnAverage(model, axis, 25 * DEG);
      expectAbsolute(map.across[i], c.across, 1e-12);
      expectAbsolute(map.alongMagnus[i], c.alongMagnus, 1e-12);
    }
  });
});
