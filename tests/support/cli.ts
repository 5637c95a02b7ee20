/** Runs the compiled CLI (npm test builds it first) and captures its output. */
import { spawn, spawnSync } from "node:child_process";
import { existsSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { dirname, join } from "node:path";

export const ROOT = join(dirname(fileURLToPath(import.meta.url)), "..", "..");
export const BIN = join(ROOT, "out", "build", "cli", "main.js");

/**
 * Runs the CLI and waits. The environment is the test's (whose XDG_CACHE_HOME is the
 * test file's own temporary folder: support/cacheHome.ts) with `env` over it.
 */
export function runCli(args: string[], options: { cwd?: string; env?: NodeJS.ProcessEnv } = {}): { code: number; stdout: string; stderr: string } {
  if (!existsSync(BIN)) throw new Error(`${BIN} is missing: run npm run build (npm test does it)`);
  if (!process.env.XDG_CACHE_HOME) throw new Error("XDG_CACHE_HOME is not set: tests run with their own cache home (vitest.config.ts, support/cacheHome.ts)");
  const r = spawnSync(process.execPath, [BIN, ...args], { cwd: options.cwd ?? ROOT, encoding: "utf8", timeout: 120_000, env: { ...process.env, FORCE_COLOR: "0", ...options.env } });
  return { code: r.status ?? -1, stdout: r.stdout, stderr: r.stderr };
}

/** What a run left: exit status (null when ended by a signal), the signal, and its output. */
export interface CliRun {
  readonly code: number | null;
  readonly signal: NodeJS.Signals | null;
  readonly timedOut: boolean;
  readonly stdout: string;
  readonly stderr: string;
}

/**
 * Runs the compiled CLI without blocking the test (for runs side by side, or a run
 * that writes into a pipe the test reads). A run still going after `timeoutMs` is
 * killed and reported `timedOut`: a limit against hangs, not a speed check.
 */
export function runCliAsync(args: string[], options: { cwd?: string; timeoutMs?: number } = {}): Promise<CliRun> {
  if (!existsSync(BIN)) throw new Error(`${BIN} is missing: run npm run build (npm test does it)`);
  if (!process.env.XDG_CACHE_HOME) throw new Error("XDG_CACHE_HOME is not set: tests run with their own cache home (vitest.config.ts, support/cacheHome.ts)");
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [BIN, ...args], { cwd: options.cwd ?? ROOT, env: { ...process.env, FORCE_COLOR: "0" }, stdio: ["ignore", "pipe", "pipe"] });
    let stdout = "";
    let stderr = "";
    let timedOut = false;
    child.stdout.setEncoding("utf8").on("data", (d: string) => (stdout += d));
    child.stderr.setEncoding("utf8").on("data", (d: string) => (stderr += d));
    const timer = setTimeout(() => {
      timedOut = true;
      child.kill("SIGKILL");
    }, options.timeoutMs ?? 120_000);
    child.on("error", reject);
    child.on("close", (code, signal) => {
      clearTimeout(timer);
      resolve({ code, signal, timedOut, stdout, stderr });
    });
  });
}
