/**
 * The seam-force model a run uses: the built-in defaults, or a profile file given
 * with --model (JSON: { "name": ..., "parameters": { "<name>": value } }, read
 * strictly), with --band-center / --band-width overriding the profile's fixation
 * band (the band the sampler and the model share). Every output echoes the
 * profile's name and hash.
 */
import { readFileSync } from "node:fs";
import { InputError } from "../../io/errors.js";
import { parseStrictJson } from "../../io/json.js";
import { seamModel, type SeamModel } from "../../physics/seamModel/model.js";
import { defaultProfile, resolveProfile, SEAM_MODEL_PARAMETERS, type SeamModelProfile } from "../../physics/seamModel/parameters.js";
import { parseInRange, type Request } from "./values.js";

export interface ModelChoice {
  readonly profile: SeamModelProfile;
  /** The profile file read, if any (an input the outputs must not replace). */
  readonly source?: string;
}

/** Reads a profile file (strict JSON), as a RangeError-free InputError naming the file. */
export function readProfileFile(path: string): SeamModelProfile {
  let bytes: Uint8Array;
  try {
    bytes = readFileSync(path);
  } catch (err) {
    throw new InputError(`--model "${path}": cannot read the file (${(err as NodeJS.ErrnoException).code ?? "error"})`);
  }
  const doc = parseStrictJson(bytes, path);
  try {
    return resolveProfile(doc.value, path);
  } catch (err) {
    throw new InputError((err as Error).message);
  }
}

/** The profile for a request: --model FILE or the defaults, with the band options applied. */
export function modelChoice(request: Request): ModelChoice {
  const source = request.model === undefined ? undefined : String(request.model);
  let profile = source === undefined ? defaultProfile() : readProfileFile(source);
  const overrides: Record<string, number> = {};
  const range = (name: string) => SEAM_MODEL_PARAMETERS.find((p) => p.name === name)!;
  const center = range("bandCenterDeg");
  const width = range("bandWidthDeg");
  if (request["band-center"] !== undefined) overrides.bandCenterDeg = parseInRange("band-center", request["band-center"], center.min, center.max, "deg");
  if (request["band-width"] !== undefined) overrides.bandWidthDeg = parseInRange("band-width", request["band-width"], width.min, width.max, "deg");
  if (Object.keys(overrides).length) {
    try {
      profile = resolveProfile({ name: profile.name, parameters: { ...profile.values, ...overrides } }, "--band-center/--band-width");
    } catch (err) {
      throw new InputError((err as Error).message);
    }
  }
  return { profile, source };
}

/** A model for the profile at the default resolution (the seam shape from the request's sampler settings). */
export function buildModel(profile: SeamModelProfile, seamShape: number): SeamModel {
  return seamModel(profile, { seamShape });
}
