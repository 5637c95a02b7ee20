/**
 * Numerical resolution of the seam-force model, separate from its physical profile:
 * seam points (the polyline), azimuth bins (meridians per turn about the flow axis)
 * and phases (instants per turn of the ball in the turn average). Defaults were set by
 * the convergence study in DEVELOPERS.md ("The seam-force model") (kept true by tests/physics/seamModel/convergence.test.ts).
 */
import { DEFAULT_SEAM_SHAPE } from "../../../geometry/seamCurve.js";
import { assertSeamPointCount } from "../../../geometry/seamSamples.js";

export interface SeamModelResolution {
  /** Arc-length seam samples, a multiple of 4 from 64 to 262144; default DEFAULT_RESOLUTION.seamPoints. */
  readonly seamPoints?: number;
  /** Meridians about the flow axis, a multiple of 4 from 8 to 4096; default DEFAULT_RESOLUTION.azimuthBins. */
  readonly azimuthBins?: number;
  /** Phases per turn in turnAverage, a multiple of 4 from 4 to 36000; default DEFAULT_RESOLUTION.phases. */
  readonly phases?: number;
  /** Seam shape b (geometry/seamCurve.ts), 0 < b < 0.5; default Thompson's 0.3012. Geometry, not physics. */
  readonly seamShape?: number;
}

export type ResolvedResolution = { readonly [K in keyof SeamModelResolution]-?: number };

export const DEFAULT_RESOLUTION: ResolvedResolution = {
  seamPoints: 128,
  azimuthBins: 96,
  phases: 96,
  seamShape: DEFAULT_SEAM_SHAPE,
};

export const AZIMUTH_BINS_RANGE: readonly [number, number] = [8, 4096];
export const PHASES_RANGE: readonly [number, number] = [4, 36000];

/** Throws RangeError unless n is a whole multiple of 4 in [lo, hi]. */
export function assertMultipleOfFour(label: string, n: number, range: readonly [number, number]): void {
  if (!Number.isInteger(n) || n < range[0] || n > range[1] || n % 4 !== 0) {
    throw new RangeError(`${label} ${n} must be a whole number from ${range[0]} to ${range[1]} divisible by 4`);
  }
}

/** Fills in defaults and validates (RangeError naming the bad value and its range). */
export function resolveResolution(r: SeamModelResolution = {}): ResolvedResolution {
  const out = {
    seamPoints: r.seamPoints ?? DEFAULT_RESOLUTION.seamPoints,
    azimuthBins: r.azimuthBins ?? DEFAULT_RESOLUTION.azimuthBins,
    phases: r.phases ?? DEFAULT_RESOLUTION.phases,
    seamShape: r.seamShape ?? DEFAULT_RESOLUTION.seamShape,
  };
  assertSeamPointCount(out.seamPoints);
  assertMultipleOfFour("azimuth bins", out.azimuthBins, AZIMUTH_BINS_RANGE);
  assertMultipleOfFour("phases per turn", out.phases, PHASES_RANGE);
  return out;
}
