/**
 * The one error type for bad user input. The command line prints its message as
 * one line and exits with status 2; anything else is an internal error.
 */

/** An error in what the user gave (a value, a file, a path): one line, exit status 2. */
export class InputError extends Error {
  /** @param options.cause the system error behind it, if any (ES2022 error cause). */
  constructor(message: string, options?: { cause?: unknown }) {
    super(message, options);
    this.name = "InputError";
  }
}
