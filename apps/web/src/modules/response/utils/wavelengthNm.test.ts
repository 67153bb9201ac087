// wavelengthNm: lambda = c / f.
import { describe, expect, it } from 'vitest';
import { wavelengthNm } from './wavelengthNm.js';

describe('wavelengthNm', () => {
  it('puts 193.4 THz at 1550.1 nm (c = 299 792 458 m/s, SI definition)', () => {
    expect(wavelengthNm(193.4e12)).toBeCloseTo(1550.12, 2);
  });
});
