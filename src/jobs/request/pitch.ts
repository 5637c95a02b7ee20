/**
 * Pitches from pitch files and requests: a pitch file (one pitch or a staff) read as
 * bytes and parsed strictly, the built-in demo staff, and the flags of a run. Each
 * pitch is built by request/pitchSpec.ts (the pure part the page shares).
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { InputError } from "../../io/errors.js";
import { parseStrictJson, type LocatedJson } from "../../io/json.js";
import { quote } from "../../io/quote.js";
import { errnoWords } from "../../io/writeErrors.js";
import { projectRoot } from "../../version.js";
import { buildPitch, PITCH_FLAGS, pitchFromFlags, pitchPath, type PitchFlags, type PitchInput, type RawPitch } from "./pitchSpec.js";
import type { Request } from "./values.js";

export * from "./pitchSpec.js";

export interface PitchFile {
  readonly team?: string;
  readonly pitches: PitchInput[];
}

/**
 * All pitches of a pitch file (one pitch or a staff), read as bytes and parsed as
 * strict JSON (io/json.ts): not UTF-8, a duplicate key or a number out of range is
 * one message with its line.
 * @param label names the file in messages, e.g. `--pitch "staff.json"`.
 */
export function pitchesFromFile(path: string, label = `--pitch ${quote(path)}`): PitchFile {
  let bytes: Uint8Array;
  try {
    bytes = readFileSync(path);
  } catch (err) {
    throw new InputError(`${label}: cannot read the file: ${errnoWords(err)}; expected a pitch file (JSON)`);
  }
  const doc: LocatedJson = parseStrictJson(bytes, label);
  const at = (p: string) => {
    const line = doc.lineOf(p);
    return `${label}${line ? ` line ${line}` : ""} (${p || "top level"})`;
  };
  const v = doc.value;
  if (typeof v !== "object" || v === null || Array.isArray(v)) throw new InputError(`${at("")}: expected a pitch or a staff object`);
  const obj = v as Record<string, unknown>;
  if (!("pitchers" in obj)) {
    // a staff whose list is misspelled reads as a staff, not as one pitch with strange fields
    const list = Object.keys(obj).find((k) => Array.isArray(obj[k]));
    if (list !== undefined || "team" in obj) {
      throw new InputError(`${at(list ?? "team")}: a staff file lists its pitchers under "pitchers"${list !== undefined ? `, not "${list}"` : ""}; expected team, pitchers (or one pitch's fields alone)`);
    }
    return { pitches: [buildPitch(obj, (f) => at(f))] };
  }
  for (const key of Object.keys(obj)) {
    if (key !== "team" && key !== "pitchers") throw new InputError(`${at(key)}: unknown field "${key}" in a staff; expected team, pitchers`);
  }
  if (!Array.isArray(obj.pitchers) || obj.pitchers.length === 0) throw new InputError(`${at("pitchers")}: "pitchers" must be a non-empty list`);
  const pitches: PitchInput[] = [];
  obj.pitchers.forEach((pr, i) => {
    const base = `pitchers[${i}]`;
    if (typeof pr !== "object" || pr === null || Array.isArray(pr)) throw new InputError(`${at(base)}: each pitcher must be an object`);
    const pitcher = pr as Record<string, unknown>;
    for (const key of Object.keys(pitcher)) {
      if (!["name", "hand", "pitches"].includes(key)) throw new InputError(`${at(`${base}.${key}`)}: unknown field "${key}" for a pitcher; expected name, hand, pitches`);
    }
    if (typeof pitcher.name !== "string" || pitcher.name.trim() === "") throw new InputError(`${at(`${base}.name`)}: each pitcher needs a "name"`);
    if (!Array.isArray(pitcher.pitches) || pitcher.pitches.length === 0) throw new InputError(`${at(`${base}.pitches`)}: "pitches" must be a non-empty list`);
    pitcher.pitches.forEach((raw, j) => {
      const pbase = `${base}.pitches[${j}]`;
      if (typeof raw !== "object" || raw === null || Array.isArray(raw)) throw new InputError(`${at(pbase)}: each pitch must be an object`);
      const merged: RawPitch = { pitcher: pitcher.name, ...(pitcher.hand !== undefined ? { hand: pitcher.hand } : {}), ...(raw as RawPitch) };
      pitches.push(buildPitch(merged, (f) => at(f in (raw as RawPitch) ? `${pbase}.${f}` : f === "hand" ? `${base}.hand` : pbase)));
    });
  });
  return { team: typeof obj.team === "string" ? obj.team : undefined, pitches };
}

/**
 * The one pitch a command takes from what the request gives (`why`: how to choose, for
 * the message): a --pitch-name that matches several pitches is named with their labels.
 */
export function onePitch<T extends { readonly echo: PitchInput["echo"] }>(request: Request, pitches: readonly T[], command: string, why: string): T {
  if (pitches.length === 1) return pitches[0];
  if (request["pitch-name"] !== undefined && pitches.length > 1) {
    throw new InputError(`--pitch-name ${quote(String(request["pitch-name"]))} matches ${pitches.length} pitches (${pitches.map((p) => pitchPath(p.echo)).join(", ")}); ${command} takes one: expected PITCHER/NAME`);
  }
  throw new InputError(`${command} takes one pitch; the file has ${pitches.length} (${why})`);
}

/** Picks pitches by name ("sinker" or "Iris Talvela/sinker"); throws listing the names when none match. */
export function selectPitches(file: PitchFile, selector: string | undefined, source: string): PitchInput[] {
  if (selector === undefined) return file.pitches;
  const key = selector.trim().toLowerCase();
  const label = (p: PitchInput) => pitchPath(p.echo);
  const found = file.pitches.filter((p) => label(p).toLowerCase() === key || p.echo.name.toLowerCase() === key);
  if (found.length === 0) {
    throw new InputError(`--pitch-name ${quote(selector)} is not in ${quote(source)}; expected one of ${file.pitches.map(label).join(", ")}`);
  }
  return found;
}

/** The built-in demo staff (an invented club). */
export function demoStaffPath(): string {
  return join(projectRoot(), "templates", "demo-staff.json");
}

/** The pitches a request works on, from --demo, --pitch FILE or the pitch flags. */
export function pitchesFromRequest(request: Request): { team?: string; source?: string; pitches: PitchInput[] } {
  const given = PITCH_FLAGS.filter((k) => request[k] !== undefined);
  if (request.demo && request.pitch !== undefined) throw new InputError(`give --demo or --pitch, not both`);
  const file = request.demo ? demoStaffPath() : (request.pitch as string | undefined);
  if (file !== undefined) {
    if (given.length) throw new InputError(`--${given[0]} cannot be combined with ${request.demo ? "--demo" : "--pitch"}; the file describes the pitches`);
    const pf = pitchesFromFile(file, request.demo ? `--demo ${quote(file)}` : `--pitch ${quote(file)}`);
    return { team: pf.team, source: file, pitches: selectPitches(pf, request["pitch-name"] as string | undefined, file) };
  }
  if (request["pitch-name"] !== undefined) throw new InputError(`--pitch-name needs --pitch FILE or --demo`);
  return { pitches: [pitchFromFlags(request as PitchFlags)] };
}
