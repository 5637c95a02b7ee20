/**
 * The screen job: every spin-axis position on the ball for each pitch, scored by the
 * one seam-force model's seam movement at the plate (inches, the trade's reading), the
 * best distinct grips, their robustness, the classic holds and the fingers. Also the
 * shared first stage of card, atlas, view and the benchmark (`screenOne`).
 */
import type { AirConditions } from "../physics/air.js";
import type { SeamModel } from "../physics/seamModel/model.js";
import { screenReport, type ScreenReport } from "../screening/report.js";
import { screenPitch, type ScreenResult } from "../screening/screen.js";
import { buildModel, modelChoice } from "./request/model.js";
import type { PitchInput } from "./request/pitch.js";
import { pitchesFromRequest } from "./request/pitch.js";
import { airConditions, samplerSettings, screenOptions, topOption, windowStart, type SamplerSettings, type ScreenOptions } from "./request/settings.js";
import type { Request } from "./request/values.js";

export interface ScreenJob {
  readonly team?: string;
  readonly pitches: readonly PitchInput[];
  readonly sampler: SamplerSettings;
  readonly options: ScreenOptions;
  readonly model: SeamModel;
  readonly air: AirConditions;
  readonly windowStartM: number;
  readonly top: number;
  /** True when the pitches came from a file or the demo (the JSON then lists pitches). */
  readonly fromFile: boolean;
}

/** One screened pitch: the input, the library's result and its user-unit report. */
export interface ScreenedPitch {
  readonly input: PitchInput;
  readonly result: ScreenResult;
  readonly report: ScreenReport;
}

export interface ScreenOutcome {
  readonly job: ScreenJob;
  readonly screened: readonly ScreenedPitch[];
}

export function parseScreen(request: Request, top: { fallback?: number; range?: readonly [number, number]; atLeast?: number } = {}): ScreenJob {
  const chosen = topOption(request, top.fallback, top.range);
  const { team, pitches } = pitchesFromRequest(request);
  const model = modelChoice(request);
  const sampler = samplerSettings(request, model.profile);
  return {
    team,
    pitches,
    sampler,
    options: screenOptions(request),
    model: buildModel(model.profile, sampler.seamShape),
    air: airConditions(request),
    windowStartM: windowStart(request),
    top: Math.max(chosen, top.atLeast ?? 1),
    fromFile: request.demo === true || request.pitch !== undefined,
  };
}

/** Screens every pitch of the job. */
export function runScreen(job: ScreenJob): ScreenOutcome {
  return { job, screened: job.pitches.map((p) => screenOne(job, p)) };
}

/** Screens one pitch of the job. */
export function screenOne(job: ScreenJob, input: PitchInput): ScreenedPitch {
  const s = job.sampler;
  const result = screenPitch(input.pitch, {
    ...job.options,
    top: job.top,
    seamShape: s.seamShape,
    seamPoints: s.seamPoints,
    band: s.band,
    model: job.model,
    air: job.air,
    windowStartM: job.windowStartM,
  });
  return { input, result, report: screenReport(result, input.echo) };
}
