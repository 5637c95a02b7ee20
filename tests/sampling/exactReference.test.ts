import { describe, expect, it } from "vitest";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { sampleSeam, type SeamSamples } from "../../geometry/seamSamples.js";
import { bandFromDegrees, type Band } from "../../src/sampling/band.js";
import { bandAveragesExact } from "../../src/sampling/exact.js";
import { lcg, randomUnit } from "../support/random.js";

/**
 * The closed form of src/sampling/exact.ts's header written the plain way (two
 * Math.acos per seam point, the side cut by a third): a second route to the same
 * numbers, against the fast table-and-pipeline evaluation.
 */
function plainClosedForm(seam: SeamSamples, w: readonly number[], gyro: number, band: Band) {
  const s = Math.sin(gyro);
  const k = Math.cos(gyro);
  const cosHi = Math.cos(band.centerRad - band.widthRad / 2);
  const cosLo = Math.cos(band.centerRad + band.widthRad / 2);
  const acos = (x: number) => (x <= -1 ? Math.PI : x >= 1 ? 0 : Math.acos(x));
  const sq = (x: number) => (x <= -1 || x >= 1 ? 0 : Math.sqrt(1 - x * x));
  let inBand = 0, plus = 0, moment = 0;
  for (let i = 0; i < seam.count; i++) {
    const qw = seam.points[3 * i] * w[0] + seam.points[3 * i + 1] * w[1] + seam.points[3 * i + 2] * w[2];
    const rho = Math.sqrt(Math.max(0, 1 - qw * qw));
    const r = k * rho;
    const L = (cosLo - s * qw) / r;
    const U = (cosHi - s * qw) / r;
    if (L >= 1 || U <= -1) continue;
    const share = (acos(L) - acos(U)) / Math.PI;
    inBand += share;
    moment += qw * k * share - (s * rho * (sq(L) - sq(U))) / Math.PI;
    if (s === 0) plus += qw > 1e-12 ? share : qw < -1e-12 ? 0 : share / 2;
    else {
      const cut = (qw * k) / (s * rho);
      const lo = Math.max(L, -1);
      const hi = Math.min(U, 1);
      const below = cut <= lo ? 0 : cut >= hi ? share : (acos(L) - acos(cut)) / Math.PI;
      plus += s > 0 ? below : share - below;
    }
  }
  return { seamInBand: inBand / seam.count, axisPlus: plus / seam.count, alongAxis: -moment / seam.count };
}

describe("exact sampler, fast evaluation", () => {
  it("equals the plain closed form (two Math.acos per point) to 1e-12 over 200 random axes, gyros and bands", () => {
    const seam = sampleSeam(DEFAULT_SEAM_SHAPE, 1024);
    const rnd = lcg(31337);
    let worst = 0;
    for (let n = 0; n < 200; n++) {
      const w = randomUnit(rnd);
      const gyro = (2 * rnd() - 1) * 1.4;
      const width = 5 + 60 * rnd();
      const band = bandFromDegrees(width / 2 + 1 + (178 - width) * rnd(), width);
      const fast = bandAveragesExact(seam, w[0], w[1], w[2], gyro, band);
      const ref = plainClosedForm(seam, w, gyro, band);
      worst = Math.max(worst, Math.abs(fast.seamInBand - ref.seamInBand), Math.abs(fast.axisPlus - ref.axisPlus), Math.abs(fast.alongAxis - ref.alongAxis));
    }
    expect(worst).toBeLessThan(1e-12);
  });
});
