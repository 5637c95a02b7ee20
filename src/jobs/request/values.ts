/**
 * Reading values people type (options and file cells) into numbers and names:
 * every message names the option, the value given and what is expected. A request
 * is the set of options as typed (strings, keyed by option name); the jobs turn it
 * into SI here, once.
 */
import { parseLatLon, latLonToVector } from "../../../geometry/ballCoords.js";
import { findLandmarks, landmarkByName, type Landmark } from "../../../geometry/landmarks.js";
import { DEG } from "../../../geometry/units.js";
import { norm3, type Vec3 } from "../../../geometry/vec.js";
import { InputError } from "../../io/errors.js";
import { parseDecimal } from "../../io/numbers.js";
import { quote } from "../../io/quote.js";

/** The options of one run, as typed: option name (without dashes) to value. */
export type Request = Readonly<Record<string, unknown>>;

/** The one text value of an option (an option given twice is an error). */
export function optionText(option: string, value: unknown): string {
  if (Array.isArray(value)) throw new InputError(`--${option} was given ${value.length} times; give it once`);
  return String(value ?? "").trim();
}

/** A path option's one value, as typed (not trimmed: a file name may have spaces). */
export function optionPath(option: string, value: unknown): string {
  if (Array.isArray(value)) throw new InputError(`--${option} was given ${value.length} times; expected it once`);
  return String(value ?? "");
}

/**
 * A finite number from an option's text, in decimal notation only (io/numbers.ts:
 * no hexadecimal or other bases, NaN and Infinity are not numbers, an overflow is
 * "too large").
 */
export function parseNumber(option: string, value: unknown, expected: string): number {
  if (Array.isArray(value)) throw new InputError(`--${option} was given ${value.length} times; give it once (${expected})`);
  return parseDecimal(String(value ?? ""), `--${option}`, expected);
}

/** A whole number from an option's text. */
export function parseInteger(option: string, value: unknown, expected: string): number {
  const x = parseNumber(option, value, expected);
  if (!Number.isInteger(x)) throw new InputError(`--${option} ${x} is not a whole number; expected ${expected}`);
  return x;
}

/** A number in [lo, hi] (inclusive) in the option's own unit. */
export function parseInRange(option: string, value: unknown, lo: number, hi: number, unit: string): number {
  const u = unit ? ` ${unit}` : "";
  const x = parseNumber(option, value, `${lo} to ${hi}${u}`);
  if (!(x >= lo && x <= hi)) throw new InputError(`--${option} ${x}${u} is out of range; expected ${lo} to ${hi}${u}`);
  return x;
}

/** A whole number in [lo, hi]. */
export function parseIntegerInRange(option: string, value: unknown, lo: number, hi: number): number {
  const x = parseInteger(option, value, `a whole number from ${lo} to ${hi}`);
  if (!(x >= lo && x <= hi)) throw new InputError(`--${option} ${x} is out of range; expected ${lo} to ${hi}`);
  return x;
}

/** Degrees from an option, converted to radians, with an open range check in degrees. */
export function parseDegrees(option: string, value: unknown, loDeg: number, hiDeg: number): number {
  const x = parseNumber(option, value, `degrees strictly between ${loDeg} and ${hiDeg}`);
  if (!(x > loDeg && x < hiDeg)) throw new InputError(`--${option} ${x} deg is out of range; expected degrees strictly between ${loDeg} and ${hiDeg}`);
  return x * DEG;
}

/** One of a fixed set of words. */
export function oneOf<T extends string>(option: string, value: unknown, allowed: readonly T[]): T {
  const text = optionText(option, value);
  if (!allowed.includes(text as T)) throw new InputError(`--${option} "${text}" is not one of ${allowed.join(", ")}`);
  return text as T;
}

/** Throws unless at most one of the options is given. */
export function atMostOne(request: Request, ...options: string[]): void {
  const given = options.filter((o) => request[o] !== undefined);
  if (given.length > 1) throw new InputError(`give --${given[0]} or --${given[1]}, not both`);
}

export interface ParsedAxis {
  /** Direction in the ball frame (not yet normalised). */
  readonly vector: Vec3;
  /** How the user wrote it. */
  readonly given: string;
  /** The landmark's name when one was named. */
  readonly landmark?: string;
}

/** Latitude/longitude written with a sign as well as a letter ("-30N,40E"). */
const SIGNED_LAT_LON = /^\s*([+-]?)\s*(\d+(?:\.\d+)?)\s*([NSns])\s*,\s*([+-]?)\s*(\d+(?:\.\d+)?)\s*([EWew])\s*$/;

/**
 * A spin axis in the ball frame: "X,Y,Z" (any non-zero length), a landmark name
 * (see `seam-atlas landmarks`), or latitude/longitude "12.5N,45E".
 */
export function parseAxis(option: string, value: unknown, seamShape: number): ParsedAxis {
  const text = optionText(option, value);
  const expected = `X,Y,Z (three numbers, not all zero), a landmark name such as waist-A, or latitude,longitude such as 12.5N,45E`;
  const given = `--${option} ${quote(text)}`;
  if (text === "") throw new InputError(`--${option} is empty; expected ${expected}`);
  const signed = SIGNED_LAT_LON.exec(text);
  if (signed && (signed[1] !== "" || signed[4] !== "")) {
    // the letter gives the side; a minus sign as well is ambiguous, so say which letter is meant
    const flip = (sign: string, letter: string, a: string, b: string) => (sign === "-" ? (letter.toUpperCase() === a ? b : a) : letter.toUpperCase());
    const fixed = `${signed[2]}${flip(signed[1], signed[3], "N", "S")},${signed[5]}${flip(signed[4], signed[6], "E", "W")}`;
    const part = signed[1] !== "" ? `the latitude ${signed[1]}${signed[2]}${signed[3]}` : `the longitude ${signed[4]}${signed[5]}${signed[6]}`;
    throw new InputError(`${given}: ${part} has a sign; expected the letter alone to give the side (S for south, W for west), as in ${fixed}`);
  }
  const latLon = (() => {
    try {
      return parseLatLon(text);
    } catch (err) {
      throw new InputError(`--${option} ${(err as Error).message}`);
    }
  })();
  if (latLon) return { vector: latLonToVector(latLon.latDeg, latLon.lonDeg), given: text };
  if (text.includes(",")) {
    const parts = text.split(",");
    if (parts.length !== 3) throw new InputError(`${given} has ${parts.length} part(s); expected ${expected}`);
    const v = parts.map((p, i) => parseDecimal(p, `${given}: part ${i + 1}`, "three decimal numbers X,Y,Z, not all zero"));
    const vector: Vec3 = [v[0], v[1], v[2]];
    if (norm3(vector) < 1e-12) throw new InputError(`${given} is a zero vector; expected a direction, not all zero`);
    return { vector, given: text };
  }
  const landmarks = findLandmarks(seamShape);
  const lm: Landmark | undefined = landmarkByName(landmarks, text);
  if (!lm) {
    throw new InputError(`${given} is not a landmark; expected one of ${landmarks.map((l) => l.name).join(", ")}, or X,Y,Z, or 12.5N,45E`);
  }
  return { vector: [...lm.direction] as Vec3, given: text, landmark: lm.name };
}
