import { describe, expect, it } from 'vitest';
import type { TechnologyProfile } from '@hexloom/mesh';
import { cAbs, polyOnCircle } from './complex.js';
import { designCircuit } from './design-circuit.js';
import { latticeResponse } from './lattice-response.js';
import { isRealisablePerimeter, perimeterForFsr } from './ring-perimeter.js';

const TECH: TechnologyProfile = {
  unitLengthUm: 650,
  groupIndex: 4.2,
  referenceFrequencyHz: 193.4e12,
  lossPerGateDb: 0.25,
  bendLossDb: 0.1,
  extinctionDb: 25,
  phaseShifter: { piPowerW: 0.022, resistanceOhm: 1200, maxPowerW: 0.06, maxVoltageV: 9 },
};
const T_U = (4.2 * 650e-6) / 299_792_458;

describe('ring perimeters', () => {
  it('are 6 and every even length from 10 on (6n - 2s), never 8', () => {
    // Perimeter of a connected patch of n hexagons with s shared edges is 6n - 2s (DOMAIN lattice facts, common practice).
    expect([6, 8, 10, 12, 13, 14].map(isRealisablePerimeter)).toEqual([true, false, true, true, false, true]);
  });
  it('round a requested FSR to the nearest realisable ring and say so', () => {
    const choice = perimeterForFsr(1 / (8 * T_U), T_U);
    expect([6, 10]).toContain(choice.perimeterUnits);
    expect(choice.notes[0]?.quantity).toBe('ring FSR');
  });
});

describe('designCircuit', () => {
  it('designs a notch ring with the round-trip loss of six gates', () => {
    const { design } = designCircuit({ kind: 'ring-notch', from: 'v(0,0)n/g(0,0)ne', to: 'v(1,0)n/g(1,0)ne', centreOffsetHz: 2e9, target: { notchDepthDb: 25, regime: 'under' }, ring: { free: true } }, TECH);
    if (design.kind !== 'ring-notch') throw new Error('wrong kind');
    // a = 10^(-6 * 0.25 / 20) for a 6-unit ring (common practice: loss adds in dB per gate).
    expect(design.ring.roundTripAmplitude).toBeCloseTo(10 ** (-1.5 / 20), 12);
    expect(design.ring.notchDepthDb).toBeCloseTo(25, 9);
  });

  it('designs a half-band lattice whose couplers and phases reproduce the target to 1e-9', () => {
    const { design } = designCircuit({ kind: 'mzi-lattice', from: 'v(0,0)n/g(0,0)ne', to: 'v(1,0)n/g(1,0)ne', band: 'half-band', order: 6, armDifferenceUnits: 2, centreOffsetHz: 0, rejectionDb: 30 }, TECH);
    if (design.kind !== 'mzi-lattice') throw new Error('wrong kind');
    const realised = latticeResponse(design.lattice);
    for (let k = 0; k < 64; k++) {
      const w = (2 * Math.PI * k) / 64;
      expect(Math.abs(cAbs(polyOnCircle(realised.a, w)) ** 2 - cAbs(polyOnCircle(design.target, w)) ** 2)).toBeLessThan(1e-9);
    }
    expect(design.latticeFsrHz).toBeCloseTo(1 / (2 * T_U), -3);
    expect(design.couplerKappas).toHaveLength(7);
  });

  it('realises transversal taps as the lattice with the same polynomial shape', () => {
    const { design } = designCircuit({ kind: 'transversal', from: 'v(0,0)n/g(0,0)ne', to: 'v(1,0)n/g(1,0)ne', taps: [1, 2, 1], tapDelayUnits: 2 }, TECH);
    if (design.kind !== 'mzi-lattice') throw new Error('wrong kind');
    // Taps [1, 2, 1] = (1 + z^-1)^2: a zero of transmission at half the FSR (common practice).
    expect(cAbs(polyOnCircle(latticeResponse(design.lattice).a, Math.PI))).toBeLessThan(1e-9);
  });

  it('refuses a ring of 8 units, naming the length', () => {
    expect(() => designCircuit({ kind: 'add-drop', from: 'v(0,0)n/g(0,0)ne', through: 'v(1,0)n/g(1,0)ne', drop: 'v(2,0)n/g(2,0)ne', centreOffsetHz: 0, bandwidthHz: 1e9, ring: { perimeterUnits: 8 } }, TECH)).toThrow(/8 units/);
  });
});
