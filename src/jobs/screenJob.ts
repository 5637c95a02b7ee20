/**
 * The screen job from a request whose pitches and model profile are already in hand:
 * the settings read from the options as typed, then every pitch screened by the one
 * seam-force model. Pure (no file is read here), so the command line (jobs/screen.ts,
 * which reads pitch and profile files) and the workbench page's worker build and run
 * the same job by the same code, and their numbers cannot disagree.
 */
import { M_PER_IN } from "../../geometry/units.js";
import type { AirConditions } from "../physics/air.js";
import type { SeamModel } from "../physics/seamModel/model.js";
import type { SeamModelProfile } from "../physics/seamModel/parameters.js";
import { screenReport, type ScreenReport } from "../screening/report.js";
import { screenPitch, type CoefficientMapSource, type ScreenProgress, type ScreenResult } from "../screening/screen.js";
import { InputError } from "../io/errors.js";
import { pitchPath, type PitchInput } from "./request/pitchSpec.js";
import { buildModel } from "./request/profile.js";
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
  /** Where the coefficient maps come from (jobs/mapCache.ts: the disk cache); computed when absent. */
  readonly maps?: CoefficientMapSource;
}

/** One screened pitch: the input, the library's result and its user-unit report. */
export interface ScreenedPitch {
  readonly input: PitchInput;
  readonly result: ScreenResult;
  readonly report: ScreenReport;
}

/** The values a sphere map shows for a screened pitch: seam movement toward the wanted direction (its size for "any") per grid cell, inches. */
export function mapValuesIn(p: ScreenedPitch): Float64Array {
  return p.result.scores.map((x) => x / M_PER_IN);
}

export interface ScreenOutcome {
  readonly job: ScreenJob;
  readonly screened: readonly ScreenedPitch[];
}

/** The options that shape a screen besides the pitch (and the model profile): `view` carries them into its page, whose own screens use them. */
export const SCREEN_SETTINGS = [
  "grid", "spread", "rank", "finger-spacing", "window-ft", "seam-shape", "seam-points", "top",
  "elevation-ft", "elevation-m", "temperature-f", "temperature-c", "humidity", "pressure-hpa",
] as const;

/** How many candidates a command lists: its default, its range, and the fewest it needs. */
export interface TopChoice {
  readonly fallback?: number;
  readonly range?: readonly [number, number];
  readonly atLeast?: number;
}

/** Where a job's pitches and profile come from, read in this order after --top (so the first bad option is the one named). */
export interface ScreenSources {
  pitches(): { readonly team?: string; readonly pitches: PitchInput[] };
  /** The seam-force profile, with the request's band options already applied. */
  profile(): SeamModelProfile;
  /** The model for the profile (default: a new one, request/profile.ts buildModel); a caller that screens again and again may keep one per profile. */
  model?(profile: SeamModelProfile, seamShape: number): SeamModel;
}

export function screenJobOf(request: Request, sources: ScreenSources, top: TopChoice = {}): ScreenJob {
  const chosen = topOption(request, top.fallback, top.range);
  const { team, pitches } = sources.pitches();
  const fromFile = request.demo === true || request.pitch !== undefined;
  for (const p of pitches) {
    if (p.pitch.spinRadPerS === 0) {
      const who = fromFile ? `${pitchPath(p.echo)}: spin 0 rpm` : "--spin 0";
      throw new InputError(`${who} has no spin axis, so there is no seam orientation to screen; expected a spin above 0 rpm (a ball without spin flies with flight --axis AXIS --phase DEG)`);
    }
  }
  const profile = sources.profile();
  const sampler = samplerSettings(request, profile);
  return {
    team,
    pitches,
    sampler,
    options: screenOptions(request),
    model: (sources.model ?? buildModel)(profile, sampler.seamShape),
    air: airConditions(request),
    windowStartM: windowStart(request),
    top: Math.max(chosen, top.atLeast ?? 1),
    fromFile,
  };
}

/** The screen's settings a job carries (the sampler, the model, the air and the window), as screenPitch takes them. */
export function jobScreenSettings(job: { readonly sampler: SamplerSettings; readonly model: SeamModel; readonly air: AirConditions; readonly windowStartM: number }) {
  const s = job.sampler;
  return { seamShape: s.seamShape, seamPoints: s.seamPoints, band: s.band, model: job.model, air: job.air, windowStartM: job.windowStartM };
}

/** Screens every pitch of the job. */
export function runScreen(job: ScreenJob): ScreenOutcome {
  return { job, screened: job.pitches.map((p) => screenOne(job, p)) };
}

/** Screens one pitch of the job; `onProgress` hears each step (src/screening/screen.ts). */
export function screenOne(job: ScreenJob, input: PitchInput, onProgress?: ScreenProgress): ScreenedPitch {
  const result = screenPitch(
    input.pitch,
    {
      ...job.options,
      top: job.top,
      ...jobScreenSettings(job),
      ...(job.maps ? { maps: job.maps } : {}),
    },
    onProgress,
  );
  return { input, result, report: screenReport(result, input.echo) };
}
