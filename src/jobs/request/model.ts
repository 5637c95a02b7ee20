/**
 * The seam-force model a run uses: the built-in defaults, or a profile file given
 * with --model (JSON: { "name": ..., "parameters": { "<name>": value } }, read
 * strictly), with --band-center / --band-width overriding the profile's fixation
 * band (the band the sampler and the model share). Every output echoes the
 * profile's name and hash. Reading the file is this module's part; the rest is
 * request/profile.ts (pure, shared with the workbench page).
 */
import { quote } from "../../io/quote.js";
import { errnoWords } from "../../io/writeErrors.js";
import { readFileSync } from "node:fs";
import { InputError } from "../../io/errors.js";
import { parseStrictJson } from "../../io/json.js";
import { defaultProfile, resolveProfile, type SeamModelProfile } from "../../physics/seamModel/parameters.js";
import { withBandOptions } from "./profile.js";
import type { Request } from "./values.js";

export { buildModel } from "./profile.js";

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
    throw new InputError(`--model ${quote(path)}: cannot read the file: ${errnoWords(err)}; expected a seam-force profile (JSON)`);
  }
  const doc = parseStrictJson(bytes, `--model ${quote(path)}`);
  try {
    return resolveProfile(doc.value, path);
  } catch (err) {
    throw new InputError((err as Error).message);
  }
}

/** The profile for a request: --model FILE or the defaults, with the band options applied. */
export function modelChoice(request: Request): ModelChoice {
  const source = request.model === undefined ? undefined : String(request.model);
  const profile = withBandOptions(source === undefined ? defaultProfile() : readProfileFile(source), request);
  return { profile, source };
}
