/** The landmarks job: the named places on the ball (ball frame), with their distance to the seam. */
import { formatLatLon, vectorToLatLon } from "../../geometry/ballCoords.js";
import { BALL_RADIUS_IN } from "../../geometry/ball.js";
import { findLandmarks, type LandmarkKind } from "../../geometry/landmarks.js";
import { assertSeamShape, DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { DEG } from "../../geometry/units.js";
import type { Vec3 } from "../../geometry/vec.js";
import { InputError } from "../io/errors.js";
import { parseNumber, type Request } from "./request/values.js";

export interface LandmarkRow {
  readonly name: string;
  readonly kind: LandmarkKind;
  readonly direction: Vec3;
  readonly latLon: string;
  readonly seamDistanceDeg: number;
  readonly seamDistanceIn: number;
}

export interface LandmarksResult {
  readonly seamShape: number;
  readonly landmarks: readonly LandmarkRow[];
}

export function parseLandmarks(request: Request): { seamShape: number } {
  const b = request["seam-shape"] === undefined ? DEFAULT_SEAM_SHAPE : parseNumber("seam-shape", request["seam-shape"], "b strictly between 0 and 0.5");
  try {
    assertSeamShape(b);
  } catch (err) {
    throw new InputError(`--seam-shape: ${(err as Error).message}`);
  }
  return { seamShape: b };
}

export function runLandmarks(job: { seamShape: number }): LandmarksResult {
  const landmarks = findLandmarks(job.seamShape).map((l) => ({
    name: l.name,
    kind: l.kind,
    direction: l.direction,
    latLon: formatLatLon(vectorToLatLon(l.direction)),
    seamDistanceDeg: l.seamDistanceRad / DEG,
    seamDistanceIn: l.seamDistanceRad * BALL_RADIUS_IN,
  }));
  return { seamShape: job.seamShape, landmarks };
}
