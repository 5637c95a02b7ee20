/**
 * The band numbers for every spin-axis position on the ball, on the equal-area
 * ring grid (geometry/sphereGrid.ts), at one gyro angle.
 *
 * Each orbit of the seam's symmetry group is evaluated once, at its smallest
 * index, and copied to the rest of the orbit: the group maps the seam samples onto
 * themselves, so the copies are what a direct evaluation gives (the tests check it).
 */
import { equalAreaGrid, orbitRepresentatives, type SphereGrid } from "../../geometry/sphereGrid.js";
import type { SeamSamples } from "../../geometry/seamSamples.js";
import { assertGyro, type Band } from "./band.js";
import { bandAveragesExact, emptyAverages } from "./exact.js";

export interface SphereMap {
  readonly grid: SphereGrid;
  readonly gyroRad: number;
  readonly band: Band;
  /** Per cell, like BandAverages. */
  readonly seamInBand: Float64Array;
  readonly axisPlus: Float64Array;
  readonly axisMinus: Float64Array;
  readonly alongAxis: Float64Array;
  readonly magnitude: Float64Array;
  /** Number of cells evaluated directly (one per symmetry orbit). */
  readonly evaluated: number;
}

/** Computes the map on a grid of spacing `spacingRad` (or on a prebuilt grid). */
export function computeSphereMap(seam: SeamSamples, gyroRad: number, band: Band, grid: SphereGrid | number): SphereMap {
  assertGyro(gyroRad);
  const g = typeof grid === "number" ? equalAreaGrid(grid) : grid;
  const rep = orbitRepresentatives(g);
  const n = g.count;
  const seamInBand = new Float64Array(n);
  const axisPlus = new Float64Array(n);
  const axisMinus = new Float64Array(n);
  const alongAxis = new Float64Array(n);
  const magnitude = new Float64Array(n);
  const r = emptyAverages();
  let evaluated = 0;
  for (let i = 0; i < n; i++) {
    const src = rep[i];
    if (src === i) {
      bandAveragesExact(seam, g.points[3 * i], g.points[3 * i + 1], g.points[3 * i + 2], gyroRad, band, r);
      seamInBand[i] = r.seamInBand;
      axisPlus[i] = r.axisPlus;
      axisMinus[i] = r.axisMinus;
      alongAxis[i] = r.alongAxis;
      magnitude[i] = r.magnitude;
      evaluated++;
    } else {
      // rep[i] < i, so the representative is already filled
      seamInBand[i] = seamInBand[src];
      axisPlus[i] = axisPlus[src];
      axisMinus[i] = axisMinus[src];
      alongAxis[i] = alongAxis[src];
      magnitude[i] = magnitude[src];
    }
  }
  return { grid: g, gyroRad, band, seamInBand, axisPlus, axisMinus, alongAxis, magnitude, evaluated };
}
