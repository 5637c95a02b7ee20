/**
 * Every JSON document the tool writes, built from job results. One place per
 * format: adding an output format means adding a sibling of this file.
 * JSON keeps full precision; people's rounding is the other formats' business.
 */
import { formatLatLon, vectorToLatLon } from "../../../geometry/ballCoords.js";
import { DEG, M_PER_FT, M_PER_IN, PA_PER_HPA } from "../../../geometry/units.js";
import { TOOL_NAME, TOOL_VERSION } from "../../version.js";
import type { Measurement } from "../../sampling/measure.js";
import type { ScreenResult } from "../../screening/screen.js";
import { basisNumbers, type ExplainOneJob, type ExplainedRow, type ExplanationNumbers, type PitchTypeNumbers } from "../explain.js";
import type { ExplainSettings } from "../explainBatch.js";
import type { PitchEcho } from "../../screening/report.js";
import { flightNumbers, type FlightOutcome } from "../flight.js";
import { FORCE_TIMELINE_PHASES, type ForceResult } from "../force.js";
import type { LandmarksResult } from "../landmarks.js";
import type { MeasureResult } from "../measure.js";
import type { ScreenOutcome } from "../screen.js";
import { screenJson } from "./screenJson.js";
import { calibrationNumbers, type CalibrateOutcome } from "../calibrate.js";
import { profileParameters } from "../../physics/calibrate/fit.js";

/** Pretty-printed JSON with a trailing newline. */
export function jsonText(doc: unknown): string {
  return JSON.stringify(doc, null, 2) + "\n";
}

function head(command: string) {
  return { tool: TOOL_NAME, version: TOOL_VERSION, command };
}

/** The JSON form of one measurement (the keys scripts rely on; see README). */
function measurementJson(m: Measurement, landmark: string, landmarkAngleDeg: number) {
  const ll = vectorToLatLon(m.axis);
  return {
    axis: m.axis,
    latLon: { latDeg: ll.latDeg, lonDeg: ll.lonDeg, text: formatLatLon(ll) },
    landmark: { name: landmark, angleDeg: landmarkAngleDeg },
    seamInBand: m.seamInBand,
    sides: { axisPlus: m.axisPlus, axisMinus: m.axisMinus, magnusPlus: m.magnusPlus, magnusMinus: m.magnusMinus },
    asymmetry: { alongAxis: m.alongAxis, alongMagnus: m.alongMagnus, magnitude: m.magnitude },
    crossingsPerRevolution: m.crossingsPerRevolution,
    timeline: m.timeline
      ? { phaseStepDeg: 1, phaseZero: "stagnation point nearest the +z pole (waist-A)", axisPlus: Array.from(m.timeline.axisPlus), axisMinus: Array.from(m.timeline.axisMinus) }
      : undefined,
  };
}

export function measureDocument(r: MeasureResult) {
  const s = r.job.settings;
  const records = r.measured.map(({ item, measurement, landmark }) => ({
    ...(item.label ? { name: item.label } : {}),
    input: {
      axis: item.axis.given,
      gyroDeg: item.gyroDeg,
      seamShape: s.seamShape,
      bandCenterDeg: s.bandCenterDeg,
      bandWidthDeg: s.bandWidthDeg,
      seamPoints: s.seamPoints,
    },
    ...measurementJson(measurement, landmark.name, landmark.angleDeg),
  }));
  return r.job.scenario !== undefined
    ? { ...head("measure"), scenario: r.job.scenario, orientations: records }
    : { ...head("measure"), ...records[0] };
}

export function landmarksDocument(r: LandmarksResult) {
  return { ...head("landmarks"), seamShape: r.seamShape, landmarks: r.landmarks };
}

export function screenDocument(o: ScreenOutcome) {
  return screenJson({ tool: TOOL_NAME, version: TOOL_VERSION }, o.screened.map((s) => s.report), o.job);
}

/**
 * One sphere map as plain JSON: cell centres (ball frame) and per-cell numbers. The
 * seam movement of each cell is the screen's linear estimate (the listed grips are
 * flown in full: see the screen's JSON), in inches at the plate in the trade's reading;
 * `score` is its part toward the wanted direction (its size for "any"); `across` and
 * `alongMagnus` are the model's turn-averaged coefficients; `seamInBand` is the
 * sampler's occupancy. Coordinates to 6 decimals, inches to 3, coefficients to 6.
 */
