/**
 * The calibrate job: fits the seam-force model's parameters to a lab's force
 * measurements and/or tracked pitches' seam movement (src/physics/calibrate/), and
 * gives the fitted profile for --model.
 *
 * Lab file (CSV, header required, columns by name in any order, units in the names):
 *   axis_x, axis_y, axis_z   the spin axis's positive end in the ball frame
 *                            (geometry/seamCurve.ts), any length, not zero
 *   gyro_deg                 gyro angle, strictly between -90 and 90 (geometry/frames.ts)
 *   phase_deg                phase of the turn (geometry/flow.ts) when the force was read
 *                            at one instant; empty for a turn-averaged measurement
 *   speed_mph                air speed past the ball, 30 to 110
 *   spin_rpm                 0 to 4500; read and checked, not used (the model has no
 *                            spin-rate dependence)
 *   force_magnus_n           measured force along m = unit(w x v), N
 *   force_across_n           measured force along the spin axis projected across the
 *                            flight, N (each at most FORCE_LIMIT_N either way)
 *   label                    optional free text, echoed in --residuals
 * Newtons from the model's coefficient by 1/2 rho pi R^2 v^2 with the air options'
 * density (all rows) and the tool's ball (geometry/ball.ts).
 *
 * Tracked file: pitches with a known seam orientation and their seam movement, read
 * by the tracked-pitch columns explain reads (trackedColumns.ts: --columns
 * key=Header,..., units in the keys, hand R/L, km/h, tilt as a clock from either view
 * or in degrees, spin efficiency with its gyro sign), with the movement under `seam`
 * and the orientation's own keys:
 *   axis_x, axis_y, axis_z   the seam orientation, as in the lab file
 *   seam_up_in | seam_up_cm, seam_arm_in | seam_arm_cm | seam_right_in | seam_right_cm
 *                            the observed seam movement, up and toward the arm side (or
 *                            the catcher's right), in the trade's reading (movement
 *                            from 50 ft, gravity removed) minus the spin's own Magnus
 *                            part (e.g. the residual `explain` reports), each at most
 *                            SEAM_MOVEMENT_LIMIT_IN either way
 * Spin must be above 0. Each row's movement per unit coefficient is computed once
 * (physics/calibrate/unitMovement.ts) with the air options and --window-ft.
 *
 * A bad row (a cell that is not a number, a zero axis, a speed outside 30-110 mph, a
 * CSV record that cannot be read ...) is reported with its file and line and skipped,
 * or stops the run with --on-bad-row stop. A bad header stops it always.
 */
import { BALL_RADIUS_M } from "../../geometry/ball.js";
import { DEG, M_PER_FT, M_PER_IN, M_PER_S_PER_MPH } from "../../geometry/units.js";
import type { Vec3 } from "../../geometry/vec.js";
import { isBadRecord, readCsv } from "../io/csv.js";
import { InputError } from "../io/errors.js";
import { parseDecimal } from "../io/numbers.js";
import { quote } from "../io/quote.js";
import { airState, type AirConditions, type AirState } from "../physics/air.js";
import {
  calibratableNames,
  calibrateSeamModel,
  checkFitNames,
  DEFAULT_SIGMA_M,
  DEFAULT_SIGMA_N,
  type CalibrationResult,
  type LabObservation,
  type TrackedObservation,
} from "../physics/calibrate/index.js";
import { unitSeamMovementArmSide } from "../physics/calibrate/unitMovement.js";
import { seamModel } from "../physics/seamModel/model.js";
import { seamForceNewtons } from "../physics/seamModel/newtons.js";
import type { SeamModelParameterName } from "../physics/seamModel/parameters.js";
import { SPEED_RANGE_MPH, SPIN_RANGE_RPM } from "../screening/pitch.js";
import { modelChoice, type ModelChoice } from "./request/model.js";
import { airConditions, windowStart } from "./request/settings.js";
import { oneOf, optionText, parseInRange, type Request } from "./request/values.js";
import { parseColumnsOption, readTrackedRow, resolveColumns, trackedColumnSet, type ColumnMap } from "./trackedColumns.js";

