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

/** The options of one run, as typed: option name (without dashes) to value. */
export type Request = Readonly<Record<string, unknown>>;

/** The one text value of an option (an option given twice is an error). */
export function optionText(option: string, value: unknown): string {
  if (Array.isArray(value)) throw new InputError(`--${option} was given ${value.length} times; give it once`);
  return String(value ?? "").trim();
}

/** A finite number from an option's text. */
export function parseNumber(option: string, value: unknown, expected: string): number {
  if (Array.isArray(value)) throw new InputError(`--${option} was given ${value.length} times; give it once (${expected})`);
  const text = String(value ?? "").trim();
  const x = text === "" ? NaN : Number(text);
  if (!Number.isFinite(x)) throw new InputError(`--${option} "${text}" is not a number; expected ${expected}`);
  return x;
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

/**
 * A spin axis in the ball frame: "X,Y,Z" (any non-zero length), a landmark name
 * (see `seam-atlas landmarks`), or latitude/longitude "12.5N,45E".
 */
export function parseAxis(option: string, value: unknown, seamShape: number): ParsedAxis {
  const text = optionText(option, value);
  const expected = `X,Y,Z (three numbers, not all zero), a landmark name such as waist-A, or latitude,longitude such as 12.5N,45E`;
  if (text === "") throw new InputError(`--${option} is empty; expected ${expected}`);
  const latLon = (() => {
    try {
      return parseLatLon(text);
    } catch (err) {
      throw new InputError(`--${option} ${(err as Error).message}`);
    }
  })();
  if (latLon) return { vector: latLonToVector(latLon.latDeg, latLon.lonDeg), given: text };
  if (/^[a-z]/i.test(text)) {
    const landmarks = findLandmarks(seamShape);
    const lm: Landmark | undefined = landmarkByName(landmarks, text);
    if (!lm) {
      throw new InputError(`--${option} "${text}" is not a landmark; expected one of ${landmarks.map((l) => l.name).join(", ")}, or X,Y,Z, or 12.5N,45E`);
    }
    return { vector: [...lm.direction] as Vec3, given: text, landmark: lm.name };
  }
  const parts = text.split(",").map((p) => p.trim());
  if (parts.length !== 3) throw new InputError(`--${option} "${text}" has ${parts.length} part(s); expected ${expected}`);
  const v = parts.map((p) => (p === "" ? NaN : Number(p)));
  if (v.some((x) => !Number.isFinite(x))) throw new InputError(`--${option} "${text}" has a part that is not a number; expected ${expected}`);
  const vector: Vec3 = [v[0], v[1], v[2]];
  if (norm3(vector) < 1e-12) throw new InputError(`--${option} "${text}" is a zero vector; expected a direction, not all zero`);
  return { vector, given: text };
}
