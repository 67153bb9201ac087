// A spectrum renamed for an overlay of two versions: its input port's name carries the version ("v2 W11").
import type { SpectrumFile } from '@hexloom/contracts';

/** The same spectrum, with `fromName` prefixed by the version, so the plot legend reads "v2 W11 → E11". */
export function versionSpectrum(spectrum: SpectrumFile, versionNumber: number): SpectrumFile {
  return { ...spectrum, fromName: `v${versionNumber} ${spectrum.fromName}` };
}
