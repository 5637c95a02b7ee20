/**
 * The explain job: a tracked pitch's movement against what its spin predicts, and
 * the seam orientations that would account for the rest; one pitch, or a CSV of
 * tracked pitches streamed through in bounded memory.
 *
 * Batch input (CSV, header required, columns by name, units in the names):
 *   pitcher, pitch (optional labels), hand (right|left), speed_mph, spin_rpm,
 *   tilt (H:MM), view (pitcher|catcher, default pitcher), gyro_deg or efficiency_pct
 *   (default gyro 0), move_arm_in, move_up_in (observed movement with gravity
 *   removed: inches toward the arm side, and up).
 * The CSV is read by io/csv.ts (RFC 4180: quoted commas, quotes and line breaks,
 * CRLF, a leading BOM); a record that cannot be read, or a row with a bad value,
 * is one bad row with its line. Numbers are decimal only (io/numbers.ts).
 */
import { statSync } from "node:fs";
import { formatLatLon, vectorToLatLon } from "../../geometry/ballCoords.js";
import { findLandmarks, nearestLandmark } from "../../geometry/landmarks.js";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { DEG, M_PER_IN } from "../../geometry/units.js";
import { isBadRecord, readCsv, type CsvProgress, type CsvReader } from "../io/csv.js";
import { InputError } from "../io/errors.js";
import { parseDecimal } from "../io/numbers.js";
import { formatOfPath, writesStraight } from "../io/outputPlan.js";
import { quote } from "../io/quote.js";
import { DEFAULT_EXPLAIN_GRID_DEG, DEFAULT_EXPLAIN_TOP, Explainer, type Explanation } from "../physics/explain.js";
import type { Pitch } from "../screening/pitch.js";
import type { PitchEcho } from "../screening/report.js";
import { buildPitch, pitchesFromRequest, PITCH_FLAGS, type RawPitch } from "./request/pitch.js";
import { airConditions } from "./request/settings.js";
import { oneOf, optionPath, parseInRange, parseIntegerInRange, parseNumber, type Request } from "./request/values.js";

const IN = (m: number) => m / M_PER_IN;
const COLUMN_FIELDS: Record<string, string> = {
  pitcher: "pitcher",
  pitch: "name",
  hand: "hand",
  speed_mph: "speedMph",
  spin_rpm: "spinRpm",
  tilt: "tilt",
  view: "view",
  gyro_deg: "gyroDeg",
  efficiency_pct: "efficiencyPct",
};
/** The numeric columns and the unit each is read in. */
const NUMERIC: Record<string, string> = { speed_mph: "mph", spin_rpm: "rpm", gyro_deg: "degrees", efficiency_pct: "percent", move_arm_in: "inches", move_up_in: "inches" };
const REQUIRED = ["hand", "speed_mph", "spin_rpm", "tilt", "move_arm_in", "move_up_in"];
export const INPUT_COLUMNS = [...Object.keys(COLUMN_FIELDS), "move_arm_in", "move_up_in"];
/** Largest observed movement accepted either way, inches. */
const MOVEMENT_LIMIT_IN = 60;

export interface ExplainSettings {
  readonly gridDeg: number;
  readonly top: number;
  readonly explainer: Explainer;
}

export interface ExplainOneJob extends ExplainSettings {
  readonly kind: "one";
  readonly pitch: Pitch;
  readonly echo: PitchEcho;
  readonly source?: string;
  readonly moveArmIn: number;
  readonly moveUpIn: number;
}

export interface ExplainBatchJob extends ExplainSettings {
  readonly kind: "batch";
  readonly csvIn: string;
  /** --out as typed (planned by the caller). */
  readonly out: string;
  readonly format: "csv" | "json";
  readonly onBadRow: "skip" | "stop";
}

function isFolder(path: string): boolean {
  try {
    return statSync(path).isDirectory();
  } catch {
    return false;
  }
}

/** Options that only a batch (--csv-in) reads. */
const BATCH_ONLY = ["on-bad-row", "format"];
/** Options that only one pitch reads (the CSV gives every pitch and its movement). */
const ONE_ONLY = [...PITCH_FLAGS, "pitch", "pitch-name", "demo", "move-arm", "move-up", "json"];

