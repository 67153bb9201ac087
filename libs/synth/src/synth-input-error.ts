/** The typed error of @hexloom/synth for a request that has no solution. */
export class SynthInputError extends Error {
  override readonly name = 'SynthInputError';
}
