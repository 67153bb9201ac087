// Measured versus simulated on the measured grid: linear interpolation and residual statistics (common practice).
import { describe, expect, it } from 'vitest';
import { BenchInputError, compareSpectra } from '../src/index.js';

const line = (offsets: number[], slope: number, intercept: number) => ({ offsetHz: offsets, powerDb: offsets.map((f) => slope * f + intercept) });

describe('compareSpectra', () => {
  it('interpolates a straight line exactly, so a line compared with itself has zero residual', () => {
    const simulated = line([0, 10, 20, 30, 40], -0.1, -3);
    const measured = line([5, 12.5, 33], -0.1, -3);
    const sut = compareSpectra(simulated, measured);
    expect(sut.offsetHz).toEqual([5, 12.5, 33]);
    for (const r of sut.residualDb) expect(Math.abs(r)).toBeLessThan(1e-12);
    expect(sut.figures.rmsResidualDb).toBeLessThan(1e-12);
  });

  it('reports a constant 1 dB offset as mean 1 dB, RMS 1 dB and max 1 dB', () => {
    const sut = compareSpectra(line([0, 10, 20], 0, -5), line([1, 2, 3, 4], 0, -4));
    expect(sut.figures.meanResidualDb).toBeCloseTo(1, 12);
    expect(sut.figures.rmsResidualDb).toBeCloseTo(1, 12);
    expect(sut.figures.maxAbsResidualDb).toBeCloseTo(1, 12);
    expect(sut.figures.points).toBe(4);
  });

  it('finds the worst point and its offset; RMS of residuals (0, 0, 3, 0) is 1.5', () => {
    const measured = { offsetHz: [1, 2, 3, 4], powerDb: [-5, -5, -8, -5] };
    const sut = compareSpectra(line([0, 10], 0, -5), measured);
    expect(sut.figures.worstOffsetHz).toBe(3);
    expect(sut.figures.maxAbsResidualDb).toBeCloseTo(3, 12);
    expect(sut.figures.rmsResidualDb).toBeCloseTo(1.5, 12);
    expect(sut.figures.meanResidualDb).toBeCloseTo(-0.75, 12);
  });

  it('leaves out measured points outside the simulated span', () => {
    const sut = compareSpectra(line([0, 10], 0, 0), line([-5, 2, 8, 15], 0, 0));
    expect(sut.offsetHz).toEqual([2, 8]);
  });

  it('refuses when the spans barely overlap, and when offsets do not increase', () => {
    expect(() => compareSpectra(line([0, 10], 0, 0), line([9, 20, 30], 0, 0))).toThrow(BenchInputError);
    expect(() => compareSpectra(line([0, 10, 5], 0, 0), line([1, 2], 0, 0))).toThrow(/simulated offsets must increase, point 2 is 5 Hz/);
  });
});
