/**
 * explain's batch columns: our documented keys, how a user's own export is mapped
 * onto them (--columns key=Header,...), and one CSV row read into a pitch and its
 * observed movement.
 *
 * Keys carry their unit in the name, so a column's unit is chosen by the key it is
 * mapped to (--columns speed_kmh=Velo reads the column "Velo" in km/h):
 *
 *   key             what                                                     needed
 *   pitcher, pitch  labels (the pitch type is `pitch`)                       no
 *   hand            right, left, R or L                                      yes
 *   speed_mph | speed_kmh   release speed                                    one
 *   spin_rpm        spin rate                                                yes
 *   tilt | tilt_deg clock reading H:MM, or degrees clockwise from 12:00      one per row
 *   view            pitcher or catcher: the view tilt is read in              no (pitcher)
 *   gyro_deg | efficiency_pct   signed gyro, or spin efficiency              no (gyro 0)
 *   gyro_sign       pos or neg: the gyro's sign with efficiency_pct          with efficiency < 100
 *   move_up_in | move_up_cm     observed vertical movement (gravity removed) one
 *   move_arm_in | move_arm_cm | move_right_in | move_right_cm
 *                   observed horizontal movement toward the arm side, or     one
 *                   toward the catcher's right (the field's +x)
 *
 * A key without a mapping is looked for under its own name. Columns no key names are
 * ignored. A mapped header the file lacks, a required quantity with no column, two
 * columns for one quantity in different units, an unknown key or a key mapped twice
 * is one line naming it, before anything is computed.
 */
import { M_PER_IN } from "../../geometry/units.js";
import { InputError } from "../io/errors.js";
import { parseDecimal } from "../io/numbers.js";
import { quote } from "../io/quote.js";
import type { Pitch } from "../screening/pitch.js";
import type { PitchEcho } from "../screening/report.js";
import { buildPitch, type RawPitch } from "./request/pitch.js";

const KMH_PER_MPH = 1.609344;
const CM_PER_IN = 2.54;
/** Largest observed movement accepted either way, inches. */
export const MOVEMENT_LIMIT_IN = 60;

interface KeyInfo {
  /** The quantity; keys of one quantity are alternatives. */
  readonly quantity: string;
  /** Words for messages: "a number of mph". */
  readonly expected: string;
  readonly numeric: boolean;
}

export const COLUMN_KEYS: Readonly<Record<string, KeyInfo>> = {
  pitcher: { quantity: "pitcher", expected: "a name", numeric: false },
  pitch: { quantity: "pitch", expected: "a pitch type", numeric: false },
  hand: { quantity: "hand", expected: "right, left, R or L", numeric: false },
  speed_mph: { quantity: "speed", expected: "a number of mph", numeric: true },
  speed_kmh: { quantity: "speed", expected: "a number of km/h", numeric: true },
  spin_rpm: { quantity: "spin", expected: "a number of rpm", numeric: true },
  tilt: { quantity: "tilt", expected: "a clock reading H:MM", numeric: false },
  tilt_deg: { quantity: "tilt", expected: "degrees clockwise from 12:00", numeric: true },
  view: { quantity: "view", expected: "pitcher or catcher", numeric: false },
  gyro_deg: { quantity: "gyro", expected: "a number of degrees", numeric: true },
  efficiency_pct: { quantity: "gyro", expected: "a number of percent", numeric: true },
  gyro_sign: { quantity: "gyroSign", expected: "pos or neg", numeric: false },
  move_up_in: { quantity: "up", expected: "a number of inches", numeric: true },
  move_up_cm: { quantity: "up", expected: "a number of centimetres", numeric: true },
  move_arm_in: { quantity: "horizontal", expected: "a number of inches", numeric: true },
  move_arm_cm: { quantity: "horizontal", expected: "a number of centimetres", numeric: true },
  move_right_in: { quantity: "horizontal", expected: "a number of inches", numeric: true },
  move_right_cm: { quantity: "horizontal", expected: "a number of centimetres", numeric: true },
};

