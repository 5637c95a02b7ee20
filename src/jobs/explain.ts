/**
 * The explain job: a tracked pitch's movement against what its spin predicts, the
 * seam orientations that would account for the rest, and the spin-based against the
 * observed direction; one pitch, or a CSV of tracked pitches streamed through
 * (explainColumns.ts: our keys and --columns; explainBatch.ts: blocks on worker
 * threads), with a per-pitch-type summary (one orientation fitted to all throws of
 * a pitch: physics/explainFit.ts) and the bullpen report (render/report/).
 *
 * Basis (--movement-basis): trade (default: induced vertical break and horizontal
 * break over the window from --window-ft, default 50 ft, to the front of the plate)
 * or release (the plate crossing against the spinless flight). Every output names the
 * basis and the window.
 */
import { statSync } from "node:fs";
import { formatLatLon, vectorToLatLon } from "../../geometry/ballCoords.js";
import { armSideSign } from "../../geometry/frames.js";
import { findLandmarks, nearestLandmark } from "../../geometry/landmarks.js";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { DEG, M_PER_FT, M_PER_IN } from "../../geometry/units.js";
import type { Vec3 } from "../../geometry/vec.js";
import { isBadRecord, readCsv, type CsvProgress, type CsvReader } from "../io/csv.js";
import { InputError } from "../io/errors.js";
import { formatOfPath, writesStraight } from "../io/outputPlan.js";
import { quote } from "../io/quote.js";
import { DEFAULT_EXPLAIN_GRID_DEG, DEFAULT_EXPLAIN_TOP, DEFAULT_GAP_FLAG_MINUTES, EXPLAIN_TOP_RANGE, MOVEMENT_BASES, type Explanation, type MovementBasis } from "../physics/explain.js";
import { fitPitchType, PitchTypeAccumulator, type PitchTypeFit } from "../physics/explainFit.js";
import type { Pitch } from "../screening/pitch.js";
import type { PitchEcho } from "../screening/report.js";
import { autoThreads, BLOCK_ROWS, blockRunner, explainerFor, IN_FLIGHT_PER_THREAD, packRows, type BlockResult, type ExplainSettings, type PackedRow } from "./explainBatch.js";
import { MOVEMENT_LIMIT_IN, parseColumnsOption, readRow, resolveColumns, type BatchRow, type ColumnMap } from "./explainColumns.js";
import { modelChoice } from "./request/model.js";
import { onePitch, pitchesFromRequest, PITCH_FLAGS } from "./request/pitch.js";
import { cacheChoice, threadsChoice } from "./request/runtime.js";
import { airConditions, samplerSettings, windowStart } from "./request/settings.js";
import { oneOf, optionPath, parseInRange, parseIntegerInRange, parseNumber, type Request } from "./request/values.js";

const IN = (m: number) => m / M_PER_IN;

export interface ExplainOneJob {
  readonly kind: "one";
  readonly settings: ExplainSettings;
  readonly pitch: Pitch;
  readonly echo: PitchEcho;
  readonly source?: string;
  /** Observed movement on the basis, inches: toward the arm side, and up. */
  readonly moveArmIn: number;
  readonly moveUpIn: number;
}

export interface ExplainBatchJob {
  readonly kind: "batch";
  readonly settings: ExplainSettings;
  readonly csvIn: string;
  /** --out as typed (planned by the caller). */
  readonly out: string;
  readonly format: "csv" | "json";
  readonly onBadRow: "skip" | "stop";
  /** --columns: key -> the user's header. */
  readonly columns: Readonly<Record<string, string>>;
  /** --summary FILE (.json or .csv), planned by the caller. */
  readonly summary?: { readonly path: string; readonly format: "json" | "csv" };
  /** --report FILE.pdf and --report-svg DIR. */
  readonly report?: string;
  readonly reportSvg?: string;
  /** --report-png DIR. */
  readonly reportPng?: string;
  /** Worker threads: a number, or "auto" (by the file's size). */
  readonly threads: number | "auto";
}

export type ExplainJob = ExplainOneJob | ExplainBatchJob;

function isFolder(path: string): boolean {
  try {
    return statSync(path).isDirectory();
  } catch {
    return false;
  }
}

/** Options that only a batch (--csv-in) reads. */
const BATCH_ONLY = ["on-bad-row", "format", "columns", "summary", "report", "report-svg", "report-png", "threads"];
/** Options that only one pitch reads (the CSV gives every pitch and its movement). */
const ONE_ONLY = [...PITCH_FLAGS, "pitch", "pitch-name", "demo", "move-arm", "move-right", "move-up", "json"];

