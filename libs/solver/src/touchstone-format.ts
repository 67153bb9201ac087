/** Shared vocabulary of the Touchstone files (IBIS Open Forum, Touchstone File Format Specification 1.1 and 2.0). */

/** Data format of the option line: magnitude-angle, dB-angle or real-imaginary (angles in degrees). */
export type TouchstoneFormat = 'MA' | 'DB' | 'RI';
export type TouchstoneFrequencyUnit = 'HZ' | 'KHZ' | 'MHZ' | 'GHZ';
export type TouchstoneVersion = '1.1' | '2.0';

/** S-parameters of an N-port on a frequency list; flat index `(f * N + i) * N + j` for S_ij. */
export type TouchstoneData = {
  portCount: number;
  frequenciesHz: Float64Array;
  re: Float64Array;
  im: Float64Array;
  /** Reference impedance of every port, ohm. */
  referenceOhm: number;
};

export const FREQUENCY_SCALE: Readonly<Record<TouchstoneFrequencyUnit, number>> = { HZ: 1, KHZ: 1e3, MHZ: 1e6, GHZ: 1e9 };

/** Error in a Touchstone or CSV file, naming the line (1-based) and the reason. */
export class SpectrumFileError extends Error {
  override readonly name = 'SpectrumFileError';
  constructor(
    readonly line: number,
    reason: string,
    readonly file: 'touchstone' | 'csv' = 'touchstone',
  ) {
    super(`${file} line ${line}: ${reason}`);
  }
}
