// gateLooks: states from the configuration's settings, parked gates idle, dead gates dead, circuits found by their gates.
import type { ConfigurationFile, MeshDefinitionFile } from '@hexloom/contracts';
import { buildMesh, DEMO_TECHNOLOGY, makeMeshDefinition } from '@hexloom/mesh';
import { describe, expect, it } from 'vitest';
import { describeGate, gateName } from './describeGate.js';
import { gateLooks } from './gateLooks.js';

const definition = { ...makeMeshDefinition({ name: 'looks fixture', shape: { kind: 'hexagon', radius: 1 }, technology: DEMO_TECHNOLOGY, io: 'none' }), deadGates: ['g(0,0)nw'] } as MeshDefinitionFile;
const mesh = buildMesh(definition);
const configuration: ConfigurationFile = {
  schemaVersion: 1,
  mesh: definition,
  parkedState: 'cross',
  gates: [
    { gate: 'g(0,0)e', state: 'bar', circuit: 'loop' },
    { gate: 'g(0,0)ne', state: 'split', kappa: 0.3, circuit: 'loop' },
    { gate: 'g(0,0)nw', state: 'bar', circuit: 'loop' },
    { gate: 'g(-1,0)e', state: 'cross' },
  ],
  circuits: [
    { id: 'feed', kind: 'path', ports: [], paths: [{ role: 'bus', from: { gate: 'g(0,1)e', at: 'a0' }, to: { gate: 'g(0,1)ne', at: 'a1' }, steps: [{ gate: 'g(0,1)e', in: 'a0', out: 'a1' }] }], couplers: [] },
    { id: 'loop', kind: 'ring', ports: [], paths: [], couplers: [{ gate: 'g(0,0)ne', role: 'ring-coupler', kappa: 0.3, phaseRad: 0 }] },
  ],
};

describe('gateLooks', () => {
  it('makes every gate idle without a configuration, except the dead ones', () => {
    const looks = gateLooks(mesh);
    expect(looks.size).toBe(mesh.gates.length);
    expect(looks.get('g(0,0)nw')?.state).toBe('dead');
    expect([...looks.values()].filter((l) => l.state === 'idle')).toHaveLength(mesh.gates.length - 1);
  });

  it('takes listed gates from their settings, parks the rest and keeps dead gates dead with the state asked of them', () => {
    const looks = gateLooks(mesh, configuration);
    expect(looks.get('g(0,0)e')).toMatchObject({ state: 'bar', circuits: ['loop'], circuitIndex: 1 });
    expect(looks.get('g(0,0)ne')).toMatchObject({ state: 'split', kappa: 0.3, circuits: ['loop'] });
    expect(looks.get('g(-1,0)e')).toMatchObject({ state: 'cross', circuits: [], circuitIndex: null });
    expect(looks.get('g(0,0)nw')).toMatchObject({ state: 'dead', requestedState: 'bar' });
    expect(looks.get('g(1,0)e')).toMatchObject({ state: 'idle', parkedState: 'cross' });
    expect(looks.get('g(0,1)e')).toMatchObject({ state: 'idle', circuits: ['feed'], circuitIndex: 0 });
  });

  it('names the gate, its state and its circuits in words', () => {
    const looks = gateLooks(mesh, configuration);
    expect(describeGate('g(0,0)e', looks.get('g(0,0)e')!)).toBe('gate g(0,0)e, bar, circuit loop');
    expect(describeGate('g(0,0)ne', looks.get('g(0,0)ne')!)).toBe('gate g(0,0)ne, split, kappa 0.3, circuit loop');
    expect(describeGate('g(-1,0)e', looks.get('g(-1,0)e')!)).toBe('gate g(-1,0)e, cross');
    expect(describeGate('g(1,0)e', looks.get('g(1,0)e')!)).toBe('gate g(1,0)e, idle, parked in cross');
    expect(gateName('g(0,0)ne', looks.get('g(0,0)ne')!)).toBe('gate g(0,0)ne, split');
    expect(gateName('g(0,0)nw', looks.get('g(0,0)nw')!)).toBe('gate g(0,0)nw, dead');
  });
});
