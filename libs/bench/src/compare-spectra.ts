/** Measured versus simulated power on a common grid, with residual figures. */
import { BenchInputError } from './bench-input-error.js';

/** A power spectrum sampled at increasing offsets from the reference frequency. */
export type PowerSpectrum = { readonly offsetHz: readonly number[]; readonly powerDb: readonly number[] };

/** Both spectra on the measured offsets inside the simulated span; residual = measured - simulated. */
export type SpectrumComparison = {
  readonly offsetHz: number[];
  readonly simulatedDb: number[];
  readonly measuredDb: number[];
  readonly residualDb: number[];
  readonly figures: { points: number; rmsResidualDb: number; maxAbsResidualDb: number; meanResidualDb: number; worstOffsetHz: number };
};

/** Linear interpolation of `s` at `x` (x inside the sampled span). */
function interpolate(s: PowerSpectrum, x: number, hint: { i: number }): number {
  const f = s.offsetHz;
  while (hint.i < f.length - 2 && (f[hint.i + 1] as number) < x) hint.i++;
  const x0 = f[hint.i] as number, x1 = f[hint.i + 1] as number;
  const y0 = s.powerDb[hint.i] as number, y1 = s.powerDb[hint.i + 1] as number;
  return x1 === x0 ? y0 : y0 + ((x - x0) / (x1 - x0)) * (y1 - y0);
}

/**
 * Resamples the simulated spectrum (linear in dB) at each measured offset inside its span and reports
 * the residual: RMS, mean (bias) and largest absolute value with where it occurs (common practice).
 * @throws BenchInputError when fewer than two measured points fall inside the simulated span, or an input is not increasing.
 */
export function compareSpectra(simulated: PowerSpectrum, measured: PowerSpectrum): SpectrumComparison {
  for (const [name, s] of [['simulated', simulated], ['measured', measured]] as const) {
    if (s.offsetHz.length !== s.powerDb.length) throw new BenchInputError(`bench: ${name} spectrum has ${s.offsetHz.length} offsets but ${s.powerDb.length} powers`);
    for (let i = 1; i < s.offsetHz.length; i++) {
      if (!((s.offsetHz[i] as number) > (s.offsetHz[i - 1] as number))) throw new BenchInputError(`bench: ${name} offsets must increase, point ${i} is ${s.offsetHz[i]} Hz`);
    }
  }
  const lo = simulated.offsetHz[0] ?? Number.NaN, hi = simulated.offsetHz[simulated.offsetHz.length - 1] ?? Number.NaN;
  const hint = { i: 0 };
  const out: SpectrumComparison = { offsetHz: [], simulatedDb: [], measuredDb: [], residualDb: [], figures: { points: 0, rmsResidualDb: 0, maxAbsResidualDb: 0, meanResidualDb: 0, worstOffsetHz: 0 } };
  measured.offsetHz.forEach((x, i) => {
    const m = measured.powerDb[i] as number;
    if (!(x >= lo && x <= hi) || !Number.isFinite(m)) return;
    const s = interpolate(simulated, x, hint);
    out.offsetHz.push(x);
    out.simulatedDb.push(s);
    out.measuredDb.push(m);
    out.residualDb.push(m - s);
  });
  const n = out.residualDb.length;
  if (n < 2) throw new BenchInputError(`bench: only ${n} measured point(s) fall inside the simulated span ${lo} .. ${hi} Hz; simulate over the measured range`);
  let sum = 0, sumSq = 0, worst = 0;
  out.residualDb.forEach((r, i) => {
    sum += r;
    sumSq += r * r;
    if (Math.abs(r) > Math.abs(out.residualDb[worst] as number)) worst = i;
  });
  out.figures.points = n;
  out.figures.meanResidualDb = sum / n;
  out.figures.rmsResidualDb = Math.sqrt(sumSq / n);
  out.figures.maxAbsResidualDb = Math.abs(out.residualDb[worst] as number);
  out.figures.worstOffsetHz = out.offsetHz[worst] as number;
  return out;
}
