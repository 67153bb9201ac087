/** Ring resonator equations: all-pass and add-drop transmission, width, finesse and delay. */

/**
 * Power transmission of an all-pass ring at round-trip phase `phaseRad`:
 * T = (a^2 - 2 a r cos(phi) + r^2) / (1 - 2 a r cos(phi) + (a r)^2)
 * (Yariv, Electron. Lett. 36(4), 2000; Rabus, Integrated Ring Resonators, Springer 2007, ch. 2).
 * `a` = round-trip field amplitude, `r` = self-coupling field amplitude of the bus coupler.
 */
export function ringAllPassPower(a: number, r: number, phaseRad: number): number {
  const c = Math.cos(phaseRad);
  return (a * a - 2 * a * r * c + r * r) / (1 - 2 * a * r * c + (a * r) ** 2);
}

/** Notch depth at resonance (linear power): (r - a)^2 / (1 - a r)^2 (Rabus 2007, ch. 2). */
export function ringAllPassMinimum(a: number, r: number): number {
  return (r - a) ** 2 / (1 - a * r) ** 2;
}

/**
 * Full width of a ring resonance at half depth, as a fraction of the FSR, for the round-trip product
 * x = a r (all-pass) or x = r1 r2 a (add-drop): 4 asin((1 - x) / (2 sqrt(x))) / (2 pi).
 * For a high finesse this is (1 - x) / (pi sqrt(x)) (Rabus 2007, ch. 2).
 */
export function ringWidthFraction(x: number): number {
  return (4 * Math.asin(Math.min(1, (1 - x) / (2 * Math.sqrt(x))))) / (2 * Math.PI);
}

/** Finesse = FSR / FWHM for the round-trip product x (Rabus 2007, ch. 2, exact half-depth width). */
export function ringFinesse(x: number): number {
  return 1 / ringWidthFraction(x);
}

/**
 * Group delay of an all-pass ring at resonance, in round trips:
 * a (1 - r^2) / ((a - r)(1 - a r)). Positive when over-coupled (r < a), negative when under-coupled
 * (r > a) (derived from the phase of Yariv 2000 eq. 5; see Heebner et al., Optical Microresonators, 2008).
 */
export function ringAllPassDelayAtResonance(a: number, r: number): number {
  return (a * (1 - r * r)) / ((a - r) * (1 - a * r));
}

/**
 * Through and drop power of an add-drop ring at round-trip phase `phaseRad` (Rabus 2007, ch. 2):
 * through = (r2^2 a^2 - 2 r1 r2 a cos + r1^2) / D, drop = (1 - r1^2)(1 - r2^2) a / D,
 * D = 1 - 2 r1 r2 a cos + (r1 r2 a)^2, with the drop coupler half way round the ring.
 */
export function ringAddDropPower(a: number, r1: number, r2: number, phaseRad: number): { through: number; drop: number } {
  const c = Math.cos(phaseRad);
  const d = 1 - 2 * r1 * r2 * a * c + (r1 * r2 * a) ** 2;
  return {
    through: (r2 * r2 * a * a - 2 * r1 * r2 * a * c + r1 * r1) / d,
    drop: ((1 - r1 * r1) * (1 - r2 * r2) * a) / d,
  };
}
