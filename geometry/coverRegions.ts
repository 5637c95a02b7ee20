/**
 * Which cover half a point on the ball lies in, and the named region it sits on
 * (ball frame, see seamCurve.ts and landmarks.ts).
 *
 * The half is decided by a sum of signed spherical-triangle areas (the Van
 * Oosterom-Strackee sum of geometry/sphereArea.ts before it is reduced modulo 4 pi)
 * with its apex at the point's antipode -p: the sum is +-2 pi, and its sign jumps
 * exactly when the apex's antipode, p, crosses the seam (each triangle's formula
 * wraps where the apex is opposite an edge). So the sign tells the two sides apart
 * without a crossing count. Half A is the side that holds waist-A (+z).
 */
import { angleToSeam, findLandmarks, type Landmark } from "./landmarks.js";
import { sampleSeam, type SeamSamples } from "./seamSamples.js";
import { signedTriangleSum } from "./sphereArea.js";
import { angleBetween, type Vec3 } from "./vec.js";

export type CoverHalf = "A" | "B";

export interface CoverRegion {
  /** The half the point lies in. */
  readonly half: CoverHalf;
  /** "seam" when the point is within the seam's half-width of the seam, else "lobe" or "waist". */
  readonly part: "seam" | "lobe" | "waist";
  /** Name of the nearest lobe centre or waist middle in the same half (e.g. lobe-A1, waist-B). */
  readonly near: string;
  /** Angular distance to the seam centre line, radians. */
  readonly seamDistanceRad: number;
}

/** Precomputed seam and landmarks for region queries on a seam of shape b. */
export interface CoverModel {
  readonly seam: SeamSamples;
  readonly landmarks: readonly Landmark[];
  readonly signA: number;
}

export function coverModel(b: number, seamPoints = 4096): CoverModel {
  const seam = sampleSeam(b, seamPoints);
  return { seam, landmarks: findLandmarks(b), signA: Math.sign(signedTriangleSum(seam.points, [0, 0, -1])) };
}

/** The half holding unit point p. */
export function coverHalf(model: CoverModel, p: Readonly<Vec3>): CoverHalf {
  return Math.sign(signedTriangleSum(model.seam.points, [-p[0], -p[1], -p[2]])) === model.signA ? "A" : "B";
}

/**
 * The region under unit point p.
 * @param seamHalfWidthRad half the seam's width as an angle on the ball (a point this close counts as on the seam)
 */
export function coverRegion(model: CoverModel, p: Readonly<Vec3>, seamHalfWidthRad: number): CoverRegion {
  const half = coverHalf(model, p);
  const seamDistanceRad = angleToSeam(p, model.seam.points);
  let best: Landmark | undefined;
  let bestAngle = Infinity;
  for (const l of model.landmarks) {
    if ((l.kind !== "lobe" && l.kind !== "waist") || !l.name.includes(`-${half}`)) continue;
    const a = angleBetween(p, l.direction);
    if (a < bestAngle) {
      bestAngle = a;
      best = l;
    }
  }
  const part = seamDistanceRad <= seamHalfWidthRad ? "seam" : best!.kind === "lobe" ? "lobe" : "waist";
  return { half, part, near: best!.name, seamDistanceRad };
}
