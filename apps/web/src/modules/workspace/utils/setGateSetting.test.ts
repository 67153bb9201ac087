import { describe, expect, it } from 'vitest';
import { SMALL_CONTENT, SMALL_GATES } from '../test/smallContent.js';
import { setGateSetting } from './setGateSetting.js';

const gate = SMALL_GATES[0]!;

describe('setGateSetting', () => {
  it('sets a parked gate to split with kappa 0.5 by default, without touching the input', () => {
    const sut = setGateSetting(SMALL_CONTENT, gate, { state: 'split' });
    expect(sut.gates).toEqual([{ gate, state: 'split', kappa: 0.5 }]);
    expect(SMALL_CONTENT.gates).toEqual([]);
  });

  it('clamps kappa into [0, 1] and drops it for bar and cross', () => {
    expect(setGateSetting(SMALL_CONTENT, gate, { state: 'split', kappa: 1.7 }).gates[0]!.kappa).toBe(1);
    const split = setGateSetting(SMALL_CONTENT, gate, { state: 'split', kappa: 0.2, phaseRad: 1.1 });
    expect(setGateSetting(split, gate, { state: 'cross' }).gates).toEqual([{ gate, state: 'cross', phaseRad: 1.1 }]);
  });

  it("keeps the owning circuit's coupler kappa equal to the gate's", () => {
    const owned = {
      ...SMALL_CONTENT,
      gates: [{ gate, state: 'split' as const, kappa: 0.3, circuit: 'r1' }],
      circuits: [{ id: 'r1', kind: 'ring' as const, ports: [], paths: [], couplers: [{ gate, role: 'ring-coupler' as const, kappa: 0.3, phaseRad: 0 }] }],
    };
    const sut = setGateSetting(owned, gate, { state: 'split', kappa: 0.42 });
    expect(sut.circuits[0]!.couplers[0]!.kappa).toBe(0.42);
    expect(sut.gates[0]).toEqual({ gate, state: 'split', kappa: 0.42, circuit: 'r1' });
  });
});