/** Largest measured force component accepted, N (a seam force is well under 1 N; this catches unit slips). */
export const FORCE_LIMIT_N = 10;
/** Largest seam movement component accepted, inches. */
export const SEAM_MOVEMENT_LIMIT_IN = 30;
/** Accepted --sigma-n and --sigma-in ranges. */
export const SIGMA_N_RANGE: readonly [number, number] = [0.0001, 10];
export const SIGMA_IN_RANGE: readonly [number, number] = [0.001, 30];

const LAB_COLUMNS = ["axis_x", "axis_y", "axis_z", "gyro_deg", "phase_deg", "speed_mph", "spin_rpm", "force_magnus_n", "force_across_n"] as const;
const LAB_OPTIONAL = ["label"];
const AXIS_EXPECTED = "a number (the three are the spin axis in the ball frame, not all zero)";
/** The tracked file's keys: the pitch's, the seam movement's and the seam orientation's. */
const TRACKED_COLUMNS = trackedColumnSet("seam", SEAM_MOVEMENT_LIMIT_IN, {
  axis_x: { quantity: "axis_x", expected: AXIS_EXPECTED },
  axis_y: { quantity: "axis_y", expected: AXIS_EXPECTED },
  axis_z: { quantity: "axis_z", expected: AXIS_EXPECTED },
});

export interface CalibrateJob {
  readonly labPath?: string;
  readonly trackedPath?: string;
  /** --columns for the tracked file: key -> the user's header. */
  readonly trackedColumns: Readonly<Record<string, string>>;
  readonly fit: readonly SeamModelParameterName[];
  readonly start: ModelChoice;
  readonly name: string;
  readonly airConditions: AirConditions;
  readonly air: AirState;
  readonly sigmaN: number;
  readonly sigmaIn: number;
  readonly windowStartM: number;
  readonly onBadRow: "skip" | "stop";
  /** The files read: inputs the outputs must not replace. */
  readonly inputs: readonly { option: string; path: string }[];
}

/** A row read, with where it came from. */
export interface LabRow {
  readonly line: number;
  readonly label: string;
  readonly observation: LabObservation;
}

export interface TrackedRow {
  readonly line: number;
  readonly label: string;
  readonly observation: TrackedObservation;
}

export interface CalibrationRows {
  readonly lab: readonly LabRow[];
  readonly tracked: readonly TrackedRow[];
  readonly skipped: number;
}

export interface CalibrateOutcome {
  readonly job: CalibrateJob;
  readonly rows: CalibrationRows;
  readonly result: CalibrationResult;
}

export function parseCalibrate(request: Request): CalibrateJob {
  const labPath = request.lab === undefined ? undefined : optionText("lab", request.lab);
  const trackedPath = request.tracked === undefined ? undefined : optionText("tracked", request.tracked);
  if (labPath === undefined && trackedPath === undefined) {
    throw new InputError(`give --lab FILE.csv (force measurements), --tracked FILE.csv (tracked pitches' seam movement) or both`);
  }
  if (labPath === "") throw new InputError(`--lab is empty; expected a CSV file`);
  if (trackedPath === "") throw new InputError(`--tracked is empty; expected a CSV file`);
  if (request.columns !== undefined && trackedPath === undefined) throw new InputError(`--columns goes with --tracked FILE.csv (it maps the tracked file's headers); the lab file's columns are fixed`);
  const trackedColumns = parseColumnsOption(request.columns, TRACKED_COLUMNS);
  const onBadRow = oneOf("on-bad-row", request["on-bad-row"] ?? "skip", ["skip", "stop"] as const);
  let fit: SeamModelParameterName[];
  if (request.fit === undefined) fit = calibratableNames();
  else {
    const text = optionText("fit", request.fit);
    const names = text.split(",").map((s) => s.trim());
    if (names.some((s) => s === "")) throw new InputError(`--fit "${text}" has an empty name; expected names separated by commas, from ${calibratableNames().join(", ")}`);
    try {
      fit = checkFitNames(names);
    } catch (err) {
      throw new InputError(`--fit: ${(err as Error).message}`);
    }
  }
  const name = request.name === undefined ? "calibrated" : optionText("name", request.name);
  if (name === "") throw new InputError(`--name is empty; expected a name for the fitted profile`);
  const start = modelChoice(request);
  const conditions = airConditions(request);
  const sigmaN = parseInRange("sigma-n", request["sigma-n"] ?? DEFAULT_SIGMA_N, SIGMA_N_RANGE[0], SIGMA_N_RANGE[1], "N");
  const sigmaIn = parseInRange("sigma-in", request["sigma-in"] ?? DEFAULT_SIGMA_M / M_PER_IN, SIGMA_IN_RANGE[0], SIGMA_IN_RANGE[1], "in");
  const inputs = [
    ...(labPath !== undefined ? [{ option: "--lab", path: labPath }] : []),
    ...(trackedPath !== undefined ? [{ option: "--tracked", path: trackedPath }] : []),
    ...(start.source !== undefined ? [{ option: "--model", path: start.source }] : []),
  ];
  return {
    ...(labPath !== undefined ? { labPath } : {}),
    ...(trackedPath !== undefined ? { trackedPath } : {}),
    trackedColumns,
    fit,
    start,
    name,
    airConditions: conditions,
    air: airState(conditions),
    sigmaN,
    sigmaIn,
    windowStartM: windowStart(request),
    onBadRow,
    inputs,
  };
}

