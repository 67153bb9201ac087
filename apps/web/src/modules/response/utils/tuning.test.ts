// Tuning functions: coupling, phase and centre shift produce new contents that move the simulated response as physics says.
import { describe, expect, it } from 'vitest';
import { ringNotchContent } from '../testing/ringNotchContent.js';
import { centreShiftHz, centreShiftRangeHz, withCentreShift } from './centreShift.js';
import { circuitKnobs } from './circuitKnobs.js';
import { computeSpectra } from './computeSpectra.js';
import { setCouplerKappa } from './setCouplerKappa.js';
import { setGatePhase } from './setGatePhase.js';

const base = ringNotchContent();
const coupler = base.circuits[0]?.couplers[0]?.gate as string;
const grid = { kind: 'span', startOffsetHz: -10e9, stopOffsetHz: 10e9, points: 2001 } as const;
const notchAtHz = (content: typeof base): number => {
  const [s] = computeSpectra({ content, pairs: [{ from: 'in', to: 'out' }], grid });
  const db = s?.points.amplitudeDb.map((v) => v ?? -400) ?? [];
  const k = db.indexOf(Math.min(...db));
  return s?.points.offsetHz[k] ?? NaN;
};

describe('circuitKnobs', () => {
  it('finds the ring coupler and one loop of 6 units on the ring-notch example (a single-cell ring is 6 units: hex lattice)', () => {
    const sut = circuitKnobs(base, 'notch');
    expect(sut?.couplers).toEqual([{ gate: coupler, role: 'ring-coupler', kappa: 0.1 }]);
    expect(sut?.loops.map((l) => l.lengthUnits)).toEqual([6]);
  });
});

describe('setCouplerKappa', () => {
  it('sets kappa in the circuit and in the gate setting, leaving the input untouched', () => {
    const sut = setCouplerKappa(base, 'notch', coupler, 0.3);
    expect(sut.circuits[0]?.couplers[0]?.kappa).toBe(0.3);
    expect(sut.gates.find((g) => g.gate === coupler)?.kappa).toBe(0.3);
    expect(base.gates.find((g) => g.gate === coupler)?.kappa).toBe(0.1);
  });

  it('deepens the notch most at critical coupling, through power = round-trip power a^2 (Yariv, Electron. Lett. 2000)', () => {
    // The bus and the ring both cross this coupler, so the through path is the gate's cross state and its power is
    // kappa. Round trip of 6 gates at 0.25 dB: a^2 = 10^(-1.5/10) = 0.708, so the notch is deepest near kappa 0.71.
    const depth = (kappa: number) => Math.min(...(computeSpectra({ content: setCouplerKappa(base, 'notch', coupler, kappa), pairs: [{ from: 'in', to: 'out' }], grid })[0]?.points.amplitudeDb.map((v) => v ?? -400) ?? []));
    const critical = depth(10 ** -0.15);
    expect(critical).toBeLessThan(depth(0.2) - 8);
    expect(critical).toBeLessThan(depth(0.97) - 8);
  });

  it('refuses a gate that is not a coupler of the circuit', () => {
    expect(() => setCouplerKappa(base, 'notch', 'g(9,9)n', 0.5)).toThrow(/no coupler/);
  });
});

describe('withCentreShift', () => {
  it('moves the notch by the asked shift: d phi = 2 pi d f L T_u (ring resonance condition, Yariv, Electron. Lett. 2000)', () => {
    const before = notchAtHz(base);
    const sut = withCentreShift(base, base, 'notch', 2e9);
    expect(notchAtHz(sut) - before).toBeCloseTo(2e9, -8); // within the 10 MHz grid step
    expect(centreShiftHz(base, sut, 'notch')).toBeCloseTo(2e9, 0);
  });

  it('offers half the ring FSR either way: 1 / (2 L T_u) with L = 6 and T_u = 9.106 ps, about 9.15 GHz (common practice)', () => {
    expect(centreShiftRangeHz(base, 'notch')).toBeCloseTo(1 / (2 * 6 * 9.1063e-12), -7);
  });
});

describe('setGatePhase', () => {
  it('records a phase on a ring gate as a circuit phase and in the setting, and a full 2 pi turn leaves the notch where it was', () => {
    const tuner = circuitKnobs(base, 'notch')?.loops[0]?.tunerGate as string;
    const sut = setGatePhase(base, 'notch', tuner, 2 * Math.PI);
    expect(sut.circuits[0]?.phases).toEqual([{ gate: tuner, phaseRad: 2 * Math.PI }]);
    expect(sut.gates.find((g) => g.gate === tuner)?.phaseRad).toBe(2 * Math.PI);
    expect(notchAtHz(sut)).toBeCloseTo(notchAtHz(base), 0);
  });
});
