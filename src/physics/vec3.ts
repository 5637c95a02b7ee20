/**
 * The 3-vector used in public physics results: a plain tuple in the field frame
 * (x toward the catcher's right, y from home plate toward the pitcher, z up).
 * Same shape as geometry/vec.ts's Vec3, so the two interoperate.
 */
export type Vec3 = [number, number, number];
