import { describe, expect, it } from "vitest";
import { equalAreaGrid, orbitRepresentatives, symmetryImage } from "../../geometry/sphereGrid.js";
import { applySymmetry, SEAM_SYMMETRIES } from "../../geometry/symmetry.js";
import { DEG } from "../../geometry/units.js";


describe("equal-area ring grid", () => {
  const grid = equalAreaGrid(1 * DEG);

  it("has about 4 pi / spacing^2 cells at 1 deg (41,253), within 1 %", () => {
    expect(Math.abs(grid.count / (4 * Math.PI / (DEG * DEG)) - 1)).toBeLessThan(0.01);
  });

  it("gives every cell the same area: ring area 2 pi dz (Archimedes) over its cell count equals 4 pi / N, to 1e-12", () => {
    for (let i = 0; i < grid.ringCount.length; i++) {
      const area = (2 * Math.PI * (grid.ringEdges[i + 1] - grid.ringEdges[i])) / grid.ringCount[i];
      expect(Math.abs(area - (4 * Math.PI) / grid.count)).toBeLessThan(1e-12);
    }
  });

  it("puts unit points, and every seam symmetry maps grid points to the grid points its index map names, to 1e-14", () => {
    for (let idx = 0; idx < grid.count; idx += 13) {
      const p: [number, number, number] = [grid.points[3 * idx], grid.points[3 * idx + 1], grid.points[3 * idx + 2]];
      expect(Math.abs(Math.hypot(...p) - 1)).toBeLessThan(1e-15);
      SEAM_SYMMETRIES.forEach((g, k) => {
        const q = applySymmetry(g, p);
        const j = symmetryImage(grid, idx, k);
        expect(Math.hypot(q[0] - grid.points[3 * j], q[1] - grid.points[3 * j + 1], q[2] - grid.points[3 * j + 2])).toBeLessThan(1e-14);
      });
    }
  });

  it("has orbits of at most 8 cells whose representatives cover about 1/8 of the sphere", () => {
    const rep = orbitRepresentatives(grid);
    let reps = 0;
    for (let i = 0; i < grid.count; i++) if (rep[i] === i) reps++;
    expect(reps).toBeGreaterThanOrEqual(grid.count / 8);
    expect(reps).toBeLessThan(grid.count / 8 + 400);
  });

  it("rejects spacings outside 0.1 to 30 deg", () => {
    expect(() => equalAreaGrid(0.01 * DEG)).toThrow(/grid spacing/);
    expect(() => equalAreaGrid(45 * DEG)).toThrow(/grid spacing/);
  });
});
