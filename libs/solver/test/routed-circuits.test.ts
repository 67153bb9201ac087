// Circuits placed by the libs/mesh router and simulated through the mesh adapter, against textbook equations.
import { describe, expect, it } from 'vitest';
import { emptyConfiguration, placeCircuit } from '@hexloom/mesh';
import { impulseResponse, netlistFromMesh, spectrumFromImpulse } from '../src/index.js';
import { DEMO_TECH, meshWithIo } from './mesh-fixtures.js';
import { ringRoundTrip } from './routed-ring.js';

// Near-ideal extinction so the leakage of parked gates stays below the tolerances; 0.2 dB per gate.
const TECH = { ...DEMO_TECH, extinctionDb: 300, lossPerGateDb: 0.2 };
const mesh = meshWithIo({ kind: 'hexagon', radius: 2 }, TECH, 2);
const alpha = 10 ** (-0.2 / 20);

describe('a single-cell ring placed by the router on a radius-2 block', () => {
  const kappa = 0.1;
  const placed = placeCircuit(emptyConfiguration(mesh.definition), { id: 'ring1', kind: 'ring', from: mesh.ports[0]!.id, to: mesh.ports[3]!.id, perimeterUnits: 6, kappa }, mesh);
  if (!placed.ok) throw new Error(`the router could not place the ring: ${placed.reason}`);
  const chip = netlistFromMesh({ mesh, configuration: placed.configuration });
  const ir = impulseResponse(chip.netlist, mesh.ports[0]!.id);
  const q = chip.netlist.outputPorts.indexOf(mesh.ports[3]!.id);
  const s = spectrumFromImpulse({ impulse: ir.outputs[q]!, grid: { kind: 'fsr', points: 4096 }, unitDelayS: chip.unitDelayS, referenceFrequencyHz: chip.referenceFrequencyHz });
  // Bus: the legs into and out of the coupler plus the coupler itself; ring: 6 units.
  const busUnits = (placed.pathLengthsUnits[0] ?? 0) + (placed.pathLengthsUnits[1] ?? 0) + 1;
  const a = alpha ** 6, t = Math.sqrt(1 - kappa);
  const { psiRad } = ringRoundTrip(chip, mesh, placed.circuit);

  it('has the requested power coupling into the ring', () => {
    // |through element|^2 of the coupler = (1 - kappa) alpha^2 (Yariv 2000: t^2 + kappa^2 = 1 for a lossless coupler).
    const { busThrough } = ringRoundTrip(chip, mesh, placed.circuit);
    expect(Math.hypot(...busThrough) ** 2 / alpha ** 2).toBeCloseTo(1 - kappa, 9);
  });

  it('follows the all-pass transmission against the round-trip phase, FSR 1/(6 T_u)', () => {
    // Yariv, Electron. Lett. 36(4) 2000; Rabus 2007 eq. (2.4), with phi -> 6 w - psi and the bus loss alpha^(2 L_bus).
    for (let i = 0; i < 4096; i += 31) {
      const c = Math.cos(2 * Math.PI * s.offsetsHz[i]! * 6 * chip.unitDelayS - psiRad);
      const expected = (alpha ** (2 * busUnits) * (a * a - 2 * a * t * c + t * t)) / (1 - 2 * a * t * c + (a * t) ** 2);
      expect(s.re[i]! ** 2 + s.im[i]! ** 2).toBeCloseTo(expected, 9);
    }
  });

  it('has the resonant group delay of an under-coupled ring (negative ring contribution)', () => {
    // Rabus 2007 sec. 2.1: tau = T_rt a (1 - t^2) / ((a - t)(1 - a t)) at resonance, plus the bus delay.
    const fRes = psiRad / (2 * Math.PI * 6 * chip.unitDelayS);
    const at = spectrumFromImpulse({ impulse: ir.outputs[q]!, grid: { kind: 'list', offsetsHz: [fRes] }, unitDelayS: chip.unitDelayS, referenceFrequencyHz: chip.referenceFrequencyHz });
    const ring = (6 * a * (1 - t * t)) / ((a - t) * (1 - a * t));
    expect(at.groupDelayS[0]! / chip.unitDelayS).toBeCloseTo(busUnits + ring, 6);
    expect(ring).toBeLessThan(0);
  });
});

