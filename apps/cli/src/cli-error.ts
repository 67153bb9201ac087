/** An error the CLI reports as one line on stderr with a chosen exit code (no stack trace). */
export class CliError extends Error {
  override readonly name = 'CliError';
  constructor(
    message: string,
    readonly exitCode = 1,
  ) {
    super(message);
  }
}