/** Reads a cell as a finite number (InputError naming the file, line and column). */
function cellNumber(cells: Readonly<Record<string, string>>, column: string, where: string, expected: string): number {
  const text = cells[column] ?? "";
  if (text === "") throw new InputError(`${where}, column ${column}: the cell is empty; expected ${expected}`);
  return parseDecimal(text, `${where}, column ${column}:`, expected);
}

/** The seam orientation's axis, either file's: InputError for a zero vector. */
function nonZeroAxis(v: Vec3, where: string): Vec3 {
  if (!(Math.hypot(v[0], v[1], v[2]) >= 1e-12)) throw new InputError(`${where}: the axis (${v.join(", ")}) is a zero vector; expected a direction, not all zero`);
  return v;
}

function cellAxis(cells: Readonly<Record<string, string>>, where: string): Vec3 {
  const expected = "three numbers, not all zero, for the spin axis in the ball frame";
  return nonZeroAxis([cellNumber(cells, "axis_x", where, expected), cellNumber(cells, "axis_y", where, expected), cellNumber(cells, "axis_z", where, expected)], where);
}

function inRange(x: number, lo: number, hi: number, where: string, column: string, unit: string): number {
  if (!(x >= lo && x <= hi)) throw new InputError(`${where}, column ${column}: ${x} ${unit} is out of range; expected ${lo} to ${hi} ${unit}`);
  return x;
}

function labRow(cells: Readonly<Record<string, string>>, where: string, densityKgM3: number): Omit<LabRow, "line"> {
  const axis = cellAxis(cells, where);
  const gyroDeg = cellNumber(cells, "gyro_deg", where, "degrees strictly between -90 and 90");
  if (!(gyroDeg > -90 && gyroDeg < 90)) throw new InputError(`${where}, column gyro_deg: ${gyroDeg} deg is out of range; expected degrees strictly between -90 and 90`);
  const phaseText = cells.phase_deg ?? "";
  const phaseDeg = phaseText === "" ? undefined : cellNumber(cells, "phase_deg", where, "a phase in degrees, or an empty cell for a turn-averaged measurement");
  const speedMph = inRange(cellNumber(cells, "speed_mph", where, `mph from ${SPEED_RANGE_MPH[0]} to ${SPEED_RANGE_MPH[1]}`), SPEED_RANGE_MPH[0], SPEED_RANGE_MPH[1], where, "speed_mph", "mph");
  inRange(cellNumber(cells, "spin_rpm", where, `rpm from ${SPIN_RANGE_RPM[0]} to ${SPIN_RANGE_RPM[1]}`), SPIN_RANGE_RPM[0], SPIN_RANGE_RPM[1], where, "spin_rpm", "rpm");
  const forceExpected = `newtons, at most ${FORCE_LIMIT_N} either way`;
  const magnus = inRange(cellNumber(cells, "force_magnus_n", where, forceExpected), -FORCE_LIMIT_N, FORCE_LIMIT_N, where, "force_magnus_n", "N");
  const across = inRange(cellNumber(cells, "force_across_n", where, forceExpected), -FORCE_LIMIT_N, FORCE_LIMIT_N, where, "force_across_n", "N");
  return {
    label: cells.label ?? "",
    observation: {
      axisBall: axis,
      gyroRad: gyroDeg * DEG,
      ...(phaseDeg === undefined ? {} : { phaseRad: phaseDeg * DEG }),
      dynamicForceN: seamForceNewtons(1, densityKgM3, BALL_RADIUS_M, speedMph * M_PER_S_PER_MPH),
      forceAlongMagnusN: magnus,
      forceAcrossN: across,
    },
  };
}