/** The settings both modes share: grid, top, basis, window, air, model, cache. */
function explainSettings(request: Request): ExplainSettings {
  const gridDeg = parseInRange("grid", request.grid ?? DEFAULT_EXPLAIN_GRID_DEG, 1, 15, "deg");
  const top = parseIntegerInRange("top", request.top ?? DEFAULT_EXPLAIN_TOP, EXPLAIN_TOP_RANGE[0], EXPLAIN_TOP_RANGE[1]);
  const basis = oneOf("movement-basis", request["movement-basis"] ?? "trade", MOVEMENT_BASES) as MovementBasis;
  if (basis === "release" && request["window-ft"] !== undefined) {
    throw new InputError(`--window-ft goes with --movement-basis trade (the release basis has no window); leave it out or use the trade basis`);
  }
  const choice = modelChoice(request);
  const sampler = samplerSettings(request, choice.profile);
  const gap = parseInRange("gap-flag", request["gap-flag"] ?? DEFAULT_GAP_FLAG_MINUTES, 1, 360, "minutes of clock");
  const cache = cacheChoice(request);
  return {
    gridDeg,
    top,
    basis,
    windowStartM: windowStart(request),
    air: airConditions(request),
    profile: choice.profile,
    seamShape: sampler.seamShape ?? DEFAULT_SEAM_SHAPE,
    gapFlagMinutes: gap,
    cacheFolder: cache,
  };
}

function batchFormat(option: string, value: unknown, allowed: readonly ("csv" | "json")[], what: string): { path: string; format: "csv" | "json" } {
  const path = optionPath(option, value);
  const named = formatOfPath(path);
  if (named !== undefined) {
    if (!(allowed as readonly string[]).includes(named)) throw new InputError(`--${option} ${quote(path)}: the extension names ${named}, but ${what} is written as ${allowed.join(" or ")}; expected a name ending in ${allowed.map((f) => `.${f}`).join(" or ")}`);
    return { path, format: named as "csv" | "json" };
  }
  if (path !== "" && writesStraight(path)) return { path, format: allowed[0] };
  if (path !== "" && !isFolder(path)) throw new InputError(`--${option} ${quote(path)} names no format; expected a name ending in ${allowed.map((f) => `.${f}`).join(" or ")}`);
  return { path, format: allowed[0] };
}

export function parseExplain(request: Request): ExplainJob {
  const given = (k: string) => request[k] !== undefined && request[k] !== false;
  if (request["csv-in"] !== undefined) {
    const stray = ONE_ONLY.find(given);
    if (stray) throw new InputError(`--${stray} cannot be combined with --csv-in; the CSV gives every pitch and its movement`);
    const settings = explainSettings(request);
    const onBadRow = oneOf("on-bad-row", request["on-bad-row"] ?? "skip", ["skip", "stop"] as const);
    if (request.out === undefined) throw new InputError(`--csv-in needs --out FILE (.csv or .json, or - for standard output) for the results`);
    const out = optionPath("out", request.out);
    const named = formatOfPath(out);
    const format =
      request.format !== undefined
        ? oneOf("format", request.format, ["csv", "json"] as const)
        : named === "csv" || named === "json"
          ? named
          : out !== "" && writesStraight(out)
            ? "csv"
            : undefined;
    // an empty --out or a folder is the output plan's to refuse, in its own words
    if (!format && out !== "" && !isFolder(out)) throw new InputError(`--out ${quote(out)} names no batch format; expected a .csv or .json file, or --format csv|json`);
    const columns = parseColumnsOption(request.columns);
    const summary = request.summary === undefined ? undefined : batchFormat("summary", request.summary, ["json", "csv"], "the summary");
    const report = request.report === undefined ? undefined : optionPath("report", request.report);
    const reportSvg = request["report-svg"] === undefined ? undefined : optionPath("report-svg", request["report-svg"]);
    const threads = threadsChoice(request);
    const reportPng = request["report-png"] === undefined ? undefined : optionPath("report-png", request["report-png"]);
    return { kind: "batch", settings, csvIn: optionPath("csv-in", request["csv-in"]), out, format: format ?? "csv", onBadRow, columns, summary, report, reportSvg, reportPng, threads };
  }
  const batchOnly = BATCH_ONLY.find(given);
  if (batchOnly) throw new InputError(`--${batchOnly} goes with --csv-in FILE (a batch); leave it out for one pitch`);
  if (request["move-arm"] !== undefined && request["move-right"] !== undefined) throw new InputError(`give --move-arm or --move-right, not both`);
  if (request["move-up"] === undefined || (request["move-arm"] === undefined && request["move-right"] === undefined)) {
    throw new InputError(`--move-up and --move-arm (or --move-right) are needed (observed movement, inches), or --csv-in FILE for a batch`);
  }
  const settings = explainSettings(request);
  const { pitches, source } = pitchesFromRequest(request);
  const chosen = onePitch(request, pitches, "explain", "choose one with --pitch-name, or use --csv-in");
  const moveUpIn = parseNumber("move-up", request["move-up"], "inches");
  const horizontalOption = request["move-arm"] !== undefined ? "move-arm" : "move-right";
  const horizontal = parseNumber(horizontalOption, request[horizontalOption], "inches");
  for (const [option, x] of [["move-up", moveUpIn], [horizontalOption, horizontal]] as const) {
    if (!(Math.abs(x) <= MOVEMENT_LIMIT_IN)) throw new InputError(`--${option} ${x} in is out of range; expected at most ${MOVEMENT_LIMIT_IN} in either way`);
  }
  const { pitch, echo } = chosen;
  const moveArmIn = horizontalOption === "move-arm" ? horizontal : armSideSign(pitch.hand) * horizontal;
  return { kind: "one", settings, pitch, echo, source, moveArmIn, moveUpIn };
}