export function sphereMapDocument(r: ScreenResult) {
  const g = r.grid;
  const r6 = (x: number) => Math.round(x * 1e6) / 1e6;
  const r3 = (x: number) => Math.round(x * 1e3) / 1e3;
  const cells: number[][] = [];
  for (let i = 0; i < g.count; i++) {
    cells.push([
      r6(g.points[3 * i]), r6(g.points[3 * i + 1]), r6(g.points[3 * i + 2]),
      r3(r.scores[i] / M_PER_IN), r3(r.armSideM[i] / M_PER_IN), r3(r.verticalM[i] / M_PER_IN),
      r6(r.across[i]), r6(r.alongMagnus[i]), r6(r.occupancy.seamInBand[i]),
    ]);
  }
  return {
    projection: "equal-area ring grid (ball frame)",
    spacingDeg: r.settings.gridSpacingRad / DEG,
    count: g.count,
    ringCounts: Array.from(g.ringCount),
    model: { name: r.settings.model.profile.name, hash: r.settings.model.profile.hash },
    want: r.pitch.want,
    view: r.pitch.view,
    columns: ["x", "y", "z", "scoreIn", "seamArmSideIn", "seamVerticalIn", "across", "alongMagnus", "seamInBand"],
    cells,
  };
}

export function flightDocument(o: FlightOutcome) {
  const j = o.job;
  return {
    ...head("flight"),
    input: {
      pitch: j.echo,
      axis: j.axisGiven,
      airModel: j.airMode,
      elevationM: j.air.elevationM ?? 0,
      temperatureC: j.air.temperatureC ?? null,
      humidityPct: j.air.relativeHumidityPct ?? 0,
      pressureHpa: j.air.pressurePa !== undefined ? j.air.pressurePa / PA_PER_HPA : null,
      releaseHeightFt: j.release.heightM / M_PER_FT,
      releaseSideFt: j.release.armSideM / M_PER_FT,
      extensionFt: j.release.extensionM / M_PER_FT,
      model: { name: j.model.profile.name, hash: j.model.profile.hash },
      phaseDeg: j.phaseRad === undefined ? null : j.phaseRad / DEG,
      windowFt: j.windowStartM / M_PER_FT,
      drag: j.drag.name,
      dragCoefficient: j.drag.name === "constant" ? j.drag.dragCoefficient : null,
      spinDecayS: j.spinDecayS ?? null,
      bandCenterDeg: j.sampler.bandCenterDeg,
      bandWidthDeg: j.sampler.bandWidthDeg,
      seamShape: j.sampler.seamShape,
    },
    ...flightNumbers(o),
  };
}

/** What every explain document says about its settings: basis, window, model, grid. */
function explainSettingsJson(settings: ExplainSettings) {
  return { ...basisNumbers(settings), model: { name: settings.profile.name, hash: settings.profile.hash }, gridDeg: settings.gridDeg, gapFlagMinutes: settings.gapFlagMinutes };
}

/** A pitch's echo with the observed movement (inches on the basis). */
function explainInput(echo: PitchEcho, moveArmIn: number, moveUpIn: number) {
  return { pitch: echo, observed: { armSideIn: moveArmIn, upIn: moveUpIn } };
}

export function explainDocument(job: ExplainOneJob, n: ExplanationNumbers) {
  return { ...head("explain"), settings: explainSettingsJson(job.settings), input: explainInput(job.echo, job.moveArmIn, job.moveUpIn), ...n };
}

/** The opening of a streamed batch document; rows follow, comma-separated, then `batchJsonClose`. */
export function batchJsonOpen(settings: ExplainSettings): string {
  const h = JSON.stringify({ ...head("explain"), settings: explainSettingsJson(settings) });
  return `${h.slice(0, -1)},"rows":[\n`;
}

export function batchJsonRow(r: ExplainedRow, first: boolean): string {
  return `${first ? "" : ",\n"}${JSON.stringify({ line: r.line, input: explainInput(r.echo, r.moveArmIn, r.moveUpIn), ...r.numbers })}`;
}

export function batchJsonClose(): string {
  return `\n]}\n`;
}

/** The per-pitch-type summary (--summary FILE.json). */
export function explainSummaryDocument(settings: ExplainSettings, pitchTypes: readonly PitchTypeNumbers[], rows: { done: number; skipped: number }) {
  return { ...head("explain"), summary: "per pitcher and pitch type", settings: explainSettingsJson(settings), rows, pitches: pitchTypes };
}

