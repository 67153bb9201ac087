// rfFromSpectrum: the IM-DD and single-sideband RF response from the sampled optical response.
import { rfResponse, spectrumFromImpulse } from '@hexloom/solver';
import { describe, expect, it } from 'vitest';
import { rfFromSpectrum } from './rfFromSpectrum.js';

const offsets = Array.from({ length: 401 }, (_, i) => (i - 200) * 0.1e9);

describe('rfFromSpectrum', () => {
  it('loses twice the optical loss in dB for a flat response: 0.5 in field (-6 dB optical) is -12 dB RF (common practice: IM-DD RF gain goes as optical power squared)', () => {
    const sut = rfFromSpectrum({ offsetsHz: offsets, re: offsets.map(() => 0.5), im: offsets.map(() => 0) }, 0, 'imdd');
    expect(sut.rfFrequenciesHz.at(-1)).toBeCloseTo(20e9, 0);
    sut.gainDb.forEach((g) => expect(g).toBeCloseTo(40 * Math.log10(0.5), 12));
  });

  it('fades as cos(beta F^2) under a quadratic (dispersive) phase in IM-DD (Capmany & Novak, Nature Photonics 1, 2007: dispersion-induced RF power fading)', () => {
    const beta = 2e-20; // rad / Hz^2: the first null at F = sqrt(pi / (2 beta)), about 8.9 GHz
    const sut = rfFromSpectrum({ offsetsHz: offsets, re: offsets.map((f) => Math.cos(beta * f * f)), im: offsets.map((f) => -Math.sin(beta * f * f)) }, 0, 'imdd');
    sut.rfFrequenciesHz.forEach((F, i) => {
      expect(sut.re[i]).toBeCloseTo(Math.cos(beta * F * F), 9);
      expect(sut.im[i]).toBeCloseTo(0, 9);
    });
  });

  it('sees no fading in single sideband under the same phase: |H_RF| stays 1 (Yao, J. Lightwave Technol. 27(3), 2009)', () => {
    const beta = 2e-20;
    const sut = rfFromSpectrum({ offsetsHz: offsets, re: offsets.map((f) => Math.cos(beta * f * f)), im: offsets.map((f) => -Math.sin(beta * f * f)) }, 0, 'ssb-upper');
    sut.gainDb.forEach((g) => expect(g).toBeCloseTo(0, 9));
  });

  it('agrees with the solver rfResponse on grid tones for a three-tap impulse', () => {
    const impulse = { re: Float64Array.of(0.6, 0.2, -0.1), im: Float64Array.of(0, 0.3, 0.05) };
    const unitDelayS = 9.1e-12;
    const s = spectrumFromImpulse({ impulse, grid: { kind: 'list', offsetsHz: offsets }, unitDelayS, referenceFrequencyHz: 193.4e12 });
    const sut = rfFromSpectrum({ offsetsHz: offsets, re: Array.from(s.re), im: Array.from(s.im) }, 0, 'imdd');
    const expected = rfResponse({ impulse, unitDelayS, carrierOffsetHz: 0, rfFrequenciesHz: Float64Array.from(sut.rfFrequenciesHz), scheme: 'imdd' });
    sut.re.forEach((r, i) => {
      expect(r).toBeCloseTo(expected.re[i] as number, 9);
      expect(sut.im[i]).toBeCloseTo(expected.im[i] as number, 9);
    });
  });
});
