import { describe, expect, it } from "vitest";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { sampleSeam } from "../../geometry/seamSamples.js";
import { equalAreaGrid, orbitRepresentatives } from "../../geometry/sphereGrid.js";
import { DEG } from "../../geometry/units.js";
import { bandFromDegrees, DEFAULT_BAND } from "../../src/sampling/band.js";
import { bandAveragesExact } from "../../src/sampling/exact.js";
import { computeSphereMap } from "../../src/sampling/sphereMap.js";

describe("sphere map of the band numbers", () => {
  const seam = sampleSeam(DEFAULT_SEAM_SHAPE, 512);

  it("averaged over all axis directions, puts the band's area share (cos(c - w/2) - cos(c + w/2)) / 2 of the seam in the band (Archimedes; Haar average), to 2e-4", () => {
    for (const [centre, width, gyro] of [
      [100, 40, 0],
      [90, 20, 30],
      [60, 30, -50],
    ]) {
      const band = bandFromDegrees(centre, width);
      const map = computeSphereMap(seam, gyro * DEG, band, 2 * DEG);
      let mean = 0;
      let meanAlong = 0;
      for (let i = 0; i < map.grid.count; i++) {
        mean += map.seamInBand[i];
        meanAlong += map.alongAxis[i];
      }
      mean /= map.grid.count;
      meanAlong /= map.grid.count;
      const expected = (Math.cos((centre - width / 2) * DEG) - Math.cos((centre + width / 2) * DEG)) / 2;
      expect(Math.abs(mean - expected)).toBeLessThan(2e-4);
      // and the asymmetry averages out: the band is symmetric about the flight line
      expect(Math.abs(meanAlong)).toBeLessThan(2e-4);
    }
  });

  it("fills every cell it copies by symmetry with what a direct evaluation at that cell gives: every 7th of 10,313 cells at 2 deg, 40 deg gyro, to 1e-12", () => {
    const grid = equalAreaGrid(2 * DEG);
    const map = computeSphereMap(seam, 40 * DEG, DEFAULT_BAND, grid);
    const rep = orbitRepresentatives(grid);
    let copied = 0;
    for (let i = 0; i < grid.count; i += 7) {
      const r = bandAveragesExact(seam, grid.points[3 * i], grid.points[3 * i + 1], grid.points[3 * i + 2], 40 * DEG, DEFAULT_BAND);
      expect(Math.abs(map.seamInBand[i] - r.seamInBand)).toBeLessThan(1e-12);
      expect(Math.abs(map.axisPlus[i] - r.axisPlus)).toBeLessThan(1e-12);
      expect(Math.abs(map.alongAxis[i] - r.alongAxis)).toBeLessThan(1e-12);
      expect(Math.abs(map.magnitude[i] - r.magnitude)).toBeLessThan(1e-12);
      if (rep[i] !== i) copied++;
    }
    expect(copied).toBeGreaterThan(1000);
    expect(map.evaluated).toBeLessThan(grid.count / 8 + 200);
  });

  it("rejects a gyro of 90 deg", () => {
    expect(() => computeSphereMap(seam, 90 * DEG, bandFromDegrees(100, 40), 10 * DEG)).toThrow(/gyro/);
  });
});
