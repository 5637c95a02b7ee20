/**
 * `seam-atlas explain`: a tracked pitch's movement against what its spin predicts,
 * and the seam orientations that would account for the rest; one pitch from flags
 * or a CSV of pitches streamed through in bounded memory.
 *
 * Batch input (CSV, header required, columns by name, units in the names):
 *   pitcher, pitch (optional labels), hand (right|left), speed_mph, spin_rpm,
 *   tilt (H:MM), view (pitcher|catcher, default pitcher), gyro_deg or efficiency_pct
 *   (default gyro 0), move_arm_in, move_up_in (observed movement with gravity
 *   removed: inches toward the arm side, and up).
 * Output: CSV (one row per pitch; columns in EXPLAIN_COLUMNS) or JSON (a list),
 * chosen by --format or the output file's extension.
 */
import { createReadStream, createWriteStream, existsSync, readFileSync, renameSync, rmSync, statSync } from "node:fs";
import { basename, dirname, join } from "node:path";
import { createInterface } from "node:readline";
import type { Argv } from "yargs";
import { formatLatLon, vectorToLatLon } from "../../geometry/ballCoords.js";
import { findLandmarks, nearestLandmark } from "../../geometry/landmarks.js";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { DEG } from "../../geometry/units.js";
import { DEFAULT_EXPLAIN_GRID_DEG, DEFAULT_EXPLAIN_TOP, Explainer, type Explanation } from "../physics/explain.js";
import { M_PER_IN } from "../../geometry/units.js";
import { fixed, formatMovementIn } from "../render/numbers.js";
import type { Pitch } from "../screening/pitch.js";
import { TOOL_NAME, TOOL_VERSION } from "../version.js";
import { csvRow, parseCsvLine } from "./csv.js";
import { InputError } from "./errors.js";
import { parseAir, withAirOptions } from "./flight.js";
import { parseInteger, parseNumber, assertOneOf } from "./parse.js";
import { buildPitch, type RawPitch } from "./pitchInput.js";
import { pitchesFromArgs, withPitchOptions } from "./screen.js";
import { ensureFolder, writeAtomic } from "./writeAtomic.js";

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

export function registerExplain(y: Argv): Argv {
  return y.command(
    "explain",
    "compare a tracked pitch's movement with what its spin predicts and find the seam orientations that would account for the rest (one pitch, or a CSV in batch)",
    (c) =>
      withAirOptions(
        withPitchOptions(c)
          .option("move-arm", { type: "string", describe: "observed movement toward the arm side, inches (gravity removed)", requiresArg: true })
          .option("move-up", { type: "string", describe: "observed movement up, inches (gravity removed)", requiresArg: true })
          .option("csv-in", { type: "string", describe: "a CSV of tracked pitches (columns: see README)", requiresArg: true })
          .option("out", { type: "string", describe: "where the batch results go (.csv or .json); for one pitch, also write its JSON here", requiresArg: true })
          .option("format", { type: "string", describe: "csv or json for the batch output [default: from --out's extension]", requiresArg: true })
          .option("on-bad-row", { type: "string", default: "skip", describe: "skip: report a bad row's line and go on; stop: stop there (rows already done are kept)", requiresArg: true })
          .option("grid", { type: "string", default: String(DEFAULT_EXPLAIN_GRID_DEG), describe: "spacing of the orientations tried on the ball, deg (1 to 15)", requiresArg: true })
          .option("top", { type: "string", default: String(DEFAULT_EXPLAIN_TOP), describe: "how many matching orientations to report (1 to 20)", requiresArg: true })
          .option("json", { type: "boolean", default: false, describe: "print JSON (one pitch)" })
          .example("$0 explain --hand right --speed 92 --spin 2150 --tilt 1:45 --gyro 10 --move-arm 17 --move-up 12", "one tracked sinker")
          .example("$0 explain --csv-in session.csv --out out/session-explained.csv", "a whole session"),
      ),
    (argv) => runExplain(argv as unknown as Record<string, unknown>),
  );
}

function explainerFrom(argv: Record<string, unknown>): { explainer: Explainer; top: number } {
  const grid = parseNumber("grid", argv.grid, "degrees from 1 to 15");
  if (!(grid >= 1 && grid <= 15)) throw new InputError(`--grid ${grid} deg is out of range; expected 1 to 15 deg`);
  const top = parseInteger("top", argv.top, "a whole number from 1 to 20");
  if (!(top >= 1 && top <= 20)) throw new InputError(`--top ${top} is out of range; expected 1 to 20`);
  return { explainer: new Explainer({ gridSpacingRad: grid * DEG, top, air: parseAir(argv) }), top };
}

function matchesJson(e: Explanation) {
  const landmarks = findLandmarks(DEFAULT_SEAM_SHAPE);
  return e.matches.map((m, i) => {
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
  });
}

