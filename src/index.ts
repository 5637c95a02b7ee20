/**
 * seam-atlas as a library: the one entry module, naming each public export.
 *
 *   import { screenPitchSpec } from "seam-atlas";
 *   const report = screenPitchSpec({ hand: "right", speedMph: 92, spinRpm: 2150, tilt: "1:45", gyroDeg: 10, want: "arm" });
 *   for (const c of report.candidates) console.log(c.rank, c.latLon.text, c.score);
 *
 * Inside, everything is SI and radians (geometry/units.ts converts); the *Spec
 * helpers take the pitch-file form (README) in people's units.
 */
import { buildPitch, type RawPitch } from "./jobs/request/pitchSpec.js";
import { screenReport, type ScreenReport } from "./screening/report.js";
import { DEFAULT_SCREEN_OPTIONS, screenPitch, type ScreenSettings } from "./screening/screen.js";
import { seamModel } from "./physics/seamModel/model.js";
import type { Pitch } from "./screening/pitch.js";

/** A pitch in the pitch-file form (README): mph, rpm, a clock tilt, degrees. */
export interface PitchSpec {
  readonly name?: string;
  readonly pitcher?: string;
  readonly hand: "right" | "left";
  readonly speedMph: number;
  readonly spinRpm: number;
  readonly tilt: string;
  readonly view?: "pitcher" | "catcher";
  readonly gyroDeg?: number;
  readonly efficiencyPct?: number;
  readonly want?: "arm" | "glove" | "up" | "down" | "any";
}

/** The pitch in SI, checked field by field (throws an InputError naming the field). */
export function pitchFromSpec(spec: PitchSpec): Pitch {
  return buildPitch({ ...spec } as RawPitch, (field) => `pitch field ${field}`).pitch;
}

/** Screens a pitch given in people's units with the default settings and model (or those given); returns the report `screen --json` prints for it. */
export function screenPitchSpec(spec: PitchSpec, settings: Partial<ScreenSettings> = {}): ScreenReport {
  const input = buildPitch({ ...spec } as RawPitch, (field) => `pitch field ${field}`);
  const model = settings.model ?? seamModel();
  const result = screenPitch(input.pitch, { ...DEFAULT_SCREEN_OPTIONS, band: model.band, ...settings, model });
  return screenReport(result, input.echo);
}

// geometry: the ball, its seam, landmarks, frames, clock, units
export { BALL_CIRCUMFERENCE_IN, BALL_MASS_KG, BALL_RADIUS_IN, BALL_RADIUS_M } from "../geometry/ball.js";
export { formatLatLon, latLonToVector, vectorToLatLon, type LatLon } from "../geometry/ballCoords.js";
export { formatClock, parseClock } from "../geometry/clock.js";
export { ballToFlowAtPhase } from "../geometry/flow.js";
export { spinAxisFromTilt, tiltFromSpinAxis, type ClockView, type Hand } from "../geometry/frames.js";
export { findLandmarks, nearestLandmark, type Landmark } from "../geometry/landmarks.js";
export { DEFAULT_SEAM_SHAPE, seamPoint } from "../geometry/seamCurve.js";
export { sampleSeam, type SeamSamples } from "../geometry/seamSamples.js";
export { SEAM_SYMMETRIES } from "../geometry/symmetry.js";
export { DEG, M_PER_FT, M_PER_IN, M_PER_S_PER_MPH, RAD_PER_S_PER_RPM } from "../geometry/units.js";
export type { Vec3 } from "../geometry/vec.js";
// sampling: band occupancy
export { bandFromDegrees, DEFAULT_BAND, type Band } from "./sampling/band.js";
export { bandAveragesExact, type BandAverages } from "./sampling/exact.js";
export { measureOrientation, type Measurement } from "./sampling/measure.js";
// screening
export { screenPitch, type ScreenResult, type ScreenSettings, type ScreenedOrientation } from "./screening/screen.js";
export { screenReport, type ScreenReport, type OrientationReport } from "./screening/report.js";
export type { Pitch } from "./screening/pitch.js";
// physics
export { airState, type AirConditions, type AirState } from "./physics/air.js";
export { simulateFlight, type FlightOptions, type FlightResult, type Launch } from "./physics/flight.js";
export { flyPitch, type PitchFlight } from "./physics/pitchFlight.js";
export { tradeMovement } from "./physics/tradeMovement.js";
export { Explainer, type Explanation, type ExplainOptions, type MovementBasis, type TrackedPitch } from "./physics/explain.js";
export { fitPitchType, PitchTypeAccumulator, type PitchTypeFit } from "./physics/explainFit.js";
export {
  coefficientMap, defaultProfile, forceTimeline, resolveProfile, SEAM_MODEL_PARAMETERS, seamModel, turnAverage,
  type SeamModel, type SeamModelProfile, type TurnAverage,
} from "./physics/seamModel/index.js";
export { InputError } from "./io/errors.js";
// calibrate: fit the seam-force model's parameters to a lab's forces and tracked seam movement
export {
  calibratableNames, calibrateSeamModel, syntheticLabRows, unitSeamMovementArmSide,
  type CalibrationOptions, type CalibrationResult, type LabObservation, type TrackedObservation,
} from "./physics/calibrate/index.js";
