/** Minimal complex arithmetic on { re, im } pairs for the polynomial work of the lattice synthesis. */

export type Complex = { re: number; im: number };

export const cx = (re: number, im = 0): Complex => ({ re, im });
export const cAdd = (a: Complex, b: Complex): Complex => ({ re: a.re + b.re, im: a.im + b.im });
export const cSub = (a: Complex, b: Complex): Complex => ({ re: a.re - b.re, im: a.im - b.im });
export const cMul = (a: Complex, b: Complex): Complex => ({ re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re });
export const cScale = (a: Complex, s: number): Complex => ({ re: a.re * s, im: a.im * s });
export const cConj = (a: Complex): Complex => ({ re: a.re, im: -a.im });
export const cAbs = (a: Complex): number => Math.hypot(a.re, a.im);
export const cArg = (a: Complex): number => Math.atan2(a.im, a.re);
export const cExpj = (phaseRad: number): Complex => ({ re: Math.cos(phaseRad), im: Math.sin(phaseRad) });
export function cDiv(a: Complex, b: Complex): Complex {
  const d = b.re * b.re + b.im * b.im;
  return { re: (a.re * b.re + a.im * b.im) / d, im: (a.im * b.re - a.re * b.im) / d };
}

/** Evaluates sum_k c[k] x^k (Horner). */
export function polyEval(c: readonly Complex[], x: Complex): Complex {
  let acc = cx(0);
  for (let k = c.length - 1; k >= 0; k--) acc = cAdd(cMul(acc, x), c[k] as Complex);
  return acc;
}

/** Value of sum_n c[n] z^-n on the unit circle at normalised angle w (rad per delay step). */
export function polyOnCircle(c: readonly Complex[], wRad: number): Complex {
  let re = 0;
  let im = 0;
  c.forEach((value, n) => {
    const cs = Math.cos(wRad * n);
    const sn = -Math.sin(wRad * n);
    re += value.re * cs - value.im * sn;
    im += value.re * sn + value.im * cs;
  });
  return { re, im };
}
