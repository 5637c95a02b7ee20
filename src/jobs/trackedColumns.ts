/**
 * Tracked-pitch CSV columns, the one reading `explain --csv-in` and `calibrate
 * --tracked` share: our documented keys, how a user's own export is mapped onto them
 * (--columns key=Header,...), and one CSV row read into a pitch and its movement.
 *
 * Keys carry their unit in the name, so a column's unit is chosen by the key it is
 * mapped to (--columns speed_kmh=Velo reads the column "Velo" in km/h). The pitch's
 * keys, common to every command:
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
 *
 * and the movement's, under a prefix of the command's (explain: `move`, the observed
 * movement; calibrate: `seam`, the seam part of it):
 *
 *   PREFIX_up_in | PREFIX_up_cm           vertical movement (gravity removed)  one
 *   PREFIX_arm_in | PREFIX_arm_cm | PREFIX_right_in | PREFIX_right_cm
 *                   horizontal movement toward the arm side, or toward the     one
 *                   catcher's right (the field's +x)
 *
 * A command may add keys of its own (calibrate: the seam orientation's axis_x,
 * axis_y, axis_z). A key without a mapping is looked for under its own name. Columns
 * no key names are ignored. A mapped header the file lacks, a required quantity with
 * no column, two columns for one quantity in different units, an unknown key or a
 * key mapped twice is one line naming it, before anything is computed. A bad cell is
 * one line naming the file, the CSV line and the column (its header, and the key it
 * was mapped to).
 */
import { armSideSign } from "../../geometry/frames.js";
import { InputError } from "../io/errors.js";
import { parseDecimal } from "../io/numbers.js";
import { quote } from "../io/quote.js";
import { SPEED_RANGE_MPH, type Pitch } from "../screening/pitch.js";
import type { PitchEcho } from "../screening/report.js";
import { buildPitch, type RawPitch } from "./request/pitch.js";

/** km/h per mph (the international mile, 1 609.344 m, exact). */
const KMH_PER_MPH = 1.609344;
/** cm per inch (exact). */
const CM_PER_IN = 2.54;

export interface ColumnKey {
  /** The quantity; keys of one quantity are alternatives. */
  readonly quantity: string;
  /** Words for messages: "a number of mph". */
  readonly expected: string;
}

/** A command's columns: its keys, the quantities every row needs, the movement's limit. */
export interface ColumnSet {
  readonly keys: Readonly<Record<string, ColumnKey>>;
  readonly required: readonly string[];
  /** Largest movement accepted either way, inches. */
  readonly movementLimitIn: number;
}

const PITCH_KEYS: Readonly<Record<string, ColumnKey>> = {
  pitcher: { quantity: "pitcher", expected: "a name" },
  pitch: { quantity: "pitch", expected: "a pitch type" },
  hand: { quantity: "hand", expected: "right, left, R or L" },
  speed_mph: { quantity: "speed", expected: "a number of mph" },
  speed_kmh: { quantity: "speed", expected: "a number of km/h" },
  spin_rpm: { quantity: "spin", expected: "a number of rpm" },
  tilt: { quantity: "tilt", expected: "a clock reading H:MM" },
  tilt_deg: { quantity: "tilt", expected: "degrees clockwise from 12:00" },
  view: { quantity: "view", expected: "pitcher or catcher" },
  gyro_deg: { quantity: "gyro", expected: "a number of degrees" },
  efficiency_pct: { quantity: "gyro", expected: "a number of percent" },
  gyro_sign: { quantity: "gyroSign", expected: "pos or neg" },
};
/** Quantities whose alternatives may stand side by side (each row fills one). */
const PER_ROW_CHOICE = new Set(["tilt", "gyro"]);
/** Every row's pitch needs these, and a vertical and a horizontal movement. */
const PITCH_REQUIRED = ["hand", "speed", "spin", "tilt", "up", "horizontal"];

/**
 * The pitch's keys, the movement's under `prefix`, and `extra` keys (each required
 * when `extraRequired`).
 */
