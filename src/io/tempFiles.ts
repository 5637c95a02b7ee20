/**
 * Temporary files beside an output, and their removal when the run is stopped.
 *
 * A temporary file is created exclusively (O_CREAT | O_EXCL | O_WRONLY, plus
 * O_NOFOLLOW where the platform has it) under a name with 48 random bits,
 * `.NAME.<12 hex digits>.tmp`, so a file or symbolic link planted at a predictable
 * name can neither be written through nor be replaced: open(2) fails with EEXIST
 * on any existing entry, a symbolic link included (POSIX open(2), O_EXCL), and a
 * new random name is tried.
 *
 * While at least one temporary file exists, an exit handler removes what is left
 * when the process ends (process.exit after an error, say), and SIGINT and SIGTERM
 * handlers are installed. On such a signal they remove every temporary file and then, unless
 * the program has handlers of its own for that signal, re-raise it with the
 * default action (the shell sees 130 or 143); should the process survive that,
 * it exits with 128 + the signal number. The handlers are taken away two event
 * loop turns after the last temporary file is gone: a signal that arrived during
 * a synchronous write is only delivered to JavaScript on a later turn, and must
 * still find a handler (which then only re-raises it).
 */
import { randomBytes } from "node:crypto";
import { constants, openSync, unlinkSync } from "node:fs";
import { basename, dirname, join } from "node:path";

/** How many random names are tried before giving up. */
export const MAX_TEMP_ATTEMPTS = 8;
/** Longest part of the output's name kept in a temporary name, UTF-8 bytes. */
const MAX_STEM_BYTES = 200;

const EXCLUSIVE = constants.O_CREAT | constants.O_EXCL | constants.O_WRONLY | (constants.O_NOFOLLOW ?? 0);
const SIGNALS = ["SIGINT", "SIGTERM"] as const;
const SIGNAL_NUMBERS: Record<(typeof SIGNALS)[number], number> = { SIGINT: 2, SIGTERM: 15 };

const live = new Set<string>();
let installed = false;
let uninstallPending = false;

/** A temporary name in `target`'s folder: `.NAME.<random hex>.tmp`. */
export function tempNameFor(target: string): string {
  let stem = basename(target);
  while (Buffer.byteLength(stem) > MAX_STEM_BYTES) stem = Array.from(stem).slice(0, -1).join("");
  return join(dirname(target), `.${stem}.${randomBytes(6).toString("hex")}.tmp`);
}

/**
 * Creates and opens an empty temporary file beside `target`, registered for
 * removal on SIGINT/SIGTERM. New files get mode 0o666 less the umask.
 * @returns the temporary file's path and its open descriptor (write only).
 * @throws the last system error when no name could be created.
 */
export function createTemp(target: string): { path: string; fd: number } {
  let lastError: unknown;
  for (let i = 0; i < MAX_TEMP_ATTEMPTS; i++) {
    const path = tempNameFor(target);
    try {
      const fd = openSync(path, EXCLUSIVE, 0o666);
      trackTemp(path);
      return { path, fd };
    } catch (err) {
      lastError = err;
      if ((err as NodeJS.ErrnoException).code !== "EEXIST") break;
    }
  }
  throw lastError;
}

/** Removes a temporary file (if still there) and forgets it. Never throws. */
export function removeTemp(path: string): void {
  try {
    unlinkSync(path);
  } catch {
    // already gone, or the folder went away: nothing left to clean
  }
  untrackTemp(path);
}

/** Forgets a temporary file that has been renamed into place. */
export function untrackTemp(path: string): void {
  live.delete(path);
  if (live.size === 0 && installed && !uninstallPending) {
    uninstallPending = true;
    setImmediate(() => setImmediate(() => {
      uninstallPending = false;
      if (live.size === 0) uninstall();
    }).unref()).unref();
  }
}

/** Temporary files that exist now (for tests and diagnostics). */
export function liveTemps(): readonly string[] {
  return [...live];
}

function trackTemp(path: string): void {
  live.add(path);
  if (!installed) {
    for (const s of SIGNALS) process.on(s, onSignal);
    process.on("exit", removeAll);
    installed = true;
  }
}

function uninstall(): void {
  for (const s of SIGNALS) process.removeListener(s, onSignal);
  process.removeListener("exit", removeAll);
  installed = false;
}

function removeAll(): void {
  for (const p of live) {
    try {
      unlinkSync(p);
    } catch {
      // gone already
    }
  }
  live.clear();
}

function onSignal(signal: NodeJS.Signals): void {
  removeAll();
  uninstall();
  if (process.listenerCount(signal) > 0) return; // the program handles it itself
  const n = SIGNAL_NUMBERS[signal as (typeof SIGNALS)[number]] ?? 0;
  process.kill(process.pid, signal);
  process.exit(128 + n);
}
