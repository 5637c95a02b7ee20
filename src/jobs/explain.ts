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
 */
import { createReadStream, existsSync } from "node:fs";
import { createInterface } from "node:readline";
import { formatLatLon, vectorToLatLon } from "../../geometry/ballCoords.js";
import { findLandmarks, nearestLandmark } from "../../geometry/landmarks.js";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { DEG, M_PER_IN } from "../../geometry/units.js";
import { parseCsvLine } from "../io/csvLine.js";
import { InputError } from "../io/errors.js";
import { DEFAULT_EXPLAIN_GRID_DEG, DEFAULT_EXPLAIN_TOP, Explainer, type Explanation } from "../physics/explain.js";
import type { Pitch } from "../screening/pitch.js";
import type { PitchEcho } from "../screening/report.js";
import { buildPitch, pitchesFromRequest, PITCH_FLAGS, type RawPitch } from "./request/pitch.js";
import { airConditions } from "./request/settings.js";
import { oneOf, parseInRange, parseIntegerInRange, parseNumber, type Request } from "./request/values.js";

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
const NUMERIC = new Set(["speed_mph", "spin_rpm", "gyro_deg", "efficiency_pct", "move_arm_in", "move_up_in"]);
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
  readonly format: "csv" | "json";
  readonly onBadRow: "skip" | "stop";
}

export function parseExplain(request: Request): ExplainOneJob | ExplainBatchJob {
  const onBadRow = oneOf("on-bad-row", request["on-bad-row"] ?? "skip", ["skip", "stop"] as const);
  const gridDeg = parseInRange("grid", request.grid ?? DEFAULT_EXPLAIN_GRID_DEG, 1, 15, "deg");
  const top = parseIntegerInRange("top", request.top ?? DEFAULT_EXPLAIN_TOP, 1, 20);
  const make = () => new Explainer({ gridSpacingRad: gridDeg * DEG, top, air: airConditions(request) });
  if (request["csv-in"] !== undefined) {
    const stray = [...PITCH_FLAGS, "pitch", "demo", "move-arm", "move-up"].find((k) => request[k] !== undefined && request[k] !== false);
    if (stray) throw new InputError(`--${stray} cannot be combined with --csv-in; the CSV gives every pitch`);
    const out = request.out;
    if (typeof out !== "string") throw new InputError(`--csv-in needs --out FILE (.csv or .json) for the results`);
    const format =
      request.format !== undefined ? oneOf("format", request.format, ["csv", "json"] as const) : out.endsWith(".json") ? "json" : out.endsWith(".csv") ? "csv" : undefined;
    if (!format) throw new InputError(`--out "${out}": give a .csv or .json file, or --format csv|json`);
    return { kind: "batch", csvIn: String(request["csv-in"]), format, onBadRow, gridDeg, top, explainer: make() };
  }
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
  progress(done: number): void;
}

export interface BatchSummary {
  readonly done: number;
  readonly skipped: number;
  /** The bad row that stopped the run under --on-bad-row stop. */
  readonly stoppedAt?: string;
}

function rowPitch(header: string[], cells: string[], lineNo: number, file: string): { pitch: Pitch; moveArmIn: number; moveUpIn: number; label: [string, string] } {
  const where = (col: string) => `${file} line ${lineNo}, column ${col}`;
  if (cells.length !== header.length) throw new InputError(`${file} line ${lineNo}: ${cells.length} cells, but the header has ${header.length}`);
  const get = (col: string) => {
    const i = header.indexOf(col);
    return i < 0 ? "" : cells[i];
  };
  for (const col of REQUIRED) if (get(col) === "") throw new InputError(`${where(col)}: "${col}" is empty`);
  const raw: RawPitch = {};
  for (const [col, field] of Object.entries(COLUMN_FIELDS)) {
    const v = get(col);
    if (v === "") continue;
    if (NUMERIC.has(col)) {
      const x = Number(v);
      if (!Number.isFinite(x)) throw new InputError(`${where(col)}: "${v}" is not a number`);
      raw[field] = x;
    } else raw[field] = v;
  }
  const colOf: Record<string, string> = Object.fromEntries(Object.entries(COLUMN_FIELDS).map(([c, f]) => [f, c]));
  const { pitch } = buildPitch(raw, (field) => where(colOf[field] ?? field));
  const moveArmIn = Number(get("move_arm_in"));
  const moveUpIn = Number(get("move_up_in"));
  const limit = MOVEMENT_LIMIT_IN;
  if (!Number.isFinite(moveArmIn) || Math.abs(moveArmIn) > limit) throw new InputError(`${where("move_arm_in")}: "${get("move_arm_in")}" must be a number of inches, at most ${limit} either way`);
  if (!Number.isFinite(moveUpIn) || Math.abs(moveUpIn) > limit) throw new InputError(`${where("move_up_in")}: "${get("move_up_in")}" must be a number of inches, at most ${limit} either way`);
  return { pitch, moveArmIn, moveUpIn, label: [get("pitcher"), get("pitch")] };
}

/** Streams the batch: one row in, one row out through `events`. */
export async function runExplainBatch(job: ExplainBatchJob, events: BatchEvents): Promise<BatchSummary> {
  const file = job.csvIn;
  if (!existsSync(file)) throw new InputError(`--csv-in "${file}": no such file`);
  let header: string[] | undefined;
  let lineNo = 0;
  let done = 0;
  let skipped = 0;
  let stoppedAt: string | undefined;
  const rl = createInterface({ input: createReadStream(file, "utf8"), crlfDelay: Infinity });
  try {
    for await (const line of rl) {
      lineNo++;
      if (line.trim() === "") continue;
      if (!header) {
        header = parseCsvLine(line);
        const missing = REQUIRED.filter((c) => !header!.includes(c));
        const unknown = header.filter((c) => !INPUT_COLUMNS.includes(c));
        if (missing.length) throw new InputError(`${file} line ${lineNo}: the header lacks column "${missing[0]}"; expected ${INPUT_COLUMNS.join(", ")}`);
        if (unknown.length) throw new InputError(`${file} line ${lineNo}: unknown column "${unknown[0]}"; expected ${INPUT_COLUMNS.join(", ")}`);
        continue;
      }
      let row;
      try {
        row = rowPitch(header, parseCsvLine(line), lineNo, file);
      } catch (err) {
        if (!(err instanceof InputError || err instanceof RangeError)) throw err;
        const message = err.message.includes(`line ${lineNo}`) ? err.message : `${file} line ${lineNo}: ${err.message}`;
        if (job.onBadRow === "stop") {
          stoppedAt = message;
          break;
        }
        skipped++;
        events.skipped(message);
        continue;
      }
      const e = job.explainer.explain({ pitch: row.pitch, observedArmSideM: row.moveArmIn * M_PER_IN, observedUpM: row.moveUpIn * M_PER_IN });
      await events.row({ line: lineNo, pitcher: row.label[0], pitch: row.label[1], moveArmIn: row.moveArmIn, moveUpIn: row.moveUpIn, numbers: explanationNumbers(e) });
      done++;
      events.progress(done);
    }
  } finally {
    rl.close();
  }
  if (!header && stoppedAt === undefined) throw new InputError(`${file}: no header line; expected columns ${INPUT_COLUMNS.join(", ")}`);
  return { done, skipped, stoppedAt };
}
