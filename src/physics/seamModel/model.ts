/**
 * A seam-force model built from a profile and a resolution: the validated numbers in
 * radians and cosines, its tables, and its scratch space.
 *
 * Building is cheap (tens of microseconds): the seam samples are memoised per shape
 * and count (src/sampling/measure.ts), the azimuth bins per count (azimuth.ts), and
 * the only table that depends on the parameters, G(cos theta_s) (pressure.ts), has 256
 * intervals. So a calibration may build one model per parameter vector.
 *
 * Not reentrant: the scratch arrays live on the model. One model per worker; do not
 * evaluate one model from inside another evaluation of the same model.
 */
import type { SeamSamples } from "../../../geometry/seamSamples.js";
import type { Band } from "../../sampling/band.js";
import { seamFor } from "../../sampling/measure.js";
import { azimuthBins, fillUnitCircle, type AzimuthBins } from "./azimuth.js";
import { bandOf, defaultProfile, type SeamModelProfile } from "./parameters.js";
import { meridianPressureIntegral, pressureTable, type PressureTable } from "./pressure.js";
import { resolveResolution, type ResolvedResolution, type SeamModelResolution } from "./resolution.js";

import { DEG } from "../../../geometry/units.js";
/** Intervals of the G(cos theta_s) table over the fixation band. */
const PRESSURE_TABLE_INTERVALS = 256;

export interface SeamModel {
  readonly profile: SeamModelProfile;
  readonly resolution: ResolvedResolution;
  /** The fixation band (the sampler's Band). */
  readonly band: Band;
  /** Angles from the front stagnation point, rad. */
  readonly laminarRad: number;
  readonly turbulentRad: number;
  readonly tripStartRad: number;
  readonly tripEndRad: number;
  readonly bandNearRad: number;
  readonly bandFarRad: number;
  readonly suctionFactor: number;
  readonly wakePressureCoefficient: number;
  readonly scale: number;
  readonly seam: SeamSamples;
  readonly bins: AzimuthBins;
  /** G(cos theta_s) over the band (pressure.ts). */
  readonly pressure: PressureTable;
  /** G at laminar separation (the undisturbed line) and G(turbulent) - G(laminar). */
  readonly pressureLaminar: number;
  readonly pressureTurbulentStep: number;
  /**
   * Widening of the instant's polar-range test, in cos theta: half the largest squared
   * chord between neighbouring seam samples, above the chord's sag (chord^2 / 8) by which
   * a crossing pushed out to the sphere can differ from the chord's own height.
   */
  readonly chordMargin: number;
  /**
   * Cosines the instant reads (larger = nearer the front): [0] tripStart, [1] tripEnd,
   * [2] band near edge, [3] band far edge, [4] turbulent, [5] laminar separation.
   */
  readonly cosines: Float64Array;
  /** cos and sin of the model's phases 2 pi j / phases, exact at quarter turns. */
  readonly phaseCos: Float64Array;
  readonly phaseSin: Float64Array;
  /** Scratch (internal): per-orientation point data, per-bin state, results. */
  readonly scratch: ModelScratch;
}

/** Internal scratch of a model (not part of the API; see the module header). */
export interface ModelScratch {
  /** Per seam point for one orientation: q.w cos g, q.w sin g, q.e1, q.e2. */
  readonly heightAcross: Float64Array;
  readonly heightAlong: Float64Array;
  readonly e1: Float64Array;
  readonly e2: Float64Array;
  /** Per bin: tripped (1) or not (0); cos theta of the first band crossing (-2: none). */
  readonly tripped: Uint8Array;
  readonly bandCos: Float64Array;
  /**
   * Results of the last instant: [0] C_x, [1] C_y (flow frame, scale applied), then cos theta_s
   * at the meridians toward +a, -m (psi = pi/2), -a, +m (bins 0, B/4, B/2, 3B/4).
   */
  readonly result: Float64Array;
  /** Orientation state: [0] sin g, [1] cos g. */
  readonly orientation: Float64Array;
}

