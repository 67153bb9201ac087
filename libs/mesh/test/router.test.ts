import { describe, expect, it } from 'vitest';
import { buildMesh, checkConfiguration, emptyConfiguration, placeCircuit, removeCircuit, type Configuration, type RouteRequest } from '../src/index.js';
import { circuitDelaysUnits, definition, demoMesh, sidePorts } from './fixtures.js';

const mesh = demoMesh();
// One port per I/O site (each site has two), north to south.
const sides = sidePorts(mesh);
const west = sides.west.filter((_p, i) => i % 2 === 0);
const east = sides.east.filter((_p, i) => i % 2 === 0);
const empty = emptyConfiguration(mesh.definition);
const place = (req: RouteRequest, cfg: Configuration = empty) => placeCircuit(cfg, req, mesh);
const shortestUnits = (from: string, to: string) => {
  const r = place({ kind: 'path', id: 'probe', from, to });
  if (!r.ok) throw new Error(r.message);
  return r.pathLengthsUnits[0]!;
};
const cellsOfGate = (id: string) => mesh.gates[mesh.gateIndex.get(id)!]!.sideCells.filter((c) => c >= 0);

describe('routeCircuit on the 12 x 8 demo mesh', () => {
  it('places delay lines at 1x, 2x and 4x the minimum length, each exact and valid', () => {
    const shortest = place({ kind: 'path', id: 'p', from: west[3]!, to: east[5]! });
    expect(shortest.ok).toBe(true);
    const dMin = shortest.ok ? shortest.pathLengthsUnits[0]! : 0;
    for (const factor of [1, 2, 4]) {
      // Lengths d_min + 2k are the only ones possible (bipartite lattice, common practice).
      const L = dMin * factor + ((dMin * factor - dMin) % 2);
      const r = place({ kind: 'delay-line', id: 'd', from: west[3]!, to: east[5]! , lengthUnits: L });
      expect(r.ok, `length ${L}`).toBe(true);
      if (r.ok) {
        expect(r.pathLengthsUnits).toEqual([L]);
        expect(checkConfiguration(mesh, r.configuration).ok).toBe(true);
      }
    }
  });

  it('answers too-short below the minimum and not-enough-free-area past the free waveguides', () => {
    const r1 = place({ kind: 'delay-line', id: 'd', from: west[0]!, to: east[0]!, lengthUnits: shortestUnits(west[0]!, east[0]!) - 2 });
    expect(r1.ok ? 'ok' : r1.reason).toBe('too-short');
    const r2 = place({ kind: 'delay-line', id: 'd', from: west[0]!, to: east[0]!, lengthUnits: shortestUnits(west[0]!, east[0]!) + 4 * mesh.gates.length });
    expect(r2.ok ? 'ok' : r2.reason).toBe('not-enough-free-area');
  });

  // Perimeter of a connected patch of n cells with s shared edges is 6n - 2s (DOMAIN brief; from
  // memory): one cell 6, two cells 10, three around a vertex 12, three in a row 14, a flower of seven 18.
  for (const perimeter of [6, 10, 12, 14, 18, 26]) {
    it(`places a ring of ${perimeter} units coupled to a bus, the loop closing through the coupler`, () => {
      const r = place({ kind: 'ring', id: 'r', from: west[4]!, to: east[4]!, perimeterUnits: perimeter, kappa: 0.2 });
      expect(r.ok).toBe(true);
      if (!r.ok) return;
      const ring = r.circuit.paths.find((p) => p.role === 'ring')!;
      expect(ring.steps.length + 1).toBe(perimeter);
      expect(r.circuit.couplers).toHaveLength(1);
      expect(checkConfiguration(mesh, r.configuration).violations).toEqual([]);
      if (perimeter === 6) {
        // The loop around one cell: all six gates are edges of one cell.
        const gates = [...ring.steps.map((s) => s.gate), r.circuit.couplers[0]!.gate];
        const common = cellsOfGate(gates[0]!).filter((c) => gates.every((g) => cellsOfGate(g).includes(c)));
        expect(common).toHaveLength(1);
      }
    });
  }

  it('refuses odd perimeters and perimeters below one cell', () => {
    const odd = place({ kind: 'ring', id: 'r', from: west[4]!, to: east[4]!, perimeterUnits: 11, kappa: 0.2 });
    expect(odd.ok ? 'ok' : odd.reason).toBe('wrong-parity');
    const small = place({ kind: 'ring', id: 'r', from: west[4]!, to: east[4]!, perimeterUnits: 4, kappa: 0.2 });
    expect(small.ok ? 'ok' : small.reason).toBe('too-short');
  });

  it('places an add-drop ring whose two ring paths and two couplers add up to the perimeter', () => {
    const r = place({ kind: 'add-drop-ring', id: 'ad', from: west[2]!, to: east[2]!, add: east[8]!, drop: west[8]!, perimeterUnits: 10, kappa: 0.1 });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const ringUnits = r.circuit.paths.filter((p) => p.role === 'ring').reduce((n, p) => n + p.steps.length, 0) + 2;
    expect(ringUnits).toBe(10);
    expect(checkConfiguration(mesh, r.configuration).violations).toEqual([]);
  });

  it('places a chain of three coupled single-cell rings, each ring 6 units around one cell', () => {
    const r = place({ kind: 'coupled-rings', id: 'crow', from: west[6]!, to: west[10]!, drop: east[6]!, rings: 3, kappas: [0.3, 0.05, 0.05, 0.3] });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.circuit.couplers.map((c) => c.role)).toEqual(['ring-coupler', 'ring-ring', 'ring-ring', 'ring-coupler']);
    // 3 rings x 6 gates = 18 ring traversals, of which 4 gates are couplers (each ring passes its couplers once).
    const ringSteps = r.circuit.paths.filter((p) => p.role === 'ring').reduce((n, p) => n + p.steps.length, 0);
    expect(ringSteps).toBe(18 - 6);
    expect(checkConfiguration(mesh, r.configuration).violations).toEqual([]);
  });

  for (const delta of [0, 2, 4, 10]) {
    it(`places a Mach-Zehnder stage whose second arm is ${delta} units longer`, () => {
      const r = place({ kind: 'mzi', id: 'm', from: west[5]!, to: east[7]!, lengthDifferenceUnits: delta });
      expect(r.ok).toBe(true);
      if (!r.ok) return;
      const arms = r.circuit.paths.filter((p) => p.role === 'arm');
      expect(arms[1]!.steps.length - arms[0]!.steps.length).toBe(delta);
      expect(checkConfiguration(mesh, r.configuration).violations).toEqual([]);
    });
  }

  it('refuses an odd arm difference and places a 4-stage lattice with its differences', () => {
    const odd = place({ kind: 'mzi', id: 'm', from: west[5]!, to: east[7]!, lengthDifferenceUnits: 3 });
    expect(odd.ok ? 'ok' : odd.reason).toBe('wrong-parity');
    const r = place({ kind: 'mzi-lattice', id: 'lat', from: west[5]!, to: east[7]!, lengthDifferencesUnits: [2, 4, 4, 2] });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const arms = r.circuit.paths.filter((p) => p.role === 'arm');
    expect([0, 1, 2, 3].map((k) => arms[2 * k + 1]!.steps.length - arms[2 * k]!.steps.length)).toEqual([2, 4, 4, 2]);
    expect(r.circuit.couplers).toHaveLength(5);
    expect(checkConfiguration(mesh, r.configuration).violations).toEqual([]);
  });

  it('places a 1x4 splitter tree with the requested delay on every branch and equal split ratios', () => {
    const outs = [east[1]!, east[5]!, east[9]!, east[13]!];
    const probe = outs.map((o) => place({ kind: 'path', id: 'p', from: west[7]!, to: o }));
    const delays = probe.map((p, k) => (p.ok ? p.pathLengthsUnits[0]! + 6 + 2 * k : 0));
    const r = place({ kind: 'splitter-tree', id: 'ttd', from: west[7]!, outputs: outs.map((port, k) => ({ port, delayUnits: delays[k]! })) });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const got = circuitDelaysUnits(r.circuit, west[7]!);
    outs.forEach((o, k) => expect(got.get(o)).toEqual([delays[k]]));
    expect(r.circuit.couplers).toHaveLength(3);
    expect(checkConfiguration(mesh, r.configuration).violations).toEqual([]);
  });

  it('answers port-taken, then frees the port and the gates when the circuit is removed', () => {
    const a = place({ kind: 'delay-line', id: 'a', from: west[0]!, to: east[0]!, lengthUnits: shortestUnits(west[0]!, east[0]!) + 10 });
    expect(a.ok).toBe(true);
    if (!a.ok) return;
    const b = place({ kind: 'path', id: 'b', from: west[0]!, to: east[3]! }, a.configuration);
    expect(b.ok ? 'ok' : b.reason).toBe('port-taken');
    const freed = removeCircuit(a.configuration, 'a');
    expect(freed.gates).toEqual([]);
    expect(freed.circuits).toEqual([]);
    expect(place({ kind: 'path', id: 'b', from: west[0]!, to: east[3]! }, freed).ok).toBe(true);
  });

  it('places six circuits one after another, each on what is still free, all valid together', () => {
    let cfg = empty;
    const probe = place({ kind: 'path', id: 'probe', from: west[0]!, to: east[0]! });
    const requests: RouteRequest[] = [
      { kind: 'delay-line', id: 'delay', from: west[0]!, to: east[0]!, lengthUnits: (probe.ok ? probe.pathLengthsUnits[0]! : 0) + 8 },
      { kind: 'ring', id: 'notch', from: west[2]!, to: east[2]!, perimeterUnits: 6, kappa: 0.1 },
      { kind: 'coupled-rings', id: 'crow', from: west[8]!, to: west[10]!, drop: east[8]!, rings: 2, kappas: [0.3, 0.1, 0.3] },
      { kind: 'mzi', id: 'mzi', from: west[5]!, to: east[5]!, lengthDifferenceUnits: 4 },
      { kind: 'path', id: 'through', from: west[16]!, to: east[16]! },
      { kind: 'add-drop-ring', id: 'bp', from: west[12]!, to: east[12]!, add: east[14]!, drop: west[14]!, perimeterUnits: 10, kappa: 0.2 },
    ];
    for (const req of requests) {
      const r = place(req, cfg);
      expect(r.ok, req.id).toBe(true);
      if (r.ok) cfg = r.configuration;
    }
    expect(cfg.circuits).toHaveLength(6);
    expect(checkConfiguration(mesh, cfg).violations).toEqual([]);
    const without = removeCircuit(cfg, 'mzi');
    expect(checkConfiguration(mesh, without).violations).toEqual([]);
    expect(without.gates.some((g) => g.circuit === 'mzi')).toBe(false);
  });

  it('keeps a circuit inside its region and says no-free-path when the region cannot hold it', () => {
    const region = mesh.cells.filter((c) => c.r <= 2).map((c) => c.id);
    const inside = place({ kind: 'path', id: 'p', from: west[0]!, to: east[0]!, region });
    expect(inside.ok).toBe(true);
    if (inside.ok) expect(checkConfiguration(mesh, inside.configuration).violations).toEqual([]);
    const out = place({ kind: 'path', id: 'p', from: west[0]!, to: east[15]!, region });
    expect(out.ok ? 'ok' : out.reason).toBe('no-free-path');
  });

  it('says dead-gates-in-the-way when only dead gates block the way', () => {
    // A single row of three cells; killing the three gates of a column cut separates west from east.
    const shape = { kind: 'rectangle', rows: 1, columns: 3 } as const;
    const sites = buildMesh(definition(shape)).sites.map((s) => s.vertex);
    const cut = ['g(0,0)e', 'g(1,0)nw', 'g(1,1)nw'].filter((g) => buildMesh(definition(shape)).gateIndex.has(g));
    const blocked = buildMesh(definition(shape, { ioSites: sites, deadGates: ['g(0,0)e', 'g(1,0)nw', 'g(0,1)ne'].filter((g) => buildMesh(definition(shape)).gateIndex.has(g)) }));
    expect(cut.length).toBeGreaterThan(0);
    const west0 = blocked.ports.find((p) => p.site.startsWith('v(0,'))!;
    const east0 = blocked.ports.find((p) => p.site.startsWith('v(3,') || p.site.startsWith('v(2,'))!;
    const r = placeCircuit(emptyConfiguration(blocked.definition), { kind: 'path', id: 'p', from: west0.id, to: east0.id }, blocked);
    expect(r.ok ? 'ok' : r.reason).toBe('dead-gates-in-the-way');
  });

  it('prefers the lower-loss way when asked to route by loss', () => {
    const straight = place({ kind: 'path', id: 'p', from: west[7]!, to: east[7]! });
    if (!straight.ok) throw new Error(straight.message);
    // Make the middle of the shortest way lossy: routing by loss must go around it.
    const steps = straight.circuit.paths[0]!.steps;
    const lossy = Object.fromEntries(steps.slice(4, -4).map((s) => [s.gate, 6]));
    const m2 = buildMesh({ ...mesh.definition, gateLossDb: lossy });
    const loss = (ids: readonly { gate: string }[]) => ids.reduce((sum, st) => sum + m2.gates[m2.gateIndex.get(st.gate)!]!.lossDb, 0);
    const byLoss = placeCircuit(emptyConfiguration(m2.definition), { kind: 'path', id: 'p', from: west[7]!, to: east[7]!, metric: 'loss' }, m2);
    expect(byLoss.ok).toBe(true);
    if (!byLoss.ok) return;
    expect(loss(byLoss.circuit.paths[0]!.steps)).toBeLessThan(loss(steps));
    expect(byLoss.circuit.paths[0]!.steps.every((s) => lossy[s.gate] === undefined)).toBe(true);
  });
});
