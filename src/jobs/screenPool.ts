/**
 * Screening a staff on the worker pool (pool.ts): pitches with the same gyro share a
 * coefficient map (screening/screen.ts), so they go to a worker together as one task;
 * the tasks are sent largest first and every worker takes the next as it finishes. A
 * worker rebuilds the same job from the request as typed (the same files, model,
 * settings and cache) and screens the pitches it is given with the same code, so the
 * numbers are this thread's to the last bit. Meanwhile this thread is free to draw each
 * pitch as its screen comes back (for the atlas, the worker also draws each pitch's
 * sphere-map cells as PDF content, the heaviest part of its pages). With 0 threads, or
 * no worker file (the TypeScript sources under a test runner), every pitch is screened
 * here, in order, by the same code (pooledPitch).
 */
import { equalAreaGrid, type SphereGrid } from "../../geometry/sphereGrid.js";
import type { ScreenReport } from "../screening/report.js";
import { coreThreads, openPool } from "./pool.js";
import type { Request } from "./request/values.js";
import { mapMarksIn, scaleRange, sphereMapCellsPdf, type MapCells, type MapCellsOptions } from "../render/sphereMapDrawing.js";
import { mapValuesIn, parseScreen, screenOne, type ScreenJob } from "./screen.js";
import type { TopChoice } from "./screenJob.js";

/** A worker's task: the request as given and the screen's top options, and which pitches. */
export interface ScreenTask {
  readonly kind: "screen";
  readonly request: Request;
  readonly top: TopChoice;
  readonly indices: readonly number[];
  /** Draw each pitch's sphere-map cells as PDF content too (the atlas's map). */
  readonly mapCells?: MapCellsOptions;
}

/** What comes back per pitch. */
export interface PoolResult {
  readonly index: number;
  readonly report: ScreenReport;
  readonly mapValuesIn: Float64Array;
  readonly gridSpacingRad: number;
  readonly mapCellsPdf?: MapCells;
}

export interface PooledPitch {
  readonly report: ScreenReport;
  /** Seam movement toward the wanted direction (its size for "any") per grid cell, inches. */
  readonly mapValuesIn: Float64Array;
  readonly grid: SphereGrid;
  /** The sphere map's cells as PDF content (render/sphereMapDrawing.ts sphereMapCellsPdf), when asked for. */
  readonly mapCellsPdf?: MapCells;
}

/** Below this many pitches, "auto" screens on this thread: a worker's start costs more than it saves. */
export const POOL_MIN_PITCHES = 3;

/** The worker threads "auto" gives a staff of `pitches`: one per core (at most one per gyro group) from POOL_MIN_PITCHES on, else none. */
export function autoScreenThreads(pitches: number, groups = pitches): number {
  return pitches < POOL_MIN_PITCHES ? 0 : Math.min(coreThreads(), groups);
}

/** Only plain values of the request (yargs adds functions and aliases a worker cannot take). */
function plainRequest(request: Request): Request {
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(request)) {
    if (k === "$0" || k === "_" || (k.includes("-") === false && /[A-Z]/.test(k))) continue;
    if (v === undefined || typeof v === "string" || typeof v === "number" || typeof v === "boolean") out[k] = v;
    else if (Array.isArray(v) && v.every((x) => typeof x === "string" || typeof x === "number")) out[k] = [...v];
  }
  return out as Request;
}

/**
 * Pitch indices grouped by gyro (one coefficient map each), in the order of their first
 * pitch: the pitches come back roughly in order, so a caller drawing them in order
 * (the atlas) can start early.
 */
export function gyroGroups(gyros: readonly number[]): number[][] {
  const byGyro = new Map<number, number[]>();
  gyros.forEach((g, i) => byGyro.set(g, [...(byGyro.get(g) ?? []), i]));
  return [...byGyro.values()];
}

