// Physics invariants of the solver: power conservation, reciprocity, periodicity, and the dense reference route.
import { describe, expect, it } from 'vitest';
import { compileGateNetwork, gridOffsetsHz, impulseResponse, powerBalance, referenceResponse, sMatrix, spectrumFromImpulse } from '../src/index.js';
import { addDropRing, coupledRings, gateLoop } from './fixtures.js';

const T_U = 9.1063e-12;
const F0 = 193.4e12;
const PORTS = ['a0', 'a1', 'b0', 'b1'];

describe('a lossless chip', () => {
  it('conserves power at every frequency: sum over outputs of |S_ij|^2 = 1', () => {
    // Unitarity of the S-matrix of a lossless network (Pozar, Microwave Engineering, 4th ed., sec. 4.3).
    const net = compileGateNetwork(gateLoop(0, Infinity));
    const s = sMatrix(net, { ports: PORTS, grid: { kind: 'fsr', points: 64 }, unitDelayS: T_U, referenceFrequencyHz: F0 });
    for (let f = 0; f < 64; f++) {
      for (let j = 0; j < 4; j++) {
        let sum = 0;
        for (let i = 0; i < 4; i++) sum += s.re[(f * 4 + i) * 4 + j]! ** 2 + s.im[(f * 4 + i) * 4 + j]! ** 2;
        expect(sum).toBeCloseTo(1, 10);
      }
    }
  });
  it('sends all the launched energy to its ports in the power balance', () => {
    const net = addDropRing(0.2, 0.3, 0);
    const ir = impulseResponse(net, 'in');
    const balance = powerBalance(net, ir, ['drop']);
    expect(balance.chosen.drop! + balance.leakage.through!).toBeCloseTo(1, 10);
    expect(balance.lost).toBeLessThan(1e-10);
  });
});

describe('a lossy chip with leaky gates', () => {
  const net = compileGateNetwork(gateLoop(0.25, 25));
  const s = sMatrix(net, { ports: PORTS, grid: { kind: 'fsr', points: 32 }, unitDelayS: T_U, referenceFrequencyHz: F0 });

  it('is reciprocal: S_ij = S_ji', () => {
    // Reciprocity of passive networks without magneto-optic parts (Pozar, sec. 4.3; common practice).
    for (let f = 0; f < 32; f++) {
      for (let i = 0; i < 4; i++) for (let j = 0; j < 4; j++) {
        expect(s.re[(f * 4 + i) * 4 + j]!).toBeCloseTo(s.re[(f * 4 + j) * 4 + i]!, 12);
        expect(s.im[(f * 4 + i) * 4 + j]!).toBeCloseTo(s.im[(f * 4 + j) * 4 + i]!, 12);
      }
    }
  });
  it('repeats with the unit FSR 1/T_u', () => {
    // z^-1 = e^{-j 2 pi f T_u} has period 1/T_u (DOMAIN: every path is an integer number of units).
    const ir = impulseResponse(net, 'a0');
    const offsets = [-3.1e9, 0, 12.5e9];
    const at = (shift: number) =>
      spectrumFromImpulse({ impulse: ir.outputs[2]!, grid: { kind: 'list', offsetsHz: offsets.map((f) => f + shift) }, unitDelayS: T_U, referenceFrequencyHz: F0 });
    const a = at(0), b = at(3 / T_U);
    offsets.forEach((_, i) => {
      expect(b.re[i]!).toBeCloseTo(a.re[i]!, 10);
      expect(b.im[i]!).toBeCloseTo(a.im[i]!, 10);
      expect(b.groupDelayS[i]! / a.groupDelayS[i]!).toBeCloseTo(1, 8);
    });
  });
  it('reports where the light went, adding up to one', () => {
    const ir = impulseResponse(net, 'a0');
    const b = powerBalance(net, ir, ['b0']);
    const sum = b.chosen.b0! + b.leakage.a0! + b.leakage.a1! + b.leakage.b1! + b.lost + b.residual;
    expect(sum).toBeCloseTo(1, 12);
    expect(b.lost).toBeGreaterThan(0.1); // 0.25 dB per traversal over at least 6 traversals
  });
});

describe('the dense reference route', () => {
  it('agrees with the fast route to 1e-9 on coupled rings with leaky parked gates', () => {
    const net = compileGateNetwork(coupledRings(0.25, 25));
    const grid = { kind: 'fsr' as const, points: 64 };
    const offsets = gridOffsetsHz(grid, T_U);
    const ref = referenceResponse(net, 'in', offsets, T_U);
    const fast = sMatrix(net, { ports: ['in', 'out'], grid, unitDelayS: T_U, referenceFrequencyHz: F0 });
    for (let f = 0; f < 64; f++) {
      // S index (f, i = out, j = in) with ports [in, out]: i = 1, j = 0.
      const k = (f * 2 + 1) * 2 + 0;
      expect(Math.hypot(fast.re[k]! - ref.re[1]![f]!, fast.im[k]! - ref.im[1]![f]!)).toBeLessThan(1e-9);
    }
  });
  it('refuses a chip larger than a radius-2 block', () => {
    const gates = Array.from({ length: 200 }, (_, i) => ({ id: `g${i}`, transfer: Float64Array.of(1, 0, 0, 0, 0, 0, 1, 0) }));
    const net = compileGateNetwork({ gates, joins: [], ports: [{ port: 'p', at: { gate: 'g0', waveguide: 0, end: 0 } }] });
    expect(() => referenceResponse(net, 'p', Float64Array.of(0), T_U)).toThrow(/at most 320 slots.*800/);
  });
});
