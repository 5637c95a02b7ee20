import { describe, expect, it } from "vitest";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { sampleSeam } from "../../geometry/seamSamples.js";
import { bandFromDegrees } from "../../src/sampling/band.js";
import { bandAveragesBrute } from "../../src/sampling/brute.js";
import { bandAveragesExact } from "../../src/sampling/exact.js";

const KEYS = ["seamInBand", "axisPlus", "axisMinus", "magnusPlus", "magnusMinus", "alongAxis", "alongMagnus", "magnitude"] as const;

describe("brute-force time-stepping sampler", () => {
  const seam = sampleSeam(DEFAULT_SEAM_SHAPE, 512);

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

  it("keeps two points on the poles of a z spin axis inside an 89.5-90.5 deg band for the whole turn at zero gyro (closed form: the stagnation point runs round the equator, 90 deg from both): seamInBand = 1, the sides cancel to 1e-15", () => {
    const twoPoles = { ...seam, count: 2, points: Float64Array.of(0, 0, 1, 0, 0, -1) };
    const r = bandAveragesBrute(twoPoles, 0, 0, 1, 0, bandFromDegrees(90, 1), 360);
    expect(r.seamInBand).toBe(1);
    expect(r.axisPlus).toBe(0.5);
    expect(Math.abs(r.alongAxis)).toBeLessThan(1e-15);
  });
});
