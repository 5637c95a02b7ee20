/**
 * Area enclosed by a closed curve on the unit sphere.
 *
 * Sum of the signed solid angles of the triangles (p, q_i, q_i+1) for an apex p,
 * each by Van Oosterom and Strackee's formula (IEEE Trans. Biomed. Eng. 30(2),
 * 125-126, 1983):  tan(Omega / 2) = p . (a x b) / (1 + p . a + p . b + a . b).
 * The total is the area of the region the curve winds around counterclockwise
 * (seen from outside the sphere), taken modulo 4 pi into [0, 4 pi).
 */
import type { Vec3 } from "./vec.js";

/** Area (steradians) of the region on the left of the closed polyline `pts` (flat unit points), seen from outside. */
export function enclosedArea(pts: Float64Array, apex: Readonly<Vec3>): number {
  const full = 4 * Math.PI;
  const sum = signedTriangleSum(pts, apex);
  return ((sum % full) + full) % full;
}

/** The raw sum of the signed triangle areas (p, q_i, q_i+1), before reduction modulo 4 pi. */
export function signedTriangleSum(pts: Float64Array, apex: Readonly<Vec3>): number {
  const n = pts.length / 3;
  const [px, py, pz] = apex;
  let sum = 0;
  let comp = 0;
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    const ax = pts[3 * i], ay = pts[3 * i + 1], az = pts[3 * i + 2];
    const bx = pts[3 * j], by = pts[3 * j + 1], bz = pts[3 * j + 2];
    const det = px * (ay * bz - az * by) + py * (az * bx - ax * bz) + pz * (ax * by - ay * bx);
    const den = 1 + px * ax + py * ay + pz * az + px * bx + py * by + pz * bz + ax * bx + ay * by + az * bz;
    const y = 2 * Math.atan2(det, den) - comp;
    const t = sum + y;
    comp = t - sum - y;
    sum = t;
  }
  return sum;
}