export function runExplainOne(job: ExplainOneJob): Explanation {
  return explainerFor(job.settings).explain({ pitch: job.pitch, observedArmSideM: job.moveArmIn * M_PER_IN, observedUpM: job.moveUpIn * M_PER_IN });
}

let landmarkList: ReturnType<typeof findLandmarks> | undefined;
function nearest(axis: Vec3) {
  landmarkList ??= findLandmarks(DEFAULT_SEAM_SHAPE);
  const near = nearestLandmark(landmarkList, axis);
  return { name: near.landmark.name, angleDeg: near.angleRad / DEG };
}

/** A grid orientation's words (nearest landmark, latitude/longitude), kept by its index: a batch meets the same few hundred again and again. */
const orientationWords = new Map<number, { axis: Vec3; words: { landmark: { name: string; angleDeg: number }; latLon: string } }>();
function wordsOf(index: number, axis: Vec3) {
  const known = orientationWords.get(index);
  // an index names one cell of one grid: a run with another grid finds another axis there
  if (known && known.axis[0] === axis[0] && known.axis[1] === axis[1] && known.axis[2] === axis[2]) return known.words;
  const words = { landmark: nearest(axis), latLon: formatLatLon(vectorToLatLon(axis)) };
  orientationWords.set(index, { axis, words });
  return words;
}

const armUp = (a: { armSideM: number; upM: number }) => ({ armSideIn: IN(a.armSideM), upIn: IN(a.upM) });

/** The basis and window in words and numbers, for every output. */
export function basisNumbers(settings: ExplainSettings) {
  return { basis: settings.basis, windowFt: settings.basis === "trade" ? settings.windowStartM / M_PER_FT : null };
}

/** The explanation in user units: the one form JSON, CSV, the terminal and the report read. */
export function explanationNumbers(e: Explanation) {
  const d = e.direction;
  return {
    basis: e.basis,
    windowFt: e.windowStartM === null ? null : e.windowStartM / M_PER_FT,
    predicted: armUp(e.predicted),
    magnus: armUp(e.magnus),
    drag: armUp(e.drag),
    residual: armUp(e.residual),
    reach: { alongResidualIn: IN(e.reachM), beyondReach: e.beyondReach },
    direction: {
      spinBased: d.spinBased?.text ?? null,
      observed: d.observed?.text ?? null,
      gapMinutes: d.differenceMinutes,
      gapDeg: d.differenceDeg,
      flagged: e.gapFlagged,
    },
    seamPerUnitCoefficient: { alongAxis: armUp(e.unitA), alongMagnus: armUp(e.unitM) },
    matches: e.matches.map((m, i) => ({
      rank: i + 1,
      axis: m.axis,
      ...wordsOf(m.index, m.axis),
      seam: { armSideIn: IN(m.seamArmSideM), upIn: IN(m.seamUpM) },
      fitErrorIn: IN(m.fitErrorM),
      seamCoefficient: m.coefficient,
    })),
  };
}

export type ExplanationNumbers = ReturnType<typeof explanationNumbers>;

