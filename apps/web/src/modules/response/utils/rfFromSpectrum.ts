// RF view from a sampled optical response: what an RF tone at F on the carrier sees after the chip and a detector.
import type { RfScheme } from '@hexloom/solver';
import { type ComplexSamples, interpolateComplex } from './interpolateComplex.js';

/** RF gain per tone: tones F (Hz, >= 0) and the small-signal gain 20 log10 |H_RF| (dB, null where it vanishes). */
export type RfSeries = { rfFrequenciesHz: number[]; gainDb: (number | null)[]; re: number[]; im: number[] };

/**
 * H_RF(F) with the carrier at offset `carrierOffsetHz`: IM-DD [H(fc + F) H*(fc) + H*(fc - F) H(fc)] / 2, single
 * sideband H(fc + F) H*(fc) (upper) or H*(fc - F) H(fc) (lower), normalised so a flat response gives 1 (each
 * sideband beating with the carrier at the detector: Yao, J. Lightwave Technol. 27(3) 2009; Capmany & Novak,
 * Nature Photonics 1, 2007 — the formula of libs/solver `rfResponse`, here on the samples, interpolated linearly).
 * Tones run from 0 to the largest F whose sidebands both lie on the grid, at the grid's own step.
 */
export function rfFromSpectrum(samples: ComplexSamples, carrierOffsetHz: number, scheme: RfScheme): RfSeries {
  const f = samples.offsetsHz;
  const n = f.length;
  const out: RfSeries = { rfFrequenciesHz: [], gainDb: [], re: [], im: [] };
  const carrier = interpolateComplex(samples, carrierOffsetHz);
  if (!carrier || n < 2) return out;
  const [cr, ci] = carrier;
  const maxF = Math.min(carrierOffsetHz - (f[0] ?? 0), (f[n - 1] ?? 0) - carrierOffsetHz);
  const step = ((f[n - 1] ?? 0) - (f[0] ?? 0)) / (n - 1);
  for (let k = 0; k * step <= maxF + 1e-9 * step; k++) {
    const F = Math.min(k * step, maxF);
    const [ur0, ui0] = interpolateComplex(samples, carrierOffsetHz + F) ?? [0, 0];
    const [lr0, li0] = interpolateComplex(samples, carrierOffsetHz - F) ?? [0, 0];
    // U = H(fc + F) conj(Hc); L = conj(H(fc - F)) Hc.
    const ur = ur0 * cr + ui0 * ci, ui = ui0 * cr - ur0 * ci;
    const lr = lr0 * cr + li0 * ci, li = lr0 * ci - li0 * cr;
    const [re, im] = scheme === 'imdd' ? [(ur + lr) / 2, (ui + li) / 2] : scheme === 'ssb-upper' ? [ur, ui] : [lr, li];
    const mag = Math.hypot(re, im);
    out.rfFrequenciesHz.push(F);
    out.re.push(re);
    out.im.push(im);
    out.gainDb.push(mag > 0 ? 20 * Math.log10(mag) : null);
  }
  return out;
}