export function parseExplain(request: Request): ExplainOneJob | ExplainBatchJob {
  const given = (k: string) => request[k] !== undefined && request[k] !== false;
  const gridDeg = parseInRange("grid", request.grid ?? DEFAULT_EXPLAIN_GRID_DEG, 1, 15, "deg");
  const top = parseIntegerInRange("top", request.top ?? DEFAULT_EXPLAIN_TOP, 1, 20);
  const make = () => new Explainer({ gridSpacingRad: gridDeg * DEG, top, air: airConditions(request) });
  if (request["csv-in"] !== undefined) {
    const stray = ONE_ONLY.find(given);
    if (stray) throw new InputError(`--${stray} cannot be combined with --csv-in; the CSV gives every pitch and its movement`);
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
    return { kind: "batch", csvIn: optionPath("csv-in", request["csv-in"]), out, format: format ?? "csv", onBadRow, gridDeg, top, explainer: make() };
  }
  const batchOnly = BATCH_ONLY.find(given);
  if (batchOnly) throw new InputError(`--${batchOnly} goes with --csv-in FILE (a batch); leave it out for one pitch`);
  if (request["move-arm"] === undefined || request["move-up"] === undefined) {
    throw new InputError(`--move-arm and --move-up (observed movement, inches) are needed, or --csv-in FILE for a batch`);
  }
  const { pitches, source } = pitchesFromRequest(request);
  if (pitches.length !== 1) throw new InputError(`explain takes one pitch; the file has ${pitches.length} (choose one with --pitch-name, or use --csv-in)`);
  const moveArmIn = parseNumber("move-arm", request["move-arm"], "inches");
  const moveUpIn = parseNumber("move-up", request["move-up"], "inches");
  if (!(Math.abs(moveArmIn) <= MOVEMENT_LIMIT_IN && Math.abs(moveUpIn) <= MOVEMENT_LIMIT_IN)) {
    throw new InputError(`observed movement ${moveArmIn}, ${moveUpIn} in is out of range; expected at most ${MOVEMENT_LIMIT_IN} in each way`);
  }
  return { kind: "one", pitch: pitches[0].pitch, echo: pitches[0].echo, source, moveArmIn, moveUpIn, gridDeg, top, explainer: make() };
}

export function runExplainOne(job: ExplainOneJob): Explanation {
  return job.explainer.explain({ pitch: job.pitch, observedArmSideM: job.moveArmIn * M_PER_IN, observedUpM: job.moveUpIn * M_PER_IN });
}

/** The explanation in user units: the one form JSON, CSV and the terminal read. */
export function explanationNumbers(e: Explanation) {
  const landmarks = findLandmarks(DEFAULT_SEAM_SHAPE);
  return {
    magnus: { armSideIn: IN(e.magnusArmSideM), upIn: IN(e.magnusUpM) },
    residual: { armSideIn: IN(e.residualArmSideM), upIn: IN(e.residualUpM) },
    seamPerUnitCoefficient: {
      alongAxis: { armSideIn: IN(e.unitA.armSideM), upIn: IN(e.unitA.upM) },
      alongMagnus: { armSideIn: IN(e.unitM.armSideM), upIn: IN(e.unitM.upM) },
    },
    matches: e.matches.map((m, i) => {
      const near = nearestLandmark(landmarks, m.axis);
      return {
        rank: i + 1,
        axis: m.axis,
        latLon: formatLatLon(vectorToLatLon(m.axis)),
        landmark: { name: near.landmark.name, angleDeg: near.angleRad / DEG },
        seam: { armSideIn: IN(m.seamArmSideM), upIn: IN(m.seamUpM) },
        fitErrorIn: IN(m.fitErrorM),
        seamCoefficient: m.coefficient,
      };
    }),
  };
}

export type ExplanationNumbers = ReturnType<typeof explanationNumbers>;

