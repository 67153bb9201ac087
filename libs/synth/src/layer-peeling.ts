/** Layer peeling: the couplers and phases of a Mach–Zehnder lattice that realise a pair A(z), B(z). */
import { cAbs, cAdd, cArg, cConj, cExpj, cMul, cScale, cx, type Complex } from './complex.js';
import type { LatticeParameters } from './lattice-response.js';
import { complementaryPolynomial } from './spectral-factor.js';

const j = cx(0, 1);

/**
 * Peels one coupler and one delay stage at a time from the last coupler back (Jinguji & Kawachi,
 * J. Lightwave Technol. 13(1), 1995, sec. III; Madsen & Zhao 1999, sec. 4.5). At stage n the inverse coupler
 * C_n^H = [[c, j s], [j s, c]] must leave A' = c A + j s B without a constant term and B' = j s A + c B of
 * degree n - 1; tan(theta_n) = j b_n[n] / a_n[n]. The delay phase phi_n is chosen so the next ratio is again
 * purely imaginary, which keeps every theta real.
 */
export function peelLattice(aIn: readonly Complex[], bIn?: readonly Complex[]): LatticeParameters {
  const n = aIn.length - 1;
  let a = [...aIn];
  let b = bIn ? [...bIn] : complementaryPolynomial(aIn);
  // The forward recursion makes b[N] / a[N] purely imaginary; a B from the spectral factorisation has a free
  // phase, so turn it onto the nearer imaginary half-axis (a given B is already there and is left alone).
  const topRatio = cMul(b[n] as Complex, cConj(a[n] as Complex));
  if (cAbs(topRatio) > 0) {
    const arg = cArg(topRatio);
    const target = arg >= 0 ? Math.PI / 2 : -Math.PI / 2;
    b = b.map((v) => cMul(v, cExpj(target - arg)));
  }
  const angles: number[] = new Array<number>(n + 1).fill(0);
  const phases: number[] = new Array<number>(n).fill(0);
  for (let k = n; k >= 1; k--) {
    // Two equivalent conditions fix theta: the top coefficients (tan = j b[k] / a[k]) and the constant terms
    // (tan = j a[0] / b[0]); use the better conditioned one.
    const top = a[k] as Complex;
    const bottom = b[0] as Complex;
    const useTop = cAbs(top) ** 2 + cAbs(b[k] as Complex) ** 2 >= cAbs(a[0] as Complex) ** 2 + cAbs(bottom) ** 2;
    const theta = useTop
      ? Math.atan2(cMul(cMul(j, b[k] as Complex), cConj(top)).re, cAbs(top) ** 2)
      : Math.atan2(cMul(cMul(j, a[0] as Complex), cConj(bottom)).re, cAbs(bottom) ** 2);
    const c = Math.cos(theta);
    const s = Math.sin(theta);
    const aNext = a.map((v, i) => cAdd(cScale(v, c), cMul(cx(0, s), b[i] as Complex)));
    const bNext = a.map((v, i) => cAdd(cMul(cx(0, s), v), cScale(b[i] as Complex, c)));
    const shifted = aNext.slice(1);
    const bLower = bNext.slice(0, k);
    // The next stage needs b/a purely imaginary: -j|.| at the top, +j|.| at the constant terms
    // (paraunitarity: rho_top * conj(rho_bottom) = -1); again take the better conditioned pair.
    const ratioTop = cMul(bLower[k - 1] as Complex, cConj(shifted[k - 1] as Complex));
    const ratioBottom = cMul(bLower[0] as Complex, cConj(shifted[0] as Complex));
    const phi =
      k - 1 === 0 || cAbs(ratioTop) >= cAbs(ratioBottom)
        ? cAbs(ratioTop) > 0 ? cArg(ratioTop) + Math.PI / 2 : 0
        : cArg(ratioBottom) - Math.PI / 2;
    const rot = cExpj(phi);
    a = shifted.map((v) => cMul(v, rot));
    b = bLower;
    angles[k] = theta;
    phases[k - 1] = phi;
  }
  const a0 = a[0] as Complex;
  const b0 = b[0] as Complex;
  const globalPhaseRad = cArg(a0);
  angles[0] = Math.atan2(cAbs(b0), cAbs(a0));
  return { couplerAnglesRad: angles, stagePhasesRad: phases, globalPhaseRad };
}
