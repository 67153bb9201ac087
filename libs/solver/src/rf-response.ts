/** RF view: what an RF tone on an optical carrier sees after the chip and a photodetector. */
import { dtftDirect } from './dtft.js';
import type { ComplexSeries } from './impulse-response.js';
import { SolverInputError } from './unit-delay.js';

/** `imdd`: intensity modulation, both sidebands with the carrier, direct detection; `ssb-upper`/`ssb-lower`: one sideband. */
export type RfScheme = 'imdd' | 'ssb-upper' | 'ssb-lower';

export type RfResponseInput = {
  impulse: ComplexSeries;
  unitDelayS: number;
  /** Optical carrier position, offset from the reference frequency, Hz. */
  carrierOffsetHz: number;
  /** RF tone frequencies F, Hz (>= 0). */
  rfFrequenciesHz: Float64Array;
  scheme: RfScheme;
};

/**
 * Small-signal RF transfer, normalised so a flat optical response gives 1:
 * IM-DD: H_RF(F) = [H(fc + F) H*(fc) + H*(fc - F) H(fc)] / 2;
 * single sideband: H(fc + F) H*(fc) (upper) or H*(fc - F) H(fc) (lower).
 * (Beating of each sideband with the carrier at the detector: Yao, J. Lightwave Technol. 27(3) 2009;
 * Capmany & Novak, Nature Photonics 1, 2007.) Electrical gain in dB is 20 log10 |H_RF|.
 */
export function rfResponse(input: RfResponseInput): ComplexSeries {
  const { impulse, unitDelayS, carrierOffsetHz, rfFrequenciesHz, scheme } = input;
  if (!rfFrequenciesHz.every((f) => Number.isFinite(f) && f >= 0)) {
    throw new SolverInputError('solver: RF frequencies must be finite and >= 0 Hz');
  }
  const w = (f: number): number => 2 * Math.PI * f * unitDelayS;
  const carrier = dtftDirect(impulse, Float64Array.of(w(carrierOffsetHz)));
  const cr = carrier.re[0] ?? 0, ci = carrier.im[0] ?? 0;
  const upper = dtftDirect(impulse, rfFrequenciesHz.map((f) => w(carrierOffsetHz + f)));
  const lower = dtftDirect(impulse, rfFrequenciesHz.map((f) => w(carrierOffsetHz - f)));
  const n = rfFrequenciesHz.length;
  const re = new Float64Array(n), im = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    // U = H(fc + F) conj(Hc); L = conj(H(fc - F)) Hc.
    const ur = (upper.re[i] ?? 0) * cr + (upper.im[i] ?? 0) * ci, ui = (upper.im[i] ?? 0) * cr - (upper.re[i] ?? 0) * ci;
    const lr = (lower.re[i] ?? 0) * cr + (lower.im[i] ?? 0) * ci, li = (lower.re[i] ?? 0) * ci - (lower.im[i] ?? 0) * cr;
    if (scheme === 'imdd') { re[i] = (ur + lr) / 2; im[i] = (ui + li) / 2; }
    else if (scheme === 'ssb-upper') { re[i] = ur; im[i] = ui; }
    else { re[i] = lr; im[i] = li; }
  }
  return { re, im };
}
