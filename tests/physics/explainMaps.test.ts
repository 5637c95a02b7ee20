import { describe, expect, it } from "vitest";
import { applySymmetry, SEAM_SYMMETRIES } from "../../geometry/symmetry.js";
import { DEG } from "../../geometry/units.js";
import { coefficientAt, computeGyroMap, gyroKeys, GYRO_STEP_DEG, orientationSet } from "../../src/physics/explainMaps.js";
import { seamModel } from "../../src/physics/seamModel/model.js";
import { turnAverage } from "../../src/physics/seamModel/turn.js";

const model = seamModel();

describe("explain's orientation set and maps", () => {
  it("keeps one cell per orbit of the four proper rotations: a quarter of the grid up to the cells they fix [orbit counting, Burnside]", () => {
    const set = orientationSet(6 * DEG);
    expect(set.cells.length).toBeGreaterThanOrEqual(set.grid.count / 4);
    expect(set.cells.length).toBeLessThan(set.grid.count / 4 + 20);
  });

  it("a map's value at a representative equals the model's turn average there to 1e-12, and a mirror image has c_m reversed [seamModel/map.ts symmetry rule]", () => {
    const set = orientationSet(12 * DEG);
    const key = 4;
    const map = computeGyroMap(model, set, key);
    const mirror = SEAM_SYMMETRIES.find((g) => g.name === "mirror x=y")!;
    for (const k of [0, 7, 19, set.cells.length - 1]) {
      const axis: [number, number, number] = [set.axes[3 * k], set.axes[3 * k + 1], set.axes[3 * k + 2]];
      const c = turnAverage(model, axis, key * GYRO_STEP_DEG * DEG);
      expect(Math.abs(map.across[k] - c.across)).toBeLessThan(1e-12);
      expect(Math.abs(map.alongMagnus[k] - c.alongMagnus)).toBeLessThan(1e-12);
      const m = turnAverage(model, applySymmetry(mirror, axis), key * GYRO_STEP_DEG * DEG);
      expect(Math.abs(m.alongMagnus + c.alongMagnus)).toBeLessThan(1e-9);
    }
  });

  it("interpolates in gyro between the keys k0 and k0 + 1 with weight f: 11 deg is key 4 with f = 0.4 (GYRO_STEP_DEG = 2.5); coefficientAt on a key is the turn average [linear interpolation]", () => {
    const { k0, f } = gyroKeys(11 * DEG);
    expect(k0).toBe(4);
    expect(f).toBeCloseTo(0.4, 12);
    const axis: [number, number, number] = [0.6, 0, 0.8];
    const at = coefficientAt(model, axis, 10 * DEG, { across: 0, alongMagnus: 0 });
    expect(at.across).toBeCloseTo(turnAverage(model, axis, 10 * DEG).across, 12);
    const mid = coefficientAt(model, axis, 11.25 * DEG, { across: 0, alongMagnus: 0 });
    const lo = turnAverage(model, axis, 10 * DEG).across;
    const hi = turnAverage(model, axis, 12.5 * DEG).across;
    expect(mid.across).toBeCloseTo((lo + hi) / 2, 12);
  });
});
