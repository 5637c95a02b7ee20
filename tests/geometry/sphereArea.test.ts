import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { enclosedArea } from "../../geometry/sphereArea.js";
import { cross3, dot3, norm3, unit3, type Vec3 } from "../../geometry/vec.js";
import { unitVector } from "../support/arbitraries.js";

/** The angle at vertex `a` of the spherical triangle abc, between the great-circle arcs ab and ac. */
function vertexAngle(a: Vec3, b: Vec3, c: Vec3): number {
  const tb: Vec3 = [b[0] - dot3(a, b) * a[0], b[1] - dot3(a, b) * a[1], b[2] - dot3(a, b) * a[2]];
  const tc: Vec3 = [c[0] - dot3(a, c) * a[0], c[1] - dot3(a, c) * a[1], c[2] - dot3(a, c) * a[2]];
  return Math.atan2(norm3(cross3(tb, tc)), dot3(tb, tc));
}

describe("area enclosed by a closed curve on the unit sphere (Van Oosterom & Strackee, IEEE Trans. Biomed. Eng. 30(2), 1983)", () => {
  it("solid-angle routine gives 2 pi (1 - cos 30 deg) for a 30 deg cap (Archimedes), to 1e-6", () => {
    const n = 4096;
    const pts = new Float64Array(3 * n);
    const r = Math.sin(Math.PI / 6);
    for (let i = 0; i < n; i++) {
      const phi = (2 * Math.PI * i) / n;
      pts[3 * i] = r * Math.cos(phi);
      pts[3 * i + 1] = r * Math.sin(phi);
      pts[3 * i + 2] = Math.cos(Math.PI / 6);
    }
    expect(Math.abs(enclosedArea(pts, [0, 0, 1]) - 2 * Math.PI * (1 - Math.cos(Math.PI / 6)))).toBeLessThan(1e-6);
  });

  it("gives the octant (x, y, z) an area of 4 pi / 8 = pi / 2 from any apex (Girard's theorem: 3 right angles - pi), to 1e-14", () => {
    const octant = Float64Array.of(1, 0, 0, 0, 1, 0, 0, 0, 1);
    for (const apex of [[0, 0, 1], [1, 1, 1], [0.2, -0.9, 0.1], [-1, -1, -1]] as Vec3[]) {
      expect(Math.abs(enclosedArea(octant, unit3(apex)) - Math.PI / 2)).toBeLessThan(1e-14);
    }
  });

  it("gives every spherical triangle the area Girard's theorem gives, A + B + C - pi (or 4 pi minus it when clockwise), from a random apex off the edges' great circles, for 500 random triangles, to 1e-10", () => {
    // The apex's antipode must not lie on an edge: there a triangle (apex, q_i, q_i+1) is
    // degenerate (numerator and denominator of the formula both vanish), so apexes within
    // 0.05 of an edge's great circle are skipped.
    fc.assert(
      fc.property(unitVector, unitVector, unitVector, unitVector, (a, b, c, apex) => {
        const det = dot3(a, cross3(b, c));
        fc.pre(Math.abs(det) > 1e-3);
        for (const [u, w] of [[a, b], [b, c], [c, a]]) fc.pre(Math.abs(dot3(apex, unit3(cross3(u, w)))) > 0.05);
        const excess = vertexAngle(a, b, c) + vertexAngle(b, c, a) + vertexAngle(c, a, b) - Math.PI;
        const expected = det > 0 ? excess : 4 * Math.PI - excess;
        const area = enclosedArea(Float64Array.of(...a, ...b, ...c), apex);
        const gap = Math.abs(area - expected);
        expect(Math.min(gap, 4 * Math.PI - gap)).toBeLessThan(1e-10);
      }),
      { seed: 1629, numRuns: 500 },
    );
  });
});
