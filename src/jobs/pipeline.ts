/**
 * The one screen path shared by card, atlas, view and the benchmark: screen each
 * pitch (the screen flies every listed grip in full, so each carries its seam
 * movement), reporting progress.
 */
import { screenOne, type ScreenedPitch, type ScreenJob } from "./screen.js";

/** Screens every pitch of the job; `tick(stage, done, total)` reports progress. */
export function screenAll(job: ScreenJob, tick: (stage: string, done: number, total: number) => void = () => {}): ScreenedPitch[] {
  return job.pitches.map((p, i) => {
    const screened = screenOne(job, p);
    tick("screening", i + 1, job.pitches.length);
    return screened;
  });
}
