import { describe, expect, it } from 'vitest';
import { designAddDropRing, designAllPassRing, designCoupledRingBandpass, ringAddDropPower, ringAllPassPower, SynthInputError } from './index.js';

const FSR_HZ = 18.3e9;

describe('designAllPassRing', () => {
  it('meets a requested notch depth, under- and over-coupled', () => {
    for (const regime of ['under', 'over'] as const) {
      const design = designAllPassRing({ fsrHz: FSR_HZ, roundTripLossDb: 1.5, target: { kind: 'notch-depth', depthDb: 20, regime } });
      // Notch depth (r - a)^2 / (1 - a r)^2 at resonance (Rabus 2007, ch. 2).
      const tMin = ringAllPassPower(design.roundTripAmplitude, design.selfCoupling, 0);
      expect(-10 * Math.log10(tMin)).toBeCloseTo(20, 9);
      expect(design.regime).toBe(regime);
    }
  });

  it('gives a positive delay at resonance when over-coupled and a negative one when under-coupled', () => {
    // Sign of the all-pass group delay at resonance (Heebner et al., Optical Microresonators, 2008, ch. 3).
    const over = designAllPassRing({ fsrHz: FSR_HZ, roundTripLossDb: 0.5, target: { kind: 'notch-depth', depthDb: 6, regime: 'over' } });
    const under = designAllPassRing({ fsrHz: FSR_HZ, roundTripLossDb: 0.5, target: { kind: 'notch-depth', depthDb: 6, regime: 'under' } });
    expect(over.delayAtResonanceRoundTrips).toBeGreaterThan(0);
    expect(under.delayAtResonanceRoundTrips).toBeLessThan(0);
  });

  it('meets a requested FWHM measured on the transmission curve itself', () => {
    const design = designAllPassRing({ fsrHz: FSR_HZ, roundTripLossDb: 0.3, target: { kind: 'bandwidth', fwhmHz: 600e6 } });
    const { roundTripAmplitude: a, selfCoupling: r } = design;
    const tMin = ringAllPassPower(a, r, 0);
    const halfDepth = (1 + tMin) / 2;
    // Half-depth points at +/- FWHM/2: phase = 2 pi f / FSR (common practice).
    const edge = ringAllPassPower(a, r, (2 * Math.PI * 300e6) / FSR_HZ);
    expect(edge).toBeCloseTo(halfDepth, 9);
    // High-finesse width (1 - ar) FSR / (pi sqrt(ar)) (Rabus 2007, ch. 2) within 1 %.
    expect(((1 - a * r) * FSR_HZ) / (Math.PI * Math.sqrt(a * r))).toBeCloseTo(600e6, -7);
  });

  it('refuses a band narrower than the loss allows, naming the width', () => {
    expect(() => designAllPassRing({ fsrHz: FSR_HZ, roundTripLossDb: 3, target: { kind: 'bandwidth', fwhmHz: 1e6 } })).toThrow(SynthInputError);
  });
});

describe('designAddDropRing', () => {
  it('drops the requested band with the drop peak of the add-drop equations', () => {
    const design = designAddDropRing({ fsrHz: FSR_HZ, roundTripLossDb: 0.2, fwhmHz: 1e9 });
    const { roundTripAmplitude: a, selfCoupling: r } = design;
    // Add-drop through/drop equations (Rabus 2007, ch. 2).
    expect(ringAddDropPower(a, r, r, 0).drop).toBeCloseTo(design.dropPeak, 12);
    const half = ringAddDropPower(a, r, r, (2 * Math.PI * 0.5e9) / FSR_HZ).drop;
    expect(half).toBeCloseTo(design.dropPeak / 2, 9);
  });
});

describe('designCoupledRingBandpass', () => {
  it('reduces to the single add-drop ring for order 1: B = FSR kappa / pi', () => {
    // Lossless symmetric add-drop ring, high finesse: FWHM = FSR kappa / pi (Little et al., JLT 15(6), 1997, narrow-band limit).
    const design = designCoupledRingBandpass({ kind: 'butterworth', order: 1, bandwidthHz: 5e6, ringFsrHz: FSR_HZ });
    expect(design.powerCouplings).toHaveLength(2);
    expect(design.powerCouplings[0]! / ((Math.PI * 5e6) / FSR_HZ)).toBeCloseTo(1, 3);
  });

  it('makes a second-order Butterworth chain maximally flat: mu = 1 / tau_e', () => {
    // Coupled-mode theory of two coupled resonators: flat when the mutual coupling equals the external decay rate
    // (coupled-mode theory as in Little et al. 1997; from memory: second-order maximally flat when mu = 1/tau).
    const design = designCoupledRingBandpass({ kind: 'butterworth', order: 2, bandwidthHz: 800e6, ringFsrHz: FSR_HZ });
    const period = 1 / FSR_HZ;
    const invTauE = -Math.log(1 - (design.powerCouplings[0] as number)) / (2 * period);
    const mu = Math.asin(Math.sqrt(design.powerCouplings[1] as number)) / period;
    expect(mu / invTauE).toBeCloseTo(1, 12);
    expect(design.normalisedCouplings[0]).toBeCloseTo(1 / Math.SQRT2, 12);
  });

  it('refuses a band of half the ring FSR or more, naming the limit', () => {
    expect(() => designCoupledRingBandpass({ kind: 'chebyshev', order: 4, rippleDb: 0.5, bandwidthHz: 9.2e9, ringFsrHz: FSR_HZ })).toThrow(/half the ring FSR/);
  });
});
