// The solver's spectrum arrays rebuilt from a spectrum file, for the solver's CSV and Touchstone writers.
import type { SpectrumFile } from '@hexloom/contracts';
import type { Spectrum } from '@hexloom/solver';

/** The spectrum of a file: offsets, re/im, group delay (s) and dispersion (ps/nm; NaN where the file has null). */
export function spectrumOfFile(file: SpectrumFile): Spectrum {
  const p = file.points;
  return {
    referenceFrequencyHz: file.referenceFrequencyHz,
    unitDelayS: file.unitDelayS,
    offsetsHz: Float64Array.from(p.offsetHz),
    re: Float64Array.from(p.re),
    im: Float64Array.from(p.im),
    groupDelayS: Float64Array.from(p.groupDelayPs, (t) => (t === null ? NaN : t * 1e-12)),
    dispersionPsPerNm: Float64Array.from(p.dispersionPsPerNm, (d) => (d === null ? NaN : d)),
    method: file.method,
  };
}
