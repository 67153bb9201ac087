/** DTFT of a finite sequence: by FFT on a full uniform grid (folded or zero-padded), or by direct sum. */
import FFT from 'fft.js';
import type { ComplexSeries } from './impulse-response.js';

/**
 * X(w_k) = sum_n x[n] e^{-j w_k n} at w_k = 2 pi k / N, k = 0..N-1 (N a power of two >= 2),
 * by one FFT. A sequence longer than N is folded (x[n] added into n mod N), which is exact for the DTFT
 * sampled on N points; a shorter one is zero-padded.
 */
export function dtftUniform(x: ComplexSeries, n: number, weight: (k: number) => number = () => 1): ComplexSeries {
  const fft = new FFT(n);
  const input = fft.createComplexArray() as number[];
  for (let i = 0; i < x.re.length; i++) {
    const w = weight(i), m = i % n;
    input[2 * m] = (input[2 * m] ?? 0) + (x.re[i] ?? 0) * w;
    input[2 * m + 1] = (input[2 * m + 1] ?? 0) + (x.im[i] ?? 0) * w;
  }
  const out = fft.createComplexArray() as number[];
  fft.transform(out, input);
  const re = new Float64Array(n), im = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    re[k] = out[2 * k] ?? 0;
    im[k] = out[2 * k + 1] ?? 0;
  }
  return { re, im };
}

/**
 * X(w) = sum_n x[n] * weight(n) * e^{-j w n} at arbitrary angular frequencies w (radians per unit delay),
 * by Horner's rule in e^{-j w} (no trigonometric call per term).
 */
export function dtftDirect(x: ComplexSeries, omegas: Float64Array, weight: (k: number) => number = () => 1): ComplexSeries {
  const re = new Float64Array(omegas.length), im = new Float64Array(omegas.length);
  const len = x.re.length;
  const wr = new Float64Array(len), wi = new Float64Array(len);
  for (let i = 0; i < len; i++) {
    const w = weight(i);
    wr[i] = (x.re[i] ?? 0) * w;
    wi[i] = (x.im[i] ?? 0) * w;
  }
  for (let k = 0; k < omegas.length; k++) {
    const om = omegas[k] ?? 0;
    const zr = Math.cos(om), zi = -Math.sin(om);
    let ar = 0, ai = 0;
    for (let i = len - 1; i >= 0; i--) {
      const tr = ar * zr - ai * zi + (wr[i] ?? 0);
      ai = ar * zi + ai * zr + (wi[i] ?? 0);
      ar = tr;
    }
    re[k] = ar;
    im[k] = ai;
  }
  return { re, im };
}