function explanationJson(e: Explanation) {
  return {
    magnus: { armSideIn: IN(e.magnusArmSideM), upIn: IN(e.magnusUpM) },
    residual: { armSideIn: IN(e.residualArmSideM), upIn: IN(e.residualUpM) },
    seamPerUnitCoefficient: {
      alongAxis: { armSideIn: IN(e.unitA.armSideM), upIn: IN(e.unitA.upM) },
      alongMagnus: { armSideIn: IN(e.unitM.armSideM), upIn: IN(e.unitM.upM) },
    },
    matches: matchesJson(e),
  };
}

async function runExplain(argv: Record<string, unknown>): Promise<void> {
  const onBad = assertOneOf("on-bad-row", argv["on-bad-row"], ["skip", "stop"] as const);
  if (argv["csv-in"] !== undefined) {
    if (typeof argv.out !== "string") throw new InputError(`--csv-in needs --out FILE (.csv or .json) for the results`);
    const format = argv.format !== undefined ? assertOneOf("format", argv.format, ["csv", "json"] as const) : argv.out.endsWith(".json") ? "json" : argv.out.endsWith(".csv") ? "csv" : undefined;
    if (!format) throw new InputError(`--out ${argv.out}: give a .csv or .json file, or --format csv|json`);
    const { explainer, top } = explainerFrom(argv);
    return batch(String(argv["csv-in"]), argv.out, format, onBad, explainer, top);
  }
  if (argv["move-arm"] === undefined || argv["move-up"] === undefined) {
    throw new InputError(`--move-arm and --move-up (observed movement, inches) are needed, or --csv-in FILE for a batch`);
  }
  const { pitches } = pitchesFromArgs(argv);
  if (pitches.length !== 1) throw new InputError(`explain takes one pitch; the file has ${pitches.length} (choose one with --pitch-name, or use --csv-in)`);
  const moveArm = parseNumber("move-arm", argv["move-arm"], "inches");
  const moveUp = parseNumber("move-up", argv["move-up"], "inches");
  if (!(Math.abs(moveArm) <= 60 && Math.abs(moveUp) <= 60)) throw new InputError(`observed movement ${moveArm}, ${moveUp} in is out of range; expected at most 60 in each way`);
  const { explainer } = explainerFrom(argv);
  const { pitch, echo } = pitches[0];
  const e = explainer.explain({ pitch, observedArmSideM: moveArm * M_PER_IN, observedUpM: moveUp * M_PER_IN });
  const doc = { tool: TOOL_NAME, version: TOOL_VERSION, command: "explain", input: { pitch: echo, moveArmIn: moveArm, moveUpIn: moveUp }, ...explanationJson(e) };
  const json = JSON.stringify(doc, null, 2) + "\n";
  if (typeof argv.out === "string") writeAtomic(argv.out, json);
  if (argv.json) {
    process.stdout.write(json);
    return;
  }
  const lines = [
    `  observed       ${formatMovementIn(moveArm)} in arm side, ${formatMovementIn(moveUp)} in up (gravity removed)`,
    `  spin predicts  ${formatMovementIn(doc.magnus.armSideIn)} in arm side, ${formatMovementIn(doc.magnus.upIn)} in up (Magnus)`,
    `  left over      ${formatMovementIn(doc.residual.armSideIn)} in arm side, ${formatMovementIn(doc.residual.upIn)} in up`,
    `  seam orientations that would give it (best first):`,
    ...doc.matches.map(
      (m) =>
        `    #${m.rank}  ${m.latLon.padEnd(14)} near ${m.landmark.name} (${fixed(m.landmark.angleDeg, 0)} deg): seam ${formatMovementIn(m.seam.armSideIn)} in arm side, ${formatMovementIn(m.seam.upIn)} in up; misses by ${fixed(m.fitErrorIn, 2)} in`,
    ),
  ];
  process.stdout.write(lines.join("\n") + "\n");
}

export const EXPLAIN_COLUMNS = (top: number) => [
  "line", "pitcher", "pitch", "magnus_arm_in", "magnus_up_in", "residual_arm_in", "residual_up_in",
  ...Array.from({ length: top }, (_, i) => [`match${i + 1}_lat_deg`, `match${i + 1}_lon_deg`, `match${i + 1}_landmark`, `match${i + 1}_seam_arm_in`, `match${i + 1}_seam_up_in`, `match${i + 1}_fit_error_in`]).flat(),
];

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
  if (!Number.isFinite(moveArmIn) || Math.abs(moveArmIn) > 60) throw new InputError(`${where("move_arm_in")}: "${get("move_arm_in")}" must be a number of inches, at most 60 either way`);
  if (!Number.isFinite(moveUpIn) || Math.abs(moveUpIn) > 60) throw new InputError(`${where("move_up_in")}: "${get("move_up_in")}" must be a number of inches, at most 60 either way`);
  return { pitch, moveArmIn, moveUpIn, label: [get("pitcher"), get("pitch")] };
}

function countLines(file: string): number {
  // one quick pass for the progress bar; files are read again, streamed, below
  const size = statSync(file).size;
  if (size > 512 * 1024 * 1024) return 0;
  let n = 0;
  const buf = readFileSync(file);
  for (let i = 0; i < buf.length; i++) if (buf[i] === 10) n++;
  return n;
}