/** A pitch type's fit in user units (the summary's JSON and CSV, and the report). */
export function pitchTypeNumbers(pitcher: string, pitch: string, hand: string, fit: PitchTypeFit) {
  return {
    pitcher,
    pitch,
    hand,
    rows: fit.rows,
    orientations: fit.orientations.map((o, i) => ({
      rank: i + 1,
      axis: o.axis,
      latLon: formatLatLon(vectorToLatLon(o.axis)),
      landmark: nearest(o.axis),
      fitErrorIn: IN(o.fitErrorM),
      seam: { armSideIn: IN(o.seamArmSideM), upIn: IN(o.seamUpM) },
    })),
    residual: { armSideIn: IN(fit.residual.armSideM), verticalIn: IN(fit.residual.upM), sdArmSideIn: IN(fit.residual.sdArmSideM), sdVerticalIn: IN(fit.residual.sdUpM) },
    reach: { alongResidualIn: IN(fit.reachM), beyondReach: fit.beyondReach },
  };
}

export type PitchTypeNumbers = ReturnType<typeof pitchTypeNumbers>;

/** One explained row of a batch: its line, every input echoed, and the numbers. */
export interface ExplainedRow {
  readonly line: number;
  readonly echo: PitchEcho;
  readonly moveArmIn: number;
  readonly moveUpIn: number;
  readonly numbers: ExplanationNumbers;
}

/** What the batch reports as it goes. */
export interface BatchEvents {
  row(r: ExplainedRow): Promise<void>;
  skipped(message: string): void;
  /** Rows done so far and how much of the file has been read. */
  progress(done: number, read: CsvProgress): void;
}

/** One throw as the report draws it (a sample per pitch type: REPORT_POINTS). */
export interface ReportPoint {
  readonly observed: { armSideIn: number; upIn: number };
  readonly predicted: { armSideIn: number; upIn: number };
  /** Clock minutes (pitch's view) of the spin-based and observed directions, or null. */
  readonly spinMinutes: number | null;
  readonly observedMinutes: number | null;
}

/** Points per pitch type the report keeps (the first ones; the summary uses every row). */
export const REPORT_POINTS = 400;

export interface PitchTypeResult {
  readonly numbers: PitchTypeNumbers;
  readonly view: string;
  readonly points: readonly ReportPoint[];
}

export interface BatchSummary {
  readonly done: number;
  readonly skipped: number;
  /** The bad row that stopped the run under --on-bad-row stop. */
  readonly stoppedAt?: string;
  readonly threads: number;
  /** Per pitcher and pitch type, when --summary or --report asked for it. */
  readonly pitchTypes?: readonly PitchTypeResult[];
}

/** A column name that a byte-order mark got into, in words; "" if none did. */
function bomInName(name: string): string {
  if (name.includes("\ufeff")) return " (it holds a byte-order mark, U+FEFF, which is invisible)";
  // EF BB BF read as Windows-1252 and saved again as UTF-8: the mark shows as three letters
  if (name.includes("\u00ef\u00bb\u00bf")) return ` (it starts with a byte-order mark that was read as the letters "\u00ef\u00bb\u00bf" and saved again; expected the file saved once as UTF-8)`;
  return "";
}

/** How messages name the batch's CSV. */
function batchLabel(job: ExplainBatchJob): string {
  return `--csv-in ${quote(job.csvIn)}`;
}

/**
 * Opens the batch's CSV and reads and checks its header against the column map,
 * before any output is made: a missing file, a folder, an unreadable or empty file,
 * a header that cannot be read or lacks a column is one InputError, and nothing is written.
 */
export async function openExplainBatch(job: ExplainBatchJob): Promise<{ reader: CsvReader; columns: ColumnMap }> {
  const label = batchLabel(job);
  const reader = readCsv(job.csvIn, { label, extraCells: "ignore" });
  try {
    const header = await reader.header();
    const marked = header.find((c) => bomInName(c) !== "");
    if (marked !== undefined) throw new InputError(`${label}: the header has the unknown column ${quote(marked)}${bomInName(marked)}; expected the column names without it`);
    return { reader, columns: resolveColumns(header, job.columns, label) };
  } catch (err) {
    reader.close();
    throw err;
  }
}

interface Group {
  readonly pitcher: string;
  readonly pitch: string;
  readonly hand: string;
  readonly view: string;
  readonly acc: PitchTypeAccumulator;
  readonly points: ReportPoint[];
}

/**
 * Streams the batch: rows in blocks through the runner, out through `events` in file
 * order; a bad row is skipped or stops the run (job.onBadRow: the caller then writes nothing).
 */
