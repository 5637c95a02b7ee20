#!/usr/bin/env node
/** The `seam-atlas` command: parse, validate, call the library, write. */
import yargs from "yargs";
import { hideBin } from "yargs/helpers";
import { quote } from "../io/quote.js";
import { errnoWords } from "../io/writeErrors.js";
import { takeNotices } from "../render/notices.js";
import { TOOL_VERSION } from "../version.js";
import { exitWithError, InputError } from "./errors.js";
import { registerLandmarks } from "./landmarks.js";
import { registerMeasure } from "./measure.js";
import { registerScreen } from "./screen.js";
import { registerFlight } from "./flight.js";
import { registerExplain } from "./explain.js";
import { registerPaper } from "./paper.js";
import { registerView } from "./view.js";
import { registerForce } from "./force.js";
import { registerCalibrate } from "./calibrate.js";

/** The commands, in the order --help lists them in words. */
export const COMMANDS = ["atlas", "card", "handout", "view", "screen", "measure", "flight", "force", "explain", "calibrate", "landmarks"] as const;

/** The switches (yargs booleans) of every command: given alone, or as =true / =false. */
const SWITCHES = ["csv", "demo", "json", "png", "svg", "trajectory"];

export async function main(args: string[]): Promise<void> {
  refuseByteOrderMarks(args);
  refuseSwitchValues(args);
  const command = args[0];
  if (command !== undefined && !command.startsWith("-") && !(COMMANDS as readonly string[]).includes(command)) throw unknownCommand(command);
  let cli = yargs(args)
    .scriptName("seam-atlas")
    .usage("$0 <command> [options]\n\nSeam orientation: where the spin axis pierces the ball, and the seam-shifted wake it makes. One seam-force model gives every push: its direction, the inches it adds at the plate, and the ranking of grips.")
    .version(TOOL_VERSION)
    .alias("help", "h")
    .strict()
    .demandCommand(1, `give a command: ${COMMANDS.slice(0, -1).join(", ")} or ${COMMANDS.at(-1)} (see --help)`)
    .wrap(Math.min(110, process.stdout.columns || 100))
    .fail((msg, err) => {
      // yargs' own complaints (unknown option, missing value) are input errors too
      if (err && err.name !== "YError") throw err;
      throw new InputError(yargsMessage((msg ?? err?.message ?? "bad command line").replace(/\s+/g, " ").trim(), args));
    });
  cli = registerMeasure(cli);
  cli = registerScreen(cli);
  cli = registerFlight(cli);
  cli = registerExplain(cli);
  cli = registerPaper(cli);
  cli = registerView(cli);
  cli = registerForce(cli);
  cli = registerLandmarks(cli);
  cli = registerCalibrate(cli);
  await cli.parseAsync();
  for (const notice of takeNotices()) process.stderr.write(`seam-atlas: ${notice}\n`);
}

/**
 * A byte-order mark (U+FEFF) is invisible and no value holds one: it comes along
 * when text is copied out of a file saved with one. Named, with its option.
 */
function refuseByteOrderMarks(args: readonly string[]): void {
  args.forEach((a, i) => {
    if (!a.includes("\ufeff")) return;
    const inline = /^(--?[^=]+)=([\s\S]*)$/.exec(a);
    const what = inline ? `${inline[1]} ${quote(inline[2])}` : i > 0 && args[i - 1].startsWith("-") ? `${args[i - 1]} ${quote(a)}` : quote(a);
    throw new InputError(`${what} holds a byte-order mark (U+FEFF, invisible); expected the value without it`);
  });
}

/** A switch given a value other than true or false ("--json=yes") would be read as off: named instead. */
function refuseSwitchValues(args: readonly string[]): void {
  for (const a of args) {
    const m = /^--([a-z-]+)=([\s\S]*)$/.exec(a);
    if (m && SWITCHES.includes(m[1]) && m[2] !== "true" && m[2] !== "false") {
      throw new InputError(`--${m[1]}=${m[2]}: --${m[1]} is a switch; expected --${m[1]} alone (or =true, =false)`);
    }
  }
}

/** "unknown command", with the nearest command when one is near (edit distance at most 2). */
function unknownCommand(typed: string): InputError {
  const near = COMMANDS.map((c) => ({ c, d: editDistance(typed.toLowerCase(), c) })).sort((a, b) => a.d - b.d)[0];
  const hint = near.d <= 2 ? `did you mean ${near.c}?` : `expected one of ${COMMANDS.join(", ")}`;
  return new InputError(`unknown command ${quote(typed)}; ${hint}`);
}

/** Levenshtein distance (insertions, deletions, substitutions), for command suggestions. */
function editDistance(a: string, b: string): number {
  let prev = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const row = [i];
    for (let j = 1; j <= b.length; j++) row.push(Math.min(prev[j] + 1, row[j - 1] + 1, prev[j - 1] + (a[i - 1] === b[j - 1] ? 0 : 1)));
    prev = row;
  }
  return prev[b.length];
}

/** yargs' messages in the tool's words: the option as typed and where to read about it. */
function yargsMessage(msg: string, args: readonly string[]): string {
  const command = args[0] !== undefined && !args[0].startsWith("-") ? args[0] : undefined;
  const help = command ? `see seam-atlas ${command} --help` : "see seam-atlas --help";
  const unknown = /^Unknown arguments?: (.+)$/.exec(msg);
  if (unknown) {
    const name = unknown[1].split(", ")[0];
    const asOption = args.find((a) => a === `--${name}` || a === `-${name}` || a.startsWith(`--${name}=`));
    if (asOption !== undefined) return `unknown option --${name}${command ? ` for ${command}` : ""}; ${help}`;
    return `unexpected ${quote(name)}${command ? ` after ${command}` : ""}; expected options only (${help})`;
  }
  const noValue = /^Not enough arguments following: (.+)$/.exec(msg);
  if (noValue) return `--${noValue[1]} is given without a value; ${help}`;
  return msg;
}

/** Whether `err` is a pipe closed by its reader (EPIPE), raised directly or as an error's cause. */
function readerWentAway(err: unknown): boolean {
  const e = err as { code?: unknown; cause?: { code?: unknown } } | undefined;
  return e?.code === "EPIPE" || e?.cause?.code === "EPIPE";
}

// a reader that closes its pipe early (| head) ends the run quietly, whether the
// output was printed or written as `--out -`, as in a shell pipeline (POSIX SIGPIPE)
process.stdout.on("error", (err: NodeJS.ErrnoException) => {
  if (readerWentAway(err)) process.exit(0);
  exitWithError(new InputError(`cannot write "-": ${errnoWords(err)}`));
});

main(hideBin(process.argv)).catch((err) => (readerWentAway(err) ? process.exit(0) : exitWithError(err)));
