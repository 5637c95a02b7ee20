/**
 * A pitch from its fields as people type them (the flags, a pitch file's object, a
 * CSV row, the workbench page's form), checked field by field and converted once to
 * SI and radians. Pure: no file is read here (request/pitch.ts reads pitch files), so
 * the page's worker builds a pitch by the very code the command line uses.
 *
 * Pitch file (JSON, our format): either one pitch
 *   { "name": "sinker", "pitcher": "Iris Talvela", "hand": "right", "speedMph": 92,
 *     "spinRpm": 2150, "tilt": "1:45", "view": "pitcher", "gyroDeg": 10, "want": "arm" }
 * or a staff
 *   { "team": "...", "pitchers": [ { "name": "Iris Talvela", "hand": "right",
 *       "pitches": [ { "name": "sinker", "speedMph": 92, ... } ] } ] }
 * where each pitch takes the pitcher's name and hand. `view` defaults to "pitcher",
 * `want` to "any", `gyroDeg` to 0.
 *
 * Spin direction as trackers give it, in every command, pitch file and CSV row:
 *   - tilt: a clock reading "H:MM" (`tilt`, `--tilt`), or degrees (`tiltDeg`,
 *     `--tilt-deg`) in our one convention: degrees clockwise from 12:00 as seen from
 *     the view given, 0 <= deg < 360 (0 = 12:00, pure backspin; 90 = 3:00; 180 = 6:00);
 *     one degree is two minutes of clock. Exactly one of the two.
 *   - hand: right, left, R or L (any case); echoed as right or left.
 *   - gyro: `gyroDeg` carries its sign (geometry/frames.ts); spin efficiency
 *     (`efficiencyPct`) has none, so below 100 % it needs `gyroSign` "pos" or "neg"
 *     (flags: --gyro-sign): we never guess the sign. Every echo gives the signed gyroDeg.
 */
import { gyroFromEfficiency } from "../../../geometry/frames.js";
import { angleToClock, clockToAngle, formatClock, parseClock } from "../../../geometry/clock.js";
import { DEG, M_PER_S_PER_MPH, RAD_PER_S_PER_RPM } from "../../../geometry/units.js";
import { assertPitch, SPEED_RANGE_MPH, SPIN_RANGE_RPM, VIEWS, WANTS, type Pitch } from "../../screening/pitch.js";
import type { PitchEcho } from "../../screening/report.js";
import { InputError } from "../../io/errors.js";
import { quote } from "../../io/quote.js";
import { parseNumber } from "./values.js";

/** A pitch with the numbers as the user gave them (for echoing). */
export interface PitchInput {
  readonly pitch: Pitch;
  readonly echo: PitchEcho;
}

/** How a pitch is named for --pitch-name and in messages: "PITCHER/NAME", or "NAME" with no pitcher. */
export function pitchPath(echo: { readonly pitcher: string; readonly name: string }): string {
  return echo.pitcher ? `${echo.pitcher}/${echo.name}` : echo.name;
}

const PITCH_FIELDS = ["name", "pitcher", "hand", "speedMph", "spinRpm", "tilt", "tiltDeg", "view", "gyroDeg", "efficiencyPct", "gyroSign", "want"];
/** Hand words accepted (any case) and what each means. */
const HAND_WORDS: Record<string, Pitch["hand"]> = { right: "right", left: "left", r: "right", l: "left" };
/** Gyro-sign words accepted (any case). */
const GYRO_SIGN_WORDS: Record<string, 1 | -1> = { pos: 1, neg: -1, "+": 1, "-": -1 };
/** Tilt in degrees: 0 <= deg < TILT_DEG_MAX. */
export const TILT_DEG_MAX = 360;
const OTHER_UNITS: Record<string, string> = {
  speed: "speedMph (mph)",
  speedKph: "speedMph (mph)",
  speedKmh: "speedMph (mph)",
  speedMps: "speedMph (mph)",
  speedMPerS: "speedMph (mph)",
  spin: "spinRpm (rpm)",
  spinRps: "spinRpm (rpm)",
  spinRadPerS: "spinRpm (rpm)",
  gyro: "gyroDeg (degrees)",
  gyroRad: "gyroDeg (degrees)",
  efficiency: "efficiencyPct (percent)",
  tiltRad: "tilt (a clock reading such as \"1:45\") or tiltDeg (degrees clockwise from 12:00)",
};

export interface RawPitch {
  [key: string]: unknown;
}

/**
 * Builds and checks one pitch; `where(field)` names the field's place for messages,
 * `named(field)` how the user writes the field (a flag, a CSV column; default the
 * pitch file's key).
 */
