/**
 * The one error type for bad user input. The command line prints its message as
 * one line and exits with status 2; anything else is an internal error.
 */

/** An error in what the user gave (a value, a file, a path): one line, exit status 2. */
export class InputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "InputError";
  }
}
