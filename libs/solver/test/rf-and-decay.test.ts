// RF view after detection, and the report of an impulse that does not decay.
import { describe, expect, it } from 'vitest';
import { compileNetlist, impulseResponse, rfResponse, SolverInputError } from '../src/index.js';
import { allPassRing, barStage, mzi } from './fixtures.js';

const T_U = 9.1063e-12;

describe('rfResponse', () => {
  it('turns a pure optical delay into the same RF delay, for IM-DD and single sideband', () => {
    // A delay line of 5 units: H = e^{-j w 5}; the detected RF tone is delayed by 5 T_u (Capmany & Novak, Nat. Photon. 2007).
    const ids = ['d0', 'd1', 'd2', 'd3', 'd4'];
    const net = compileNetlist({
      stages: ids.map((id) => barStage(id, 0)),
      links: ids.slice(1).map((id, i) => ({ from: { stage: ids[i]!, slot: 0 as const }, to: { stage: id, slot: 0 as const } })),
      inputs: [{ port: 'in', to: { stage: 'd0', slot: 0 } }],
      outputs: [{ port: 'out', from: { stage: 'd4', slot: 0 } }],
    });
    const h = impulseResponse(net, 'in').outputs[0]!;
    const rf = Float64Array.of(0, 1e9, 5e9, 17e9);
    for (const scheme of ['imdd', 'ssb-upper', 'ssb-lower'] as const) {
      const r = rfResponse({ impulse: h, unitDelayS: T_U, carrierOffsetHz: 3e9, rfFrequenciesHz: rf, scheme });
      rf.forEach((f, i) => {
        expect(r.re[i]!).toBeCloseTo(Math.cos(2 * Math.PI * f * 5 * T_U), 12);
        expect(r.im[i]!).toBeCloseTo(-Math.sin(2 * Math.PI * f * 5 * T_U), 12);
      });
    }
  });

  it('shows the IM-DD fading of an MZI whose two arms differ by two units', () => {
    // Cross port of a balanced MZI, carrier at quadrature-free point f_c = 0: H(f) = (z^-3 + z^-5)/2 up to a factor;
    // IM-DD gives [H(F) H*(0) + H*(-F) H(0)] / 2 (Yao, J. Lightwave Technol. 27(3) 2009, eq. for DSB with carrier).
    const h = impulseResponse(mzi(3, 1, 0), 'in').outputs[1]!;
    const F = Float64Array.of(1 / (4 * T_U));
    const r = rfResponse({ impulse: h, unitDelayS: T_U, carrierOffsetHz: 0, rfFrequenciesHz: F, scheme: 'imdd' });
    // At F = 1/(4 T_u) both sidebands sit at the MZI nulls cos(2 pi F T_u) = 0, so the tone vanishes.
    expect(Math.hypot(r.re[0]!, r.im[0]!)).toBeLessThan(1e-12);
  });

  it('rejects a negative RF frequency', () => {
    const h = impulseResponse(mzi(3, 1, 0), 'in').outputs[1]!;
    expect(() => rfResponse({ impulse: h, unitDelayS: T_U, carrierOffsetHz: 0, rfFrequenciesHz: Float64Array.of(-1), scheme: 'imdd' })).toThrow(SolverInputError);
  });
});

describe('impulseResponse on a nearly lossless loop', () => {
  it('says the impulse does not decay and reports the energy left', () => {
    // A lossless ring with 1e-4 power coupling: 1e-4 of the energy enters and stays for ~1e4 round trips.
    const ir = impulseResponse(allPassRing(1e-4, 0), 'in', { maxSteps: 3000 });
    expect(ir.converged).toBe(false);
    expect(ir.steps).toBe(3000);
    expect(ir.residualEnergy).toBeGreaterThan(5e-5);
    expect(ir.warning).toMatch(/nearly lossless/);
    expect(ir.decayDbPerStep).toBeLessThan(1e-3);
  });
  it('converges with a residual below the tolerance on a lossy ring', () => {
    const ir = impulseResponse(allPassRing(0.1, 0.25), 'in', { energyTolerance: 1e-18 });
    expect(ir.converged).toBe(true);
    expect(ir.residualEnergy).toBeLessThan(1e-18);
    expect(ir.warning).toBeNull();
  });
});
