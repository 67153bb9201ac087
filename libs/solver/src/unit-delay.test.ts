import { describe, expect, it } from 'vitest';
import { loopFsrHz, SolverInputError, unitDelayS } from './index.js';

describe('unitDelayS', () => {
  it('is n_g L / c for a 650 um unit at group index 4.2', () => {
    // T = n_g L / c (common practice); 4.2 * 650e-6 m / 299792458 m/s = 9.1063 ps.
    expect(unitDelayS({ unitLengthUm: 650, groupIndex: 4.2 })).toBeCloseTo(9.10630e-12, 16);
  });
  it('rejects a zero length and a group index below one, naming the value', () => {
    expect(() => unitDelayS({ unitLengthUm: 0, groupIndex: 4 })).toThrow(SolverInputError);
    expect(() => unitDelayS({ unitLengthUm: 10, groupIndex: 0.5 })).toThrow(/groupIndex.*0\.5/);
  });
});

describe('loopFsrHz', () => {
  it('gives the FSR of a six-unit single-cell ring as one sixth of the unit FSR', () => {
    // FSR = 1 / (L T_u) for a ring of L units (common practice).
    const tech = { unitLengthUm: 650, groupIndex: 4.2 };
    const unit = loopFsrHz({ ...tech, lengthUnits: 1 });
    expect(unit).toBeCloseTo(1 / 9.1063e-12, -7);
    expect(loopFsrHz({ ...tech, lengthUnits: 6 })).toBeCloseTo(unit / 6, 0);
  });
  it('rejects a fractional loop length', () => {
    expect(() => loopFsrHz({ unitLengthUm: 650, groupIndex: 4.2, lengthUnits: 2.5 })).toThrow(/lengthUnits/);
  });
});
