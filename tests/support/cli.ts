/** Runs the compiled CLI (npm test builds it first) and captures its output. */
import { spawnSync } from "node:child_process";
import { existsSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { dirname, join } from "node:path";

export const ROOT = join(dirname(fileURLToPath(import.meta.url)), "..", "..");
export const BIN = join(ROOT, "out", "build", "cli", "main.js");

export function runCli(args: string[], options: { cwd?: string } = {}): { code: number; stdout: string; stderr: string } {
  if (!existsSync(BIN)) throw new Error(`${BIN} is missing: run npm run build (npm test does it)`);
  const r = spawnSync(process.execPath, [BIN, ...args], { cwd: options.cwd ?? ROOT, encoding: "utf8", timeout: 120_000, env: { ...process.env, FORCE_COLOR: "0" } });
  return { code: r.status ?? -1, stdout: r.stdout, stderr: r.stderr };
}
