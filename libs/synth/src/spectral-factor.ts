/** Spectral factorisation: the cross polynomial B(z) with |A|^2 + |B|^2 = 1 on the unit circle. */
import { cAbs, cConj, cMul, cScale, cSub, cx, polyOnCircle, type Complex } from './complex.js';
import { polynomialRoots } from './polynomial-roots.js';
import { SynthInputError } from './synth-input-error.js';

/**
 * Returns the minimum-phase B(z) of degree N such that |A(e^jw)|^2 + |B(e^jw)|^2 = 1 (the power-complementary
 * partner of a lossless two-port; Madsen & Zhao 1999, sec. 4.5, spectral factorisation of 1 - A A~).
 * Roots of the palindromic product come in pairs (x, 1/conj(x)); the ones outside the unit circle in x = z^-1 are kept.
 * @throws SynthInputError when |A| exceeds 1 somewhere (no passive lattice can realise it).
 */
export function complementaryPolynomial(a: readonly Complex[]): Complex[] {
  const n = a.length - 1;
  const grid = 512 + 16 * n;
  let peak = 0;
  let bestW = 0;
  let bestQ = -Infinity;
  for (let k = 0; k < grid; k++) {
    const w = (2 * Math.PI * k) / grid;
    const magnitude = cAbs(polyOnCircle(a, w)) ** 2;
    peak = Math.max(peak, magnitude);
    if (1 - magnitude > bestQ) {
      bestQ = 1 - magnitude;
      bestW = w;
    }
  }
  if (peak > 1 + 1e-12) throw new SynthInputError(`synth: |A|^2 reaches ${peak.toFixed(6)} > 1; scale the target below 1`);
  if (n === 0) return [cx(Math.sqrt(Math.max(0, 1 - cAbs(a[0] as Complex) ** 2)))];
  // q_k, k = -N..N: coefficient of z^-k in 1 - A(z) conj(A)(1/z*); P(x) = sum q_k x^(k+N).
  const p: Complex[] = [];
  for (let k = -n; k <= n; k++) {
    let sum = cx(k === 0 ? 1 : 0);
    for (let l = 0; l <= n; l++) {
      const i = l + k;
      if (i >= 0 && i <= n) sum = cSub(sum, cMul(a[i] as Complex, cConj(a[l] as Complex)));
    }
    p.push(sum);
  }
  const roots = polynomialRoots(p).sort((x, y) => cAbs(y) - cAbs(x));
  const kept = roots.slice(0, n);
  // B(x) = beta * prod (x - x_i): expand the product into coefficients of x^0..x^N.
  let coeffs: Complex[] = [cx(1)];
  for (const root of kept) {
    const next: Complex[] = Array.from({ length: coeffs.length + 1 }, () => cx(0));
    coeffs.forEach((v, k) => {
      next[k + 1] = { re: (next[k + 1] as Complex).re + v.re, im: (next[k + 1] as Complex).im + v.im };
      const t = cMul(v, root);
      next[k] = cSub(next[k] as Complex, t);
    });
    coeffs = next;
  }
  const atBest = cAbs(polyOnCircle(coeffs, bestW));
  const beta = Math.sqrt(Math.max(bestQ, 0)) / atBest;
  return coeffs.map((v) => cScale(v, beta));
}

/** Largest deviation of |A|^2 + |B|^2 from 1 over `points` frequencies (a check of power complementarity). */
export function complementarityError(a: readonly Complex[], b: readonly Complex[], points = 256): number {
  let worst = 0;
  for (let k = 0; k < points; k++) {
    const w = (2 * Math.PI * k) / points;
    worst = Math.max(worst, Math.abs(cAbs(polyOnCircle(a, w)) ** 2 + cAbs(polyOnCircle(b, w)) ** 2 - 1));
  }
  return worst;
}

