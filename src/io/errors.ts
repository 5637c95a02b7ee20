/** The one error type for bad user input: the command line prints its message as one line and exits with status 2. */
export class InputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "InputError";
  }
}
