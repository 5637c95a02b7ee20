import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { angleBetween, cross3, dot3, newVec3, perpendicularUnit, rotateAbout, type Vec3 } from "../../geometry/vec.js";
import { uniform, unitVector } from "../support/arbitraries.js";

describe("vector helpers", () => {
  it("uses Float64 for gl-matrix's vectors (STYLE.md: gl-matrix defaults to Float32)", () => {
    expect(newVec3()).toBeInstanceOf(Float64Array);
  });

  it("measures the angle between vectors at full precision near 0 and pi, where acos loses half the digits: 1e-8 rad and pi - 1e-8 rad to 1e-15 relative (closed form)", () => {
    const e = 1e-8;
    expect(Math.abs(angleBetween([1, 0, 0], [Math.cos(e), Math.sin(e), 0]) - e) / e).toBeLessThan(1e-15);
    expect(Math.abs(angleBetween([1, 0, 0], [-Math.cos(e), Math.sin(e), 0]) - (Math.PI - e))).toBeLessThan(1e-15);
  });

  it("rotates by Rodrigues' formula (O. Rodrigues, J. Math. Pures Appl. 5, 1840), v cos t + (k x v) sin t + k (k . v)(1 - cos t), for 500 random axes, vectors and angles, to 1e-14", () => {
    fc.assert(
      fc.property(unitVector, unitVector, uniform(-2 * Math.PI, 2 * Math.PI), (k, v, t) => {
        const kxv = cross3(k, v);
        const kv = dot3(k, v);
        const expected = [0, 1, 2].map((i) => v[i] * Math.cos(t) + kxv[i] * Math.sin(t) + k[i] * kv * (1 - Math.cos(t)));
        const got = rotateAbout(v, k, t);
        for (let i = 0; i < 3; i++) expect(Math.abs(got[i] - expected[i])).toBeLessThan(1e-14);
      }),
      { seed: 1840, numRuns: 500 },
    );
  });

  it("finds a unit vector perpendicular to any unit vector, the coordinate axes included, to 1e-15", () => {
    const axes: Vec3[] = [[0, 0, 1], [0, 0, -1], [1, 0, 0], [0, 1, 0]];
    fc.assert(
      fc.property(unitVector, (n) => {
        for (const m of [n, ...axes]) {
          const p = perpendicularUnit(m);
          expect(Math.abs(Math.hypot(...p) - 1)).toBeLessThan(1e-15);
          expect(Math.abs(dot3(p, m))).toBeLessThan(1e-15);
        }
      }),
      { seed: 1841, numRuns: 200 },
    );
  });
});
