/**
 * The one screen -> fly path shared by card, atlas and the benchmark: screen each
 * pitch, then fly every listed orientation (candidates, then reference holds) to
 * get its seam movement in inches at standard air.
 */
import { seamMovementIn } from "../physics/pitchFlight.js";
import type { SeamMovement } from "../render/paper/words.js";
import type { ScreenedOrientation } from "../screening/screen.js";
import { screenOne, type ScreenedPitch, type ScreenJob } from "./screen.js";

export type { SeamMovement };

/** A screened pitch with the seam movement of each listed orientation (candidates first, then references). */
export interface FlownPitch extends ScreenedPitch {
  readonly movements: readonly SeamMovement[];
}

/** The seam movement of one screened orientation. */
export function seamMovementOf(screened: ScreenedPitch, o: ScreenedOrientation): SeamMovement {
  const s = screened.result.settings;
  return seamMovementIn(screened.result.pitch, o.axis, { band: s.band, seamShape: s.seamShape, seamPoints: s.seamPoints });
}

/** Screens and flies every pitch of the job; `tick(stage, done, total)` reports progress. */
export function screenAndFly(job: ScreenJob, tick: (stage: string, done: number, total: number) => void = () => {}): FlownPitch[] {
  const out: FlownPitch[] = [];
  job.pitches.forEach((p, i) => {
    const screened = screenOne(job, p);
    tick("screening", i + 1, job.pitches.length);
    const listed = [...screened.result.candidates, ...screened.result.references];
    const movements = listed.map((o, k) => {
      const m = seamMovementOf(screened, o);
      tick("flights", k + 1, listed.length);
      return m;
    });
    out.push({ ...screened, movements });
  });
  return out;
}
