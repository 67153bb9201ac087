/** Roots of a complex polynomial by the Aberth–Ehrlich iteration, polished with Newton steps. */
import { cAbs, cAdd, cDiv, cExpj, cMul, cScale, cSub, cx, polyEval, type Complex } from './complex.js';

/**
 * All roots of sum_k c[k] x^k (c[last] != 0), Aberth–Ehrlich simultaneous iteration
 * (Aberth, Math. Comp. 27, 1973); converges cubically for simple roots. Deterministic start points on a
 * circle of the Cauchy-bound radius, so the result never depends on a random seed.
 */
export function polynomialRoots(c: readonly Complex[], maxIterations = 500): Complex[] {
  let coeffs = [...c];
  while (coeffs.length > 1 && cAbs(coeffs[coeffs.length - 1] as Complex) === 0) coeffs = coeffs.slice(0, -1);
  const degree = coeffs.length - 1;
  if (degree < 1) return [];
  const lead = coeffs[degree] as Complex;
  const monic = coeffs.map((v) => cDiv(v, lead));
  const derivative = monic.slice(1).map((v, k) => cScale(v, k + 1));
  const radius = 1 + Math.max(...monic.slice(0, degree).map(cAbs));
  const start = Math.min(radius, 2);
  let z = Array.from({ length: degree }, (_, k) => cScale(cExpj((2 * Math.PI * k) / degree + 0.4), start * (0.5 + (0.5 * (k + 1)) / degree)));
  for (let it = 0; it < maxIterations; it++) {
    let moved = 0;
    const next = z.map((zi, i) => {
      const ratio = cDiv(polyEval(monic, zi), polyEval(derivative, zi));
      let sum = cx(0);
      z.forEach((zj, j) => {
        if (j !== i) sum = cAdd(sum, cDiv(cx(1), cSub(zi, zj)));
      });
      const step = cDiv(ratio, cSub(cx(1), cMul(ratio, sum)));
      const finite = Number.isFinite(step.re) && Number.isFinite(step.im);
      const delta = finite ? step : cx(0);
      moved = Math.max(moved, cAbs(delta) / Math.max(1, cAbs(zi)));
      return cSub(zi, delta);
    });
    z = next;
    if (moved < 1e-15) break;
  }
  return z;
}
