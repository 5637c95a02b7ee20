/**
 * Writing a command's results: files whole or not at all, standard output, and a
 * progress line on a terminal. The only place the command line touches the disk.
 */
import { existsSync, mkdirSync, renameSync, rmSync, statSync, writeFileSync } from "node:fs";
import { basename, dirname, join } from "node:path";
import { InputError } from "../io/errors.js";

/** Deepest folder chain we create for an output file. */
const MAX_NEW_FOLDERS = 32;

/**
 * Creates `dir` and any missing parents one level at a time. (Node's recursive
 * mkdir loops forever under /proc, which refuses new entries with ENOENT; a
 * non-recursive mkdir reports that at once.)
 */
export function ensureFolder(dir: string): void {
  const missing: string[] = [];
  let d = dir;
  while (!existsSync(d) && missing.length < MAX_NEW_FOLDERS) {
    missing.push(d);
    const up = dirname(d);
    if (up === d) break;
    d = up;
  }
  if (existsSync(d) && !statSync(d).isDirectory()) throw new InputError(`cannot write into ${d}: it is a file, not a folder`);
  for (const m of missing.reverse()) {
    try {
      mkdirSync(m);
    } catch (err) {
      throw new InputError(`cannot create folder ${m}: ${(err as NodeJS.ErrnoException).code ?? (err as Error).message}`);
    }
  }
}

/** Writes a file whole or not at all: to a temporary name beside it, then rename. */
export function writeAtomic(path: string, data: string | Uint8Array): void {
  ensureFolder(dirname(path));
  const tmp = join(dirname(path), `.${basename(path)}.${process.pid}.tmp`);
  try {
    writeFileSync(tmp, data);
    renameSync(tmp, path);
  } catch (err) {
    try {
      rmSync(tmp, { force: true });
    } catch {
      // nothing was written there
    }
    throw new InputError(`cannot write ${path}: ${(err as NodeJS.ErrnoException).code ?? (err as Error).message}`);
  }
}

/** Prints to standard output. */
export function print(text: string): void {
  process.stdout.write(text);
}

/** A progress line on a terminal (stderr), nothing otherwise. */
export function progress(): (label: string, done: number, total: number) => void {
  const tty = process.stderr.isTTY === true;
  return (label, done, total) => {
    if (!tty) return;
    const bar = "#".repeat(Math.round((30 * done) / Math.max(1, total))).padEnd(30, ".");
    process.stderr.write(`\r  ${label} [${bar}] ${done}/${total}${done === total ? "\r\x1b[K" : ""}`);
  };
}