/** Quantities every row needs, and the keys that give each. */
const REQUIRED: readonly string[] = ["hand", "speed", "spin", "tilt", "up", "horizontal"];
/** Quantities whose alternatives may stand side by side (each row fills one). */
const PER_ROW_CHOICE = new Set(["tilt", "gyro"]);

const keysOf = (quantity: string) => Object.keys(COLUMN_KEYS).filter((k) => COLUMN_KEYS[k].quantity === quantity);

/** Which header column each key reads. */
export interface ColumnMap {
  /** key -> header name */
  readonly headerOf: Readonly<Record<string, string>>;
}

/** Parses --columns "key=Header,key=Header" (no column map: an empty one). */
export function parseColumnsOption(value: unknown): Record<string, string> {
  if (value === undefined) return {};
  if (Array.isArray(value)) throw new InputError(`--columns was given ${value.length} times; give it once, as key=Header,key=Header`);
  const text = String(value);
  const out: Record<string, string> = {};
  const parts = text.split(",");
  for (const part of parts) {
    const eq = part.indexOf("=");
    if (eq < 0) throw new InputError(`--columns ${quote(text)}: ${quote(part)} has no "="; expected key=Header pairs separated by commas, such as speed_kmh=Velo`);
    const key = part.slice(0, eq).trim();
    const header = part.slice(eq + 1).trim();
    if (!(key in COLUMN_KEYS)) throw new InputError(`--columns ${quote(text)}: ${quote(key)} is not a column key; expected one of ${Object.keys(COLUMN_KEYS).join(", ")}`);
    if (header === "") throw new InputError(`--columns ${quote(text)}: the key ${key} has no header name; expected key=Header`);
    if (key in out) throw new InputError(`--columns ${quote(text)}: the key ${key} is mapped twice; expected each key once`);
    out[key] = header;
  }
  return out;
}

/**
 * Resolves the keys against the file's header (see the module header).
 * @throws InputError naming a missing column, a missing quantity or two units for one.
 */
export function resolveColumns(header: readonly string[], mapped: Readonly<Record<string, string>>, label: string): ColumnMap {
  const names = new Set(header);
  const headerOf: Record<string, string> = {};
  for (const [key, h] of Object.entries(mapped)) {
    if (!names.has(h)) throw new InputError(`${label}: the header lacks column ${quote(h)} (mapped to ${key} by --columns); expected one of its columns: ${header.join(", ")}`);
    headerOf[key] = h;
  }
  const mappedHeaders = new Set(Object.values(mapped));
  for (const key of Object.keys(COLUMN_KEYS)) {
    // a key's own name counts unless another key was mapped onto that column
    if (!(key in headerOf) && names.has(key) && !mappedHeaders.has(key)) headerOf[key] = key;
  }
  const quantities = new Set(Object.values(COLUMN_KEYS).map((k) => k.quantity));
  for (const q of quantities) {
    const present = keysOf(q).filter((k) => k in headerOf);
    if (present.length > 1 && !PER_ROW_CHOICE.has(q)) {
      throw new InputError(`${label}: the columns ${present.map((k) => quote(headerOf[k])).join(" and ")} both give the ${q} (as ${present.join(" and ")}); expected one of them`);
    }
    if (present.length === 0 && REQUIRED.includes(q)) {
      const alternatives = keysOf(q);
      throw new InputError(
        `${label}: the header lacks column "${alternatives[0]}"${alternatives.length > 1 ? ` (or ${alternatives.slice(1).map((k) => `"${k}"`).join(", ")})` : ""}; expected it, or --columns ${alternatives[0]}=YourHeader`,
      );
    }
  }
  return { headerOf };
}

/** One row: the pitch, its echo (normalised units) and the observed movement on the batch's basis. */
export interface BatchRow {
  readonly pitch: Pitch;
  readonly echo: PitchEcho;
  readonly moveArmIn: number;
  readonly moveUpIn: number;
}

