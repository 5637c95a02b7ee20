/// <reference lib="dom" />
/// <reference lib="webworker" />
/**
 * The screen in the page: a web worker made from the page's own script (a blob of
 * it: the one file carries everything) builds the job from the request exactly as
 * the command line does (jobs/screenJob.ts with the pitch from the flags,
 * jobs/request/pitchSpec.ts) with the model profile the page embeds, screens it with
 * progress, and answers with the document `screen --json` prints, as text.
 *
 * Messages, page to worker: { id, request } (options as the command line names them,
 * values as typed). Worker to page: { id, kind: "progress", done, total, stage },
 * then { id, kind: "done", json, frame, ms } or { id, kind: "error", message, input }.
 */
import { resolveProfile } from "../physics/seamModel/parameters.js";
import { InputError } from "../io/errors.js";
import { screenJson, type ToolHead } from "../jobs/formats/screenJson.js";
import { pitchFromFlags, type PitchFlags } from "../jobs/request/pitchSpec.js";
import { buildModel, withBandOptions } from "../jobs/request/profile.js";
import { BoundedCache } from "../../geometry/cache.js";
import type { SeamModel } from "../physics/seamModel/model.js";
import type { Request } from "../jobs/request/values.js";
import { screenJobOf, screenOne } from "../jobs/screenJob.js";
import type { FieldFrameVectors, ViewData } from "../render/page3d/data.js";

/** What the worker needs before its first screen. */
export interface WorkerSetup {
  readonly head: ToolHead;
  readonly model: ViewData["model"];
}

export type WorkerReply =
  | { id: number; kind: "progress"; done: number; total: number; stage: string }
  | { id: number; kind: "done"; json: string; frame: FieldFrameVectors; ms: number }
  | { id: number; kind: "error"; message: string; input: boolean };

/**
 * What answers the page's requests: each message in (a setup, or { id, request }) gives
 * replies out, by the command line's code. The worker runs one; a browser that gives
 * the page no worker runs one on the page's own thread.
 */
function screenAnswerer(post: (reply: WorkerReply) => void): (msg: { setup?: WorkerSetup; id?: number; request?: Request }) => void {
  let setup: WorkerSetup | null = null;
  // one model per profile and seam shape, so a pitch with a gyro seen before reuses its coefficient map (src/screening/screen.ts)
  const models = new BoundedCache<string, SeamModel>("the worker's seam-force models", 4);
  return (msg) => {
    if (msg.setup) {
      setup = msg.setup;
      return;
    }
    const id = msg.id ?? 0;
    try {
      if (!setup) throw new Error("the screen worker has no model yet");
      const s = setup;
      const t0 = performance.now();
      const request = msg.request ?? {};
      const job = screenJobOf(request, {
        pitches: () => ({ pitches: [pitchFromFlags(request as PitchFlags)] }),
        profile: () => withBandOptions(resolveProfile(s.model, "the page's model profile"), request),
        model: (profile, seamShape) => models.get(`${profile.hash}/${seamShape}`, () => buildModel(profile, seamShape)),
      });
      const screened = screenOne(job, job.pitches[0], (done, total, stage) => post({ id, kind: "progress", done, total, stage }));
      const json = JSON.stringify(screenJson(s.head, [screened.report], { fromFile: false }), null, 2) + "\n";
      const f = screened.result.frame;
      const frame: FieldFrameVectors = { spinAxis: f.spinAxis, flight: f.flight, pushLine: f.pushLine, magnus: f.magnus, armSide: f.armSide };
      post({ id, kind: "done", json, frame, ms: performance.now() - t0 });
    } catch (err) {
      const input = err instanceof InputError || err instanceof RangeError;
      post({ id, kind: "error", message: (err as Error).message, input });
    }
  };
}

/** The worker's side: answers screen requests until the page closes. */
export function runScreenWorker(scope: DedicatedWorkerGlobalScope): void {
  const answer = screenAnswerer((reply) => scope.postMessage(reply));
  scope.onmessage = (e: MessageEvent) => answer(e.data);
}

export interface ScreenAnswer {
  /** The document `screen --json` prints, as text (two-space indent, a final line feed). */
  readonly json: string;
  readonly frame: FieldFrameVectors;
  /** Time the worker took, ms. */
  readonly ms: number;
}

/** A refused request: the library's one-line message, naming the option ("--speed ..."). */
export class ScreenInputError extends Error {}

/** The page's side: one worker, requests answered in turn. */
export class ScreenClient {
  /** The page's worker, or null when the browser gave none (the screen then runs on the page's own thread). */
  readonly worker: Worker | null;
  private readonly send: (msg: { setup?: WorkerSetup; id?: number; request?: Request }) => void;
  private next = 1;
  private readonly waiting = new Map<number, { resolve(a: ScreenAnswer): void; reject(e: Error): void; progress?: (done: number, total: number) => void }>();

  constructor(scriptText: string, setup: WorkerSetup) {
    let worker: Worker | null = null;
    try {
      worker = new Worker(URL.createObjectURL(new Blob([scriptText], { type: "text/javascript" })));
    } catch {
      // a browser that refuses a worker made from the page (a strict setting, an old engine): the same code here
      worker = null;
    }
    this.worker = worker;
    if (worker) {
      worker.onmessage = (e: MessageEvent<WorkerReply>) => this.reply(e.data);
      worker.onerror = (e) => {
        e.preventDefault();
        for (const w of this.waiting.values()) w.reject(new Error(`the screen worker stopped: ${e.message}`));
        this.waiting.clear();
      };
      this.send = (msg) => worker.postMessage(msg);
    } else {
      const answer = screenAnswerer((reply) => this.reply(reply));
      // a moment later, so the page can show its progress bar first
      this.send = (msg) => (msg.setup ? answer(msg) : void setTimeout(() => answer(msg), 30));
    }
    this.send({ setup });
  }

  /** Screens the request (command-line option names, values as typed). */
  screen(request: Request, progress?: (done: number, total: number) => void): Promise<ScreenAnswer> {
    const id = this.next++;
    return new Promise((resolve, reject) => {
      this.waiting.set(id, { resolve, reject, progress });
      this.send({ id, request });
    });
  }

  private reply(r: WorkerReply): void {
    const w = this.waiting.get(r.id);
    if (!w) return;
    if (r.kind === "progress") {
      w.progress?.(r.done, r.total);
      return;
    }
    this.waiting.delete(r.id);
    if (r.kind === "done") w.resolve({ json: r.json, frame: r.frame, ms: r.ms });
    else w.reject(r.input ? new ScreenInputError(r.message) : new Error(r.message));
  }
}
