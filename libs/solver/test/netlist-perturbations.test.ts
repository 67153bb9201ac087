import { describe, expect, it } from 'vitest';
import { emptyConfiguration } from '@hexloom/mesh';
import { netlistFromMesh } from '../src/index.js';
import { DEMO_TECH, meshWithIo } from './mesh-fixtures.js';

describe('withPerturbations', () => {
  it('gives exactly the netlist a full rebuild with those perturbations gives, bends included', () => {
    const mesh = meshWithIo({ kind: 'hexagon', radius: 2 }, { ...DEMO_TECH, bendLossDb: 0.3 }, 4);
    const configuration = emptyConfiguration(mesh.definition, 'cross');
    const gates = mesh.gates.slice(0, 12).map((g) => g.id);
    const perturbations = Object.fromEntries(gates.map((id, k) => [id, { thetaErrorRad: 0.01 * k, coupler1ErrorRad: -0.004 * k, phiErrorRad: 0.02 }]));
    const chip = netlistFromMesh({ mesh, configuration });
    const patched = chip.withPerturbations(perturbations);
    const rebuilt = netlistFromMesh({ mesh, configuration, perturbations }).netlist;
    expect(patched.transfers.length).toBe(rebuilt.transfers.length);
    patched.transfers.forEach((v, i) => expect(Math.abs(v - (rebuilt.transfers[i] as number))).toBeLessThan(1e-15));
    // The chip it came from is left untouched (common practice: no mutation of inputs).
    expect(chip.netlist.transfers).toEqual(netlistFromMesh({ mesh, configuration }).netlist.transfers);
  });

  it('refuses a gate the mesh does not have', () => {
    const mesh = meshWithIo({ kind: 'hexagon', radius: 1 }, DEMO_TECH, 2);
    expect(() => netlistFromMesh({ mesh, configuration: emptyConfiguration(mesh.definition) }).withPerturbations({ 'g(9,9)e': { thetaErrorRad: 1 } })).toThrow(/g\(9,9\)e/);
  });
});
