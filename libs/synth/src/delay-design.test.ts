import { describe, expect, it } from 'vitest';
import { allPassStageDelayS, chooseDelaySet, chooseDelayUnits, designAllPassEqualiser, nelderMead } from './index.js';

const T_U = 9.1063e-12;

describe('chooseDelayUnits', () => {
  it('keeps the parity of the shortest path and reports the rounding error', () => {
    // Bipartite lattice: all paths between two vertices share one parity (graph theory, common practice).
    const choice = chooseDelayUnits({ requestedS: 100e-12, unitDelayS: T_U, minUnits: 5, toleranceS: 5e-12 });
    expect(choice.units % 2).toBe(1);
    expect(choice.units).toBe(11);
    expect(choice.errorS).toBeCloseTo(11 * T_U - 100e-12, 18);
    expect(choice.withinTolerance).toBe(true);
  });
  it('never goes below the shortest path', () => {
    expect(chooseDelayUnits({ requestedS: 10e-12, unitDelayS: T_U, minUnits: 8, toleranceS: 0 })).toMatchObject({ units: 8, withinTolerance: false });
  });
});

describe('chooseDelaySet', () => {
  it('rounds the step to an even number of units', () => {
    const set = chooseDelaySet({ stepS: 37.5e-12, count: 8, unitDelayS: T_U, baseUnits: 10 });
    expect(set.stepUnits).toBe(4);
    expect(set.unitsPerOutput).toEqual([10, 14, 18, 22, 26, 30, 34, 38]);
  });
});

describe('allPass stages', () => {
  it('delay integrates to one round trip per FSR (phase winds by 2 pi per stage)', () => {
    // An all-pass stage adds exactly 2 pi of phase per FSR, so the mean delay equals T (Madsen & Zhao 1999, ch. 6).
    const T = 6 * T_U;
    const points = 4000;
    let sum = 0;
    for (let i = 0; i < points; i++) sum += allPassStageDelayS(0.7, T, (i / points) / T, 0);
    expect(sum / points / T).toBeCloseTo(1, 6);
  });
  it('fit a linear delay slope over a band with two stages', () => {
    const T = 6 * T_U;
    const design = designAllPassEqualiser({ stages: 2, ringDelayS: T, bandHz: [1e9, 5e9], targetDelayS: (f) => 20e-12 + 5e-21 * (f - 1e9), freeOffset: true });
    expect(design.rmsErrorS).toBeLessThan(2e-12);
  });
  it('find the minimum of the Rosenbrock function with Nelder–Mead', () => {
    // Rosenbrock's function has its minimum 0 at (1, 1) (Rosenbrock, Computer Journal 3, 1960).
    const result = nelderMead(([x = 0, y = 0]) => (1 - x) ** 2 + 100 * (y - x * x) ** 2, [-1.2, 1], { maxIterations: 5000, tolerance: 1e-16 });
    expect(result.x[0]).toBeCloseTo(1, 4);
    expect(result.x[1]).toBeCloseTo(1, 4);
  });
});