const FIELD_KEY: Record<string, string> = {
  pitcher: "pitcher",
  name: "pitch",
  hand: "hand",
  speedMph: "speed_mph",
  spinRpm: "spin_rpm",
  tilt: "tilt",
  tiltDeg: "tilt_deg",
  view: "view",
  gyroDeg: "gyro_deg",
  efficiencyPct: "efficiency_pct",
  gyroSign: "gyro_sign",
};

/** Reads one record's cells into a row; InputError (with the line and column) for a bad value. */
export function readRow(cells: Readonly<Record<string, string>>, columns: ColumnMap, lineNo: number, label: string): BatchRow {
  const h = columns.headerOf;
  const colName = (key: string) => `column ${quote(h[key] ?? key)}${h[key] !== undefined && h[key] !== key ? ` (${key})` : ""}`;
  const where = (key: string) => `${label} line ${lineNo}, ${colName(key)}`;
  const cell = (key: string): string => (h[key] === undefined ? "" : (cells[h[key]] ?? ""));
  const pick = (quantity: string): string | undefined => keysOf(quantity).find((k) => h[k] !== undefined && cell(k) !== "");
  const number = (key: string) => parseDecimal(cell(key), `${where(key)}:`, COLUMN_KEYS[key].expected);
  for (const q of REQUIRED) {
    if (pick(q) === undefined) {
      const key = keysOf(q).find((k) => h[k] !== undefined)!;
      throw new InputError(`${where(key)}: the cell is empty; expected ${COLUMN_KEYS[key].expected}`);
    }
  }
  const raw: RawPitch = {};
  for (const key of ["pitcher", "pitch", "hand", "view", "tilt", "gyro_sign"]) if (cell(key) !== "") raw[key === "pitch" ? "name" : key === "gyro_sign" ? "gyroSign" : key] = cell(key);
  const speedKey = pick("speed")!;
  const speed = number(speedKey);
  raw.speedMph = speedKey === "speed_kmh" ? speed / KMH_PER_MPH : speed;
  raw.spinRpm = number("spin_rpm");
  if (cell("tilt_deg") !== "") raw.tiltDeg = number("tilt_deg");
  if (cell("gyro_deg") !== "") raw.gyroDeg = number("gyro_deg");
  if (cell("efficiency_pct") !== "") raw.efficiencyPct = number("efficiency_pct");
  // the pitch's own checks, with messages naming this row's columns
  const keyOfField = (field: string) => (field === "speedMph" ? speedKey : FIELD_KEY[field] ?? field);
  let built;
  try {
    built = buildPitch(raw, (field) => where(keyOfField(field)), (field) => colName(keyOfField(field)));
  } catch (err) {
    if (speedKey === "speed_kmh" && err instanceof InputError && /speedMph .* is outside/.test(err.message)) {
      throw new InputError(
        `${where(speedKey)}: ${speed} km/h is out of range; expected ${Math.round(30 * KMH_PER_MPH * 10) / 10} to ${Math.round(110 * KMH_PER_MPH * 10) / 10} km/h`,
      );
    }
    throw err;
  }
  const inches = (key: string) => {
    const x = number(key);
    const xin = key.endsWith("_cm") ? x / CM_PER_IN : x;
    if (!(Math.abs(xin) <= MOVEMENT_LIMIT_IN)) {
      const unit = key.endsWith("_cm") ? "cm" : "in";
      const limit = key.endsWith("_cm") ? MOVEMENT_LIMIT_IN * CM_PER_IN : MOVEMENT_LIMIT_IN;
      throw new InputError(`${where(key)}: ${x} ${unit} is out of range; expected at most ${limit} ${unit} either way`);
    }
    return xin;
  };
  const upKey = pick("up")!;
  const horKey = pick("horizontal")!;
  const moveUpIn = inches(upKey);
  const hor = inches(horKey);
  // toward the catcher's right is +x; the arm side is -x for a right-hander, +x for a left-hander
  const moveArmIn = horKey.startsWith("move_right") ? (built.pitch.hand === "right" ? -hor : hor) : hor;
  return { pitch: built.pitch, echo: built.echo, moveArmIn, moveUpIn };
}

/** Observed movement, m, from inches. */
export const metres = (inches: number) => inches * M_PER_IN;
