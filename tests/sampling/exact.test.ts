import { describe, expect, it } from "vitest";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { sampleSeam } from "../../geometry/seamSamples.js";
import { applySymmetry, SEAM_SYMMETRIES } from "../../geometry/symmetry.js";
import { bandFromDegrees, DEFAULT_BAND } from "../../src/sampling/band.js";
import { bandAveragesBrute } from "../../src/sampling/brute.js";
import { bandAveragesExact } from "../../src/sampling/exact.js";
import { computeSphereMap } from "../../src/sampling/sphereMap.js";
import { lcg, randomUnit } from "../support/random.js";
import { DEG } from "../../geometry/units.js";

const KEYS = ["seamInBand", "axisPlus", "axisMinus", "magnusPlus", "magnusMinus", "alongAxis", "alongMagnus", "magnitude"] as const;

describe("exact time-averaged sampler", () => {
  const seam = sampleSeam(DEFAULT_SEAM_SHAPE, 512);

  it("equals the brute-force time-stepping sampler (720 steps) within 1e-3 over 60 random axes, gyros and bands (cross-check by two routes)", () => {
    const rnd = lcg(2026);
    let worst = 0;
    for (let k = 0; k < 60; k++) {
      const [x, y, z] = randomUnit(rnd);
      const gyro = (2 * rnd() - 1) * 80 * DEG;
      const width = 5 + 55 * rnd();
      const centre = width / 2 + 1 + (178 - width) * rnd();
      const band = bandFromDegrees(centre, width);
      const e = bandAveragesExact(seam, x, y, z, gyro, band);
      const b = bandAveragesBrute(seam, x, y, z, gyro, band, 720);
      for (const key of KEYS) worst = Math.max(worst, Math.abs(e[key] - b[key]));
    }
    expect(worst).toBeLessThan(1e-3);
    expect(worst).toBeGreaterThan(0); // two different computations, not one
  });

  it("converges to brute force as the time step shrinks (error at 2880 steps below 1/3 of that at 180)", () => {
    const band = bandFromDegrees(95, 30);
    const n = Math.hypot(0.3, -0.5, 0.81);
    const [x, y, z] = [0.3 / n, -0.5 / n, 0.81 / n];
    const e = bandAveragesExact(seam, x, y, z, 0.2, band);
    const err = (steps: number) => {
      const b = bandAveragesBrute(seam, x, y, z, 0.2, band, steps);
      return Math.max(...KEYS.map((k) => Math.abs(e[k] - b[k])));
    };
    expect(err(2880)).toBeLessThan(err(180) / 3);
  });

  it("gives sides that add up: axisPlus + axisMinus = magnusPlus + magnusMinus = seamInBand, to 1e-14", () => {
    const rnd = lcg(11);
    for (let k = 0; k < 30; k++) {
      const [x, y, z] = randomUnit(rnd);
      const r = bandAveragesExact(seam, x, y, z, (2 * rnd() - 1) * 1.4, DEFAULT_BAND);
      expect(Math.abs(r.axisPlus + r.axisMinus - r.seamInBand)).toBeLessThan(1e-14);
      expect(Math.abs(r.magnusPlus + r.magnusMinus - r.seamInBand)).toBeLessThan(1e-14);
    }
  });

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

  it("gives zero asymmetry for axes along the curve's 2-fold axes x, y, z at zero gyro (symmetry: the half-turn about z maps w to -w), to 1e-14", () => {
    for (const axis of [
      [1, 0, 0],
      [0, 1, 0],
      [0, 0, 1],
    ] as const) {
      for (const band of [DEFAULT_BAND, bandFromDegrees(70, 20), bandFromDegrees(110, 10)]) {
        const r = bandAveragesExact(seam, axis[0], axis[1], axis[2], 0, band);
        expect(r.magnitude).toBeLessThan(1e-14);
        expect(Math.abs(r.axisPlus - r.axisMinus)).toBeLessThan(1e-14);
      }
    }
  });

  it("gives identical numbers for all 8 symmetric images of an axis at any gyro (symmetry of the curve), to 1e-13", () => {
    const rnd = lcg(99);
    for (let k = 0; k < 10; k++) {
      const p = randomUnit(rnd);
      const gyro = (2 * rnd() - 1) * 1.2;
      const r0 = bandAveragesExact(seam, p[0], p[1], p[2], gyro, DEFAULT_BAND);
      for (const g of SEAM_SYMMETRIES) {
        const q = applySymmetry(g, p);
        const r = bandAveragesExact(seam, q[0], q[1], q[2], gyro, DEFAULT_BAND);
        for (const key of KEYS) expect(Math.abs(r[key] - r0[key])).toBeLessThan(1e-13);
      }
    }
  });

  it("flips the asymmetry and swaps the axis sides when both the axis and the gyro are reversed (reversed turn visits the same flow directions), to 1e-14", () => {
    const n = Math.hypot(0.2, 0.5, 0.84);
    const a = bandAveragesExact(seam, 0.2 / n, 0.5 / n, 0.84 / n, 0.3, DEFAULT_BAND);
    const b = bandAveragesExact(seam, -0.2 / n, -0.5 / n, -0.84 / n, -0.3, DEFAULT_BAND);
    expect(Math.abs(a.alongAxis + b.alongAxis)).toBeLessThan(1e-14);
    expect(Math.abs(a.axisPlus - b.axisMinus)).toBeLessThan(1e-14);
    expect(a.magnitude).toBeGreaterThan(1e-4); // a case that is not trivially zero
  });

  it("splits the band exactly in half across the Magnus direction, as the brute force finds to 1e-3 (derived: the stagnation circle is mirror-symmetric about the plane of w and v)", () => {
    const n = Math.hypot(0.6, 0.1, 0.79);
    const r = bandAveragesExact(seam, 0.6 / n, 0.1 / n, 0.79 / n, 0.4, DEFAULT_BAND);
    expect(r.magnusPlus).toBe(r.seamInBand / 2);
    expect(r.alongMagnus).toBe(0);
    const b = bandAveragesBrute(seam, 0.6 / n, 0.1 / n, 0.79 / n, 0.4, DEFAULT_BAND, 720);
    expect(Math.abs(b.magnusPlus - b.magnusMinus)).toBeLessThan(1e-3);
    expect(Math.abs(b.alongMagnus)).toBeLessThan(1e-3);
  });

  it("counts a seam point on the spin axis as always in or always out of the band", () => {
    // band around 90 deg with zero gyro: every point on the axis sits at theta = 90 deg
    const onAxis = sampleSeam(DEFAULT_SEAM_SHAPE, 512);
    const r = bandAveragesExact(onAxis, 1, 0, 0, 0, bandFromDegrees(90, 2));
    const b = bandAveragesBrute(onAxis, 1, 0, 0, 0, bandFromDegrees(90, 2), 720);
    expect(Math.abs(r.seamInBand - b.seamInBand)).toBeLessThan(2e-3);
  });
});
