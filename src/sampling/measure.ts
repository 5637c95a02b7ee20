/**
 * One orientation, measured: the turn-averaged band numbers (exact sampler),
 * the seam crossings per revolution and the instantaneous timeline through one turn.
 */
import { BoundedCache } from "../../geometry/cache.js";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { DEFAULT_SEAM_POINTS, sampleSeam, type SeamSamples } from "../../geometry/seamSamples.js";
import { unit3, type Vec3 } from "../../geometry/vec.js";
import { assertGyro, DEFAULT_BAND, type Band } from "./band.js";
import { ballToFlowAtPhase } from "../../geometry/flow.js";
import { crossingsPerRevolution } from "./crossings.js";
import { emptyShares, instantBandShares } from "./instant.js";
import { bandAveragesExact, type BandAverages } from "./exact.js";

/** Phases per turn in a timeline (one per degree). */
export const TIMELINE_STEPS = 360;

export interface Orientation {
  /** Spin axis's positive end in the ball frame (any non-zero length). */
  readonly axis: Readonly<Vec3>;
  /** Gyro angle, radians, |gyro| < pi/2. */
  readonly gyroRad: number;
}

export interface MeasureOptions {
  readonly band?: Band;
  readonly seamShape?: number;
  readonly seamPoints?: number;
  /** Whether to compute the 360-phase timeline (default true). */
  readonly timeline?: boolean;
}

export interface Timeline {
  /** Instantaneous in-band seam share with q . a > 0 at phases 0, 1, ..., 359 deg. */
  readonly axisPlus: Float64Array;
  /** The same with q . a < 0. */
  readonly axisMinus: Float64Array;
}

export interface Measurement extends BandAverages {
  /** Unit spin axis in the ball frame. */
  readonly axis: Vec3;
  readonly crossingsPerRevolution: number;
  readonly timeline?: Timeline;
}

const seamCache = new BoundedCache<string, SeamSamples>("seam samples per shape and count", 16);

/** Arc-length samples of the seam, memoised per (shape, count). */
export function seamFor(seamShape: number = DEFAULT_SEAM_SHAPE, seamPoints: number = DEFAULT_SEAM_POINTS): SeamSamples {
  return seamCache.get(`${seamShape}/${seamPoints}`, () => sampleSeam(seamShape, seamPoints));
}

/** Measures one orientation. Throws RangeError for a zero axis, |gyro| >= 90 deg or a bad seam shape. */
export function measureOrientation(orientation: Orientation, options: MeasureOptions = {}): Measurement {
  const axis = unit3(orientation.axis);
  assertGyro(orientation.gyroRad);
  const band = options.band ?? DEFAULT_BAND;
  const seam = seamFor(options.seamShape, options.seamPoints);
  const averages = bandAveragesExact(seam, axis[0], axis[1], axis[2], orientation.gyroRad, band);
  const crossings = crossingsPerRevolution(seam, axis[0], axis[1], axis[2], orientation.gyroRad);
  let timeline: Timeline | undefined;
  if (options.timeline !== false) {
    const plus = new Float64Array(TIMELINE_STEPS);
    const minus = new Float64Array(TIMELINE_STEPS);
    const rotation = new Float64Array(9);
    const shares = emptyShares();
    for (let j = 0; j < TIMELINE_STEPS; j++) {
      ballToFlowAtPhase(axis[0], axis[1], axis[2], orientation.gyroRad, (2 * Math.PI * j) / TIMELINE_STEPS, rotation);
      instantBandShares(seam, rotation, band, shares);
      plus[j] = shares.axisPlus;
      minus[j] = shares.axisMinus;
    }
    timeline = { axisPlus: plus, axisMinus: minus };
  }
  return { ...averages, axis, crossingsPerRevolution: crossings, timeline };
}
