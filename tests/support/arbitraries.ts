/**
 * fast-check generators the property tests share. Runs repeat: every fc.assert in
 * the tests passes a fixed `seed`.
 *
 * fc.double draws uniformly over the set of doubles, so most of its values in [-1, 1]
 * are tiny (below 1e-100); geometry wants values uniform over the interval, so these
 * build them from a 52-bit fraction.
 */
import fc from "fast-check";
import type { Vec3 } from "../../geometry/vec.js";

const TWO_26 = 2 ** 26;

/** Uniform in [0, 1) on a grid of 2^-52, without fast-check's bias toward small values. */
const fraction: fc.Arbitrary<number> = fc
  .noBias(fc.tuple(fc.integer({ min: 0, max: TWO_26 - 1 }), fc.integer({ min: 0, max: TWO_26 - 1 })))
  .map(([hi, lo]) => (hi * TWO_26 + lo) / (TWO_26 * TWO_26));

/** Uniform in [min, max). */
export function uniform(min: number, max: number): fc.Arbitrary<number> {
  return fraction.map((u) => min + (max - min) * u);
}

/** Uniform on the unit sphere (Archimedes: z uniform in [-1, 1], longitude uniform). */
export const unitVector: fc.Arbitrary<Vec3> = fc.tuple(uniform(-1, 1), uniform(0, 2 * Math.PI)).map(([z, phi]) => {
  const r = Math.sqrt(Math.max(0, 1 - z * z));
  return [r * Math.cos(phi), r * Math.sin(phi), z] as Vec3;
});
