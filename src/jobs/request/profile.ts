/**
 * The seam-force model a run uses, from a profile already in hand (the built-in
 * defaults, a --model file read by request/model.ts, or the profile a workbench page
 * embeds): --band-center / --band-width override its fixation band (the band the
 * sampler and the model share). Pure: the page's worker builds its model here, as
 * the command line does.
 */
import { InputError } from "../../io/errors.js";
import { seamModel, type SeamModel } from "../../physics/seamModel/model.js";
import { resolveProfile, SEAM_MODEL_PARAMETERS, type SeamModelProfile } from "../../physics/seamModel/parameters.js";
import { parseInRange, type Request } from "./values.js";

/** `profile` with the request's band options applied (the profile itself when none is given). */
export function withBandOptions(profile: SeamModelProfile, request: Request): SeamModelProfile {
  const overrides: Record<string, number> = {};
  const range = (name: string) => SEAM_MODEL_PARAMETERS.find((p) => p.name === name)!;
  const center = range("bandCenterDeg");
  const width = range("bandWidthDeg");
  if (request["band-center"] !== undefined) overrides.bandCenterDeg = parseInRange("band-center", request["band-center"], center.min, center.max, "deg");
  if (request["band-width"] !== undefined) overrides.bandWidthDeg = parseInRange("band-width", request["band-width"], width.min, width.max, "deg");
  if (!Object.keys(overrides).length) return profile;
  try {
    return resolveProfile({ name: profile.name, parameters: { ...profile.values, ...overrides } }, "--band-center/--band-width");
  } catch (err) {
    throw new InputError((err as Error).message);
  }
}

/** A model for the profile at the default resolution (the seam shape from the request's sampler settings). */
export function buildModel(profile: SeamModelProfile, seamShape: number): SeamModel {
  return seamModel(profile, { seamShape });
}
