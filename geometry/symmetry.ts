/**
 * The symmetry group of the seam curve (ball frame, see seamCurve.ts).
 *
 * Eight orthogonal maps send the curve onto itself (the group D2d, order 8):
 *   identity; half-turns about x, y and z; the rotoreflections
 *   (x, y, z) -> (-y, x, -z) and (y, -x, -z) (a quarter-turn about z with z flipped);
 *   the mirrors (x, y, z) -> (y, x, z) and (-y, -x, z) (through the 45 and 135 deg meridians).
 * On the curve: a quarter-period shift t -> t + pi/2 is the rotoreflection;
 * t -> -t is the half-turn about x; t -> pi/2 - t is the mirror x <-> y.
 * Only the half-turns about x and y and the two rotoreflections swap the cover halves.
 *
 * Acting on a spin axis with the gyro angle fixed, every element leaves the
 * turn-averaged band numbers unchanged (a mirror reverses the spin sense and the
 * flight direction's side together; see DEVELOPERS.md), which the tests check.
 */
import type { Vec3 } from "./vec.js";

export interface Symmetry {
  readonly name: string;
  /** Row-major 3x3 matrix. */
  readonly matrix: readonly number[];
  /** True for rotations (determinant +1). */
  readonly proper: boolean;
  /** True when it swaps the two cover halves. */
  readonly swapsHalves: boolean;
}

export const SEAM_SYMMETRIES: readonly Symmetry[] = [
  { name: "identity", matrix: [1, 0, 0, 0, 1, 0, 0, 0, 1], proper: true, swapsHalves: false },
  { name: "half-turn x", matrix: [1, 0, 0, 0, -1, 0, 0, 0, -1], proper: true, swapsHalves: true },
  { name: "half-turn y", matrix: [-1, 0, 0, 0, 1, 0, 0, 0, -1], proper: true, swapsHalves: true },
  { name: "half-turn z", matrix: [-1, 0, 0, 0, -1, 0, 0, 0, 1], proper: true, swapsHalves: false },
  { name: "rotoreflection +90", matrix: [0, -1, 0, 1, 0, 0, 0, 0, -1], proper: false, swapsHalves: true },
  { name: "rotoreflection -90", matrix: [0, 1, 0, -1, 0, 0, 0, 0, -1], proper: false, swapsHalves: true },
  { name: "mirror x=y", matrix: [0, 1, 0, 1, 0, 0, 0, 0, 1], proper: false, swapsHalves: false },
  { name: "mirror x=-y", matrix: [0, -1, 0, -1, 0, 0, 0, 0, 1], proper: false, swapsHalves: false },
];

export function applySymmetry(g: Symmetry, v: Readonly<Vec3>): Vec3 {
  const m = g.matrix;
  return [
    m[0] * v[0] + m[1] * v[1] + m[2] * v[2],
    m[3] * v[0] + m[4] * v[1] + m[5] * v[2],
    m[6] * v[0] + m[7] * v[1] + m[8] * v[2],
  ];
}
