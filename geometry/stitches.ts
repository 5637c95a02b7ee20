/**
 * Stitch positions along the seam, for drawing (ball frame, unit sphere).
 *
 * A baseball carries 108 double stitches (common practice). Stitch j is centred at
 * arc length (j + 1/2) L / count from c(0), equally spaced; each has the seam's
 * unit tangent there and the unit vector across the seam in the sphere's tangent
 * plane (across = position x tangent), toward which its two legs splay.
 */
import { DOUBLE_STITCH_COUNT } from "./ball.js";
import { sampleSeam } from "./seamSamples.js";

export interface Stitches {
  readonly count: number;
  /** Unit stitch centres, flat (3 * count). */
  readonly centres: Float64Array;
  /** Unit seam tangents at the centres, flat. */
  readonly tangents: Float64Array;
  /** Unit vectors across the seam (centre x tangent), flat. */
  readonly across: Float64Array;
}

/** Stitch centres and directions for the seam with shape `b`. */
export function stitchLayout(b: number, count: number = DOUBLE_STITCH_COUNT): Stitches {
  if (!Number.isInteger(count) || count < 4 || count % 4 !== 0) {
    throw new RangeError(`stitch count ${count} must be a whole number, at least 4, divisible by 4`);
  }
  const seam = sampleSeam(b, count, 0.5);
  const across = new Float64Array(3 * count);
  for (let j = 0; j < count; j++) {
    const px = seam.points[3 * j], py = seam.points[3 * j + 1], pz = seam.points[3 * j + 2];
    const tx = seam.tangents[3 * j], ty = seam.tangents[3 * j + 1], tz = seam.tangents[3 * j + 2];
    across[3 * j] = py * tz - pz * ty;
    across[3 * j + 1] = pz * tx - px * tz;
    across[3 * j + 2] = px * ty - py * tx;
  }
  return { count, centres: seam.points, tangents: seam.tangents, across };
}
