import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { DEFAULT_SEAM_SHAPE, seamPoint } from "../../geometry/seamCurve.js";
import { sampleSeam } from "../../geometry/seamSamples.js";
import { crossingsPerRevolution } from "../../src/sampling/crossings.js";
import { uniform, unitVector } from "../support/arbitraries.js";

const b = DEFAULT_SEAM_SHAPE;
const seam = sampleSeam(b, 2048);
/** Height of the horseshoe tips, 2 sqrt(ab) (the published curve's z = 2 sqrt(ab) sin 2t at its maximum). */
const TIP_HEIGHT = 2 * Math.sqrt((1 - b) * b);

describe("seam crossings per revolution", () => {
  it("counts 4 for the four-seam axis (through a waist, +z) and 2 for the two-seam axis ((1, 1, 0) / sqrt 2) at zero gyro (A. M. Nathan, Am. J. Phys. 76(2), 2008: two- and four-seam orientations)", () => {
    expect(crossingsPerRevolution(seam, 0, 0, 1, 0)).toBe(4);
    expect(crossingsPerRevolution(seam, Math.SQRT1_2, Math.SQRT1_2, 0, 0)).toBe(2);
  });

  it("for the z axis counts 4 while sin(gyro) is below the tips' height 2 sqrt(ab) and 0 above it (closed form: 2 sqrt(ab) sin 2t = sin g has 4 roots per turn, or none)", () => {
    for (const s of [0, 0.3, 0.6, 0.9, TIP_HEIGHT - 0.005]) expect(crossingsPerRevolution(seam, 0, 0, 1, Math.asin(s))).toBe(4);
    for (const s of [TIP_HEIGHT + 0.005, 0.95, 0.99]) expect(crossingsPerRevolution(seam, 0, 0, 1, Math.asin(s))).toBe(0);
  });

  it("is even, and equals the sign changes of q . w - sin(gyro) along the exact curve sampled 16x finer, for 300 random axes and gyros away from tangency (brute force)", () => {
    const fine = 32768;
    const p = [0, 0, 0];
    const level = new Float64Array(fine);
    fc.assert(
      fc.property(unitVector, uniform(-1.2, 1.2), (w, gyro) => {
        const s = Math.sin(gyro);
        for (let i = 0; i < fine; i++) {
          seamPoint(b, (2 * Math.PI * i) / fine, p);
          level[i] = p[0] * w[0] + p[1] * w[1] + p[2] * w[2] - s;
        }
        let changes = 0;
        for (let i = 0; i < fine; i++) if (Math.sign(level[i]) !== Math.sign(level[(i + 1) % fine])) changes++;
        const count = crossingsPerRevolution(seam, w[0], w[1], w[2], gyro);
        expect(count % 2).toBe(0);
        // skip circles that nearly touch the seam (a local extremum of the level within 2e-3 of zero),
        // where the coarse and fine polylines may legitimately disagree
        let tangentish = false;
        for (let i = 0; i < fine; i++) {
          const prev = level[(i + fine - 1) % fine], next = level[(i + 1) % fine];
          if ((level[i] - prev) * (next - level[i]) <= 0 && Math.abs(level[i]) < 2e-3) tangentish = true;
        }
        if (!tangentish) expect(count).toBe(changes);
      }),
      { seed: 2008, numRuns: 300 },
    );
  });
});
