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
 * coupling between rings i and i+1 is T dw / (2 sqrt(g_i g_{i+1})).
 * @throws SynthInputError when the band is so wide that a coupler would exceed full coupling.
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
  const couplings = [tdw / (gi(0) * gi(1))];
  const normalised: number[] = [];
  for (let i = 1; i < order; i++) {
    const field = tdw / (2 * Math.sqrt(gi(i) * gi(i + 1)));
    couplings.push(field * field);
    normalised.push(1 / Math.sqrt(gi(i) * gi(i + 1)));
  }
  couplings.push(tdw / (gi(order) * gi(order + 1)));
  const worst = Math.max(...couplings);
  if (worst >= 1) {
    throw new SynthInputError(`synth: a ${bandwidthHz} Hz band needs a coupler beyond full coupling (kappa = ${worst.toFixed(3)}); use a narrower band or smaller rings`);
  }
  return {
    gValues: g,
    powerCouplings: couplings,
    externalQTimesFractionalBandwidth: [gi(0) * gi(1), gi(order) * gi(order + 1)],
    normalisedCouplings: normalised,
  };
}