function trackedRow(record: Readonly<Record<string, string>>, columns: ColumnMap, lineNo: number, label: string, job: CalibrateJob, model: ReturnType<typeof seamModel>): Omit<TrackedRow, "line"> {
  const { pitch, moveArmIn, moveUpIn, cells } = readTrackedRow(record, columns, lineNo, label);
  if (!(pitch.spinRadPerS > 0)) throw new InputError(`${cells.where("spin_rpm")}: 0 rpm; expected a spin above 0 (the seam force's directions follow the spin axis)`);
  const axis = nonZeroAxis([cells.number("axis_x"), cells.number("axis_y"), cells.number("axis_z")], `${label} line ${lineNo}`);
  let unitMovement;
  try {
    unitMovement = unitSeamMovementArmSide(pitch, model, { air: job.airConditions, windowStartM: job.windowStartM });
  } catch (err) {
    if (err instanceof RangeError) throw new InputError(`${label} line ${lineNo}: ${err.message}`);
    throw err;
  }
  const tag = [cells.text("pitcher"), cells.text("pitch")].filter((s) => s !== "").join(" / ");
  return { label: tag, observation: { axisBall: axis, gyroRad: pitch.gyroRad, unitMovement, seamArmSideM: moveArmIn * M_PER_IN, seamUpM: moveUpIn * M_PER_IN } };
}

/** What reading reports as it goes. */
export interface ReadEvents {
  /** A bad row skipped (one line: file, line, what is wrong). */
  skipped(message: string): void;
}

/** The lab file's header: every required column, no unknown one. */
function checkLabHeader(header: readonly string[], label: string): void {
  const known = [...LAB_COLUMNS, ...LAB_OPTIONAL];
  const missing = LAB_COLUMNS.filter((c) => !header.includes(c));
  if (missing.length) throw new InputError(`${label}: the header lacks column ${quote(missing[0])}; expected the columns ${LAB_COLUMNS.join(", ")} (and optionally ${LAB_OPTIONAL.join(", ")})`);
  const unknown = header.find((c) => !known.includes(c));
  if (unknown !== undefined) throw new InputError(`${label}: unknown column ${quote(unknown)} in the header; expected ${known.join(", ")}`);
}

/**
 * Reads a CSV's rows: `columns` checks the header (any InputError stops the run),
 * `build` reads a record; a bad record or row is skipped or stops the run. Cells
 * beyond the header are an error in the lab file (fixed columns), ignored in the
 * tracked one (an export's extra columns are ignored, as explain does).
 */
async function readRows<C, T>(
  path: string,
  option: "--lab" | "--tracked",
  onBadRow: "skip" | "stop",
  events: ReadEvents,
  columns: (header: readonly string[], label: string) => C,
  build: (cells: Readonly<Record<string, string>>, lineNo: number, label: string, columns: C) => T,
): Promise<{ rows: (T & { line: number })[]; skipped: number }> {
  const label = `${option} ${quote(path)}`;
  const reader = readCsv(path, { label, extraCells: option === "--tracked" ? "ignore" : "error" });
  let resolved: C;
  try {
    resolved = columns(await reader.header(), label);
  } catch (err) {
    reader.close();
    throw err;
  }
  const rows: (T & { line: number })[] = [];
  let skipped = 0;
  for await (const item of reader) {
    let message: string;
    if (isBadRecord(item)) message = item.error;
    else {
      try {
        rows.push({ ...build(item.cells, item.line, label, resolved), line: item.line });
        continue;
      } catch (err) {
        if (!(err instanceof InputError || err instanceof RangeError)) throw err;
        message = err.message.includes(`line ${item.line}`) ? err.message : `${label} line ${item.line}: ${err.message}`;
      }
    }
    if (onBadRow === "stop") {
      reader.close();
      throw new InputError(`${message} (stopped there: --on-bad-row stop; nothing written)`);
    }
    skipped++;
    events.skipped(message);
  }
  return { rows, skipped };
}