/** One explained row of a batch. */
export interface ExplainedRow {
  readonly line: number;
  readonly pitcher: string;
  readonly pitch: string;
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

export interface BatchSummary {
  readonly done: number;
  readonly skipped: number;
  /** The bad row that stopped the run under --on-bad-row stop. */
  readonly stoppedAt?: string;
}

/** A column name that a byte-order mark got into, in words; "" if none did. */
function bomInName(name: string): string {
  if (name.includes("\ufeff")) return " (it holds a byte-order mark, U+FEFF, which is invisible)";
  // EF BB BF read as Windows-1252 and saved again as UTF-8: the mark shows as three letters
  if (name.includes("\u00ef\u00bb\u00bf")) return ` (it starts with a byte-order mark that was read as the letters "\u00ef\u00bb\u00bf" and saved again; expected the file saved once as UTF-8)`;
  return "";
}

/** Checks the header's names: every required column there, no unknown one. */
function checkHeader(names: readonly string[], label: string): void {
  const expected = `expected the columns ${INPUT_COLUMNS.join(", ")}`;
  const unknown = names.filter((c) => !INPUT_COLUMNS.includes(c));
  // a byte-order mark in a name also hides a required column: name the mark first
  const marked = unknown.find((c) => bomInName(c) !== "");
  if (marked !== undefined) throw new InputError(`${label}: the header has the unknown column ${quote(marked)}${bomInName(marked)}; ${expected}`);
  const missing = REQUIRED.filter((c) => !names.includes(c));
  if (missing.length) throw new InputError(`${label}: the header lacks column "${missing[0]}"; ${expected}`);
  if (unknown.length) throw new InputError(`${label}: the header has the unknown column ${quote(unknown[0])}; ${expected}`);
}

/** How messages name the batch's CSV. */
function batchLabel(job: ExplainBatchJob): string {
  return `--csv-in ${quote(job.csvIn)}`;
}

function rowPitch(cells: Readonly<Record<string, string>>, lineNo: number, label: string): { pitch: Pitch; moveArmIn: number; moveUpIn: number; label: [string, string] } {
  const where = (col: string) => `${label} line ${lineNo}, column "${col}"`;
  const get = (col: string) => cells[col] ?? "";
  for (const col of REQUIRED) if (get(col) === "") throw new InputError(`${where(col)}: the cell is empty; expected ${NUMERIC[col] ? `a number of ${NUMERIC[col]}` : `a ${col}`}`);
  const number = (col: string) => parseDecimal(get(col), `${where(col)}:`, `a number of ${NUMERIC[col]}`);
  const raw: RawPitch = {};
  for (const [col, field] of Object.entries(COLUMN_FIELDS)) {
    if (get(col) === "") continue;
    raw[field] = NUMERIC[col] ? number(col) : get(col);
  }
  const colOf: Record<string, string> = Object.fromEntries(Object.entries(COLUMN_FIELDS).map(([c, f]) => [f, c]));
  const { pitch } = buildPitch(raw, (field) => where(colOf[field] ?? field));
  const moveArmIn = number("move_arm_in");
  const moveUpIn = number("move_up_in");
  const limit = MOVEMENT_LIMIT_IN;
  for (const [col, x] of [["move_arm_in", moveArmIn], ["move_up_in", moveUpIn]] as const) {
    if (Math.abs(x) > limit) throw new InputError(`${where(col)}: ${x} in is out of range; expected at most ${limit} inches either way`);
  }
  return { pitch, moveArmIn, moveUpIn, label: [get("pitcher"), get("pitch")] };
}

/**
 * Opens the batch's CSV and reads and checks its header, before any output is
 * made: a missing file, a folder, an unreadable or empty file, a header that
 * cannot be read or lacks a column is one InputError, and nothing is written.
 */
export async function openExplainBatch(job: ExplainBatchJob): Promise<CsvReader> {
  const label = batchLabel(job);
  const reader = readCsv(job.csvIn, { label });
  try {
    checkHeader(await reader.header(), label);
  } catch (err) {
    reader.close();
    throw err;
  }
  return reader;
}

/** Streams the batch: one row in, one row out through `events`; a bad row is skipped or stops the run (job.onBadRow). */
export async function runExplainBatch(job: ExplainBatchJob, reader: CsvReader, events: BatchEvents): Promise<BatchSummary> {
  const label = batchLabel(job);
  let done = 0;
  let skipped = 0;
  let stoppedAt: string | undefined;
  for await (const item of reader) {
    let row;
    try {
      if (isBadRecord(item)) throw new InputError(item.error);
      row = rowPitch(item.cells, item.line, label);
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
    const e = job.explainer.explain({ pitch: row.pitch, observedArmSideM: row.moveArmIn * M_PER_IN, observedUpM: row.moveUpIn * M_PER_IN });
    await events.row({ line: item.line, pitcher: row.label[0], pitch: row.label[1], moveArmIn: row.moveArmIn, moveUpIn: row.moveUpIn, numbers: explanationNumbers(e) });
    done++;
    events.progress(done, reader.progress());
  }
  return { done, skipped, stoppedAt };
}
