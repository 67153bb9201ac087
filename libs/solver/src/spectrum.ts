/** Frequency response of one impulse response: H(f), group delay by the n h[n] identity, and dispersion. */
import type { ComplexSeries } from './impulse-response.js';
import { dtftDirect, dtftUniform } from './dtft.js';
import type { FrequencyGrid } from './frequency-grid.js';
import { gridOffsetsHz, isPowerOfTwo } from './frequency-grid.js';
import { SPEED_OF_LIGHT_M_PER_S, SolverInputError } from './unit-delay.js';

/** H(f) on a grid with its group delay and dispersion; dB and degree views are derived by helpers. */
export type Spectrum = {
  /** Reference (carrier) frequency f0 where z^-1 = 1, Hz. */
  referenceFrequencyHz: number;
  unitDelayS: number;
  /** Offsets f - f0 of every point, Hz. */
  offsetsHz: Float64Array;
  re: Float64Array;
  im: Float64Array;
  /** Group delay, seconds. */
  groupDelayS: Float64Array;
  /** Dispersion D = d tau / d lambda, ps/nm. */
  dispersionPsPerNm: Float64Array;
  /** How the values were computed. */
  method: 'fft' | 'direct-sum';
};

export type SpectrumInput = {
  impulse: ComplexSeries;
  grid: FrequencyGrid;
  unitDelayS: number;
  referenceFrequencyHz: number;
};

/**
 * Evaluates H(w) = sum h[n] e^{-j w n}, w = 2 pi (f - f0) T_u, with G = sum n h[n] e^{-j w n} and
 * K = sum n^2 h[n] e^{-j w n}. Group delay tau = Re(G / H) T_u (the standard DSP identity for the
 * derivative of the phase, e.g. Oppenheim & Schafer, Discrete-Time Signal Processing, 3rd ed., sec. 5.1.2,
 * as used by scipy.signal.group_delay) and d tau / d w = Im(K / H - (G / H)^2) T_u, so no phase unwrapping.
 * Dispersion D = -(f^2 / c) d tau / d f (common practice), reported in ps/nm.
 * An `fsr` grid whose size is a power of two (>= 2) uses three FFTs; every other grid a direct sum.
 */
export function spectrumFromImpulse({ impulse, grid, unitDelayS, referenceFrequencyHz }: SpectrumInput): Spectrum {
  if (!(unitDelayS > 0 && Number.isFinite(unitDelayS))) throw new SolverInputError(`solver: unitDelayS must be positive, got ${unitDelayS}`);
  if (!(referenceFrequencyHz > 0 && Number.isFinite(referenceFrequencyHz))) {
    throw new SolverInputError(`solver: referenceFrequencyHz must be positive, got ${referenceFrequencyHz}`);
  }
  const offsetsHz = gridOffsetsHz(grid, unitDelayS);
  const count = offsetsHz.length;
  const one = (): number => 1, lin = (i: number): number => i, sq = (i: number): number => i * i;
  let h: ComplexSeries, g: ComplexSeries, k: ComplexSeries;
  let method: Spectrum['method'];
  if (grid.kind === 'fsr' && count >= 2 && isPowerOfTwo(count)) {
    method = 'fft';
    const reorder = (x: ComplexSeries): ComplexSeries => {
      const re = new Float64Array(count), im = new Float64Array(count);
      for (let i = 0; i < count; i++) {
        const bin = (i - count / 2 + count) % count;
        re[i] = x.re[bin] ?? 0;
        im[i] = x.im[bin] ?? 0;
      }
      return { re, im };
    };
    h = reorder(dtftUniform(impulse, count, one));
    g = reorder(dtftUniform(impulse, count, lin));
    k = reorder(dtftUniform(impulse, count, sq));
  } else {
    method = 'direct-sum';
    const omegas = offsetsHz.map((f) => 2 * Math.PI * f * unitDelayS);
    h = dtftDirect(impulse, omegas, one);
    g = dtftDirect(impulse, omegas, lin);
    k = dtftDirect(impulse, omegas, sq);
  }
  const groupDelayS = new Float64Array(count), dispersionPsPerNm = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    const hr = h.re[i] ?? 0, hi = h.im[i] ?? 0, d = hr * hr + hi * hi;
    const gr = ((g.re[i] ?? 0) * hr + (g.im[i] ?? 0) * hi) / d, gi = ((g.im[i] ?? 0) * hr - (g.re[i] ?? 0) * hi) / d;
    const ki = ((k.im[i] ?? 0) * hr - (k.re[i] ?? 0) * hi) / d;
    groupDelayS[i] = gr * unitDelayS;
    const dTauDOmega = (ki - 2 * gr * gi) * unitDelayS;
    const dTauDf = dTauDOmega * 2 * Math.PI * unitDelayS;
    const f = referenceFrequencyHz + (offsetsHz[i] ?? 0);
    dispersionPsPerNm[i] = ((-(f * f) / SPEED_OF_LIGHT_M_PER_S) * dTauDf) * 1e3;
  }
  return { referenceFrequencyHz, unitDelayS, offsetsHz, re: h.re, im: h.im, groupDelayS, dispersionPsPerNm, method };
}

/** |H|^2 in dB at every point (-Infinity where H = 0). */
export function amplitudeDb(s: Pick<Spectrum, 're' | 'im'>): Float64Array {
  return s.re.map((r, i) => 10 * Math.log10(r * r + (s.im[i] ?? 0) ** 2));
}

/** Phase of H, radians in (-pi, pi] (wrapped; the group delay never needs it unwrapped). */
export function phaseRad(s: Pick<Spectrum, 're' | 'im'>): Float64Array {
  return s.re.map((r, i) => Math.atan2(s.im[i] ?? 0, r));
}
