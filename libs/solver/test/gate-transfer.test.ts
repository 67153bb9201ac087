// The gate model: MZI convention, extinction from coupler imbalance, loss, reciprocity.
import { describe, expect, it } from 'vitest';
import { couplerImbalanceRad, gateTransfer, SolverInputError, thetaForKappa, transposeTransfer } from '../src/index.js';

const power = (t: Float64Array, k: number): number => t[2 * k]! ** 2 + t[2 * k + 1]! ** 2;

describe('gateTransfer', () => {
  it('has power cross-coupling cos^2(theta/2) with ideal couplers', () => {
    // Balanced MZI of two 3 dB couplers: |t_cross|^2 = cos^2(theta/2) (Madsen & Zhao 1999, sec. 3.3).
    for (const theta of [0, 0.4, 1, Math.PI / 2, 2.5, Math.PI]) {
      const t = gateTransfer({ thetaRad: theta, phiRad: 0.3, lossDb: 0, extinctionDb: Infinity });
      expect(power(t, 1)).toBeCloseTo(Math.cos(theta / 2) ** 2, 14);
      expect(power(t, 0)).toBeCloseTo(Math.sin(theta / 2) ** 2, 14);
    }
  });
  it('is unitary when lossless, whatever the coupler imbalance', () => {
    // A lossless 2x2 is unitary: columns of unit norm and orthogonal (common practice).
    const t = gateTransfer({ thetaRad: 1.3, phiRad: 2.2, lossDb: 0, extinctionDb: 12, coupler2ErrorRad: 0.05 });
    expect(power(t, 0) + power(t, 2)).toBeCloseTo(1, 14);
    expect(power(t, 1) + power(t, 3)).toBeCloseTo(1, 14);
    const dotRe = t[0]! * t[2]! + t[1]! * t[3]! + t[4]! * t[6]! + t[5]! * t[7]!;
    const dotIm = t[0]! * t[3]! - t[1]! * t[2]! + t[4]! * t[7]! - t[5]! * t[6]!;
    expect(Math.hypot(dotRe, dotIm)).toBeLessThan(1e-14);
  });
  it('has a 25 dB ratio of wanted to leaked power in bar and in cross for a 25 dB extinction', () => {
    // MZI with coupler angle errors e1, e2: bar leakage sin^2(e2 - e1), cross leakage sin^2(e1 + e2)
    // (Madsen & Zhao 1999, ch. 3); with e2 = 0 and e1 = atan(10^(-ER/20)) the ratio is 10^(-ER/10).
    const bar = gateTransfer({ thetaRad: Math.PI, phiRad: 0, lossDb: 0, extinctionDb: 25 });
    const cross = gateTransfer({ thetaRad: 0, phiRad: 0, lossDb: 0, extinctionDb: 25 });
    expect(10 * Math.log10(power(bar, 1) / power(bar, 0))).toBeCloseTo(-25, 9);
    expect(10 * Math.log10(power(cross, 0) / power(cross, 1))).toBeCloseTo(-25, 9);
    expect(couplerImbalanceRad(25)).toBeCloseTo(Math.atan(10 ** -1.25), 15);
  });
  it('applies the insertion loss to the power of every input', () => {
    const t = gateTransfer({ thetaRad: 0.9, phiRad: 0, lossDb: 0.25, extinctionDb: 25 });
    expect(power(t, 0) + power(t, 2)).toBeCloseTo(10 ** -0.025, 14);
  });
  it('moves the split under a phase error', () => {
    const t = gateTransfer({ thetaRad: Math.PI / 2, phiRad: 0, lossDb: 0, extinctionDb: Infinity, thetaErrorRad: 0.1 });
    expect(power(t, 1)).toBeCloseTo(Math.cos((Math.PI / 2 + 0.1) / 2) ** 2, 14);
  });
  it('reverses by the transpose', () => {
    const t = gateTransfer({ thetaRad: 0.7, phiRad: 1.9, lossDb: 0.2, extinctionDb: 20 });
    const r = transposeTransfer(t);
    expect([r[2], r[3], r[4], r[5]]).toEqual([t[4], t[5], t[2], t[3]]);
    expect([r[0], r[6]]).toEqual([t[0], t[6]]);
  });
  it('maps kappa to theta and rejects bad values by name', () => {
    expect(Math.cos(thetaForKappa(0.3) / 2) ** 2).toBeCloseTo(0.3, 14);
    expect(() => thetaForKappa(1.2)).toThrow(/kappa.*1\.2/);
    expect(() => gateTransfer({ thetaRad: 0, phiRad: 0, lossDb: -1, extinctionDb: 20 })).toThrow(SolverInputError);
    expect(() => couplerImbalanceRad(-3)).toThrow(/extinctionDb.*-3/);
  });
});
