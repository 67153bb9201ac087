import { describe, expect, it } from 'vitest';
import { buildMesh, buildPortGraph, chipNetlist, emptyConfiguration, gateThetaRad, placeCircuit, portGraphKey } from '../src/index.js';
import { demoMesh, sidePorts } from './fixtures.js';

const mesh = demoMesh();

describe('port graph and chip netlist', () => {
  it('has two nodes per gate port plus source and sink per external port, and 2 traversal arcs per entry', () => {
    const sut = buildPortGraph(mesh);
    const linked = mesh.linkKind.filter((k) => k === 'corner' || k === 'bend').length;
    expect(sut.order).toBe(8 * mesh.gates.length + 2 * mesh.ports.length);
    expect(sut.size).toBe(8 * mesh.gates.length + linked + 2 * mesh.ports.length);
    const arcs = sut.outEdges(portGraphKey(mesh, 'in', 0)).map((e) => sut.getEdgeAttributes(e).kind).sort();
    expect(arcs).toEqual(['bar', 'cross']);
  });

  it('finds by loss (Dijkstra on the graphology port graph) the same least length as by length when every gate loses the same', () => {
    const uniform = buildMesh({ ...mesh.definition, technology: { ...mesh.definition.technology, bendLossDb: 0 } });
    const { west, east } = sidePorts(uniform);
    const cfg = emptyConfiguration(uniform.definition);
    for (let k = 0; k < 12; k++) {
      const from = west[(k * 5) % west.length]!;
      const to = east[(k * 7 + 3) % east.length]!;
      const byLength = placeCircuit(cfg, { kind: 'path', id: 'p', from, to }, uniform);
      const byLoss = placeCircuit(cfg, { kind: 'path', id: 'p', from, to, metric: 'loss' }, uniform);
      expect(byLoss.ok && byLoss.pathLengthsUnits[0], `${from} -> ${to}`).toBe(byLength.ok && byLength.pathLengthsUnits[0]);
    }
  });

  it('gives the solver every segment, link and port, with the unit delay n_g L_u / c', () => {
    const { west, east } = sidePorts(mesh);
    const r = placeCircuit(emptyConfiguration(mesh.definition), { kind: 'ring', id: 'r', from: west[2]!, to: east[2]!, perimeterUnits: 6, kappa: 0.25 }, mesh);
    if (!r.ok) throw new Error(r.message);
    const sut = chipNetlist(mesh, r.configuration);
    expect(sut.segments).toHaveLength(4 * mesh.gates.length);
    // T_u = n_g L_u / c = 4.2 * 650e-6 m / 299792458 m/s = 9.1063 ps (definition of group delay, common practice).
    expect(sut.unitDelayS).toBeCloseTo(9.1063e-12, 15);
    const coupler = sut.gates.find((g) => g.state === 'split')!;
    // The gate's cross-coupling is 0.25, or 0.75 where the bus passes the coupler in cross.
    expect([0.25, 0.75]).toContain(coupler.kappa);
    expect(sut.gates.filter((g) => g.circuit === undefined).every((g) => g.state === 'bar' && g.kappa === 0)).toBe(true);
    // Every corner or bend joins two gate ports once.
    expect(sut.links.length * 2).toBe(mesh.linkKind.filter((k) => k === 'corner' || k === 'bend').length);
  });

  it('maps kappa to the internal phase with kappa = cos^2(theta / 2)', () => {
    // Balanced MZI of two 3 dB couplers: theta = 0 is cross, theta = pi is bar (common practice).
    expect(gateThetaRad(1)).toBeCloseTo(0, 12);
    expect(gateThetaRad(0)).toBeCloseTo(Math.PI, 12);
    expect(Math.cos(gateThetaRad(0.3) / 2) ** 2).toBeCloseTo(0.3, 12);
  });
});
