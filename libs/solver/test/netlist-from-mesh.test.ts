// The mesh adapter: a single-cell ring against the ring equations, and mesh chips against the reference route.
import { describe, expect, it } from 'vitest';
import { buildMesh, CONFIGURATION_SCHEMA_VERSION, MESH_SCHEMA_VERSION, type Configuration } from '@hexloom/mesh';
import { gridOffsetsHz, impulseResponse, netlistFromMesh, powerBalance, referenceResponse, sMatrix, spectrumFromImpulse } from '../src/index.js';
import { DEMO_TECH, meshWithIo, spreadConfiguration } from './mesh-fixtures.js';

describe('netlistFromMesh on a single cell', () => {
  // One cell: the ring is the inner waveguide of its six gates; gate 0 couples it to its outer waveguide,
  // whose two ends are I/O sites.
  const tech = { ...DEMO_TECH, extinctionDb: 300, lossPerGateDb: 0.2 };
  const bare = buildMesh({ schemaVersion: MESH_SCHEMA_VERSION, name: 'one cell', shape: { kind: 'hexagon', radius: 0 }, technology: tech, ioSites: [], ports: [], deadGates: [] });
  const coupler = bare.gates[0]!;
  const ioSites = coupler.ends.map((v) => bare.vertices[v]!.id);
  const mesh = buildMesh({ ...bare.definition, ioSites });
  const outer = coupler.sideCells[0] === -1 ? 0 : 1;
  const inPort = mesh.ports.find((p) => p.gatePort === coupler.index * 4 + outer * 2 + 0)!.id;
  const outPort = mesh.ports.find((p) => p.gatePort === coupler.index * 4 + outer * 2 + 1)!.id;
  const kappa = 0.08;
  const configuration: Configuration = {
    schemaVersion: CONFIGURATION_SCHEMA_VERSION,
    mesh: mesh.definition,
    parkedState: 'bar',
    gates: [{ gate: coupler.id, state: 'split', kappa, phaseRad: 0 }],
    circuits: [],
  };
  const chip = netlistFromMesh({ mesh, configuration });

  it('covers every gate in both directions and every external port', () => {
    expect(chip.netlist.stageCount).toBe(2 * mesh.gates.length);
    expect(chip.netlist.inputPorts.length).toBe(mesh.ports.length);
  });

  it('reproduces the all-pass ring transmission with FSR 1/(6 T_u)', () => {
    // Yariv, Electron. Lett. 36(4) 2000: |H|^2 = (a^2 - 2 a t cos phi + t^2) / (1 - 2 a t cos phi + a^2 t^2),
    // phi = 2 pi f 6 T_u; a = round-trip amplitude, t = sqrt(1 - kappa); times alpha^2 for the bus traversal.
    const ir = impulseResponse(chip.netlist, inPort);
    const q = chip.netlist.outputPorts.indexOf(outPort);
    const s = spectrumFromImpulse({ impulse: ir.outputs[q]!, grid: { kind: 'fsr', points: 1024 }, unitDelayS: chip.unitDelayS, referenceFrequencyHz: chip.referenceFrequencyHz });
    const alpha = 10 ** (-0.2 / 20), a = alpha ** 6;
    const t = Math.sqrt(1 - kappa), psi = ringPhase(chip, mesh);
    for (let i = 0; i < 1024; i += 29) {
      const phi = 2 * Math.PI * s.offsetsHz[i]! * 6 * chip.unitDelayS;
      const expected = (alpha ** 2 * (a * a - 2 * a * t * Math.cos(phi - psi) + t * t)) / (1 - 2 * a * t * Math.cos(phi - psi) + (a * t) ** 2);
      expect(s.re[i]! ** 2 + s.im[i]! ** 2).toBeCloseTo(expected, 9);
    }
  });

  it('sends the light only to the bus output and to loss when the other gates are ideal', () => {
    const ir = impulseResponse(chip.netlist, inPort);
    const b = powerBalance(chip.netlist, ir, [outPort]);
    const leak = Object.values(b.leakage).reduce((x, y) => x + y, 0);
    expect(leak).toBeLessThan(1e-20);
    expect(b.chosen[outPort]! + b.lost + b.residual).toBeCloseTo(1, 12);
  });
});

/**
 * Phase psi of one round trip at f0 as the all-pass sees it: arg of the product of the ring-side bar terms
 * of the six gates (an MZI in bar carries -1 on side a, and the split coupler's ring-side term its own phase).
 * Yariv's equation then holds with phi -> phi - psi.
 */
function ringPhase(chip: ReturnType<typeof netlistFromMesh>, mesh: ReturnType<typeof buildMesh>): number {
  let re = 1, im = 0;
  mesh.gates.forEach((g, i) => {
    const inner = g.sideCells[0] === 0 ? 0 : 1;
    const t = chip.network.gates[i]!.transfer;
    const tr = t[inner * 6]!, ti = t[inner * 6 + 1]!;
    [re, im] = [re * tr - im * ti, re * ti + im * tr];
  });
  return Math.atan2(im, re);
}

