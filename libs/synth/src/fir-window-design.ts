/** Target FIR responses for Mach–Zehnder lattices by the Kaiser window method. */
import { cAbs, cExpj, cScale, cx, polyOnCircle, type Complex } from './complex.js';
import { SynthInputError } from './synth-input-error.js';

export type FirBand = 'band-pass' | 'band-stop' | 'half-band';

export type FirDesignInput = {
  band: FirBand;
  /** Lattice order N (number of delay stages); even for band-stop. */
  order: number;
  /** Centre of the band as a fraction of the lattice FSR, in [-0.5, 0.5). Ignored for half-band. */
  centreFraction: number;
  /** Full width of the band as a fraction of the lattice FSR. Ignored for half-band (0.5). */
  widthFraction: number;
  /** Stop-band rejection the window aims at, dB (sets the Kaiser beta). */
  rejectionDb: number;
  /** Peak |A|^2 after scaling; a little below 1 keeps the spectral factorisation well conditioned. */
  peakPower?: number;
};

/** Zeroth-order modified Bessel function of the first kind, by its power series (Abramowitz & Stegun 1964, eq. 9.6.12). */
export function besselI0(x: number): number {
  let sum = 1;
  let term = 1;
  for (let k = 1; k < 60; k++) {
    term *= (x / (2 * k)) ** 2;
    sum += term;
    if (term < 1e-17 * sum) break;
  }
  return sum;
}

/** Kaiser's beta for a stop-band attenuation in dB (Oppenheim & Schafer, Discrete-Time Signal Processing, sec. 7.6, Kaiser design formulas). */
export function kaiserBeta(rejectionDb: number): number {
  if (rejectionDb > 50) return 0.1102 * (rejectionDb - 8.7);
  if (rejectionDb >= 21) return 0.5842 * (rejectionDb - 21) ** 0.4 + 0.07886 * (rejectionDb - 21);
  return 0;
}

/**
 * Coefficients a[0..N] of A(z) = sum a[n] z^-n: a Kaiser-windowed ideal band (Oppenheim & Schafer sec. 7.5),
 * shifted to the centre by exp(j 2 pi f_c n) (a complex lattice realises any centre with its phases), then
 * scaled so that max |A|^2 = peakPower. Band-stop = delayed impulse minus the band-pass (N even).
 */
export function designFirTarget(input: FirDesignInput): Complex[] {
  const { band, order } = input;
  if (!(Number.isInteger(order) && order >= 1 && order <= 64)) throw new SynthInputError(`synth: lattice order must be an integer from 1 to 64, got ${order}`);
  if (band === 'band-stop' && order % 2 === 1) throw new SynthInputError(`synth: a band-stop lattice needs an even order, got ${order}`);
  const width = band === 'half-band' ? 0.5 : input.widthFraction;
  const centre = band === 'half-band' ? 0 : input.centreFraction;
  if (!(width > 0 && width < 1)) throw new SynthInputError(`synth: widthFraction must lie in (0, 1), got ${input.widthFraction}`);
  const beta = kaiserBeta(input.rejectionDb);
  const mid = order / 2;
  const cutoff = width / 2;
  const taps: Complex[] = [];
  for (let n = 0; n <= order; n++) {
    const t = n - mid;
    const ideal = t === 0 ? 2 * cutoff : Math.sin(2 * Math.PI * cutoff * t) / (Math.PI * t);
    const window = besselI0(beta * Math.sqrt(Math.max(0, 1 - (t / mid) ** 2))) / besselI0(beta);
    taps.push(cScale(cExpj(2 * Math.PI * centre * n), ideal * window));
  }
  let a = taps;
  if (band === 'band-stop') a = taps.map((v, n) => (n === mid ? cx(1 - v.re, -v.im) : cx(-v.re, -v.im)));
  const peakPower = input.peakPower ?? 0.999;
  let peak = 0;
  for (let k = 0; k < 2048; k++) peak = Math.max(peak, cAbs(polyOnCircle(a, (2 * Math.PI * k) / 2048)));
  return a.map((v) => cScale(v, Math.sqrt(peakPower) / peak));
}
