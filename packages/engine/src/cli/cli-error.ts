/** A problem with the command line or its input: printed on stderr, exit code 2. */
export class CliError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "CliError";
  }
}
