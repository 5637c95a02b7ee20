/**
 * Small circles on the unit sphere (ball frame), sampled for drawing: the circle of
 * points at angle theta from a unit axis n is cos(theta) n + sin(theta) (cos(phi) e1 + sin(phi) e2),
 * with (e1, e2) any orthonormal pair across n.
 */
import { cross3, perpendicularUnit, unit3, type Vec3 } from "../../geometry/vec.js";

/**
 * `count` points (flat, 3 * count) at `angleRad` (0..pi) from `axis`, at phi = 2 pi k / count.
 * The starting phi is fixed by `perpendicularUnit`, so the output is deterministic.
 */
export function smallCirclePoints(axis: Readonly<Vec3>, angleRad: number, count: number): Float64Array {
  if (!(angleRad >= 0 && angleRad <= Math.PI)) throw new RangeError(`circle angle ${angleRad} rad must be from 0 to pi`);
  if (!(Number.isInteger(count) && count >= 3)) throw new RangeError(`circle point count ${count} must be a whole number >= 3`);
  const n = unit3(axis);
  const e1 = perpendicularUnit(n);
  const e2 = cross3(n, e1);
  const c = Math.cos(angleRad);
  const s = Math.sin(angleRad);
  const out = new Float64Array(3 * count);
  for (let k = 0; k < count; k++) {
    const phi = (2 * Math.PI * k) / count;
    const cp = s * Math.cos(phi);
    const sp = s * Math.sin(phi);
    for (let j = 0; j < 3; j++) out[3 * k + j] = c * n[j] + cp * e1[j] + sp * e2[j];
  }
  return out;
}