export function forceDocument(r: ForceResult) {
  const j = r.job;
  const t = r.timeline;
  const k = r.dynamicForceN;
  const ll = vectorToLatLon(j.axisBall);
  return {
    ...head("force"),
    input: {
      axis: j.axis.given,
      gyroDeg: j.gyroRad / DEG,
      speedMph: j.speedMph,
      spinRpm: j.spinRpm,
      densityKgM3: j.air.densityKgM3,
      model: { name: j.model.profile.name, hash: j.model.profile.hash },
    },
    axis: j.axisBall,
    latLon: { latDeg: ll.latDeg, lonDeg: ll.lonDeg, text: formatLatLon(ll) },
    frames: "alongMagnus along unit(w x v), across along the spin axis projected across the flight (geometry/flow.ts); separation angles from the front stagnation point",
    dynamicForceN: k,
    magnusN: r.magnusN,
    turnAverage: { alongMagnusN: r.turnAverage.alongMagnus * k, acrossN: r.turnAverage.across * k, alongMagnus: r.turnAverage.alongMagnus, across: r.turnAverage.across },
    timeline: Array.from({ length: FORCE_TIMELINE_PHASES }, (_, i) => ({
      phaseDeg: (360 * i) / FORCE_TIMELINE_PHASES,
      alongMagnusN: t.alongMagnus[i] * k,
      acrossN: t.across[i] * k,
      alongMagnus: t.alongMagnus[i],
      across: t.across[i],
      separationDeg: {
        plusAcross: t.separationPlusAcrossRad[i] / DEG,
        minusAcross: t.separationMinusAcrossRad[i] / DEG,
        plusMagnus: t.separationPlusMagnusRad[i] / DEG,
        minusMagnus: t.separationMinusMagnusRad[i] / DEG,
      },
    })),
  };
}

/** The fitted profile as a --model file: { "name": ..., "parameters": { every parameter, table order } }. */
export function calibratedProfileDocument(o: CalibrateOutcome) {
  const p = o.result.profile;
  return { name: p.name, parameters: profileParameters(p.values) };
}

/** The calibration report (README, "Calibrating the model to your lab"). */
export function calibrateDocument(o: CalibrateOutcome) {
  const r = o.result;
  const j = o.job;
  const numbers = calibrationNumbers(o);
  return {
    ...head("calibrate"),
    input: {
      lab: j.labPath ?? null,
      tracked: j.trackedPath ?? null,
      fit: j.fit,
      start: { name: r.start.name, hash: r.start.hash, file: j.start.source ?? null },
      sigmaN: j.sigmaN,
      sigmaIn: j.sigmaIn,
      densityKgM3: j.air.densityKgM3,
      windowFt: numbers.windowFt,
    },
    parameters: r.parameters.map((p) => ({
      name: p.name,
      value: p.value,
      uncertainty: p.uncertainty ?? null,
      unit: p.unit,
      atBound: p.atBound !== undefined,
      bound: p.atBound ?? null,
      start: p.start,
    })),
    notIdentified: r.notIdentified.map((n) => ({ name: n.name, reason: n.reason })),
    rmsBeforeN: numbers.rmsBeforeN ?? null,
    rmsAfterN: numbers.rmsAfterN ?? null,
    rmsBeforeIn: numbers.rmsBeforeIn ?? null,
    rmsAfterIn: numbers.rmsAfterIn ?? null,
    rows: r.rows.lab + r.rows.tracked,
    rowsByKind: { lab: r.rows.lab, labTurnAveraged: r.rows.labTurnAveraged, tracked: r.rows.tracked },
    skippedRows: o.rows.skipped,
    method: {
      search: r.method.search,
      iterations: r.method.iterations,
      modelEvaluations: r.method.evaluations,
      converged: r.method.converged,
      stopReason: r.method.stopReason,
      uncertainty: "1-sigma from the Gauss-Newton covariance s^2 (J^T J)^-1 at the optimum, s^2 the residual variance of the weighted residuals",
      residualVariance: r.method.residualVariance,
      degreesOfFreedom: r.method.degreesOfFreedom,
      relativeSingularValues: r.method.relativeSingularValues,
      correlation: r.method.correlation.map((row) => row.map((c) => (Number.isFinite(c) ? c : null))),
    },
    profile: { name: r.profile.name, hash: r.profile.hash },
  };
}