/** Reads the lab and tracked files (see the module header). */
export async function readCalibrationRows(job: CalibrateJob, events: ReadEvents): Promise<CalibrationRows> {
  let lab: LabRow[] = [];
  let tracked: TrackedRow[] = [];
  let skipped = 0;
  if (job.labPath !== undefined) {
    const density = job.air.densityKgM3;
    const r = await readRows(job.labPath, "--lab", job.onBadRow, events, checkLabHeader, (cells, lineNo, label) => labRow(cells, `${label} line ${lineNo}`, density));
    lab = r.rows;
    skipped += r.skipped;
  }
  if (job.trackedPath !== undefined) {
    const model = seamModel(job.start.profile);
    const r = await readRows(
      job.trackedPath,
      "--tracked",
      job.onBadRow,
      events,
      (header, label) => resolveColumns(header, job.trackedColumns, label, TRACKED_COLUMNS),
      (cells, lineNo, label, columns) => trackedRow(cells, columns, lineNo, label, job, model),
    );
    tracked = r.rows;
    skipped += r.skipped;
  }
  return { lab, tracked, skipped };
}

/**
 * Fits. InputError for too few rows (fewer than the parameters to fit, or none).
 * @param onIteration called after each iteration of the search with the rms weighted residual.
 */
export function runCalibrate(job: CalibrateJob, rows: CalibrationRows, onIteration?: (iteration: number, rmsWeighted: number) => void): CalibrateOutcome {
  const count = rows.lab.length + rows.tracked.length;
  const skipped = rows.skipped ? ` (after skipping ${rows.skipped} bad row(s))` : "";
  if (count === 0) throw new InputError(`no rows to fit${skipped}; expected at least ${job.fit.length} row(s), one per parameter to fit`);
  if (count < job.fit.length) {
    throw new InputError(`${count} row(s) to fit ${job.fit.length} parameters${skipped}; expected at least ${job.fit.length} rows, or fewer parameters with --fit`);
  }
  let result: CalibrationResult;
  try {
    result = calibrateSeamModel({
      start: job.start.profile,
      fit: job.fit,
      lab: rows.lab.map((r) => r.observation),
      tracked: rows.tracked.map((r) => r.observation),
      sigmaN: job.sigmaN,
      sigmaM: job.sigmaIn * M_PER_IN,
      name: job.name,
      ...(onIteration ? { onIteration } : {}),
    });
  } catch (err) {
    if (err instanceof RangeError) throw new InputError(err.message);
    throw err;
  }
  return { job, rows, result };
}

/** One row's numbers in the file's units: newtons (along Magnus, across) for lab rows, inches (arm side, up) for tracked ones. */
export interface CalibratedRowNumbers {
  readonly kind: "lab" | "tracked";
  readonly line: number;
  readonly label: string;
  readonly measured: readonly [number, number];
  readonly start: readonly [number, number];
  readonly fitted: readonly [number, number];
}

/** The outcome in the user's units: the one form JSON, CSV and the terminal read. */
export function calibrationNumbers(o: CalibrateOutcome) {
  const r = o.result;
  const inches = (m: number | undefined) => (m === undefined ? undefined : m / M_PER_IN);
  const L = o.rows.lab.length;
  const pair = (a: Float64Array, k: number, unit: number): [number, number] => [a[2 * k] / unit, a[2 * k + 1] / unit];
  const rows: CalibratedRowNumbers[] = [
    ...o.rows.lab.map((row, i) => ({ kind: "lab" as const, line: row.line, label: row.label, measured: pair(r.measured, i, 1), start: pair(r.predictedBefore, i, 1), fitted: pair(r.predictedAfter, i, 1) })),
    ...o.rows.tracked.map((row, k) => ({
      kind: "tracked" as const,
      line: row.line,
      label: row.label,
      measured: pair(r.measured, L + k, M_PER_IN),
      start: pair(r.predictedBefore, L + k, M_PER_IN),
      fitted: pair(r.predictedAfter, L + k, M_PER_IN),
    })),
  ];
  return {
    rmsBeforeN: r.rms.labBeforeN,
    rmsAfterN: r.rms.labAfterN,
    rmsBeforeIn: inches(r.rms.trackedBeforeM),
    rmsAfterIn: inches(r.rms.trackedAfterM),
    windowFt: o.job.windowStartM / M_PER_FT,
    rows,
  };
}