export async function runExplainBatch(job: ExplainBatchJob, opened: { reader: CsvReader; columns: ColumnMap }, events: BatchEvents): Promise<BatchSummary> {
  const { reader, columns } = opened;
  const label = batchLabel(job);
  const wantGroups = job.summary !== undefined || job.report !== undefined || job.reportSvg !== undefined || job.reportPng !== undefined;
  const threads = job.threads === "auto" ? autoThreads(reader.progress().totalBytes) : job.threads;
  const runner = await blockRunner(job.settings, threads);
  const groups: Group[] = [];
  const groupIndex = new Map<string, number>();
  const explainer = wantGroups ? explainerFor(job.settings) : undefined;
  let done = 0;
  let skipped = 0;
  let stoppedAt: string | undefined;
  type Pending = { rows: BatchRow[]; lines: number[]; groups: number[]; result: Promise<BlockResult> };
  const pending: Pending[] = [];
  let block: { rows: BatchRow[]; lines: number[]; groups: number[] } = { rows: [], lines: [], groups: [] };

  const finish = async (p: Pending) => {
    const r = await p.result;
    for (const s of r.sums) groups[s.group].acc.addSums(s.sums);
    for (let i = 0; i < p.rows.length; i++) {
      const row = p.rows[i];
      const e = r.explanations[i];
      const g = p.groups[i];
      if (g >= 0) {
        const grp = groups[g];
        grp.acc.addThrow(r.fits[i]);
        if (grp.points.length < REPORT_POINTS) {
          grp.points.push({
            observed: { armSideIn: row.moveArmIn, upIn: row.moveUpIn },
            predicted: armUp(e.predicted),
            spinMinutes: e.direction.spinBased?.minutes ?? null,
            observedMinutes: e.direction.observed?.minutes ?? null,
          });
        }
      }
      await events.row({ line: p.lines[i], echo: row.echo, moveArmIn: row.moveArmIn, moveUpIn: row.moveUpIn, numbers: explanationNumbers(e) });
      done++;
    }
    events.progress(done, reader.progress());
  };
  const send = async () => {
    if (block.rows.length === 0) return;
    const packed: PackedRow[] = block.rows.map((r, i) => ({ pitch: r.pitch, observedArmSideM: r.moveArmIn * M_PER_IN, observedUpM: r.moveUpIn * M_PER_IN, group: block.groups[i] }));
    pending.push({ ...block, result: runner.run(packRows(packed), wantGroups) });
    // a rejected block is awaited in order below; keep it from being reported unhandled meanwhile
    pending[pending.length - 1].result.catch(() => {});
    block = { rows: [], lines: [], groups: [] };
    while (pending.length >= Math.max(1, runner.threads) * IN_FLIGHT_PER_THREAD) await finish(pending.shift()!);
  };
  try {
    for await (const item of reader) {
      let row: BatchRow;
      try {
        if (isBadRecord(item)) throw new InputError(item.error);
        row = readRow(item.cells, columns, item.line, label);
      } catch (err) {
        if (!(err instanceof InputError || err instanceof RangeError)) throw err;
        const message = err instanceof RangeError ? `${label} line ${item.line}: ${err.message}` : err.message;
        if (job.onBadRow === "stop") {
          stoppedAt = message;
          break;
        }
        skipped++;
        events.skipped(message);
        continue;
      }
      let g = -1;
      if (wantGroups) {
        const key = `${row.echo.pitcher}\u0000${row.echo.name}`;
        const found = groupIndex.get(key);
        if (found !== undefined) g = found;
        else {
          g = groups.length;
          groupIndex.set(key, g);
          groups.push({ pitcher: row.echo.pitcher, pitch: row.echo.name, hand: row.echo.hand, view: row.echo.view, acc: new PitchTypeAccumulator(explainer!.orientations), points: [] });
        }
      }
      block.rows.push(row);
      block.lines.push(item.line);
      block.groups.push(g);
      if (block.rows.length >= BLOCK_ROWS) await send();
    }
    await send();
    while (pending.length) await finish(pending.shift()!);
  } finally {
    await runner.close();
  }
  const pitchTypes = wantGroups
    ? groups.map((g) => ({ numbers: pitchTypeNumbers(g.pitcher, g.pitch, g.hand, fitPitchType(explainer!, g.acc)), view: g.view, points: g.points }))
    : undefined;
  return { done, skipped, stoppedAt, threads: runner.threads, ...(pitchTypes ? { pitchTypes } : {}) };
}
