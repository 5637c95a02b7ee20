/**
 * How a run goes about its work, not what it computes: the cache folder (--cache) and
 * the worker threads (--threads). Neither changes a number of the output; both are read
 * here once for every command that takes them.
 */
import { existsSync, statSync } from "node:fs";
import { cacheFolder } from "../../io/cacheFiles.js";
import { InputError } from "../../io/errors.js";
import { quote } from "../../io/quote.js";
import { optionPath, parseIntegerInRange, type Request } from "./values.js";

/** Most worker threads --threads takes. */
export const MAX_THREADS_OPTION = 64;

/**
 * The cache folder a run uses: --cache FOLDER, none for no cache (null), or by default
 * the user's cache folder (io/cacheFiles.ts cacheFolder; null when there is no home).
 */
export function cacheChoice(request: Request): string | null {
  if (request.cache === undefined) return cacheFolder();
  const value = optionPath("cache", request.cache);
  if (value === "none") return null;
  if (value === "") throw new InputError(`--cache "": the path is empty; expected a folder for the cache, or none`);
  if (existsSync(value) && !statSync(value).isDirectory()) throw new InputError(`--cache ${quote(value)} is a file; expected a folder for the cache, or none`);
  return value;
}

/** --threads: a whole number of worker threads from 0 (this thread only) to MAX_THREADS_OPTION, or "auto" (also when not given). */
export function threadsChoice(request: Request): number | "auto" {
  if (request.threads === undefined || request.threads === "auto") return "auto";
  return parseIntegerInRange("threads", request.threads, 0, MAX_THREADS_OPTION);
}
