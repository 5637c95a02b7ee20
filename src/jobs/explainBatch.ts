/**
 * explain's batch engine: rows in blocks, explained on the worker pool (pool.ts,
 * piscina, shared with the screen) or in this thread, results back in file order.
 *
 * The main thread reads and checks the CSV (explain.ts), packs each block of up to
 * BLOCK_ROWS good rows into one Float64Array (ROW_FIELDS numbers a row, transferred,
 * not copied) and hands it to the pool; a worker keeps one Explainer per settings
 * (model, orientation set, coefficient maps read from the disk cache or computed and
 * written there: mapCache.ts) and returns the block's explanations and, when a
 * summary is wanted, its per-pitch-type sums over the orientations. At most
 * IN_FLIGHT_PER_THREAD blocks per thread are out at once, so memory follows the
 * block, not the file; results are written in the order the blocks were sent.
 *
 * Threads: `threads` 0 explains in this thread (also when the worker's file is not
 * there, as under the TypeScript test runner); "auto" (the command line's default) is
 * one worker per core (at most 8) for files above AUTO_THREADS_BYTES, else 0.
 */
import type { AirConditions } from "../physics/air.js";
import { Explainer, emptySums, type Explanation, type MovementBasis, type OrientationSums, type ThrowFitData } from "../physics/explain.js";
import { seamModel } from "../physics/seamModel/model.js";
import type { SeamModelProfile } from "../physics/seamModel/parameters.js";
import { DEG } from "../../geometry/units.js";
import type { Pitch } from "../screening/pitch.js";
import { cachedGyroMaps } from "./mapCache.js";
import { coreThreads, openPool } from "./pool.js";
import { formatClock } from "../../geometry/clock.js";
import type { Vec3 } from "../../geometry/vec.js";
import { orientationSet, type OrientationSet } from "../physics/explainMaps.js";

/** Rows per block sent to a worker. */
export const BLOCK_ROWS = 256;
/** Blocks out per thread at most. */
export const IN_FLIGHT_PER_THREAD = 3;
/** Files at least this large get worker threads by default, bytes (about 600 rows). */
export const AUTO_THREADS_BYTES = 48 * 1024;

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

/** A worker's task (worker.ts): one packed block of rows. */
export interface ExplainTask {
  readonly kind: "explain";
  readonly settings: ExplainSettings;
  readonly rows: Float64Array;
  readonly wantSums: boolean;
}

/** A block's results as they cross between threads: numbers only (see packExplanation), and the per-type sums. */
export interface PackedBlockResult {
  readonly values: Float64Array;
  readonly top: number;
  readonly sums: { group: number; sums: OrientationSums }[];
}

export interface BlockResult {
  readonly explanations: Explanation[];
  /** Per row: the numbers a joint fit needs. */
  readonly fits: ThrowFitData[];
  /** Per pitch type present in the block (when asked): its sums over the orientations. */
  readonly sums: { group: number; sums: OrientationSums }[];
}

/** Numbers per packed explanation before its matches, and per match. */
const EXPLANATION_FIELDS = 20;
const MATCH_FIELDS = 6;

/**
 * An explanation as numbers (a transferable Float64Array instead of an object graph,
 * which costs the receiving thread a structured clone and its garbage):
 *   predicted, magnus, drag, residual, J_a, J_m (arm side, up each), reach, beyond (0/1),
 *   spin-based and observed clock readings (whole minutes; NaN for none), gap minutes and
 *   degrees (NaN for none), flagged (0/1), gyro (rad), then per match: orientation
 *   index, seam arm side, seam up, fit error, c_a, c_m (index -1 past the last match).
 */
function packExplanation(e: Explanation, gyroRad: number, top: number, out: Float64Array, o: number): void {
  const put = (i: number, a: { armSideM: number; upM: number }) => {
    out[o + i] = a.armSideM;
    out[o + i + 1] = a.upM;
  };
  put(0, e.predicted);
  put(2, e.magnus);
  put(4, e.drag);
  put(6, e.residual);
  put(8, e.unitA);
  put(10, e.unitM);
  out[o + 12] = e.reachM;
  out[o + 13] = e.beyondReach ? 1 : 0;
  out[o + 14] = e.direction.spinBased ? e.direction.spinBased.minutes : NaN;
  out[o + 15] = e.direction.observed ? e.direction.observed.minutes : NaN;
  out[o + 16] = e.direction.differenceMinutes ?? NaN;
  out[o + 17] = e.direction.differenceDeg ?? NaN;
  out[o + 18] = e.gapFlagged ? 1 : 0;
  out[o + 19] = gyroRad;
  for (let k = 0; k < top; k++) {
    const m = e.matches[k];
    const b = o + EXPLANATION_FIELDS + MATCH_FIELDS * k;
    if (!m) {
      out[b] = -1;
      continue;
    }
    out[b] = m.index;
    out[b + 1] = m.seamArmSideM;
    out[b + 2] = m.seamUpM;
    out[b + 3] = m.fitErrorM;
    out[b + 4] = m.coefficient.alongAxis;
    out[b + 5] = m.coefficient.alongMagnus;
  }
}

