/** Forward response of a Mach–Zehnder lattice: the bar/cross polynomials A(z), B(z) from couplers and phases. */
import { cAdd, cExpj, cMul, cScale, cx, type Complex } from './complex.js';

/**
 * A lattice of N + 1 couplers and N delay stages. Coupler n has field bar amplitude cos(theta_n) and cross
 * -j sin(theta_n) (power cross-coupling kappa_n = sin^2(theta_n)); stage n delays the upper arm by one lattice
 * unit z^-1 with the extra phase exp(-j phi_n). `globalPhaseRad` multiplies everything.
 */
export type LatticeParameters = {
  couplerAnglesRad: number[];
  stagePhasesRad: number[];
  globalPhaseRad: number;
};

/** Coefficients of A(z) = sum a[n] z^-n (through path) and B(z) (cross path) for light entering port 1. */
export type LatticePolynomials = { a: Complex[]; b: Complex[] };

/**
 * [A_n; B_n] = C_n D_n [A_{n-1}; B_{n-1}], C = [[c, -j s], [-j s, c]], D = diag(z^-1 e^{-j phi}, 1)
 * (Madsen & Zhao, Optical Filter Design and Analysis, 1999, sec. 4.5; Jinguji & Kawachi, JLT 13(1), 1995).
 */
export function latticeResponse({ couplerAnglesRad, stagePhasesRad, globalPhaseRad }: LatticeParameters): LatticePolynomials {
  const g = cExpj(globalPhaseRad);
  const theta0 = couplerAnglesRad[0] ?? 0;
  let a: Complex[] = [cScale(g, Math.cos(theta0))];
  let b: Complex[] = [cMul(g, cx(0, -Math.sin(theta0)))];
  for (let n = 1; n < couplerAnglesRad.length; n++) {
    const c = Math.cos(couplerAnglesRad[n] as number);
    const s = Math.sin(couplerAnglesRad[n] as number);
    const rot = cExpj(-(stagePhasesRad[n - 1] ?? 0));
    const delayed = [cx(0), ...a.map((v) => cMul(v, rot))];
    const bPadded = [...b, cx(0)];
    a = delayed.map((v, k) => cAdd(cScale(v, c), cMul(cx(0, -s), bPadded[k] as Complex)));
    b = delayed.map((v, k) => cAdd(cMul(cx(0, -s), v), cScale(bPadded[k] as Complex, c)));
  }
  return { a, b };
}