export function buildPitch(raw: RawPitch, where: (field: string) => string, named: (field: string) => string = (f) => `"${f}"`): PitchInput {
  for (const key of Object.keys(raw)) {
    if (PITCH_FIELDS.includes(key)) continue;
    if (OTHER_UNITS[key]) throw new InputError(`${where(key)}: field "${key}" is not read; give ${OTHER_UNITS[key]}`);
    throw new InputError(`${where(key)}: unknown field "${key}"; expected ${PITCH_FIELDS.join(", ")}`);
  }
  // "--speed -92 is ..." for a flag; in a file or a CSV its place names the field: 'p.json line 4 (speedMph): 200 is ...', 'line 3, column "speed_mph": 200 is ...'
  const bad = (field: string, rest: string) => new InputError(where(field) === named(field) ? `${named(field)} ${rest}` : `${where(field)}: ${rest}`);
  const text = (field: string, fallback?: string): string => {
    const v = raw[field];
    if (v === undefined) {
      if (fallback !== undefined) return fallback;
      throw new InputError(`${where(field)}: field "${field}" is missing`);
    }
    if (typeof v !== "string") throw new InputError(`${where(field)}: "${field}" must be text, got ${JSON.stringify(v)}`);
    // invisible, and no reading or name holds one: it came along from another file
    if (v.includes("\ufeff")) throw new InputError(`${where(field)}: "${field}" ${quote(v)} holds a byte-order mark (U+FEFF, invisible); expected the text without it`);
    return v;
  };
  const num = (field: string, unit: string, fallback?: number): number => {
    const v = raw[field];
    if (v === undefined) {
      if (fallback !== undefined) return fallback;
      throw new InputError(`${where(field)}: field "${field}" is missing (a number of ${unit})`);
    }
    if (typeof v !== "number" || !Number.isFinite(v)) throw new InputError(`${where(field)}: "${field}" must be a number of ${unit}, got ${JSON.stringify(v)}`);
    return v;
  };
  const oneOf = (field: string, allowed: readonly string[], fallback?: string): string => {
    const v = text(field, fallback);
    if (!allowed.includes(v)) throw bad(field, `${quote(v)} is not one of ${allowed.join(", ")}`);
    return v;
  };
  const speedMph = num("speedMph", "mph");
  if (!(speedMph >= SPEED_RANGE_MPH[0] && speedMph <= SPEED_RANGE_MPH[1])) {
    throw bad("speedMph", `${speedMph} is out of range; expected ${SPEED_RANGE_MPH[0]} to ${SPEED_RANGE_MPH[1]} mph`);
  }
  const spinRpm = num("spinRpm", "rpm");
  if (!(spinRpm >= SPIN_RANGE_RPM[0] && spinRpm <= SPIN_RANGE_RPM[1])) {
    throw bad("spinRpm", `${spinRpm} is out of range; expected ${SPIN_RANGE_RPM[0]} to ${SPIN_RANGE_RPM[1]} rpm`);
  }
  if (raw.tilt !== undefined && raw.tiltDeg !== undefined) throw new InputError(`${where("tiltDeg")}: give tilt (a clock reading) or tiltDeg (degrees), not both`);
  let tilt: string;
  let tiltRad: number;
  let tiltDeg: number | undefined;
  if (raw.tiltDeg !== undefined) {
    tiltDeg = num("tiltDeg", "degrees clockwise from 12:00");
    if (!(tiltDeg >= 0 && tiltDeg < TILT_DEG_MAX)) {
      throw bad("tiltDeg", `${tiltDeg} is out of range; expected degrees clockwise from 12:00, at least 0 and below ${TILT_DEG_MAX}`);
    }
    tiltRad = tiltDeg * DEG;
    tilt = formatClock(angleToClock(tiltRad));
  } else {
    if (raw.tilt === undefined) throw new InputError(`${where("tilt")}: field "tilt" is missing (a clock reading such as "1:45", or give tiltDeg)`);
    tilt = text("tilt");
    try {
      tiltRad = clockToAngle(parseClock(tilt));
    } catch (err) {
      throw new InputError(`${where("tilt")}: ${(err as Error).message}`);
    }
  }
  if (raw.gyroDeg !== undefined && raw.efficiencyPct !== undefined) {
    throw new InputError(`${where("efficiencyPct")}: give gyroDeg or efficiencyPct, not both`);
  }
  if (raw.gyroSign !== undefined && raw.efficiencyPct === undefined) {
    throw new InputError(`${where("gyroSign")}: ${named("gyroSign")} goes with ${named("efficiencyPct")} (${named("gyroDeg")} carries its own sign)`);
  }
  let gyroDeg: number;
  let efficiencyPct: number;
  if (raw.efficiencyPct !== undefined) {
    efficiencyPct = num("efficiencyPct", "percent");
    if (!(efficiencyPct > 0 && efficiencyPct <= 100)) throw bad("efficiencyPct", `${efficiencyPct} is out of range; expected above 0 and at most 100 percent`);
    let sign: 1 | -1 = 1;
    if (raw.gyroSign === undefined) {
      if (efficiencyPct < 100) {
        throw new InputError(
          `${where("efficiencyPct")}: spin efficiency ${efficiencyPct} % has no gyro sign; expected ${named("gyroSign")} pos (the axis's positive end leans toward the plate) or neg, or a signed ${named("gyroDeg")}`,
        );
      }
    } else {
      const word = text("gyroSign");
      const s = GYRO_SIGN_WORDS[word.trim().toLowerCase()];
      if (s === undefined) throw bad("gyroSign", `${quote(word)} is not a sign; expected pos or neg`);
      sign = s;
    }
    gyroDeg = (sign * gyroFromEfficiency(efficiencyPct / 100)) / DEG;
    if (!(Math.abs(gyroDeg) < 90)) throw bad("efficiencyPct", `${efficiencyPct} gives a gyro of 90 degrees; expected above 0 percent`);
  } else {
    gyroDeg = num("gyroDeg", "degrees", 0);
    if (!(gyroDeg > -90 && gyroDeg < 90)) throw bad("gyroDeg", `${gyroDeg} is out of range; expected strictly between -90 and 90 degrees`);
    efficiencyPct = 100 * Math.cos(gyroDeg * DEG);
  }
  const handText = text("hand");
  const hand = HAND_WORDS[handText.trim().toLowerCase()];
  if (hand === undefined) throw bad("hand", `${quote(handText)} is not a throwing hand; expected right, left, R or L`);
  const echo = {
    name: text("name", "pitch"),
    pitcher: text("pitcher", ""),
    hand,
    speedMph,
    spinRpm,
    tilt,
    ...(tiltDeg !== undefined ? { tiltDeg } : {}),
    view: oneOf("view", VIEWS, "pitcher"),
    gyroDeg,
    efficiencyPct,
    want: oneOf("want", WANTS, "any"),
  };
  const pitch: Pitch = {
    name: echo.name,
    pitcher: echo.pitcher,
    hand: echo.hand as Pitch["hand"],
    speedMPerS: speedMph * M_PER_S_PER_MPH,
    spinRadPerS: spinRpm * RAD_PER_S_PER_RPM,
    tiltRad,
    view: echo.view as Pitch["view"],
    gyroRad: gyroDeg * DEG,
    want: echo.want as Pitch["want"],
  };
  assertPitch(pitch);
  return { pitch, echo };
}