/** Rebuilds a block's explanations from their numbers (the orientation set gives the match axes). */
export function unpackBlock(r: PackedBlockResult, settings: ExplainSettings): BlockResult {
  const set = orientationSetFor(settings.gridDeg);
  const per = EXPLANATION_FIELDS + MATCH_FIELDS * r.top;
  const v = r.values;
  const n = v.length / per;
  const explanations: Explanation[] = [];
  const fits: ThrowFitData[] = [];
  const reading = (minutes: number) => (Number.isNaN(minutes) ? null : { minutes, text: formatClock(minutes) });
  for (let i = 0; i < n; i++) {
    const o = per * i;
    const at = (j: number) => ({ armSideM: v[o + j], upM: v[o + j + 1] });
    const matches = [];
    for (let k = 0; k < r.top; k++) {
      const b = o + EXPLANATION_FIELDS + MATCH_FIELDS * k;
      const index = v[b];
      if (index < 0) continue;
      matches.push({
        axis: [set.axes[3 * index], set.axes[3 * index + 1], set.axes[3 * index + 2]] as Vec3,
        index,
        seamArmSideM: v[b + 1],
        seamUpM: v[b + 2],
        fitErrorM: v[b + 3],
        coefficient: { alongAxis: v[b + 4], alongMagnus: v[b + 5] },
      });
    }
    const residual = at(6);
    const unitA = at(8);
    const unitM = at(10);
    explanations.push({
      basis: settings.basis,
      windowStartM: settings.basis === "trade" ? settings.windowStartM : null,
      predicted: at(0),
      magnus: at(2),
      drag: at(4),
      residual,
      unitA,
      unitM,
      reachM: v[o + 12],
      beyondReach: v[o + 13] === 1,
      direction: {
        spinBased: reading(v[o + 14]),
        observed: reading(v[o + 15]),
        differenceMinutes: Number.isNaN(v[o + 16]) ? null : v[o + 16],
        differenceDeg: Number.isNaN(v[o + 17]) ? null : v[o + 17],
      },
      gapFlagged: v[o + 18] === 1,
      matches,
    });
    fits.push({ residualArmSideM: residual.armSideM, residualUpM: residual.upM, unitA, unitM, gyroRad: v[o + 19] });
  }
  return { explanations, fits, sums: r.sums };
}

let sets: { gridDeg: number; set: OrientationSet } | undefined;
function orientationSetFor(gridDeg: number): OrientationSet {
  if (sets?.gridDeg !== gridDeg) sets = { gridDeg, set: orientationSet(gridDeg * DEG) };
  return sets.set;
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

/** Explains one packed block and packs the results (the worker's task). */
export function explainBlockPacked(settings: ExplainSettings, rows: Float64Array, wantSums: boolean): PackedBlockResult {
  const r = explainBlock(settings, rows, wantSums);
  const per = EXPLANATION_FIELDS + MATCH_FIELDS * settings.top;
  const values = new Float64Array(per * r.explanations.length);
  r.explanations.forEach((e, i) => packExplanation(e, r.fits[i].gyroRad, settings.top, values, per * i));
  return { values, top: settings.top, sums: r.sums };
}

/** Explains one packed block (the in-thread path; workers pack it: explainBlockPacked). */
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

/** Worker threads for a file of `bytes` (undefined: not a regular file). */
export function autoThreads(bytes: number | undefined): number {
  if (bytes !== undefined && bytes < AUTO_THREADS_BYTES) return 0;
  return coreThreads();
}

/** Runs blocks on worker threads or in this thread. */
export interface BlockRunner {
  readonly threads: number;
  run(rows: Float64Array, wantSums: boolean): Promise<BlockResult>;
  close(): Promise<void>;
}

/** A runner with `threads` workers (0, or no worker file: this thread). */
export async function blockRunner(settings: ExplainSettings, threads: number): Promise<BlockRunner> {
  const pool = await openPool(threads);
  if (pool === undefined) {
    return {
      threads: 0,
      run: async (rows, wantSums) => explainBlock(settings, rows, wantSums),
      close: async () => {},
    };
  }
  return {
    threads,
    run: async (rows, wantSums) => unpackBlock((await pool.run({ kind: "explain", settings, rows, wantSums } satisfies ExplainTask, { transferList: [rows.buffer as ArrayBuffer] })) as PackedBlockResult, settings),
    close: () => pool.destroy(),
  };
}
