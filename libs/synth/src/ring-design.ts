/** Designs the coupling of an all-pass (notch) or add-drop ring for a notch depth or a bandwidth. */
import { ringAllPassDelayAtResonance, ringAllPassMinimum, ringFinesse, ringWidthFraction } from './ring-equations.js';
import { SynthInputError } from './synth-input-error.js';

export type RingCouplingRegime = 'under' | 'critical' | 'over';

export type RingTarget =
  | { kind: 'notch-depth'; depthDb: number; regime: 'under' | 'over' }
  | { kind: 'critical' }
  | { kind: 'bandwidth'; fwhmHz: number };

export type RingDesignInput = {
  /** Free spectral range of the ring, Hz (1 / (perimeter * unit delay)). */
  fsrHz: number;
  /** Optical loss of one round trip, dB (gates and waveguide). */
  roundTripLossDb: number;
  target: RingTarget;
};

export type RingDesign = {
  /** Round-trip field amplitude a = 10^(-loss/20). */
  roundTripAmplitude: number;
  /** Self-coupling field amplitude r of the bus coupler. */
  selfCoupling: number;
  /** Power cross-coupling kappa = 1 - r^2 of the bus coupler (lossless coupler). */
  powerCoupling: number;
  regime: RingCouplingRegime;
  /** Notch depth at resonance, dB below the off-resonance level (Infinity at critical coupling). */
  notchDepthDb: number;
  fwhmHz: number;
  finesse: number;
  /** Group delay at resonance in round trips (sign tells over- from under-coupling). */
  delayAtResonanceRoundTrips: number;
};

const amplitudeFromLossDb = (lossDb: number): number => 10 ** (-lossDb / 20);

/**
 * Solves r for an all-pass ring: from the notch depth (r - a)^2 / (1 - a r)^2 = D, or from the width
 * (1 - a r) / sqrt(a r) = 2 sin(pi FWHM / (2 FSR)) (Rabus, Integrated Ring Resonators, 2007, ch. 2).
 * @throws SynthInputError when the target cannot be met with this loss (e.g. a band narrower than the loss allows).
 */
export function designAllPassRing({ fsrHz, roundTripLossDb, target }: RingDesignInput): RingDesign {
  if (!(fsrHz > 0 && Number.isFinite(fsrHz))) throw new SynthInputError(`synth: fsrHz must be positive, got ${fsrHz}`);
  if (!(roundTripLossDb > 0 && Number.isFinite(roundTripLossDb))) {
    throw new SynthInputError(`synth: roundTripLossDb must be positive (a lossless ring has no notch), got ${roundTripLossDb}`);
  }
  const a = amplitudeFromLossDb(roundTripLossDb);
  let r: number;
  if (target.kind === 'critical') r = a;
  else if (target.kind === 'notch-depth') {
    if (!(target.depthDb > 0)) throw new SynthInputError(`synth: depthDb must be positive, got ${target.depthDb}`);
    const s = 10 ** (-target.depthDb / 20);
    if (target.regime === 'under') r = (a + s) / (1 + a * s);
    else {
      if (s >= a) throw new SynthInputError(`synth: a ${target.depthDb} dB over-coupled notch needs less loss than ${roundTripLossDb} dB per round trip`);
      r = (a - s) / (1 - a * s);
    }
  } else {
    const fraction = target.fwhmHz / fsrHz;
    if (!(fraction > 0 && fraction < 0.5)) {
      throw new SynthInputError(`synth: fwhmHz must lie between 0 and half the FSR (${fsrHz / 2} Hz), got ${target.fwhmHz}`);
    }
    const c = 2 * Math.sin((Math.PI * fraction) / 2);
    const u = (-c + Math.sqrt(c * c + 4)) / 2;
    r = (u * u) / a;
    if (r >= 1) {
      const narrowest = ringWidthFraction(a) * fsrHz;
      throw new SynthInputError(`synth: a ${target.fwhmHz} Hz wide resonance is narrower than the loss allows (narrowest ${narrowest.toFixed(0)} Hz)`);
    }
  }
  return describeAllPassRing(a, r, fsrHz);
}

/** Figures of an all-pass ring with round-trip amplitude `a` and self-coupling `r`. */
export function describeAllPassRing(a: number, r: number, fsrHz: number): RingDesign {
  const depth = ringAllPassMinimum(a, r);
  const regime: RingCouplingRegime = Math.abs(r - a) < 1e-12 ? 'critical' : r > a ? 'under' : 'over';
  return {
    roundTripAmplitude: a,
    selfCoupling: r,
    powerCoupling: 1 - r * r,
    regime,
    notchDepthDb: depth === 0 ? Infinity : -10 * Math.log10(depth),
    fwhmHz: ringWidthFraction(a * r) * fsrHz,
    finesse: ringFinesse(a * r),
    delayAtResonanceRoundTrips: regime === 'critical' ? Infinity : ringAllPassDelayAtResonance(a, r),
  };
}

export type AddDropDesign = {
  roundTripAmplitude: number;
  /** Self-coupling of the input (r1) and drop (r2) couplers; equal by design. */
  selfCoupling: number;
  powerCoupling: number;
  fwhmHz: number;
  finesse: number;
  /** Drop power at resonance (linear) and through-port rejection at resonance (dB). */
  dropPeak: number;
  throughRejectionDb: number;
};

/**
 * Symmetric add-drop ring (r1 = r2) for a drop bandwidth: r1 r2 a from the width equation, then
 * drop peak (1 - r^2)^2 a / (1 - r^2 a)^2 and through minimum (r a - r)^2 / (1 - r^2 a)^2 (Rabus 2007, ch. 2).
 */
export function designAddDropRing(input: { fsrHz: number; roundTripLossDb: number; fwhmHz: number }): AddDropDesign {
  const { fsrHz, roundTripLossDb, fwhmHz } = input;
  if (!(roundTripLossDb >= 0)) throw new SynthInputError(`synth: roundTripLossDb must be >= 0, got ${roundTripLossDb}`);
  const a = amplitudeFromLossDb(roundTripLossDb);
  const fraction = fwhmHz / fsrHz;
  if (!(fraction > 0 && fraction < 0.5)) throw new SynthInputError(`synth: fwhmHz must lie between 0 and half the FSR, got ${fwhmHz}`);
  const c = 2 * Math.sin((Math.PI * fraction) / 2);
  const u = (-c + Math.sqrt(c * c + 4)) / 2;
  const r = Math.sqrt((u * u) / a);
  if (r >= 1) throw new SynthInputError(`synth: a ${fwhmHz} Hz drop band is narrower than the loss allows`);
  const d = (1 - r * r * a) ** 2;
  const throughMin = (r * a - r) ** 2 / d;
  return {
    roundTripAmplitude: a,
    selfCoupling: r,
    powerCoupling: 1 - r * r,
    fwhmHz: ringWidthFraction(r * r * a) * fsrHz,
    finesse: ringFinesse(r * r * a),
    dropPeak: ((1 - r * r) ** 2 * a) / d,
    throughRejectionDb: throughMin === 0 ? Infinity : -10 * Math.log10(throughMin),
  };
}
