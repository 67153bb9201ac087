import { describe, expect, it } from 'vitest';
import { buildMesh, emptyConfiguration, placeCircuit, type Axial } from '../src/index.js';
import { RouteSpace } from '../src/route-space.js';
import { ringPlacements } from '../src/route-ring.js';
import { definition, demoMesh, sidePorts } from './fixtures.js';

// Perimeter of a connected patch of n cells with s shared edges: 6n - 2s units (DOMAIN brief, from memory).
const PATCHES: { name: string; cells: Axial[]; n: number; s: number; perimeter: number }[] = [
  { name: 'one cell', cells: [{ q: 0, r: 0 }], n: 1, s: 0, perimeter: 6 },
  { name: 'two cells', cells: [{ q: 0, r: 0 }, { q: 1, r: 0 }], n: 2, s: 1, perimeter: 10 },
  { name: 'three in a row', cells: [{ q: 0, r: 0 }, { q: 1, r: 0 }, { q: 2, r: 0 }], n: 3, s: 2, perimeter: 14 },
  { name: 'three around a vertex', cells: [{ q: 0, r: 0 }, { q: 1, r: 0 }, { q: 0, r: 1 }], n: 3, s: 3, perimeter: 12 },
  { name: 'a flower of seven', cells: [{ q: 0, r: 0 }, { q: 1, r: 0 }, { q: 1, r: -1 }, { q: 0, r: -1 }, { q: -1, r: 0 }, { q: -1, r: 1 }, { q: 0, r: 1 }], n: 7, s: 12, perimeter: 18 },
];

describe('lattice facts', () => {
  for (const p of PATCHES) {
    it(`gives ${p.name} ${p.s} shared gates and ${p.perimeter} boundary gates (6n - 2s)`, () => {
      const sut = buildMesh(definition({ kind: 'cells', cells: p.cells }));
      const shared = sut.gates.filter((g) => g.sideCells.every((c) => c >= 0)).length;
      const boundary = sut.gates.filter((g) => g.sideCells.includes(-1)).length;
      expect(shared).toBe(p.s);
      expect(boundary).toBe(6 * p.n - 2 * p.s);
      expect(boundary).toBe(p.perimeter);
    });
  }

  // No patch has perimeter 8 (6n - 2s skips it), and a loop that meets itself at a gate is two loops of
  // at least 6 each (from memory; the brute-force enumeration in completeness.test.ts agrees on small meshes).
  it('finds no ring of 8 units: no patch has perimeter 8 and any self-touching loop is at least 12', () => {
    const mesh = demoMesh();
    const { west, east } = sidePorts(mesh);
    // The router's own search, asked for 8 units without the up-front check, finds no placement.
    const space = new RouteSpace(mesh);
    const gen = ringPlacements(space, { sourceIn: mesh.ports[mesh.portIndex.get(west[4]!)!]!.gatePort, targetOut: mesh.ports[mesh.portIndex.get(east[4]!)!]!.gatePort, perimeterUnits: 8 });
    const first = gen.next();
    expect(first.done).toBe(true);
    // So a request for 8 units is refused at once, with the perimeters that exist.
    const r = placeCircuit(emptyConfiguration(mesh.definition), { kind: 'ring', id: 'r', from: west[4]!, to: east[4]!, perimeterUnits: 8, kappa: 0.1 }, mesh);
    expect(r.ok ? 'ok' : r.message).toMatch(/no loop of 8 units exists.*6, 10, 12, 14/);
  });

  it('stops a search at its budget and says search-limit instead of hanging', () => {
    const mesh = demoMesh();
    const { west, east } = sidePorts(mesh);
    const cfg = emptyConfiguration(mesh.definition);
    const probe = placeCircuit(cfg, { kind: 'path', id: 'p', from: west[4]!, to: east[4]! }, mesh);
    if (!probe.ok) throw new Error(probe.message);
    const r = placeCircuit(cfg, { kind: 'delay-line', id: 'd', from: west[4]!, to: east[4]!, lengthUnits: probe.pathLengthsUnits[0]! + 2, budget: 5 }, mesh);
    expect(r.ok ? 'ok' : r.reason).toBe('search-limit');
  });
});
