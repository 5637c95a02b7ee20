/**
 * Small vector helpers, and Float64 storage for gl-matrix.
 *
 * gl-matrix's own constructors (create, fromValues, clone) allocate Float32Array
 * unless its global array type is switched, which would be a side effect on import
 * felt by every other user of the package. We never call them: storage comes from
 * newVec3 / newQuat / newMat3 below (Float64Array), and gl-matrix's functions, which
 * write into whatever array they are given, work on it at full precision.
 */
import { vec3, quat, mat3 } from "gl-matrix";

export { vec3, quat, mat3 };

/** A Float64 3-vector for gl-matrix's functions. */
export function newVec3(x = 0, y = 0, z = 0): vec3 {
  return Float64Array.of(x, y, z) as unknown as vec3;
}

/** A Float64 identity quaternion [0, 0, 0, 1] for gl-matrix's functions. */
export function newQuat(): quat {
  return Float64Array.of(0, 0, 0, 1) as unknown as quat;
}

/** A Float64 identity 3x3 matrix (column-major) for gl-matrix's functions. */
export function newMat3(): mat3 {
  return Float64Array.of(1, 0, 0, 0, 1, 0, 0, 0, 1) as unknown as mat3;
}

/** A 3-vector as a plain tuple (for public results and JSON). */
export type Vec3 = [number, number, number];

/** Length below which a vector counts as zero (dimensionless, unit-sphere scale). */
export const ZERO_LENGTH = 1e-12;

export function dot3(a: Readonly<Vec3>, b: Readonly<Vec3>): number {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}

export function cross3(a: Readonly<Vec3>, b: Readonly<Vec3>): Vec3 {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

export function norm3(a: Readonly<Vec3>): number {
  return Math.hypot(a[0], a[1], a[2]);
}

/** Unit vector along `a`; throws RangeError for a zero or non-finite vector. */
export function unit3(a: Readonly<Vec3>): Vec3 {
  const n = norm3(a);
  if (!Number.isFinite(n) || n < ZERO_LENGTH) {
    throw new RangeError(`cannot normalise vector (${a.join(", ")}): it is zero or not finite`);
  }
  return [a[0] / n, a[1] / n, a[2] / n];
}

export function scale3(a: Readonly<Vec3>, k: number): Vec3 {
  return [a[0] * k, a[1] * k, a[2] * k];
}

export function add3(a: Readonly<Vec3>, b: Readonly<Vec3>): Vec3 {
  return [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
}

export function sub3(a: Readonly<Vec3>, b: Readonly<Vec3>): Vec3 {
  return [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
}

/** Angle between two vectors in radians, by atan2(|a x b|, a . b) (stable near 0 and pi). */
export function angleBetween(a: Readonly<Vec3>, b: Readonly<Vec3>): number {
  return Math.atan2(norm3(cross3(a, b)), dot3(a, b));
}

/**
 * A unit vector perpendicular to unit `n`: the component of `hint` across `n`,
 * or of a fallback axis when `hint` is (nearly) parallel to `n`.
 */
export function perpendicularUnit(n: Readonly<Vec3>, hint: Readonly<Vec3> = [0, 0, 1]): Vec3 {
  const tryHint = (h: Readonly<Vec3>): Vec3 | null => {
    const d = dot3(h, n);
    const p: Vec3 = [h[0] - d * n[0], h[1] - d * n[1], h[2] - d * n[2]];
    const len = norm3(p);
    return len > 1e-6 ? [p[0] / len, p[1] / len, p[2] / len] : null;
  };
  return tryHint(hint) ?? tryHint([1, 0, 0]) ?? (tryHint([0, 1, 0]) as Vec3);
}

/** Rotates `v` about unit axis `axis` by `angleRad` (right-hand rule), via a gl-matrix quaternion. */
export function rotateAbout(v: Readonly<Vec3>, axis: Readonly<Vec3>, angleRad: number): Vec3 {
  const q = quat.setAxisAngle(newQuat(), axis as unknown as vec3, angleRad);
  const out = vec3.transformQuat(newVec3(), v as unknown as vec3, q);
  return [out[0], out[1], out[2]];
}

export function clamp(x: number, lo: number, hi: number): number {
  return x < lo ? lo : x > hi ? hi : x;
}

