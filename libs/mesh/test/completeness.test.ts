// Completeness against brute force: on small meshes every walk and loop an exhaustive enumeration
// finds, the router finds too, and everything it returns passes the checker.
import { describe, expect, it } from 'vitest';
import { buildMesh, checkConfiguration, emptyConfiguration, placeCircuit, type Mesh, type MeshShape } from '../src/index.js';
import { enumerateLoopLengths, enumeratePortWalks } from './brute-force.js';
import { definition } from './fixtures.js';

const SMALL: { name: string; shape: MeshShape; sites: number[]; dead?: string[] }[] = [
  { name: 'two adjacent cells', shape: { kind: 'cells', cells: [{ q: 0, r: 0 }, { q: 1, r: 0 }] }, sites: [0, 3, 7] },
  { name: 'three cells in a row', shape: { kind: 'rectangle', rows: 1, columns: 3 }, sites: [0, 5, 9] },
  { name: 'three cells around a vertex', shape: { kind: 'cells', cells: [{ q: 0, r: 0 }, { q: 1, r: 0 }, { q: 0, r: 1 }] }, sites: [1, 6, 10] },
  { name: 'three cells in a row with a dead gate', shape: { kind: 'rectangle', rows: 1, columns: 3 }, sites: [0, 5, 9], dead: ['g(1,0)e'] },
];

function smallMesh(s: (typeof SMALL)[number]): Mesh {
  const all = buildMesh(definition(s.shape)).sites.map((x) => x.vertex);
  return buildMesh(definition(s.shape, { ioSites: s.sites.map((i) => all[i]!), deadGates: s.dead ?? [] }));
}

describe.each(SMALL)('router against brute force on $name', (s) => {
  const mesh = smallMesh(s);
  const walks = enumeratePortWalks(mesh).filter((w) => w.from !== w.to);
  const empty = emptyConfiguration(mesh.definition);

  it('finds a delay line for every (port, port, length) the enumeration finds, each valid under the checker', () => {
    expect(walks.length).toBeGreaterThan(5);
    for (const w of walks) {
      const r = placeCircuit(empty, { kind: 'delay-line', id: 'd', from: mesh.ports[w.from]!.id, to: mesh.ports[w.to]!.id, lengthUnits: w.lengthUnits }, mesh);
      expect(r.ok, `${mesh.ports[w.from]!.id} -> ${mesh.ports[w.to]!.id} in ${w.lengthUnits} units`).toBe(true);
      if (r.ok) {
        expect(r.pathLengthsUnits).toEqual([w.lengthUnits]);
        expect(checkConfiguration(mesh, r.configuration).violations).toEqual([]);
      }
    }
  });

  it('gives every walk between two ports one parity (the lattice is bipartite, common practice)', () => {
    const parity = new Map<string, number>();
    for (const w of walks) {
      const key = `${w.from}>${w.to}`;
      if (!parity.has(key)) parity.set(key, w.lengthUnits % 2);
      expect(w.lengthUnits % 2).toBe(parity.get(key));
    }
  });

  it('answers wrong-parity for a length of the other parity', () => {
    const w = walks[0]!;
    const r = placeCircuit(empty, { kind: 'delay-line', id: 'd', from: mesh.ports[w.from]!.id, to: mesh.ports[w.to]!.id, lengthUnits: w.lengthUnits + 1 }, mesh);
    expect(r.ok ? 'ok' : r.reason).toBe('wrong-parity');
  });

  it('finds the least length and the least loss the enumeration finds for each pair', () => {
    const pairs = new Map<string, { len: number; loss: number }>();
    for (const w of walks) {
      const key = `${w.from}>${w.to}`;
      const p = pairs.get(key) ?? { len: Infinity, loss: Infinity };
      pairs.set(key, { len: Math.min(p.len, w.lengthUnits), loss: Math.min(p.loss, w.lossDb) });
    }
    for (const [key, best] of pairs) {
      const [a, b] = key.split('>').map(Number) as [number, number];
      const byLength = placeCircuit(empty, { kind: 'path', id: 'p', from: mesh.ports[a]!.id, to: mesh.ports[b]!.id }, mesh);
      const byLoss = placeCircuit(empty, { kind: 'path', id: 'p', from: mesh.ports[a]!.id, to: mesh.ports[b]!.id, metric: 'loss' }, mesh);
      expect(byLength.ok && byLength.pathLengthsUnits[0]).toBe(best.len);
      expect(byLoss.ok).toBe(true);
      if (byLoss.ok) {
        const steps = byLoss.circuit.paths[0]!.steps;
        const lossDb = steps.reduce((sum, st) => sum + mesh.gates[mesh.gateIndex.get(st.gate)!]!.lossDb, 0);
        // Bends add loss too; the enumeration's figure includes them, so compare with a 0.5 dB allowance per bend at most.
        expect(lossDb).toBeLessThanOrEqual(best.loss + 1e-9);
      }
    }
  });

  it('finds a ring coupled to a bus for every loop length the enumeration finds, all loops even', () => {
    const loops = enumerateLoopLengths(mesh, 40);
    expect(loops.size).toBeGreaterThan(0);
    for (const L of loops) {
      // Every closed loop on the hexagonal lattice is even (bipartite graph, common practice).
      expect(L % 2).toBe(0);
      let placed = false;
      for (const a of mesh.ports)
        for (const b of mesh.ports) {
          if (placed || a === b) continue;
          const r = placeCircuit(empty, { kind: 'ring', id: 'r', from: a.id, to: b.id, perimeterUnits: L, kappa: 0.1 }, mesh);
          if (r.ok) {
            placed = true;
            const ring = r.circuit.paths.find((p) => p.role === 'ring')!;
            expect(ring.steps.length + 1).toBe(L);
            expect(checkConfiguration(mesh, r.configuration).violations).toEqual([]);
          }
        }
      expect(placed, `ring of ${L} units`).toBe(true);
    }
  });
});
