/**
 * Screening a staff on two cores: one worker thread (screenWorker.ts) screens part of
 * the pitches while the calling thread screens the rest (and can draw them meanwhile).
 * Pitches with the same gyro share a coefficient map (screening/screen.ts), so they
 * go to the same thread; the groups are balanced by that work. Where the worker's
 * compiled file is not there (the TypeScript sources under a test runner), every
 * pitch is screened on the calling thread: the same numbers, one core.
 */
import { existsSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { Worker } from "node:worker_threads";
import { equalAreaGrid, type SphereGrid } from "../../geometry/sphereGrid.js";
import { M_PER_IN } from "../../geometry/units.js";
import type { ScreenReport } from "../screening/report.js";
import type { Request } from "./request/values.js";
import { screenOne, type ScreenJob } from "./screen.js";

/** What a worker is asked: the request as given and the screen's top options, and which pitches. */
export interface PoolTask {
  readonly request: Request;
  readonly top: { fallback?: number; range?: readonly [number, number]; atLeast?: number };
  readonly indices: readonly number[];
}

/** What comes back per pitch. */
export interface PoolResult {
  readonly index: number;
  readonly report: ScreenReport;
  readonly mapValuesIn: Float64Array;
  readonly gridSpacingRad: number;
}

export interface PooledPitch {
  readonly report: ScreenReport;
  /** Seam movement toward the wanted direction (its size for "any") per grid cell, inches. */
  readonly mapValuesIn: Float64Array;
  readonly grid: SphereGrid;
}

/** The calling thread's share of the screening (it draws the pages too; measured on the demo staff). */
const CALLER_SHARE = 0.4;
/** Below this many pitches a second thread costs more than it saves. */
const POOL_MIN_PITCHES = 3;

function workerFile(): string | undefined {
  for (const rel of ["./screenWorker.js", "./chunks/screenWorker.js", "../chunks/screenWorker.js"]) {
    const path = fileURLToPath(new URL(rel, import.meta.url));
    if (existsSync(path)) return path;
  }
  return undefined;
}

/** Only plain values of the request (yargs adds functions and aliases a worker cannot take). */
function plainRequest(request: Request): Request {
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(request)) {
    if (k === "$0" || k === "_" || k.includes("-") === false && /[A-Z]/.test(k)) continue;
    if (v === undefined || typeof v === "string" || typeof v === "number" || typeof v === "boolean") out[k] = v;
    else if (Array.isArray(v) && v.every((x) => typeof x === "string" || typeof x === "number")) out[k] = [...v];
  }
  return out as Request;
}

/**
 * Splits pitch indices into two groups, pitches with one gyro together: the first
 * gets about `share` of the work (the calling thread, which also draws), the second
 * the rest (the worker).
 */
export function splitByGyro(gyros: readonly number[], share = 0.5): [number[], number[]] {
  const byGyro = new Map<number, number[]>();
  gyros.forEach((g, i) => byGyro.set(g, [...(byGyro.get(g) ?? []), i]));
  // a group's cost: one map per gyro (about as much as screening a pitch) and one per pitch
  const groups = [...byGyro.values()].sort((a, b) => b.length - a.length || a[0] - b[0]);
  const bins: [number[], number[]] = [[], []];
  const cost = [0, 0];
  for (const g of groups) {
    const k = cost[0] / share <= cost[1] / (1 - share) ? 0 : 1;
    bins[k].push(...g);
    cost[k] += 1 + g.length;
  }
  return [bins[0].sort((a, b) => a - b), bins[1].sort((a, b) => a - b)];
}

/**
 * Screens every pitch of `job`; `onPitch(i, pitch)` as each is done (on this thread's
 * own group first, in order), `tick` for progress. Resolves with all of them in order.
 */
export async function screenAllPooled(
  job: ScreenJob,
  request: Request,
  top: PoolTask["top"],
  onPitch: (index: number, pitch: PooledPitch) => void = () => {},
  tick: (stage: string, done: number, total: number) => void = () => {},
): Promise<PooledPitch[]> {
  const n = job.pitches.length;
  const out: PooledPitch[] = new Array(n);
  let done = 0;
  const grids = new Map<number, SphereGrid>();
  const gridOf = (spacing: number) => {
    if (!grids.has(spacing)) grids.set(spacing, equalAreaGrid(spacing));
    return grids.get(spacing)!;
  };
  const local = (i: number) => {
    const s = screenOne(job, job.pitches[i]);
    const p: PooledPitch = { report: s.report, mapValuesIn: s.result.scores.map((x) => x / M_PER_IN), grid: s.result.grid };
    out[i] = p;
    tick("screening", ++done, n);
    onPitch(i, p);
  };
  const file = n >= POOL_MIN_PITCHES ? workerFile() : undefined;
  if (!file) {
    for (let i = 0; i < n; i++) local(i);
    return out;
  }
  // this thread also draws every page, so it screens the smaller part
  const [mine, theirs] = splitByGyro(job.pitches.map((p) => p.pitch.gyroRad), CALLER_SHARE);
  const results: PoolResult[] = [];
  const worker = new Worker(file, { workerData: { request: plainRequest(request), top, indices: theirs } satisfies PoolTask });
  const finished = new Promise<void>((resolve, reject) => {
    worker.on("message", (r: PoolResult) => results.push(r));
    worker.on("error", reject);
    worker.on("exit", (code) => (code === 0 ? resolve() : reject(new Error(`the screening worker stopped with status ${code}`))));
  });
  for (const i of mine) local(i);
  await finished;
  for (const r of results.sort((a, b) => a.index - b.index)) {
    const p: PooledPitch = { report: r.report, mapValuesIn: r.mapValuesIn, grid: gridOf(r.gridSpacingRad) };
    out[r.index] = p;
    tick("screening", ++done, n);
    onPitch(r.index, p);
  }
  if (out.some((p) => p === undefined)) throw new Error("the screening worker left pitches unscreened");
  return out;
}
