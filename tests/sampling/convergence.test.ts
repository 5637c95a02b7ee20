import { describe, expect, it } from "vitest";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { DEFAULT_SEAM_POINTS, sampleSeam } from "../../geometry/seamSamples.js";
import { DEFAULT_BAND } from "../../src/sampling/band.js";
import { bandAveragesExact } from "../../src/sampling/exact.js";
import { lcg, randomUnit } from "../support/random.js";

describe("convergence in seam resolution", () => {
  const rnd = lcg(4242);
  const cases = Array.from({ length: 40 }, () => {
    const p = randomUnit(rnd);
    return { p, gyro: (2 * rnd() - 1) * 1.2 };
  });
  const reference = sampleSeam(DEFAULT_SEAM_SHAPE, 65536);
  const refs = cases.map((c) => ({ ...bandAveragesExact(reference, c.p[0], c.p[1], c.p[2], c.gyro, DEFAULT_BAND) }));
  const worst = (n: number) => {
    const seam = sampleSeam(DEFAULT_SEAM_SHAPE, n);
    let w = 0;
    cases.forEach((c, i) => {
      const r = bandAveragesExact(seam, c.p[0], c.p[1], c.p[2], c.gyro, DEFAULT_BAND);
      for (const k of ["seamInBand", "axisPlus", "axisMinus", "alongAxis"] as const) w = Math.max(w, Math.abs(r[k] - refs[i][k]));
    });
    return w;
  };

  it("puts the default resolution within 1e-4 of the converged answer (65,536 points)", () => {
    expect(worst(DEFAULT_SEAM_POINTS)).toBeLessThan(1e-4);
  });

  it("shrinks the error by at least 4x when the resolution grows 8x (observed order about 1.5: square-root edges in the band share)", () => {
    expect(worst(4096)).toBeLessThan(worst(512) / 4);
  });
});
