import { describe, expect, it } from "vitest";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { sampleSeam } from "../../geometry/seamSamples.js";
import { angleBetween, type Vec3 } from "../../geometry/vec.js";
import { findReferenceAxes } from "../../src/screening/references.js";

/** Angle to a line (either sign of the direction), rad. */
const lineAngle = (a: Vec3, b: Vec3) => Math.min(angleBetween(a, b), angleBetween(a, [-b[0], -b[1], -b[2]]));

describe("the classic reference holds", () => {
  it("finds the four-seam axis through the waists (+-z) and the two-seam axis on the equator midway between nodes, (1, +-1, 0) / sqrt 2 (the published curve's symmetry axes; A. M. Nathan, Am. J. Phys. 76(2), 2008: 4 and 2 seam passes per turn), to 1e-15 rad, for b from 0.2 to 0.4", () => {
    for (const b of [0.2, DEFAULT_SEAM_SHAPE, 0.4]) {
      const [four, two] = findReferenceAxes(sampleSeam(b, 2048));
      expect(four).toMatchObject({ name: "four-seam", greatCircleCrossings: 4 });
      expect(two).toMatchObject({ name: "two-seam", greatCircleCrossings: 2 });
      expect(lineAngle(four.axis, [0, 0, 1])).toBeLessThan(1e-15);
      // (1, 1, 0) and (1, -1, 0) are images of each other under the rotoreflection: either will do
      expect(Math.min(lineAngle(two.axis, [Math.SQRT1_2, Math.SQRT1_2, 0]), lineAngle(two.axis, [Math.SQRT1_2, -Math.SQRT1_2, 0]))).toBeLessThan(1e-15);
    }
  });
});
