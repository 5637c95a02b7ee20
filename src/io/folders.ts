/**
 * Creating an output's folder one level at a time. Node's recursive mkdir loops
 * forever under /proc (which refuses new entries with ENOENT); a plain mkdir per
 * level reports that at once.
 */
import { existsSync, mkdirSync, statSync } from "node:fs";
import { dirname } from "node:path";
import { InputError } from "./errors.js";
import { quote } from "./quote.js";
import { errnoWords } from "./writeErrors.js";

/** Deepest chain of new folders created for one output. */
export const MAX_NEW_FOLDERS = 32;

/**
 * Makes sure folder `dir` exists, creating missing parents one level at a time.
 * @param label names the output in messages, e.g. `--out "a/b/c.json"`.
 * @throws InputError when a part of the path is a file or a folder cannot be made.
 */
export function ensureFolder(dir: string, label: string): void {
  const missing: string[] = [];
  let d = dir;
  while (!existsSync(d)) {
    if (missing.length >= MAX_NEW_FOLDERS) throw new InputError(`${label}: more than ${MAX_NEW_FOLDERS} folders would have to be made; expected an existing folder nearer the file`);
    missing.push(d);
    const up = dirname(d);
    if (up === d) break;
    d = up;
  }
  if (existsSync(d) && !statSync(d).isDirectory()) throw new InputError(`${label}: ${quote(d)} is a file, not a folder; expected a folder to write into`);
  for (const m of missing.reverse()) {
    try {
      mkdirSync(m);
    } catch (err) {
      throw new InputError(`${label}: cannot create the folder ${quote(m)}: ${errnoWords(err)}`);
    }
  }
}