/** What a caller hears while a staff is screened. */
export interface PoolHooks {
  /** Pitch `index` is screened (in the order they come back; in order on this thread). */
  onPitch?: (index: number, pitch: PooledPitch) => void;
  /** Progress: the stage, pitches done, pitches in all. */
  tick?: (stage: string, done: number, total: number) => void;
  /** Called once the workers have their tasks (at once with no pool): this thread's own work meanwhile, awaited before the screen resolves (with no pool, before it starts). */
  meanwhile?: () => void | Promise<void>;
  /** Also draw each pitch's sphere-map cells as PDF content, on the thread that screens it. */
  mapCells?: MapCellsOptions;
}

let built: { key: string; job: ScreenJob } | undefined;

/** Pitch `i` of `job` screened, with its map's values in inches and, when asked for, its cells as PDF content: what either side of the pool makes of a pitch. */
function pooledPitch(job: ScreenJob, i: number, mapCells: MapCellsOptions | undefined): PooledPitch {
  const s = screenOne(job, job.pitches[i]);
  const values = mapValuesIn(s);
  const mapCellsPdf = mapCells ? sphereMapCellsPdf(values, s.result.grid, { ...mapCells, range: scaleRange(values, mapMarksIn(s.report)) }) : undefined;
  return { report: s.report, mapValuesIn: values, grid: s.result.grid, ...(mapCellsPdf ? { mapCellsPdf } : {}) };
}

/** A worker's side of a screen task: the job built once per request, the pitches screened. */
export function screenPitches(task: ScreenTask): PoolResult[] {
  const key = JSON.stringify([task.request, task.top]);
  if (built?.key !== key) built = { key, job: parseScreen(task.request, task.top) };
  const job = built.job;
  return task.indices.map((i) => {
    // the grid is rebuilt on the calling thread from its spacing, not sent
    const { grid, ...rest } = pooledPitch(job, i, task.mapCells);
    return { index: i, ...rest, gridSpacingRad: grid.spacingRad };
  });
}

/**
 * Screens every pitch of `job` on `threads` workers ("auto": autoScreenThreads), with
 * `hooks` told of each pitch and the progress. Resolves with all of them in order.
 */
export async function screenAllPooled(job: ScreenJob, request: Request, top: TopChoice, threads: number | "auto", hooks: PoolHooks = {}): Promise<PooledPitch[]> {
  const { onPitch = () => {}, tick = () => {}, meanwhile = () => {}, mapCells } = hooks;
  const n = job.pitches.length;
  const groups = gyroGroups(job.pitches.map((p) => p.pitch.gyroRad));
  const count = threads === "auto" ? autoScreenThreads(n, groups.length) : Math.min(threads, groups.length);
  const out: PooledPitch[] = new Array(n);
  let done = 0;
  const take = (i: number, p: PooledPitch) => {
    out[i] = p;
    tick("screening", ++done, n);
    onPitch(i, p);
  };
  const pool = await openPool(count);
  if (!pool) {
    await meanwhile();
    for (let i = 0; i < n; i++) take(i, pooledPitch(job, i, mapCells));
    return out;
  }
  const grids = new Map<number, SphereGrid>();
  const gridOf = (spacing: number) => {
    if (!grids.has(spacing)) grids.set(spacing, equalAreaGrid(spacing));
    return grids.get(spacing)!;
  };
  const plain = plainRequest(request);
  try {
    const runs = groups.map(async (indices) => {
      const task: ScreenTask = { kind: "screen", request: plain, top, indices, ...(mapCells ? { mapCells } : {}) };
      const results = (await pool.run(task)) as PoolResult[];
      for (const r of results) take(r.index, { report: r.report, mapValuesIn: r.mapValuesIn, grid: gridOf(r.gridSpacingRad), ...(r.mapCellsPdf ? { mapCellsPdf: r.mapCellsPdf } : {}) });
    });
    await Promise.all([...runs, meanwhile()]);
  } finally {
    await pool.destroy();
  }
  if (out.some((p) => p === undefined)) throw new Error("the screening workers left pitches unscreened");
  return out;
}
