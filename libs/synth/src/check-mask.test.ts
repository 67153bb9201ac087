import { describe, expect, it } from 'vitest';
import { checkMask } from './check-mask.js';
import { responseFigures } from './response-figures.js';
import type { SampledResponse } from './mask-types.js';

/** A Butterworth |H|^2 = 1 / (1 + (f/fc)^(2n)) sampled from -4 to +4 GHz (common practice closed form). */
function butterworth(order: number, cutoffHz: number, lossDb = 0): SampledResponse {
  const frequencyHz = Array.from({ length: 801 }, (_, i) => -4e9 + i * 1e7);
  const powerDb = frequencyHz.map((f) => -lossDb - 10 * Math.log10(1 + (f / cutoffHz) ** (2 * order)));
  return { frequencyHz, powerDb, groupDelayPs: frequencyHz.map(() => 50) };
}

describe('responseFigures', () => {
  it('measures the 3 dB bandwidth of a Butterworth response as twice its cutoff', () => {
    // |H(fc)|^2 = 1/2, i.e. -3.0103 dB at the cutoff (common practice); the 3 dB band is a hair inside it.
    const figures = responseFigures(butterworth(3, 0.6e9, 1.5));
    expect(figures.bandwidth3dBHz).toBeGreaterThan(1.19e9);
    expect(figures.bandwidth3dBHz).toBeLessThan(1.2e9);
    expect(figures.insertionLossDb).toBeCloseTo(1.5, 9);
  });
});

describe('checkMask', () => {
  const response = butterworth(4, 0.6e9);
  it('passes a mask the response meets, with positive margins', () => {
    const report = checkMask(response, [
      { kind: 'pass', range: { fromHz: -0.3e9, toHz: 0.3e9 }, maxInsertionLossDb: 0.5, maxRippleDb: 0.5 },
      { kind: 'stop', range: { fromHz: 2e9, toHz: 4e9 }, minRejectionDb: 30 },
    ]);
    expect(report.pass).toBe(true);
    expect(report.checks.every((c) => c.margin > 0)).toBe(true);
  });
  it('fails a stop band that is too close, naming the worst frequency and the miss', () => {
    const report = checkMask(response, [{ kind: 'stop', range: { fromHz: 0.8e9, toHz: 4e9 }, minRejectionDb: 30 }]);
    expect(report.pass).toBe(false);
    expect(report.worst?.worstFrequencyHz).toBeCloseTo(0.8e9, -6);
    // Rejection at 0.8 GHz of a 4th-order Butterworth with fc = 0.6 GHz: 10 log10(1 + (4/3)^8) = 10.25 dB (closed form).
    expect(report.worst?.measured).toBeCloseTo(10 * Math.log10(1 + (0.8 / 0.6) ** 8), 6);
  });
  it('refuses a region without any sample', () => {
    expect(() => checkMask(response, [{ kind: 'stop', range: { fromHz: 5e9, toHz: 6e9 }, minRejectionDb: 30 }])).toThrow(/finer grid/);
  });
});

describe('checkMask on a long response', () => {
  it('checks 1,000,000 points without running out of stack', () => {
    const n = 1_000_000;
    const response = { frequencyHz: Array.from({ length: n }, (_, i) => i), powerDb: Array.from({ length: n }, (_, i) => -(i % 7)), groupDelayPs: new Array<number>(n).fill(1) };
    const report = checkMask(response, [{ kind: 'stop', range: { fromHz: 10, toHz: 20 }, minRejectionDb: 1 }]);
    expect(report.checks[0]?.measured).toBe(0);
    expect(responseFigures(response).rejectionDb).toBe(6);
  });
});
