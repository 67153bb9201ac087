import { describe, expect, it } from 'vitest';
import { lowpassPrototype, SynthInputError } from './index.js';

const expectValues = (actual: number[], expected: number[], tolerance: number): void => {
  expect(actual).toHaveLength(expected.length);
  actual.forEach((value, i) => expect(Math.abs(value - (expected[i] as number))).toBeLessThan(tolerance));
};

describe('lowpassPrototype', () => {
  it('matches the published Butterworth table for n = 3 and n = 5', () => {
    // Matthaei, Young & Jones 1964, Table 4.05-1(a).
    expectValues(lowpassPrototype({ kind: 'butterworth', order: 3 }), [1, 1, 2, 1, 1], 1e-12);
    expectValues(lowpassPrototype({ kind: 'butterworth', order: 5 }), [1, 0.618, 1.618, 2.0, 1.618, 0.618, 1], 5e-4);
  });

  it('matches the published 0.1 dB and 0.5 dB Chebyshev tables, including the even-n load', () => {
    // Matthaei, Young & Jones 1964, Table 4.05-2(a), four decimals as printed.
    expectValues(lowpassPrototype({ kind: 'chebyshev', order: 2, rippleDb: 0.1 }), [1, 0.843, 0.622, 1.3554], 6e-4);
    expectValues(lowpassPrototype({ kind: 'chebyshev', order: 3, rippleDb: 0.1 }), [1, 1.0316, 1.1474, 1.0316, 1], 1e-4);
    expectValues(lowpassPrototype({ kind: 'chebyshev', order: 2, rippleDb: 0.5 }), [1, 1.4029, 0.7071, 1.9841], 1e-4);
    expectValues(lowpassPrototype({ kind: 'chebyshev', order: 3, rippleDb: 0.5 }), [1, 1.5963, 1.0967, 1.5963, 1], 1e-4);
    expectValues(
      lowpassPrototype({ kind: 'chebyshev', order: 5, rippleDb: 0.5 }),
      [1, 1.7058, 1.2296, 2.5408, 1.2296, 1.7058, 1],
      1e-4,
    );
  });

  it('refuses a Chebyshev prototype without ripple and an order of zero', () => {
    expect(() => lowpassPrototype({ kind: 'chebyshev', order: 3 })).toThrow(SynthInputError);
    expect(() => lowpassPrototype({ kind: 'butterworth', order: 0 })).toThrow(/order.*0/);
  });
});
