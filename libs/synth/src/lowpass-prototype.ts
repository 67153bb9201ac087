/** Low-pass prototype element values (g-values) for Butterworth and Chebyshev responses. */

import { SynthInputError } from './synth-input-error.js';

export type PrototypeKind = 'butterworth' | 'chebyshev';

export type PrototypeInput = {
  kind: PrototypeKind;
  /** Filter order n (number of reactive elements, here: coupled resonators), 1..30. */
  order: number;
  /** Pass-band ripple in dB, Chebyshev only (> 0). */
  rippleDb?: number;
};


/**
 * Returns g_0 .. g_{n+1} of the doubly terminated low-pass prototype (g_0 = 1).
 * Closed forms of Matthaei, Young & Jones, "Microwave Filters, Impedance-Matching Networks and Coupling
 * Structures", 1964, sec. 4.05, eqs. (4.05-1) (Butterworth) and (4.05-3)/(4.05-4) (Chebyshev), with
 * beta = ln(coth(L_Ar / 17.37)); for even n the Chebyshev load g_{n+1} = coth^2(beta / 4).
 */
export function lowpassPrototype({ kind, order, rippleDb }: PrototypeInput): number[] {
  if (!(Number.isInteger(order) && order >= 1 && order <= 30)) {
    throw new SynthInputError(`synth: order must be an integer from 1 to 30, got ${order}`);
  }
  const n = order;
  const a = (k: number): number => Math.sin(((2 * k - 1) * Math.PI) / (2 * n));
  if (kind === 'butterworth') {
    return [1, ...Array.from({ length: n }, (_, i) => 2 * a(i + 1)), 1];
  }
  if (rippleDb === undefined || !(Number.isFinite(rippleDb) && rippleDb > 0 && rippleDb <= 10)) {
    throw new SynthInputError(`synth: a Chebyshev prototype needs rippleDb in (0, 10], got ${rippleDb}`);
  }
  // 17.3718 = 40 / ln(10): the ripple in dB expressed in nepers times two.
  const beta = Math.log(1 / Math.tanh(rippleDb / (40 / Math.LN10)));
  const gamma = Math.sinh(beta / (2 * n));
  const b = (k: number): number => gamma ** 2 + Math.sin((k * Math.PI) / n) ** 2;
  const g = [1, (2 * a(1)) / gamma];
  for (let k = 2; k <= n; k++) {
    g.push((4 * a(k - 1) * a(k)) / (b(k - 1) * (g[k - 1] as number)));
  }
  g.push(n % 2 === 1 ? 1 : 1 / Math.tanh(beta / 4) ** 2);
  return g;
}