/**
 * Builds and validates a model.
 * @param profile resolved profile (parameters.ts); default defaultProfile().
 * @param resolution seam points, azimuth bins, phases, seam shape; defaults in resolution.ts.
 * @throws RangeError for a bad resolution (the profile was checked when resolved).
 */
export function seamModel(profile: SeamModelProfile = defaultProfile(), resolution: SeamModelResolution = {}): SeamModel {
  const res = resolveResolution(resolution);
  return seamModelOnSamples(profile, res, seamFor(res.seamShape, res.seamPoints));
}

/**
 * A model on given seam samples (constructed seams in tests, other balls). The polyline
 * is closed: the last sample joins the first. `res.seamPoints` and `res.seamShape` are
 * reported as given; the samples decide the geometry.
 * @throws RangeError for fewer than 4 samples.
 */
export function seamModelOnSamples(profile: SeamModelProfile, res: ResolvedResolution, seam: SeamSamples): SeamModel {
  if (!(seam.count >= 4 && seam.points.length >= 3 * seam.count)) {
    throw new RangeError(`seam samples ${seam.count} must be at least 4 with 3 coordinates each`);
  }
  const v = profile.values;
  const band = bandOf(v);
  const bins = azimuthBins(res.azimuthBins);
  const bandNearRad = band.centerRad - band.widthRad / 2;
  const bandFarRad = band.centerRad + band.widthRad / 2;
  const lam = v.laminarSeparationDeg * DEG;
  const turb = v.turbulentSeparationDeg * DEG;
  const pressure = pressureTable(
    Math.cos(bandFarRad),
    Math.cos(bandNearRad),
    PRESSURE_TABLE_INTERVALS,
    v.suctionFactor,
    v.wakePressureCoefficient,
  );
  const gLam = meridianPressureIntegral(lam, v.suctionFactor, v.wakePressureCoefficient);
  const gTurb = meridianPressureIntegral(turb, v.suctionFactor, v.wakePressureCoefficient);
  const phases = res.phases;
  const phaseCos = new Float64Array(phases);
  const phaseSin = new Float64Array(phases);
  fillUnitCircle(phaseCos, phaseSin);
  const n = seam.count;
  const nb = bins.count;
  let chord2 = 0;
  const pts = seam.points;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const dx = pts[3 * i] - pts[3 * j], dy = pts[3 * i + 1] - pts[3 * j + 1], dz = pts[3 * i + 2] - pts[3 * j + 2];
    chord2 = Math.max(chord2, dx * dx + dy * dy + dz * dz);
  }
  return {
    profile,
    resolution: res,
    band,
    laminarRad: lam,
    turbulentRad: turb,
    tripStartRad: v.tripStartDeg * DEG,
    tripEndRad: v.tripEndDeg * DEG,
    bandNearRad,
    bandFarRad,
    suctionFactor: v.suctionFactor,
    wakePressureCoefficient: v.wakePressureCoefficient,
    scale: v.scale,
    seam,
    bins,
    pressure,
    pressureLaminar: gLam,
    pressureTurbulentStep: gTurb - gLam,
    chordMargin: 0.5 * chord2,
    cosines: Float64Array.of(
      Math.cos(v.tripStartDeg * DEG),
      Math.cos(v.tripEndDeg * DEG),
      Math.cos(bandNearRad),
      Math.cos(bandFarRad),
      Math.cos(turb),
      Math.cos(lam),
    ),
    phaseCos,
    phaseSin,
    scratch: {
      heightAcross: new Float64Array(n),
      heightAlong: new Float64Array(n),
      e1: new Float64Array(n),
      e2: new Float64Array(n),
      tripped: new Uint8Array(nb),
      bandCos: new Float64Array(nb),
      result: new Float64Array(6),
      orientation: new Float64Array(2),
    },
  };
}

