/**
 * The seam and its stitches on a ball drawing (ball frame, see geometry/seamCurve.ts).
 *
 * The seam is drawn as a band of its real width, not as a stroke of constant width:
 * the band's two edges are the seam curve offset by half the width along the
 * across-seam direction on the sphere, then projected, so the band narrows toward
 * the limb as the real seam does. Each double stitch is a V: two legs from the band's
 * edges meeting on the seam's centre line, the point of the V toward increasing t.
 */
import { BALL_RADIUS_IN } from "../../geometry/ball.js";
import { BoundedCache } from "../../geometry/cache.js";
import { seamLength } from "../../geometry/seamSamples.js";
import { stitchLayout, type Stitches } from "../../geometry/stitches.js";
import { seamFor } from "../sampling/measure.js";
import { depthRuns, projectPoints, type DiscPlacement, type View } from "./projection.js";
import { polylinePath } from "./svgPath.js";

const stitchCache = new BoundedCache<number, Stitches>("stitch layouts per seam shape", 4);

/** Width of the stitched seam, inches (common practice: about 3/16 in). */
export const SEAM_WIDTH_IN = 3 / 16;
/** Half the seam width as an angle on the ball, radians. */
export const SEAM_HALF_WIDTH_RAD = SEAM_WIDTH_IN / 2 / BALL_RADIUS_IN;

/** Writes unit(p + k q) for 3-vectors at `i` of `p` and `q` into `out` at `i`. */
function offsetOnSphere(out: Float64Array, p: Float64Array, q: Float64Array, i: number, k: number): void {
  const x = p[i] + k * q[i], y = p[i + 1] + k * q[i + 1], z = p[i + 2] + k * q[i + 2];
  const len = Math.hypot(x, y, z);
  out[i] = x / len;
  out[i + 1] = y / len;
  out[i + 2] = z / len;
}

function across(p: Float64Array, t: Float64Array, i: number, out: Float64Array): void {
  // position x tangent: the unit across-seam direction in the sphere's tangent plane
  out[i] = p[i + 1] * t[i + 2] - p[i + 2] * t[i + 1];
  out[i + 1] = p[i + 2] * t[i] - p[i] * t[i + 2];
  out[i + 2] = p[i] * t[i + 1] - p[i + 1] * t[i];
}

/** Flat 2-D points of projected triples at the given indices. */
function xyOf(projected: Float64Array, indices: readonly number[]): number[] {
  const xy: number[] = [];
  for (const i of indices) xy.push(projected[3 * i], projected[3 * i + 1]);
  return xy;
}

export interface SeamPaths {
  /** Filled outline of the seam band where it faces the viewer (closed subpaths). */
  readonly visibleBand: string;
  /** Centre line of the seam where it faces away (open subpaths). */
  readonly hiddenLine: string;
}

/** Path data of the seam band and the hidden seam for shape `b`, sampled at `seamPoints` (multiple of 4). */
export function seamPaths(b: number, view: View, disc: DiscPlacement, seamPoints: number, digits: number): SeamPaths {
  const seam = seamFor(b, seamPoints);
  const n = seam.count;
  const side = new Float64Array(3 * n);
  const left = new Float64Array(3 * n);
  const right = new Float64Array(3 * n);
  for (let i = 0; i < 3 * n; i += 3) {
    across(seam.points, seam.tangents, i, side);
    offsetOnSphere(left, seam.points, side, i, Math.tan(SEAM_HALF_WIDTH_RAD));
    offsetOnSphere(right, seam.points, side, i, -Math.tan(SEAM_HALF_WIDTH_RAD));
  }
  const centre = projectPoints(view, disc, seam.points);
  const pl = projectPoints(view, disc, left);
  const pr = projectPoints(view, disc, right);
  // Every run is a proper part of the seam: each cover half has area 2 pi, so the seam
  // cannot lie inside one open hemisphere and always has a far side.
  let visibleBand = "";
  for (const run of depthRuns(centre, true, true)) {
    visibleBand += polylinePath([...xyOf(pl, run), ...xyOf(pr, [...run].reverse())], true, digits);
  }
  let hiddenLine = "";
  for (const run of depthRuns(centre, true, false)) hiddenLine += polylinePath(xyOf(centre, run), false, digits);
  return { visibleBand, hiddenLine };
}

export interface StitchMarks {
  /** One open V subpath per visible double stitch. */
  readonly path: string;
  /** Number of visible double stitches drawn. */
  readonly visibleCount: number;
}

/** Path data of the double stitches whose centres face the viewer. */
export function stitchMarks(b: number, view: View, disc: DiscPlacement, digits: number): StitchMarks {
  const layout = stitchCache.get(b, () => stitchLayout(b));
  const count = layout.count;
  const centres = projectPoints(view, disc, layout.centres);
  // legs reach 85 % of the way to the band edge; the V is 60 % of the stitch pitch long
  const spread = 0.85 * Math.tan(SEAM_HALF_WIDTH_RAD);
  const reach = (0.3 * seamLength(b)) / count;
  const legs = new Float64Array(9 * count);
  const tmp = new Float64Array(3);
  for (let j = 0; j < count; j++) {
    const c = 3 * j;
    for (let k = 0; k < 3; k++) {
      const back = layout.centres[c + k] - reach * layout.tangents[c + k];
      legs[9 * j + k] = back + spread * layout.across[c + k];
      legs[9 * j + 3 + k] = layout.centres[c + k] + reach * layout.tangents[c + k];
      legs[9 * j + 6 + k] = back - spread * layout.across[c + k];
    }
    for (let m = 0; m < 3; m++) {
      const o = 9 * j + 3 * m;
      const len = Math.hypot(legs[o], legs[o + 1], legs[o + 2]);
      for (let k = 0; k < 3; k++) tmp[k] = legs[o + k] / len;
      legs.set(tmp, o);
    }
  }
  const p = projectPoints(view, disc, legs);
  let path = "";
  let visibleCount = 0;
  for (let j = 0; j < count; j++) {
    if (!(centres[3 * j + 2] > 0)) continue;
    const o = 9 * j;
    path += polylinePath([p[o], p[o + 1], p[o + 3], p[o + 4], p[o + 6], p[o + 7]], false, digits);
    visibleCount++;
  }
  return { path, visibleCount };
}