describe('netlistFromMesh on hexagonal blocks', () => {
  it('agrees with the dense reference route to 1e-9 on a radius-1 block with leaky parked gates', () => {
    const mesh = meshWithIo({ kind: 'hexagon', radius: 1 }, DEMO_TECH, 3);
    const chip = netlistFromMesh({ mesh, configuration: spreadConfiguration(mesh) });
    const [from, to] = [chip.netlist.inputPorts[0]!, chip.netlist.outputPorts[3]!];
    const grid = { kind: 'fsr' as const, points: 16 };
    const fast = sMatrix(chip.netlist, { ports: [from, to], grid, unitDelayS: chip.unitDelayS, referenceFrequencyHz: chip.referenceFrequencyHz });
    const ref = referenceResponse(chip.netlist, from, gridOffsetsHz(grid, chip.unitDelayS), chip.unitDelayS);
    for (let f = 0; f < 16; f++) {
      const k = (f * 2 + 1) * 2;
      expect(Math.hypot(fast.re[k]! - ref.re[3]![f]!, fast.im[k]! - ref.im[3]![f]!)).toBeLessThan(1e-9);
    }
  });

  it('agrees with the dense reference route to 1e-9 on a radius-2 block', () => {
    const mesh = meshWithIo({ kind: 'hexagon', radius: 2 }, DEMO_TECH, 4);
    const chip = netlistFromMesh({ mesh, configuration: spreadConfiguration(mesh, 'cross') });
    expect(mesh.gates.length).toBe(72); // 9k^2 + 15k + 6 edges at k = 2 (Euler's formula, common practice)
    const from = chip.netlist.inputPorts[1]!;
    const offsets = Float64Array.of(-20e9, 0, 7.7e9);
    const ir = impulseResponse(chip.netlist, from);
    const ref = referenceResponse(chip.netlist, from, offsets, chip.unitDelayS);
    chip.netlist.outputPorts.forEach((_, q) => {
      const s = spectrumFromImpulse({ impulse: ir.outputs[q]!, grid: { kind: 'list', offsetsHz: [...offsets] }, unitDelayS: chip.unitDelayS, referenceFrequencyHz: chip.referenceFrequencyHz });
      offsets.forEach((_, f) => expect(Math.hypot(s.re[f]! - ref.re[q]![f]!, s.im[f]! - ref.im[q]![f]!)).toBeLessThan(1e-9));
    });
  }, 60_000);

  it('is reciprocal and, without loss or leakage, conserves power over all ports', () => {
    // Pozar, Microwave Engineering, sec. 4.3: S = S^T for reciprocal networks, S^H S = I for lossless ones.
    const tech = { ...DEMO_TECH, lossPerGateDb: 0, extinctionDb: 400 };
    const mesh = meshWithIo({ kind: 'hexagon', radius: 1 }, tech, 2);
    const chip = netlistFromMesh({ mesh, configuration: spreadConfiguration(mesh) });
    const ports = chip.netlist.inputPorts;
    const P = ports.length;
    const s = sMatrix(chip.netlist, { ports, grid: { kind: 'fsr', points: 8 }, unitDelayS: chip.unitDelayS, referenceFrequencyHz: chip.referenceFrequencyHz });
    for (let f = 0; f < 8; f++) {
      for (let j = 0; j < P; j++) {
        let sum = 0;
        for (let i = 0; i < P; i++) {
          const ij = (f * P + i) * P + j, ji = (f * P + j) * P + i;
          sum += s.re[ij]! ** 2 + s.im[ij]! ** 2;
          expect(Math.hypot(s.re[ij]! - s.re[ji]!, s.im[ij]! - s.im[ji]!)).toBeLessThan(1e-10);
        }
        expect(sum).toBeCloseTo(1, 9);
      }
    }
  });
});

describe('netlistFromMesh with per-gate perturbations', () => {
  const mesh = meshWithIo({ kind: 'hexagon', radius: 1 }, DEMO_TECH, 3);
  const configuration = spreadConfiguration(mesh);

  it('applies a phase error to the named gate only', () => {
    const gate = mesh.gates[4]!.id;
    const base = netlistFromMesh({ mesh, configuration });
    const moved = netlistFromMesh({ mesh, configuration, perturbations: { [gate]: { thetaErrorRad: 0.05 } } });
    base.network.gates.forEach((g, i) => {
      const same = [...g.transfer].every((v, k) => v === moved.network.gates[i]!.transfer[k]);
      expect(same).toBe(g.id !== gate);
    });
  });

  it('rejects a perturbation of a gate the mesh does not have', () => {
    expect(() => netlistFromMesh({ mesh, configuration, perturbations: { 'g(9,9)e': { phiErrorRad: 0.1 } } })).toThrow(/g\(9,9\)e/);
  });
});
