/**
 * The classic reference holds, found from the seam's geometry.
 *
 * Candidates are the directions the curve's symmetry singles out: the three
 * half-turn axes (x, y, z) and the two lines where the mirror planes meet the
 * curve's equator ((1, 1, 0) and (1, -1, 0), normalised). For each, count the
 * seam's crossings of the great circle across it (zero gyro: the stagnation point's
 * path). The four-seam axis is the candidate with 4 crossings nearest a waist middle;
 * the two-seam axis the one with 2 crossings nearest a lobe centre (common practice,
 * no source: the trade names the holds by the seams passing the front per turn).
 * Both are mapped to minus themselves by a half-turn of the group, so either sign of
 * the axis gives the same numbers.
 */
import { findLandmarks } from "../../geometry/landmarks.js";
import type { SeamSamples } from "../../geometry/seamSamples.js";
import { angleBetween, unit3, type Vec3 } from "../../geometry/vec.js";
import { crossingsPerRevolution } from "../sampling/crossings.js";

export type ReferenceName = "four-seam" | "two-seam";

export interface ReferenceAxis {
  readonly name: ReferenceName;
  /** Unit axis in the ball frame. */
  readonly axis: Vec3;
  /** Crossings of the great circle across the axis (zero gyro). */
  readonly greatCircleCrossings: number;
}

export function findReferenceAxes(seam: SeamSamples): ReferenceAxis[] {
  const candidates: Vec3[] = [[1, 0, 0], [0, 1, 0], [0, 0, 1], unit3([1, 1, 0]), unit3([1, -1, 0])];
  const landmarks = findLandmarks(seam.shape);
  const nearest = (axis: Vec3, kind: "waist" | "lobe") =>
    Math.min(...landmarks.filter((l) => l.kind === kind).flatMap((l) => [angleBetween(axis, l.direction), angleBetween(axis, [-l.direction[0], -l.direction[1], -l.direction[2]])]));
  const withCount = candidates.map((axis) => ({ axis, count: crossingsPerRevolution(seam, axis[0], axis[1], axis[2], 0) }));
  const pick = (count: number, kind: "waist" | "lobe"): Vec3 => {
    const options = withCount.filter((c) => c.count === count).sort((p, q) => nearest(p.axis, kind) - nearest(q.axis, kind));
    if (options.length === 0) throw new Error(`no symmetric axis with ${count} seam crossings for seam shape ${seam.shape}`);
    return options[0].axis;
  };
  return [
    { name: "four-seam", axis: pick(4, "waist"), greatCircleCrossings: 4 },
    { name: "two-seam", axis: pick(2, "lobe"), greatCircleCrossings: 2 },
  ];
}