describe('a Mach-Zehnder stage placed by the router with a two-unit arm difference', () => {
  const placed = placeCircuit(emptyConfiguration(mesh.definition), { id: 'mzi1', kind: 'mzi', from: mesh.ports[0]!.id, to: mesh.ports[5]!.id, lengthDifferenceUnits: 2 }, mesh);
  if (!placed.ok) throw new Error(`the router could not place the MZI: ${placed.reason}`);
  const chip = netlistFromMesh({ mesh, configuration: placed.configuration });
  const ir = impulseResponse(chip.netlist, mesh.ports[0]!.id);
  const q = chip.netlist.outputPorts.indexOf(mesh.ports[5]!.id);
  const s = spectrumFromImpulse({ impulse: ir.outputs[q]!, grid: { kind: 'fsr', points: 1024 }, unitDelayS: chip.unitDelayS, referenceFrequencyHz: chip.referenceFrequencyHz });
  const power = (i: number): number => s.re[i % 1024]! ** 2 + s.im[i % 1024]! ** 2;

  it('repeats every 1/(2 T_u) and follows cos^2: |H(f)|^2 + |H(f + FSR/2)|^2 is constant', () => {
    // Textbook MZI (Madsen & Zhao 1999, sec. 3.3): |H|^2 = A cos^2(w dL / 2 + c) with dL = 2, period 1/(2 T_u);
    // a quarter period (256 of 1024 points over 1/T_u) turns cos^2 into sin^2.
    const sum = power(0) + power(256);
    for (let i = 0; i < 1024; i += 7) {
      expect(power(i)).toBeCloseTo(power(i + 512), 10);
      expect(power(i) + power(i + 256)).toBeCloseTo(sum, 10);
    }
    // Contrast of two interfering fields of amplitudes 1 and r = alpha^2 (the longer arm has two more lossy units):
    // min/max = ((1 - r)/(1 + r))^2 (two-beam interference, common practice); the grid holds the extremes only approximately.
    const max = Math.max(...[...s.re].map((_, i) => power(i))), min = Math.min(...[...s.re].map((_, i) => power(i)));
    const r = alpha ** 2;
    expect(min / max).toBeGreaterThanOrEqual(((1 - r) / (1 + r)) ** 2 * (1 - 1e-9));
    expect(min / max).toBeLessThan(((1 - r) / (1 + r)) ** 2 * 1.5);
  });
});

describe('every single-cell ring the router places on a radius-2 block', () => {
  it('couples the requested power kappa = 0.1 into the ring, whichever way the bus passes the coupler', () => {
    // Lossless, ideal gates: the coupler's bus-through power must be 1 - kappa (Yariv 2000: t^2 + kappa^2 = 1).
    const ideal = meshWithIo({ kind: 'hexagon', radius: 2 }, { ...TECH, lossPerGateDb: 0 }, 2);
    const wrong: string[] = [];
    for (let i = 0; i < ideal.ports.length; i++) {
      for (let j = i + 1; j < ideal.ports.length; j += 3) {
        const r = placeCircuit(emptyConfiguration(ideal.definition), { id: 'x', kind: 'ring', from: ideal.ports[i]!.id, to: ideal.ports[j]!.id, perimeterUnits: 6, kappa: 0.1 }, ideal);
        if (!r.ok) continue;
        const through = Math.hypot(...ringRoundTrip(netlistFromMesh({ mesh: ideal, configuration: r.configuration }), ideal, r.circuit).busThrough) ** 2;
        if (Math.abs(through - 0.9) > 1e-9) wrong.push(`${ideal.ports[i]!.id} -> ${ideal.ports[j]!.id}: through ${through.toFixed(3)}`);
      }
    }
    expect(wrong).toEqual([]);
  });
});
