// maskShapes: limit lines and fail bands of pass, stop and delay regions on a known curve.
import type { Mask } from '@hexloom/contracts';
import { describe, expect, it } from 'vitest';
import { syntheticSpectrum } from '../testing/ringNotchContent.js';
import { maskShapes } from './maskShapes.js';
import { traceSeries } from './traceSeries.js';

// A Lorentzian-like notch at +3 GHz, 0 dB far away: |H|^2 = 1 - 0.99 / (1 + ((f - 3 GHz) / 0.2 GHz)^2).
const offsets = Array.from({ length: 401 }, (_, i) => (i - 200) * 0.05e9);
const field = offsets.map((f) => Math.sqrt(1 - 0.99 / (1 + ((f - 3e9) / 0.2e9) ** 2)));
const spectrum = syntheticSpectrum({ offsetsHz: offsets, re: field, im: offsets.map(() => 0), groupDelayPs: offsets.map((f) => 100 + (f > 5e9 && f < 6e9 ? 20 : 0)) });
const options = { referenceFrequencyHz: 193.4e12, linear: false, rfScheme: 'imdd' as const };

describe('maskShapes', () => {
  it('shades nothing where a stop band is deep enough, and the stretch beside the notch where it is too wide', () => {
    const mask: Mask = { regions: [{ kind: 'stop', range: { fromHz: 2.95e9, toHz: 3.05e9 }, minRejectionDb: 10 }, { kind: 'stop', range: { fromHz: 2.5e9, toHz: 3.5e9 }, minRejectionDb: 10 }] };
    const [deep, wide] = maskShapes(mask, [spectrum], () => traceSeries(spectrum, 'transmission', options), 'transmission', false);
    expect(deep?.limits[0]?.side).toBe('max');
    // The peak of the whole curve (no pass region) is 0 dB to within 0.002 dB far from the notch.
    expect(deep?.limits[0]?.y).toBeCloseTo(-10, 2);
    expect(deep?.fails).toEqual([]);
    // -10 dB is reached where 0.99 / (1 + u^2) = 0.9, u = 0.316 (0.063 GHz from the centre): outside that the band fails.
    expect(wide?.fails.length).toBe(2);
    expect(wide?.fails[0]?.x1Ghz).toBeGreaterThan(2.9);
    expect(wide?.fails[0]?.x1Ghz).toBeLessThan(2.96);
  });

  it('fails a pass band whose insertion-loss limit the notch breaks, and converts the limit to a power ratio in the linear view', () => {
    const mask: Mask = { regions: [{ kind: 'pass', range: { fromHz: 2e9, toHz: 4e9 }, maxInsertionLossDb: 3 }] };
    const [db] = maskShapes(mask, [spectrum], () => traceSeries(spectrum, 'transmission', options), 'transmission', false);
    expect(db?.fails.length).toBe(1);
    const [linear] = maskShapes(mask, [spectrum], () => traceSeries(spectrum, 'transmission', options), 'transmission', true);
    expect(linear?.limits[0]?.y).toBeCloseTo(10 ** -0.3, 12);
  });

  it('checks a delay band on the group-delay view only, failing the 20 ps step against a 10 ps ripple limit', () => {
    const mask: Mask = { regions: [{ kind: 'delay', range: { fromHz: 4e9, toHz: 7e9 }, maxDelayRipplePs: 10 }] };
    expect(maskShapes(mask, [spectrum], () => traceSeries(spectrum, 'transmission', options), 'transmission', false)).toEqual([]);
    const [delay] = maskShapes(mask, [spectrum], () => traceSeries(spectrum, 'delay', options), 'delay', false);
    expect(delay?.fails.length).toBeGreaterThan(0);
  });
});
