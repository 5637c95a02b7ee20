import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { sampleSeam } from "../../geometry/seamSamples.js";
import { applySymmetry, SEAM_SYMMETRIES } from "../../geometry/symmetry.js";
import { bandFromDegrees, DEFAULT_BAND } from "../../src/sampling/band.js";
import { bandAveragesBrute } from "../../src/sampling/brute.js";
import { bandAveragesExact } from "../../src/sampling/exact.js";
import { uniform, unitVector } from "../support/arbitraries.js";
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

  it("gives sides that add up: axisPlus + axisMinus = magnusPlus + magnusMinus = seamInBand, to 1e-14", () => {
    const rnd = lcg(11);
    for (let k = 0; k < 30; k++) {
      const [x, y, z] = randomUnit(rnd);
      const r = bandAveragesExact(seam, x, y, z, (2 * rnd() - 1) * 1.4, DEFAULT_BAND);
      expect(Math.abs(r.axisPlus + r.axisMinus - r.seamInBand)).toBeLessThan(1e-14);
      expect(Math.abs(r.magnusPlus + r.magnusMinus - r.seamInBand)).toBeLessThan(1e-14);
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

  it("gives identical numbers, to 1e-13, for all 8 images of the spin axis under the curve's symmetry group at a fixed gyro, for 40 random axes and gyros (published symmetries of the two-harmonic curve; DEVELOPERS.md explains why the improper ones keep the numbers too)", () => {
    fc.assert(
      fc.property(unitVector, uniform(-1.3, 1.3), (p, gyro) => {
        const r0 = bandAveragesExact(seam, p[0], p[1], p[2], gyro, DEFAULT_BAND);
        for (const g of SEAM_SYMMETRIES) {
          const q = applySymmetry(g, p);
          const r = bandAveragesExact(seam, q[0], q[1], q[2], gyro, DEFAULT_BAND);
          for (const key of KEYS) expect(Math.abs(r[key] - r0[key]), `${g.name}, ${key}`).toBeLessThan(1e-13);
        }
      }),
      { seed: 8, numRuns: 40 },
    );
  });

  it("control for the check above: a generic rotation of the axis (0.3 rad about z) changes the numbers by more than 1e-3", () => {
    const c = Math.cos(0.3), sn = Math.sin(0.3);
    let largest = 0;
    const rnd = lcg(8);
    for (let k = 0; k < 10; k++) {
      const p = randomUnit(rnd);
      const r0 = bandAveragesExact(seam, p[0], p[1], p[2], 0.2, DEFAULT_BAND);
      const r = bandAveragesExact(seam, c * p[0] - sn * p[1], sn * p[0] + c * p[1], p[2], 0.2, DEFAULT_BAND);
      for (const key of KEYS) largest = Math.max(largest, Math.abs(r[key] - r0[key]));
    }
    expect(largest).toBeGreaterThan(1e-3);
  });

  it("flips the asymmetry and swaps the axis sides when both the axis and the gyro are reversed (reversed turn visits the same flow directions), to 1e-14", () => {
    const n = Math.hypot(0.2, 0.5, 0.84);
    const a = bandAveragesExact(seam, 0.2 / n, 0.5 / n, 0.84 / n, 0.3, DEFAULT_BAND);
    const b = bandAveragesExact(seam, -0.2 / n, -0.5 / n, -0.84 / n, -0.3, DEFAULT_BAND);
    expect(Math.abs(a.alongAxis + b.alongAxis)).toBeLessThan(1e-14);
    expect(Math.abs(a.axisPlus - b.axisMinus)).toBeLessThan(1e-14);
    expect(a.magnitude).toBeGreaterThan(1e-4); // a case that is not trivially zero
  });

  it("splits the band in half across the Magnus direction: the brute force finds equal halves to 1e-3 (derived: the stagnation circle is mirror-symmetric about the plane of w and v), which the exact sampler builds in", () => {
    const n = Math.hypot(0.6, 0.1, 0.79);
    const r = bandAveragesExact(seam, 0.6 / n, 0.1 / n, 0.79 / n, 0.4, DEFAULT_BAND);
    expect(r.magnusPlus).toBe(r.seamInBand / 2);
    expect(r.alongMagnus).toBe(0);
    const b = bandAveragesBrute(seam, 0.6 / n, 0.1 / n, 0.79 / n, 0.4, DEFAULT_BAND, 720);
    expect(Math.abs(b.magnusPlus - b.magnusMinus)).toBeLessThan(1e-3);
    expect(Math.abs(b.alongMagnus)).toBeLessThan(1e-3);
  });

  it("agrees with the brute force within 2e-3 when a seam sample lies on the spin axis (node-1 on the axis +x, band 89-91 deg): such a point is always in or always out of the band", () => {
    // band around 90 deg with zero gyro: every point on the axis sits at theta = 90 deg
    const onAxis = sampleSeam(DEFAULT_SEAM_SHAPE, 512);
    const r = bandAveragesExact(onAxis, 1, 0, 0, 0, bandFromDegrees(90, 2));
    const b = bandAveragesBrute(onAxis, 1, 0, 0, 0, bandFromDegrees(90, 2), 720);
    expect(Math.abs(r.seamInBand - b.seamInBand)).toBeLessThan(2e-3);
  });
});