export function trackedColumnSet(prefix: string, movementLimitIn: number, extra: Readonly<Record<string, ColumnKey>> = {}): ColumnSet {
  const inches = "a number of inches";
  const cm = "a number of centimetres";
  const keys: Record<string, ColumnKey> = {
    ...PITCH_KEYS,
    [`${prefix}_up_in`]: { quantity: "up", expected: inches },
    [`${prefix}_up_cm`]: { quantity: "up", expected: cm },
    [`${prefix}_arm_in`]: { quantity: "horizontal", expected: inches },
    [`${prefix}_arm_cm`]: { quantity: "horizontal", expected: cm },
    [`${prefix}_right_in`]: { quantity: "horizontal", expected: inches },
    [`${prefix}_right_cm`]: { quantity: "horizontal", expected: cm },
    ...extra,
  };
  return { keys, required: [...PITCH_REQUIRED, ...Object.values(extra).map((k) => k.quantity)], movementLimitIn };
}

const keysOf = (set: ColumnSet, quantity: string) => Object.keys(set.keys).filter((k) => set.keys[k].quantity === quantity);

/** Which header column each key reads, for one command's set. */
export interface ColumnMap {
  /** key -> header name */
  readonly headerOf: Readonly<Record<string, string>>;
  readonly set: ColumnSet;
}