export interface PitchFlags {
  hand?: string;
  speed?: string;
  spin?: string;
  tilt?: string;
  "tilt-deg"?: string;
  view?: string;
  gyro?: string;
  efficiency?: string;
  "gyro-sign"?: string;
  want?: string;
  name?: string;
}

/** One pitch from flags. */
export function pitchFromFlags(f: PitchFlags): PitchInput {
  const missing = (["hand", "speed", "spin"] as const).filter((k) => f[k] === undefined);
  if (missing.length) throw new InputError(`--${missing[0]} is missing; a pitch needs --hand, --speed, --spin and --tilt or --tilt-deg (or --pitch FILE)`);
  if (f.tilt === undefined && f["tilt-deg"] === undefined) throw new InputError(`--tilt is missing; a pitch needs --tilt H:MM or --tilt-deg DEG (or --pitch FILE)`);
  if (f.tilt !== undefined && f["tilt-deg"] !== undefined) throw new InputError(`give --tilt or --tilt-deg, not both`);
  if (f.gyro !== undefined && f.efficiency !== undefined) throw new InputError(`give --gyro or --efficiency, not both`);
  if (f["gyro-sign"] !== undefined && f.efficiency === undefined) throw new InputError(`--gyro-sign goes with --efficiency (--gyro carries its own sign)`);
  const raw: RawPitch = {
    name: f.name ?? "pitch",
    hand: f.hand,
    speedMph: parseNumber("speed", f.speed, "mph"),
    spinRpm: parseNumber("spin", f.spin, "rpm"),
    view: f.view ?? "pitcher",
    want: f.want ?? "any",
  };
  if (f.tilt !== undefined) raw.tilt = f.tilt;
  if (f["tilt-deg"] !== undefined) raw.tiltDeg = parseNumber("tilt-deg", f["tilt-deg"], "degrees clockwise from 12:00");
  if (f.gyro !== undefined) raw.gyroDeg = parseNumber("gyro", f.gyro, "degrees");
  if (f.efficiency !== undefined) raw.efficiencyPct = parseNumber("efficiency", f.efficiency, "percent");
  if (f["gyro-sign"] !== undefined) raw.gyroSign = f["gyro-sign"];
  const flagOf: Record<string, string> = { speedMph: "speed", spinRpm: "spin", gyroDeg: "gyro", efficiencyPct: "efficiency", tiltDeg: "tilt-deg", gyroSign: "gyro-sign" };
  return buildPitch(raw, (field) => `--${flagOf[field] ?? field}`, (field) => `--${flagOf[field] ?? field}`);
}

/** The pitch flags a request may carry. */
export const PITCH_FLAGS = ["hand", "speed", "spin", "tilt", "tilt-deg", "view", "gyro", "efficiency", "gyro-sign", "want", "name"] as const;
