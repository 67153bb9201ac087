// The CSV of one plotted spectrum, in Hexloom's spectrum CSV columns (libs/solver writer).
import type { SpectrumFile } from '@hexloom/contracts';
import { writeSpectrumCsv } from '@hexloom/solver';
import { pairLabel } from './pairLabel.js';
import { spectrumOfFile } from './spectrumOfFile.js';

/** CSV text of `file` with comment lines naming the ports and the reference frequency. */
export function spectrumCsv(file: SpectrumFile): string {
  return writeSpectrumCsv(spectrumOfFile(file), [`Hexloom spectrum ${pairLabel(file)}`, `reference frequency ${file.referenceFrequencyHz} Hz`, `method ${file.method}`]);
}
