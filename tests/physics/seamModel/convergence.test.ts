/**
 * The default resolution against a fine reference (the full study is in the report of the
 * commit that set the defaults; this keeps it true). Error measure: over random axes and
 * gyros, the root-mean-square of |C(default) - C(reference)| (both turn-averaged parts)
 * divided by the root-mean-square of |C(reference)|.
 */
import { describe, expect, it } from "vitest";
import { DEFAULT_RESOLUTION, defaultProfile, forceTimeline, seamModel, turnAverage } from "../../../src/physics/seamModel/index.js";
import { lcg, randomUnit } from "../../support/random.js";
import { DEG } from "./helpers.js";

describe("numerical resolution", () => {
  it("defaults (128 seam points, 96 meridians, 96 phases) are within 2.5 % rms of a fine reference (1024, 360, 720) over 16 random axes and gyros (|gyro| < 45 deg); the largest error is below 0.003 in C", () => {
    expect(DEFAULT_RESOLUTION).toMatchObject({ seamPoints: 128, azimuthBins: 96, phases: 96 });
    const fine = seamModel(defaultProfile(), { seamPoints: 1024, azimuthBins: 360, phases: 720 });
    const coarse = seamModel();
    const rnd = lcg(31);
    let e2 = 0;
    let r2 = 0;
    let worst = 0;
    for (let k = 0; k < 16; k++) {
      const axis = randomUnit(rnd);
      const gyro = (2 * rnd() - 1) * 45 * DEG;
      const a = { ...turnAverage(fine, axis, gyro) };
      const b = turnAverage(coarse, axis, gyro);
      const e = Math.hypot(a.across - b.across, a.alongMagnus - b.alongMagnus);
      e2 += e * e;
      r2 += a.across ** 2 + a.alongMagnus ** 2;
      worst = Math.max(worst, e);
    }
    expect(Math.sqrt(e2 / r2)).toBeLessThan(0.025);
    expect(worst).toBeLessThan(0.003);
  });

  it("the knuckleball timeline's peak at the defaults is within 1 % of the fine reference's", () => {
    const fine = seamModel(defaultProfile(), { seamPoints: 1024, azimuthBins: 360 });
    const peak = (m: ReturnType<typeof seamModel>) => Math.max(...forceTimeline(m, [0, 0, 1], 0, 360).alongMagnus.map(Math.abs));
    const p = peak(seamModel());
    const q = peak(fine);
    expect(Math.abs(p - q) / q).toBeLessThan(0.01);
  });
});
