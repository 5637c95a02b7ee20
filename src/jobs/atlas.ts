/**
 * The atlas job: every pitch screened (on the worker pool, screenPool.ts) and its pages
 * painted as it comes back (render/paper/atlas.ts). The drawing code is loaded only once
 * the workers have their tasks, so they start screening while it loads.
 */
import { ATLAS_MAP_CELLS } from "../render/paper/atlasMap.js";
import type { AtlasInProgress } from "../render/paper/atlas.js";
import type { Layout } from "../render/paper/layouts.js";
import type { PaperOutput } from "./paper.js";
import { checkNames, layoutOf } from "./paperRequest.js";
import { threadsChoice } from "./request/runtime.js";
import type { Request } from "./request/values.js";
import { parseScreen, type ScreenJob } from "./screen.js";
import type { TopChoice } from "./screenJob.js";
import { screenAllPooled, type PooledPitch } from "./screenPool.js";

export interface AtlasJob {
  readonly screen: ScreenJob;
  readonly layout: Layout;
  /** The request as given and the screen's top options: a worker thread builds the same job from them (screenPool.ts). */
  readonly request: Request;
  readonly top: TopChoice;
  /** Worker threads that screen (--threads; 0: this thread only; "auto": screenPool.ts autoScreenThreads). */
  readonly threads: number | "auto";
}

const ATLAS_TOP = { fallback: 4, range: [1, 12] as const };

export function parseAtlas(request: Request): AtlasJob {
  const layout = layoutOf(String(request.layout ?? "atlas-letter"), ["atlas"]);
  const screen = parseScreen(request, ATLAS_TOP);
  checkNames(screen);
  return { layout, screen, request, top: ATLAS_TOP, threads: threadsChoice(request) };
}

export async function runAtlas(job: AtlasJob, tick: (stage: string, done: number, total: number) => void = () => {}): Promise<PaperOutput> {
  const base = { layout: job.layout, team: job.screen.team, seamShape: job.screen.sampler.seamShape, onPage: (done: number, total: number) => tick("pages", done, total) };
  // The worker threads screen while this thread loads the drawing code and paints: the
  // pages that need no pitch while the first screens run, then each pitch's pages as it
  // comes back (a pitch back before the drawing code is loaded waits for it), the cover last.
  let atlas: AtlasInProgress | undefined;
  const waiting: [number, PooledPitch][] = [];
  const pitches = await screenAllPooled(job.screen, job.request, job.top, job.threads, {
    meanwhile: async () => {
      const { startAtlas } = await import("../render/paper/atlas.js");
      atlas = startAtlas(base, job.screen.pitches.length);
      for (const [i, p] of waiting.splice(0)) atlas.pitch(i, p);
    },
    onPitch: (i, p) => (atlas ? atlas.pitch(i, p) : waiting.push([i, p])),
    tick,
    mapCells: ATLAS_MAP_CELLS,
  });
  const pdf = await atlas!.finish(pitches);
  return { bytes: pdf.bytes, format: "pdf", pages: pdf.pages, pitches: pitches.length };
}
