/** Writes a file whole or not at all: to a temporary name beside it, then rename. */
import { mkdirSync, renameSync, rmSync, writeFileSync } from "node:fs";
import { basename, dirname, join } from "node:path";
import { InputError } from "./errors.js";

export function writeAtomic(path: string, data: string | Uint8Array): void {
  const dir = dirname(path);
  try {
    mkdirSync(dir, { recursive: true });
  } catch (err) {
    throw new InputError(`cannot create folder ${dir} for ${path}: ${(err as Error).message}`);
  }
  const tmp = join(dir, `.${basename(path)}.${process.pid}.tmp`);
  try {
    writeFileSync(tmp, data);
    renameSync(tmp, path);
  } catch (err) {
    rmSync(tmp, { force: true });
    throw new InputError(`cannot write ${path}: ${(err as NodeJS.ErrnoException).code ?? (err as Error).message}`);
  }
}
