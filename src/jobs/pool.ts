/**
 * The one pool of worker threads (piscina) that screen and explain share: one worker
 * file (worker.ts, bundled to out/build/cli/worker.js by src/build/bundle.ts) serves
 * both kinds of task. Where that file is not there (the TypeScript sources under a
 * test runner), there is no pool and the callers run every task on this thread by the
 * same code: the same numbers, one core.
 *
 * Threads: --threads N (jobs/request/runtime.ts), 0 for this thread only; "auto" is
 * the caller's (screen: one per core for three pitches or more; explain: one per core
 * for large files), at most MAX_AUTO_THREADS.
 */
import { existsSync } from "node:fs";
import { availableParallelism } from "node:os";
import { fileURLToPath } from "node:url";
import type { Piscina } from "piscina";

/** Most threads "auto" gives. */
export const MAX_AUTO_THREADS = 8;

/** The worker's file beside this module (compiled sources) or, in the bundle, beside the command line's entry. */
export function workerFile(): string | undefined {
  for (const rel of ["./worker.js", "../worker.js"]) {
    const path = fileURLToPath(new URL(rel, import.meta.url));
    if (existsSync(path)) return path;
  }
  return undefined;
}

/** One thread per core, at most MAX_AUTO_THREADS. */
export function coreThreads(): number {
  return Math.max(1, Math.min(MAX_AUTO_THREADS, availableParallelism()));
}

/** A pool of `threads` workers, or undefined for this thread only (0 threads, or no worker file). */
export async function openPool(threads: number): Promise<Piscina | undefined> {
  const file = threads > 0 ? workerFile() : undefined;
  if (file === undefined) return undefined;
  const { Piscina } = await import("piscina");
  return new Piscina({ filename: file, minThreads: threads, maxThreads: threads, idleTimeout: 60_000 });
}
