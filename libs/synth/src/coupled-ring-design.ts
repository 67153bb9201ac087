/** Coupled-ring band-pass: gate couplings of a chain of identical rings from the low-pass prototype. */
import { lowpassPrototype, type PrototypeKind } from './lowpass-prototype.js';
import { SynthInputError } from './synth-input-error.js';

export type CoupledRingInput = {
  kind: PrototypeKind;
  order: number;
  /** Chebyshev pass-band ripple, dB. */
  rippleDb?: number;
  /** Pass-band width, Hz: the 3 dB width (Butterworth) or the ripple width (Chebyshev). */
  bandwidthHz: number;
  /** FSR of one ring of the chain, Hz (all rings have the same perimeter). */
  ringFsrHz: number;
};

export type CoupledRingDesign = {
  /** The prototype g_0 .. g_{n+1} the design was scaled from. */
  gValues: number[];
  /** Power cross-coupling (kappa) of the input bus coupler, ring-to-ring couplers in order, output bus coupler. */
  powerCouplings: number[];
  /** External quality factors of the first and last rings, in units of the centre frequency ratio (Q_e * bandwidth / f0 = g0 g1). */
  externalQTimesFractionalBandwidth: [number, number];
  /** Normalised coupling coefficients k_{i,i+1} * f0 / bandwidth = 1 / sqrt(g_i g_{i+1}). */
  normalisedCouplings: number[];
};

/**
 * Narrow-band coupled-resonator design (Little et al., J. Lightwave Technol. 15(6), 1997, coupled-mode
 * rules; prototype scaling of Matthaei, Young & Jones 1964, ch. 8): with T = 1 / FSR and
 * dw = 2 pi B, the bus couplers need kappa^2 = T dw / (g0 g1) and T dw / (g_n g_{n+1}), and the field
 * coupling between rings i and i+1 is T dw / (2 sqrt(g_i g_{i+1})) — used here in their round-trip forms
 * kappa = 1 - exp(-T dw / (g0 g1)) and k = sin(T dw / (2 sqrt(g_i g_{i+1}))), which reduce to them for narrow bands.
 * @throws SynthInputError when the band is half the ring FSR or wider, or needs more than full ring-to-ring coupling.
 */
export function designCoupledRingBandpass(input: CoupledRingInput): CoupledRingDesign {
  const { bandwidthHz, ringFsrHz, order } = input;
  if (!(ringFsrHz > 0)) throw new SynthInputError(`synth: ringFsrHz must be positive, got ${ringFsrHz}`);
  if (!(bandwidthHz > 0 && bandwidthHz < ringFsrHz / 2)) {
    throw new SynthInputError(`synth: bandwidthHz must lie between 0 and half the ring FSR (${ringFsrHz / 2} Hz), got ${bandwidthHz}`);
  }
  const g = lowpassPrototype(input.rippleDb === undefined ? { kind: input.kind, order } : { kind: input.kind, order, rippleDb: input.rippleDb });
  const gi = (i: number): number => g[i] as number;
  const tdw = (2 * Math.PI * bandwidthHz) / ringFsrHz;
  // Round-trip forms of the coupled-mode rules: a bus coupler keeps 1 - kappa of the ring energy per round trip,
  // so T / tau_e = -ln(1 - kappa) (-> kappa for weak coupling); two rings coupled by field k split by
  // +/- asin(k) per round trip, so mu T = asin(k) (-> k). They keep the rules accurate at wider bands.
  const external = (g: number): number => 1 - Math.exp(-tdw / g);
  const couplings = [external(gi(0) * gi(1))];
  const normalised: number[] = [];
  for (let i = 1; i < order; i++) {
    const muT = tdw / (2 * Math.sqrt(gi(i) * gi(i + 1)));
    if (muT >= Math.PI / 2) throw new SynthInputError(`synth: a ${bandwidthHz} Hz band needs ring-to-ring coupling beyond full coupling; use a narrower band`);
    couplings.push(Math.sin(muT) ** 2);
    normalised.push(1 / Math.sqrt(gi(i) * gi(i + 1)));
  }
  couplings.push(external(gi(order) * gi(order + 1)));
  return {
    gValues: g,
    powerCouplings: couplings,
    externalQTimesFractionalBandwidth: [gi(0) * gi(1), gi(order) * gi(order + 1)],
    normalisedCouplings: normalised,
  };
}
