/**
 * explain's batch engine: rows in blocks, explained on worker threads (piscina) or
 * in this thread, results back in file order.
 *
 * The main thread reads and checks the CSV (explain.ts), packs each block of up to
 * BLOCK_ROWS good rows into one Float64Array (ROW_FIELDS numbers a row, transferred,
 * not copied) and hands it to the pool; a worker keeps one Explainer per settings
 * (model, orientation set, coefficient maps read from the disk cache or computed and
 * written there: explainCache.ts) and returns the block's explanations and, when a
 * summary is wanted, its per-pitch-type sums over the orientations. At most
 * IN_FLIGHT_PER_THREAD blocks per thread are out at once, so memory follows the
 * block, not the file; results are written in the order the blocks were sent.
 *
 * Threads: `threads` 0 explains in this thread (also when the worker's file is not
 * there, as under the TypeScript test runner); the command line uses one worker per
 * core (at most 8) for files above AUTO_THREADS_BYTES, else 0.
 */
import { existsSync } from "node:fs";
import { cpus } from "node:os";
import { fileURLToPath } from "node:url";
import type { AirConditions } from "../physics/air.js";
import { Explainer, emptySums, type Explanation, type MovementBasis, type OrientationSums, type ThrowFitData } from "../physics/explain.js";
import { seamModel } from "../physics/seamModel/model.js";
import type { SeamModelProfile } from "../physics/seamModel/parameters.js";
import { DEG } from "../../geometry/units.js";
import type { Pitch } from "../screening/pitch.js";
import { cachedGyroMaps } from "./explainCache.js";

/** Rows per block sent to a worker. */
export const BLOCK_ROWS = 128;
/** Blocks out per thread at most. */
export const IN_FLIGHT_PER_THREAD = 3;
/** Files at least this large get worker threads by default, bytes (about 600 rows). */
export const AUTO_THREADS_BYTES = 48 * 1024;
const MAX_THREADS = 8;

/** Everything a worker needs to build the same Explainer (plain data: structured-cloned to workers). */
export interface ExplainSettings {
  readonly gridDeg: number;
  readonly top: number;
  readonly basis: MovementBasis;
  readonly windowStartM: number;
  readonly air: AirConditions;
  readonly profile: SeamModelProfile;
  readonly seamShape: number;
  readonly gapFlagMinutes: number;
  /** Cache folder for the coefficient maps, or null for none. */
  readonly cacheFolder: string | null;
}

/** Numbers per packed row: hand (+1 right, -1 left), speed m/s, spin rad/s, tilt rad, view (0 pitcher, 1 catcher), gyro rad, observed arm side m, observed up m, group (-1 none). */
export const ROW_FIELDS = 9;

export interface PackedRow {
  readonly pitch: Pitch;
  readonly observedArmSideM: number;
  readonly observedUpM: number;
  /** The pitch type's index for the summary, or -1. */
  readonly group: number;
}

export function packRows(rows: readonly PackedRow[]): Float64Array {
  const out = new Float64Array(ROW_FIELDS * rows.length);
  rows.forEach((r, i) => {
    const o = ROW_FIELDS * i;
    const p = r.pitch;
    out[o] = p.hand === "right" ? 1 : -1;
    out[o + 1] = p.speedMPerS;
    out[o + 2] = p.spinRadPerS;
    out[o + 3] = p.tiltRad;
    out[o + 4] = p.view === "pitcher" ? 0 : 1;
    out[o + 5] = p.gyroRad;
    out[o + 6] = r.observedArmSideM;
    out[o + 7] = r.observedUpM;
    out[o + 8] = r.group;
  });
  return out;
}

export interface BlockResult {
  readonly explanations: Explanation[];
  /** Per row: the numbers a joint fit needs. */
  readonly fits: ThrowFitData[];
  /** Per pitch type present in the block (when asked): its sums over the orientations. */
  readonly sums: { group: number; sums: OrientationSums }[];
}

