/** Measurements on a sampled response: values at a frequency, notches, bands around a centre, delay over a band. */
import type { SampledResponse } from './mask-types.js';

/** Linear interpolation of `values` at `fHz` on the increasing grid (clamped to the ends). */
export function valueAt(r: SampledResponse, values: readonly number[], fHz: number): number {
  const f = r.frequencyHz;
  const n = f.length;
  if (fHz <= (f[0] as number)) return values[0] as number;
  if (fHz >= (f[n - 1] as number)) return values[n - 1] as number;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((f[mid] as number) <= fHz) lo = mid;
    else hi = mid;
  }
  const t = (fHz - (f[lo] as number)) / ((f[hi] as number) - (f[lo] as number));
  return (values[lo] as number) + t * ((values[hi] as number) - (values[lo] as number));
}

/** Indices of the samples in [fromHz, toHz]. */
export function indicesWithin(r: SampledResponse, fromHz: number, toHz: number): number[] {
  const out: number[] = [];
  r.frequencyHz.forEach((f, i) => {
    if (f >= fromHz && f <= toHz) out.push(i);
  });
  return out;
}

/**
 * Smallest, largest and mean of `values` over the samples in [fromHz, toHz] (NaN when none). The mean is the
 * trapezoidal average over frequency, so a grid refined near the edges does not weigh them more (common practice).
 */
export function statsWithin(r: SampledResponse, values: readonly number[], fromHz: number, toHz: number): { min: number; max: number; mean: number; minAtHz: number; maxAtHz: number } {
  const idx = indicesWithin(r, fromHz, toHz);
  if (idx.length === 0) return { min: NaN, max: NaN, mean: NaN, minAtHz: NaN, maxAtHz: NaN };
  let lo = idx[0] as number;
  let hi = lo;
  let sum = 0;
  for (const i of idx) {
    const v = values[i] as number;
    if (v < (values[lo] as number)) lo = i;
    if (v > (values[hi] as number)) hi = i;
    sum += v;
  }
  let area = 0;
  for (let k = 1; k < idx.length; k++) {
    const a = idx[k - 1] as number;
    const b = idx[k] as number;
    area += (((values[a] as number) + (values[b] as number)) / 2) * ((r.frequencyHz[b] as number) - (r.frequencyHz[a] as number));
  }
  const span = (r.frequencyHz[idx[idx.length - 1] as number] as number) - (r.frequencyHz[idx[0] as number] as number);
  return { min: values[lo] as number, max: values[hi] as number, mean: span > 0 ? area / span : sum / idx.length, minAtHz: r.frequencyHz[lo] as number, maxAtHz: r.frequencyHz[hi] as number };
}

/** Least-squares slope of `values` against frequency over [fromHz, toHz], per Hz (common practice). */
export function slopeWithin(r: SampledResponse, values: readonly number[], fromHz: number, toHz: number): number {
  const idx = indicesWithin(r, fromHz, toHz);
  const n = idx.length;
  if (n < 2) return NaN;
  const fm = idx.reduce((s, i) => s + (r.frequencyHz[i] as number), 0) / n;
  const vm = idx.reduce((s, i) => s + (values[i] as number), 0) / n;
  let num = 0;
  let den = 0;
  for (const i of idx) {
    const df = (r.frequencyHz[i] as number) - fm;
    num += df * ((values[i] as number) - vm);
    den += df * df;
  }
  return num / den;
}

/** Frequency where `values` crosses `level` between samples i and j (linear interpolation). */
const crossing = (r: SampledResponse, values: readonly number[], i: number, j: number, level: number): number => {
  const v0 = values[i] as number;
  const v1 = values[j] as number;
  const f0 = r.frequencyHz[i] as number;
  const f1 = r.frequencyHz[j] as number;
  return v1 === v0 ? f0 : f0 + ((level - v0) / (v1 - v0)) * (f1 - f0);
};

/**
 * The notch nearest `centreHz` within `searchHz` of it: depth below the highest power of the whole response,
 * its frequency, and its width at half depth in linear power (the notch FWHM of an all-pass ring, Rabus 2007, ch. 2).
 */
export function notchNear(r: SampledResponse, centreHz: number, searchHz: number): { depthDb: number; frequencyHz: number; widthHz: number; offResonanceDb: number } {
  const p = r.powerDb;
  const top = p.reduce((m, x) => Math.max(m, x), -Infinity);
  const s = statsWithin(r, p, centreHz - searchHz, centreHz + searchHz);
  const min = r.frequencyHz.indexOf(s.minAtHz);
  const lin = p.map((x) => 10 ** (x / 10));
  const half = (10 ** (top / 10) + (lin[min] as number)) / 2;
  let lo = min;
  while (lo > 0 && (lin[lo - 1] as number) < half) lo--;
  let hi = min;
  while (hi < lin.length - 1 && (lin[hi + 1] as number) < half) hi++;
  const loEdge = lo > 0 ? crossing(r, lin, lo - 1, lo, half) : (r.frequencyHz[0] as number);
  const hiEdge = hi < lin.length - 1 ? crossing(r, lin, hi, hi + 1, half) : (r.frequencyHz[lin.length - 1] as number);
  return { depthDb: top - s.min, frequencyHz: s.minAtHz, widthHz: hiEdge - loEdge, offResonanceDb: top };
}

/**
 * The band around the highest power within `searchHz` of `centreHz`: its peak, and the contiguous band within
 * `levelDb` of the peak (3 dB by default), with edges interpolated between samples.
 */
export function bandNear(r: SampledResponse, centreHz: number, searchHz: number, levelDb = 3): { peakDb: number; peakHz: number; lowHz: number; highHz: number; widthHz: number } {
  const p = r.powerDb;
  const s = statsWithin(r, p, centreHz - searchHz, centreHz + searchHz);
  const peak = r.frequencyHz.indexOf(s.maxAtHz);
  const level = s.max - levelDb;
  let lo = peak;
  while (lo > 0 && (p[lo - 1] as number) >= level) lo--;
  let hi = peak;
  while (hi < p.length - 1 && (p[hi + 1] as number) >= level) hi++;
  const lowHz = lo > 0 ? crossing(r, p, lo - 1, lo, level) : (r.frequencyHz[0] as number);
  const highHz = hi < p.length - 1 ? crossing(r, p, hi, hi + 1, level) : (r.frequencyHz[p.length - 1] as number);
  return { peakDb: s.max, peakHz: s.maxAtHz, lowHz, highHz, widthHz: highHz - lowHz };
}
