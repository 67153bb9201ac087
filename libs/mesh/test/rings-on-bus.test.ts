import { describe, expect, it } from 'vitest';
import { checkConfiguration, emptyConfiguration, placeCircuit } from '../src/index.js';
import { demoMesh, sidePorts } from './fixtures.js';

const mesh = demoMesh();
const sides = sidePorts(mesh);
const west = sides.west.filter((_p, i) => i % 2 === 0);
const east = sides.east.filter((_p, i) => i % 2 === 0);
const empty = emptyConfiguration(mesh.definition);

describe('rings on one bus', () => {
  it('places three single-cell rings in series, each a 6-unit loop through its own coupler, and the checker accepts it', () => {
    const r = placeCircuit(empty, { kind: 'rings-on-bus', id: 'eq', from: west[3]!, to: east[3]!, rings: [6, 6, 6].map((perimeterUnits) => ({ perimeterUnits, kappa: 0.3 })) }, mesh);
    if (!r.ok) throw new Error(r.message);
    expect(checkConfiguration(mesh, r.configuration).ok).toBe(true);
    const rings = r.circuit.paths.filter((p) => p.role === 'ring');
    // A loop around one cell is 6 units: 5 path steps plus the pass through the coupler (common practice).
    expect(rings.map((p) => p.steps.length)).toEqual([5, 5, 5]);
    expect(new Set(r.circuit.couplers.map((c) => c.gate)).size).toBe(3);
    // The bus runs port -> coupler 1 -> coupler 2 -> coupler 3 -> port.
    const bus = r.circuit.paths.filter((p) => p.role === 'bus');
    expect(bus).toHaveLength(4);
    expect(bus[0]!.from).toEqual({ port: west[3] });
    expect(bus[3]!.to).toEqual({ port: east[3] });
  });

  it('refuses an odd perimeter with the parity reason', () => {
    const r = placeCircuit(empty, { kind: 'rings-on-bus', id: 'eq', from: west[3]!, to: east[3]!, rings: [{ perimeterUnits: 7, kappa: 0.3 }] }, mesh);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toBe('wrong-parity');
  });
});