let cached: { key: string; explainer: Explainer } | undefined;

/** The Explainer for a settings object, kept between blocks. */
export function explainerFor(settings: ExplainSettings): Explainer {
  const key = JSON.stringify(settings);
  if (cached?.key !== key) {
    const model = seamModel(settings.profile, { seamShape: settings.seamShape });
    cached = {
      key,
      explainer: new Explainer({
        gridSpacingRad: settings.gridDeg * DEG,
        top: settings.top,
        air: settings.air,
        model,
        basis: settings.basis,
        windowStartM: settings.windowStartM,
        gapFlagMinutes: settings.gapFlagMinutes,
        maps: cachedGyroMaps(settings.cacheFolder),
      }),
    };
  }
  return cached.explainer;
}

/** Explains one packed block (the worker's task, and the in-thread path). */
export function explainBlock(settings: ExplainSettings, rows: Float64Array, wantSums: boolean): BlockResult {
  const explainer = explainerFor(settings);
  const n = rows.length / ROW_FIELDS;
  const explanations: Explanation[] = [];
  const fits: ThrowFitData[] = [];
  const sums = new Map<number, OrientationSums>();
  for (let i = 0; i < n; i++) {
    const o = ROW_FIELDS * i;
    const pitch: Pitch = {
      name: "",
      pitcher: "",
      hand: rows[o] > 0 ? "right" : "left",
      speedMPerS: rows[o + 1],
      spinRadPerS: rows[o + 2],
      tiltRad: rows[o + 3],
      view: rows[o + 4] === 0 ? "pitcher" : "catcher",
      gyroRad: rows[o + 5],
      want: "any",
    };
    const group = rows[o + 8];
    let s: OrientationSums | undefined;
    if (wantSums && group >= 0) {
      s = sums.get(group);
      if (!s) {
        s = emptySums(explainer.orientations);
        sums.set(group, s);
      }
    }
    const r = explainer.explainWith({ pitch, observedArmSideM: rows[o + 6], observedUpM: rows[o + 7] }, s);
    explanations.push(r.explanation);
    fits.push(r.fit);
  }
  return { explanations, fits, sums: [...sums].map(([group, s]) => ({ group, sums: s })) };
}

/** The worker's file beside this module or, in the bundle, beside the command line's entry. */
export function workerFile(): string | undefined {
  for (const rel of ["./explainWorker.js", "../explainWorker.js"]) {
    const path = fileURLToPath(new URL(rel, import.meta.url));
    if (existsSync(path)) return path;
  }
  return undefined;
}

/** Worker threads for a file of `bytes` (undefined: not a regular file). */
export function autoThreads(bytes: number | undefined): number {
  if (bytes !== undefined && bytes < AUTO_THREADS_BYTES) return 0;
  return Math.max(1, Math.min(MAX_THREADS, cpus().length));
}

/** Runs blocks on worker threads or in this thread. */
export interface BlockRunner {
  readonly threads: number;
  run(rows: Float64Array, wantSums: boolean): Promise<BlockResult>;
  close(): Promise<void>;
}

/** A runner with `threads` workers (0, or no worker file: this thread). */
export async function blockRunner(settings: ExplainSettings, threads: number): Promise<BlockRunner> {
  const file = threads > 0 ? workerFile() : undefined;
  if (file === undefined) {
    return {
      threads: 0,
      run: async (rows, wantSums) => explainBlock(settings, rows, wantSums),
      close: async () => {},
    };
  }
  const { Piscina } = await import("piscina");
  const pool = new Piscina({ filename: file, minThreads: threads, maxThreads: threads, idleTimeout: 60_000 });
  return {
    threads,
    run: (rows, wantSums) => pool.run({ settings, rows, wantSums }, { transferList: [rows.buffer as ArrayBuffer] }) as Promise<BlockResult>,
    close: () => pool.destroy(),
  };
}
