/**
 * Where a command's results go: every output is planned (io/outputPlan.ts) before
 * anything is computed and written whole through the one writer (io/output.ts);
 * `-` is standard output. Also printing to standard output and a progress line on
 * a terminal. The only place the command line touches the disk.
 */
import { InputError } from "../io/errors.js";
import { planOutputs, type InputRef, type OutputFormat, type PlannedOutput } from "../io/output.js";

export { openOutputStream, writeOutput, type PlannedOutput } from "../io/output.js";

/** An output a command was asked for: the option, its value as typed (undefined: not asked) and its format. */
export interface WantedOutput {
  readonly option: string;
  readonly path: unknown;
  readonly format?: OutputFormat;
}

/**
 * Checks every output of a run at once, before anything is computed (see
 * io/outputPlan.ts): folders, devices, links, inputs, duplicates and formats.
 * @returns one entry per wanted output, in order: the planned output, or
 *   undefined where the option was not given.
 * @throws InputError naming the option and the path as typed.
 */
export function planRun(wanted: readonly WantedOutput[], inputs: readonly InputRef[]): (PlannedOutput | undefined)[] {
  const asked = wanted.filter((w) => w.path !== undefined);
  for (const w of asked) {
    if (Array.isArray(w.path)) throw new InputError(`${w.option} was given ${w.path.length} times; expected it once`);
    if (typeof w.path !== "string") throw new InputError(`${w.option} needs a file path; expected a path, or - for standard output`);
  }
  const planned = planOutputs(
    asked.map((w) => ({ option: w.option, path: w.path as string, format: w.format })),
    inputs,
  );
  let next = 0;
  return wanted.map((w) => (w.path === undefined ? undefined : planned[next++]));
}

/** Whether one of the planned outputs is standard output (then nothing else is printed there). */
export function toStdout(planned: readonly (PlannedOutput | undefined)[]): boolean {
  return planned.some((p) => p?.kind === "stdout");
}

/** "wrote PATH" lines for the outputs that went to files or devices. */
export function wroteLines(planned: readonly (PlannedOutput | undefined)[]): string {
  return planned
    .filter((p): p is PlannedOutput => p !== undefined && p.kind !== "stdout")
    .map((p) => `wrote ${p.given}\n`)
    .join("");
}

/** Refuses `flag` (which prints to standard output) beside an output given as `-`; called before planning. */
export function refuseSecondStdout(wanted: readonly WantedOutput[], flag: string): void {
  const w = wanted.find((q) => q.path === "-");
  if (w) throw new InputError(`${w.option} "-" and ${flag} both write to standard output; expected one of them`);
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

/**
 * A progress line on a terminal for a file streamed through: rows done and the
 * share of the file's bytes read so far (no first pass to count lines).
 */
export function streamProgress(): { tick(rows: number, bytesRead: number, totalBytes: number | undefined): void; clear(): void } {
  const tty = process.stderr.isTTY === true;
  return {
    tick(rows, bytesRead, totalBytes) {
      if (!tty) return;
      if (totalBytes === undefined || totalBytes === 0) {
        process.stderr.write(`\r  ${rows} rows`);
        return;
      }
      const share = Math.min(1, bytesRead / totalBytes);
      const bar = "#".repeat(Math.round(30 * share)).padEnd(30, ".");
      process.stderr.write(`\r  ${rows} rows [${bar}] ${Math.floor(100 * share)} %`);
    },
    clear() {
      if (tty) process.stderr.write("\r\x1b[K");
    },
  };
}
