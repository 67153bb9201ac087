/** The figures engineers quote for a filter response: insertion loss, 3 dB band, rejection, ripple. */
import type { SampledResponse } from './mask-types.js';

export type ResponseFigures = {
  /** Loss at the peak of the response, dB (positive). */
  insertionLossDb: number;
  peakFrequencyHz: number;
  /** Width of the contiguous band around the peak within 3 dB of it, Hz (linear interpolation of the edges). */
  bandwidth3dBHz: number;
  /** Lowest and highest edge of that band, Hz. */
  band3dBHz: [number, number];
  /** Peak minus the lowest power of the response, dB. */
  rejectionDb: number;
  /** Peak-to-peak group delay inside the 3 dB band, ps. */
  delayRippleIn3dBBandPs: number;
  /** Mean group delay over the whole grid, ps (the delay of a delay line or a delay-set branch). */
  meanGroupDelayPs: number;
};

/** Linear interpolation of the frequency where the power crosses `level` between samples i and j. */
const crossing = (r: SampledResponse, i: number, j: number, level: number): number => {
  const p0 = r.powerDb[i] as number;
  const p1 = r.powerDb[j] as number;
  const f0 = r.frequencyHz[i] as number;
  const f1 = r.frequencyHz[j] as number;
  return p1 === p0 ? f0 : f0 + ((level - p0) / (p1 - p0)) * (f1 - f0);
};

/** Figures of a band-pass-like response sampled on an increasing frequency grid (common practice definitions). */
export function responseFigures(response: SampledResponse): ResponseFigures {
  const n = response.powerDb.length;
  let peak = 0;
  for (let i = 1; i < n; i++) if ((response.powerDb[i] as number) > (response.powerDb[peak] as number)) peak = i;
  const peakDb = response.powerDb[peak] as number;
  const level = peakDb - 3;
  let lo = peak;
  while (lo > 0 && (response.powerDb[lo - 1] as number) >= level) lo--;
  let hi = peak;
  while (hi < n - 1 && (response.powerDb[hi + 1] as number) >= level) hi++;
  const lowEdge = lo > 0 ? crossing(response, lo - 1, lo, level) : (response.frequencyHz[0] as number);
  const highEdge = hi < n - 1 ? crossing(response, hi, hi + 1, level) : (response.frequencyHz[n - 1] as number);
  let dMin = Infinity;
  let dMax = -Infinity;
  for (let i = lo; i <= hi; i++) {
    dMin = Math.min(dMin, response.groupDelayPs[i] as number);
    dMax = Math.max(dMax, response.groupDelayPs[i] as number);
  }
  return {
    insertionLossDb: -peakDb,
    peakFrequencyHz: response.frequencyHz[peak] as number,
    bandwidth3dBHz: highEdge - lowEdge,
    band3dBHz: [lowEdge, highEdge],
    rejectionDb: peakDb - response.powerDb.reduce((m, p) => Math.min(m, p), Infinity),
    delayRippleIn3dBBandPs: dMax - dMin,
    meanGroupDelayPs: response.groupDelayPs.reduce((sum, d) => sum + d, 0) / n,
  };
}
