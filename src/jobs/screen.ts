/**
 * The screen job: every spin-axis position on the ball for each pitch, scored by the
 * one seam-force model's seam movement at the plate (inches, the trade's reading), the
 * best distinct grips, their robustness, the classic holds and the fingers. Also the
 * shared first stage of card, atlas, view and the benchmark (`screenOne`). This module
 * reads the pitch file and the model profile and keeps the coefficient maps in the
 * cache folder (--cache: jobs/mapCache.ts); the job itself is jobs/screenJob.ts.
 */
import { cachedScreenMaps } from "./mapCache.js";
import { modelChoice } from "./request/model.js";
import { pitchesFromRequest } from "./request/pitch.js";
import { cacheChoice } from "./request/runtime.js";
import type { Request } from "./request/values.js";
import { screenJobOf, type ScreenJob, type TopChoice } from "./screenJob.js";

export { mapValuesIn, runScreen, screenOne, type ScreenedPitch, type ScreenJob, type ScreenOutcome } from "./screenJob.js";

export function parseScreen(request: Request, top: TopChoice = {}): ScreenJob {
  return withMapCache(screenJobOf(request, { pitches: () => pitchesFromRequest(request), profile: () => modelChoice(request).profile }, top), request);
}

/** The job with its coefficient maps kept in the request's cache folder (--cache; none: computed each run). */
export function withMapCache(job: ScreenJob, request: Request): ScreenJob {
  const folder = cacheChoice(request);
  return folder === null ? job : { ...job, maps: cachedScreenMaps(folder) };
}