/** Parses --columns "key=Header,key=Header" against the set's keys (no column map: an empty one). */
export function parseColumnsOption(value: unknown, set: ColumnSet): Record<string, string> {
  if (value === undefined) return {};
  if (Array.isArray(value)) throw new InputError(`--columns was given ${value.length} times; give it once, as key=Header,key=Header`);
  const text = String(value);
  const out: Record<string, string> = {};
  for (const part of text.split(",")) {
    const eq = part.indexOf("=");
    if (eq < 0) throw new InputError(`--columns ${quote(text)}: ${quote(part)} has no "="; expected key=Header pairs separated by commas, such as speed_kmh=Velo`);
    const key = part.slice(0, eq).trim();
    const header = part.slice(eq + 1).trim();
    if (!(key in set.keys)) throw new InputError(`--columns ${quote(text)}: ${quote(key)} is not a column key; expected one of ${Object.keys(set.keys).join(", ")}`);
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
export function resolveColumns(header: readonly string[], mapped: Readonly<Record<string, string>>, label: string, set: ColumnSet): ColumnMap {
  const names = new Set(header);
  const headerOf: Record<string, string> = {};
  for (const [key, h] of Object.entries(mapped)) {
    if (!names.has(h)) throw new InputError(`${label}: the header lacks column ${quote(h)} (mapped to ${key} by --columns); expected one of its columns: ${header.join(", ")}`);
    headerOf[key] = h;
  }
  const mappedHeaders = new Set(Object.values(mapped));
  for (const key of Object.keys(set.keys)) {
    // a key's own name counts unless another key was mapped onto that column
    if (!(key in headerOf) && names.has(key) && !mappedHeaders.has(key)) headerOf[key] = key;
  }
  const quantities = new Set(Object.values(set.keys).map((k) => k.quantity));
  for (const q of quantities) {
    const present = keysOf(set, q).filter((k) => k in headerOf);
    if (present.length > 1 && !PER_ROW_CHOICE.has(q)) {
      throw new InputError(`${label}: the columns ${present.map((k) => quote(headerOf[k])).join(" and ")} both give the ${q} (as ${present.join(" and ")}); expected one of them`);
    }
    if (present.length === 0 && set.required.includes(q)) {
      const alternatives = keysOf(set, q);
      throw new InputError(
        `${label}: the header lacks column "${alternatives[0]}"${alternatives.length > 1 ? ` (or ${alternatives.slice(1).map((k) => `"${k}"`).join(", ")})` : ""}; expected it, or --columns ${alternatives[0]}=YourHeader`,
      );
    }
  }
  return { headerOf, set };
}

/** One record's cells as the set's keys read them, with messages naming the CSV line and column. */
export interface RowCells {
  /** The cell's text ("" for a key with no column). */
  text(key: string): string;
  /** The cell as a decimal number (InputError naming the place for anything else). */
  number(key: string): number;
  /** `LABEL line N, column "Header" (key)`, for messages. */
  where(key: string): string;
}

/** A row read: the pitch, its echo (normalised units), its movement (arm side, up), inches. */
export interface TrackedRow {
  readonly pitch: Pitch;
  readonly echo: PitchEcho;
  readonly moveArmIn: number;
  readonly moveUpIn: number;
  /** The record, for a command's own keys. */
  readonly cells: RowCells;
}

/** The pitch's fields (request/pitchSpec.ts) and the keys that give them. */
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
const TEXT_FIELDS = ["pitcher", "name", "hand", "view", "tilt", "gyroSign"];
const NUMBER_FIELDS = ["spinRpm", "tiltDeg", "gyroDeg", "efficiencyPct"];

/** Reads one record's cells into a row; InputError (with the line and column) for a bad value. */
export function readTrackedRow(record: Readonly<Record<string, string>>, columns: ColumnMap, lineNo: number, label: string): TrackedRow {
  const { headerOf: h, set } = columns;
  const colName = (key: string) => `column ${quote(h[key] ?? key)}${h[key] !== undefined && h[key] !== key ? ` (${key})` : ""}`;
  const cells: RowCells = {
    text: (key) => (h[key] === undefined ? "" : (record[h[key]] ?? "")),
    number: (key) => parseDecimal(cells.text(key), `${cells.where(key)}:`, set.keys[key].expected),
    where: (key) => `${label} line ${lineNo}, ${colName(key)}`,
  };
  const pick = (quantity: string): string | undefined => keysOf(set, quantity).find((k) => h[k] !== undefined && cells.text(k) !== "");
  for (const q of set.required) {
    if (pick(q) === undefined) {
      const key = keysOf(set, q).find((k) => h[k] !== undefined)!;
      throw new InputError(`${cells.where(key)}: the cell is empty; expected ${set.keys[key].expected}`);
    }
  }
  const raw: RawPitch = {};
  for (const field of TEXT_FIELDS) if (cells.text(FIELD_KEY[field]) !== "") raw[field] = cells.text(FIELD_KEY[field]);
  for (const field of NUMBER_FIELDS) if (cells.text(FIELD_KEY[field]) !== "") raw[field] = cells.number(FIELD_KEY[field]);
  const speedKey = pick("speed")!;
  const speed = cells.number(speedKey);
  const kmh = speedKey === "speed_kmh";
  const speedMph = kmh ? speed / KMH_PER_MPH : speed;
  raw.speedMph = speedMph;
  // the pitch's own checks, with messages naming this row's columns
  const keyOfField = (field: string) => (field === "speedMph" ? speedKey : (FIELD_KEY[field] ?? field));
  if (kmh && !(speedMph >= SPEED_RANGE_MPH[0] && speedMph <= SPEED_RANGE_MPH[1])) {
    const [lo, hi] = SPEED_RANGE_MPH.map((mph) => Math.round(mph * KMH_PER_MPH * 10) / 10);
    throw new InputError(`${cells.where(speedKey)}: ${speed} km/h is out of range; expected ${lo} to ${hi} km/h`);
  }
  const built = buildPitch(raw, (field) => cells.where(keyOfField(field)), (field) => colName(keyOfField(field)));
  const inches = (key: string) => {
    const x = cells.number(key);
    const cm = key.endsWith("_cm");
    const xin = cm ? x / CM_PER_IN : x;
    if (!(Math.abs(xin) <= set.movementLimitIn)) {
      throw new InputError(`${cells.where(key)}: ${x} ${cm ? "cm" : "in"} is out of range; expected at most ${cm ? set.movementLimitIn * CM_PER_IN : set.movementLimitIn} ${cm ? "cm" : "in"} either way`);
    }
    return xin;
  };
  const horKey = pick("horizontal")!;
  const hor = inches(horKey);
  // toward the catcher's right is the field's +x; the arm side's sign in x depends on the hand
  const moveArmIn = horKey.includes("_right_") ? armSideSign(built.pitch.hand) * hor : hor;
  return { pitch: built.pitch, echo: built.echo, moveArmIn, moveUpIn: inches(pick("up")!), cells };
}
