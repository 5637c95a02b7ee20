import { describe, expect, it } from "vitest";
import { equalAreaGrid, interpolateOnGrid, orbitRepresentatives, symmetryImage } from "../../geometry/sphereGrid.js";
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

describe("reading per-cell values between the cells (interpolateOnGrid)", () => {
  const grid = equalAreaGrid(2 * DEG);
  const field = (x: number, y: number, z: number) => 0.3 + x - 2 * y + 0.5 * z + x * y - z * z;
  const values = new Float64Array(grid.count);
  for (let i = 0; i < grid.count; i++) values[i] = field(grid.points[3 * i], grid.points[3 * i + 1], grid.points[3 * i + 2]);

  it("gives every cell centre its own value, to 1e-12 [interpolation is exact at the nodes]", () => {
    for (let i = 0; i < grid.count; i += 7) {
      expect(Math.abs(interpolateOnGrid(grid, values, grid.points[3 * i], grid.points[3 * i + 1], grid.points[3 * i + 2]) - values[i])).toBeLessThan(1e-12);
    }
  });

  it("reads a smooth field between the cells to within 3 h^2 away from the poles (linear interpolation's second-order error, h the 2 deg spacing) and within h near them (rings of few cells: first order in h)", () => {
    const h = grid.spacingRad;
    let away = 0;
    let near = 0;
    // a deterministic spiral of points over the whole sphere, both poles included
    const n = 20000;
    for (let k = 0; k <= n; k++) {
      const z = -1 + (2 * k) / n;
      const r = Math.sqrt(Math.max(0, 1 - z * z));
      const lon = k * 2.399963229728653;
      const x = r * Math.cos(lon), y = r * Math.sin(lon);
      const e = Math.abs(interpolateOnGrid(grid, values, x, y, z) - field(x, y, z));
      if (r > 10 * h) away = Math.max(away, e);
      else near = Math.max(near, e);
    }
    // the field's second derivatives on the unit sphere are below 6 and its gradient below 2.5
    expect(away).toBeLessThan(3 * h * h);
    expect(near).toBeLessThan(h);
    expect(away).toBeGreaterThan(0);
  });

  it("is continuous: two points 1e-7 rad apart read within 1e-5 of each other across ring edges and the 0/360 deg seam", () => {
    for (let i = 1; i < grid.ringEdges.length - 1; i += 5) {
      const z = grid.ringEdges[i];
      for (const lon of [0, 1e-9, 2 * Math.PI - 1e-9, 1.234]) {
        const r = Math.sqrt(1 - z * z);
        const a = interpolateOnGrid(grid, values, r * Math.cos(lon), r * Math.sin(lon), z - 1e-7);
        const b = interpolateOnGrid(grid, values, r * Math.cos(lon + 1e-7), r * Math.sin(lon + 1e-7), z + 1e-7);
        expect(Math.abs(a - b)).toBeLessThan(1e-5);
      }
    }
  });
});
