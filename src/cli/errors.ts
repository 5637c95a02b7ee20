/** Input errors: one clear line on stderr, exit status 2, no stack trace. */
import { InputError } from "../io/errors.js";

export { InputError };

export const EXIT_BAD_INPUT = 2;
export const EXIT_INTERNAL = 1;

/** Prints `err` as one line and exits: 2 for bad input (InputError, RangeError), 1 otherwise. */
export function exitWithError(err: unknown): never {
  const isInput = err instanceof InputError || err instanceof RangeError;
  const message = err instanceof Error ? err.message : String(err);
  const line = message.split("\n")[0];
  process.stderr.write(isInput ? `seam-atlas: ${line}\n` : `seam-atlas: internal error: ${line}\n`);
  process.exit(isInput ? EXIT_BAD_INPUT : EXIT_INTERNAL);
}
