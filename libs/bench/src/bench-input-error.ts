/** The typed error of @hexloom/bench for inputs it cannot use. */

/** Thrown for an input the library cannot work with; the message names the bad value. */
export class BenchInputError extends Error {
  override readonly name = 'BenchInputError';
}