/** Streams the batch: one row in, one row out; the output is renamed into place at the end. */
async function batch(file: string, out: string, format: "csv" | "json", onBad: "skip" | "stop", explainer: Explainer, top: number): Promise<void> {
  if (!existsSync(file)) throw new InputError(`--csv-in ${file}: no such file`);
  const total = Math.max(0, countLines(file) - 1);
  ensureFolder(dirname(out));
  const tmp = join(dirname(out), `.${basename(out)}.${process.pid}.tmp`);
  const sink = createWriteStream(tmp);
  const write = (s: string) => new Promise<void>((resolve) => (sink.write(s) ? resolve() : sink.once("drain", () => resolve())));
  const finish = () => new Promise<void>((resolve, reject) => sink.end((err?: Error | null) => (err ? reject(err) : resolve())));
  const tty = process.stderr.isTTY === true;
  const t0 = Date.now();
  let header: string[] | undefined;
  let lineNo = 0;
  let done = 0;
  let skipped = 0;
  let stopError: InputError | undefined;
  const rl = createInterface({ input: createReadStream(file, "utf8"), crlfDelay: Infinity });
  try {
    if (format === "json") await write(`{"tool":"${TOOL_NAME}","version":"${TOOL_VERSION}","command":"explain","rows":[\n`);
    for await (const line of rl) {
      lineNo++;
      if (line.trim() === "") continue;
      if (!header) {
        header = parseCsvLine(line);
        const missing = REQUIRED.filter((c) => !header!.includes(c));
        const unknown = header.filter((c) => !INPUT_COLUMNS.includes(c));
        if (missing.length) throw new InputError(`${file} line ${lineNo}: the header lacks column "${missing[0]}"; expected ${INPUT_COLUMNS.join(", ")}`);
        if (unknown.length) throw new InputError(`${file} line ${lineNo}: unknown column "${unknown[0]}"; expected ${INPUT_COLUMNS.join(", ")}`);
        if (format === "csv") await write(csvRow(EXPLAIN_COLUMNS(top)) + "\n");
        continue;
      }
      let row;
      try {
        row = rowPitch(header, parseCsvLine(line), lineNo, file);
      } catch (err) {
        const e = err instanceof InputError || err instanceof RangeError ? new InputError(err.message.includes(`line ${lineNo}`) ? err.message : `${file} line ${lineNo}: ${err.message}`) : err;
        if (onBad === "stop" || !(e instanceof InputError)) {
          stopError = e as InputError;
          break;
        }
        skipped++;
        process.stderr.write(`${tty ? "\r\x1b[K" : ""}seam-atlas: skipped ${e.message}\n`);
        continue;
      }
      const e = explainer.explain({ pitch: row.pitch, observedArmSideM: row.moveArmIn * M_PER_IN, observedUpM: row.moveUpIn * M_PER_IN });
      const j = explanationJson(e);
      if (format === "csv") {
        await write(
          csvRow([
            lineNo, row.label[0], row.label[1], j.magnus.armSideIn, j.magnus.upIn, j.residual.armSideIn, j.residual.upIn,
            ...j.matches.flatMap((m) => {
              const ll = vectorToLatLon(m.axis);
              return [ll.latDeg, ll.lonDeg, m.landmark.name, m.seam.armSideIn, m.seam.upIn, m.fitErrorIn];
            }),
          ]) + "\n",
        );
      } else {
        await write(`${done > 0 ? ",\n" : ""}${JSON.stringify({ line: lineNo, pitcher: row.label[0], pitch: row.label[1], moveArmIn: row.moveArmIn, moveUpIn: row.moveUpIn, ...j })}`);
      }
      done++;
      if (tty && done % 50 === 0) {
        const rate = done / Math.max(0.001, (Date.now() - t0) / 1000);
        const frac = total ? Math.min(1, done / total) : 0;
        const bar = "#".repeat(Math.round(30 * frac)).padEnd(30, ".");
        process.stderr.write(`\r  [${bar}] ${done}${total ? `/${total}` : ""} rows, ${Math.round(rate)} rows/s`);
      }
    }
    if (!header && !stopError) throw new InputError(`${file}: no header line; expected columns ${INPUT_COLUMNS.join(", ")}`);
    if (format === "json") await write(`\n]}\n`);
    await finish();
    renameSync(tmp, out);
  } catch (err) {
    sink.destroy();
    rmSync(tmp, { force: true });
    throw err;
  } finally {
    rl.close();
  }
  if (tty) process.stderr.write("\r\x1b[K");
  const rate = done / Math.max(0.001, (Date.now() - t0) / 1000);
  if (stopError) {
    throw new InputError(`stopped at ${stopError.message.replace(/^seam-atlas: /, "")} (${done} row(s) before it written to ${out})`);
  }
  process.stdout.write(`explained ${done} pitch(es) in ${((Date.now() - t0) / 1000).toFixed(1)} s (${Math.round(rate)} rows/s)${skipped ? `, skipped ${skipped} bad row(s)` : ""}; wrote ${out}\n`);
}
