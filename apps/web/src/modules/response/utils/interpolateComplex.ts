// Linear interpolation of a sampled complex response at any frequency inside its grid.

/** A sampled complex response on increasing offsets (Hz). */
export type ComplexSamples = { offsetsHz: readonly number[]; re: readonly number[]; im: readonly number[] };

/** [re, im] at `offsetHz` by linear interpolation between the two neighbouring samples; null outside the grid. */
export function interpolateComplex(samples: ComplexSamples, offsetHz: number): [number, number] | null {
  const { offsetsHz: f, re, im } = samples;
  const n = f.length;
  if (n === 0 || offsetHz < (f[0] ?? 0) || offsetHz > (f[n - 1] ?? 0)) return null;
  let lo = 0, hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((f[mid] ?? 0) <= offsetHz) lo = mid;
    else hi = mid;
  }
  const f0 = f[lo] ?? 0, f1 = f[hi] ?? 0;
  const t = f1 === f0 ? 0 : (offsetHz - f0) / (f1 - f0);
  return [(re[lo] ?? 0) * (1 - t) + (re[hi] ?? 0) * t, (im[lo] ?? 0) * (1 - t) + (im[hi] ?? 0) * t];
}
