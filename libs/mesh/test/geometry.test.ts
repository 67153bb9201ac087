import { describe, expect, it } from 'vitest';
import { buildMesh, cellId, parseGateId, gateId, MeshError } from '../src/index.js';
import { definition } from './fixtures.js';

describe('mesh geometry', () => {
  // A radius-k hexagonal block has 3k^2+3k+1 cells, 6(k+1)^2 vertices and 9k^2+15k+6 edges
  // (centred hexagonal numbers; Euler's formula V - E + F = 2 for the planar graph, F = cells + 1).
  for (const k of [0, 1, 2, 3, 5, 8]) {
    it(`gives a radius-${k} hexagon the lattice counts of cells, vertices and gates`, () => {
      const sut = buildMesh(definition({ kind: 'hexagon', radius: k }));
      expect(sut.cells.length).toBe(3 * k * k + 3 * k + 1);
      expect(sut.vertices.length).toBe(6 * (k + 1) ** 2);
      expect(sut.gates.length).toBe(9 * k * k + 15 * k + 6);
      // Euler's formula for a connected planar graph: V - E + F = 2 (the outer face counted once).
      expect(sut.vertices.length - sut.gates.length + sut.cells.length + 1).toBe(2);
    });
  }

  it('satisfies Euler\'s formula on rectangles and gives every vertex two or three gates', () => {
    for (const [rows, columns] of [[1, 1], [2, 3], [8, 12], [5, 7]] as const) {
      const sut = buildMesh(definition({ kind: 'rectangle', rows, columns }));
      expect(sut.cells.length).toBe(rows * columns);
      // Euler's formula V - E + F = 2 (common practice for planar graphs).
      expect(sut.vertices.length - sut.gates.length + sut.cells.length + 1).toBe(2);
      for (const v of sut.vertices) expect([2, 3]).toContain(v.gates.length);
    }
  });

  it('joins every gate port by exactly one corner link, bend or external port', () => {
    const sut = buildMesh(definition({ kind: 'hexagon', radius: 2 }, { ioSites: ['v(0,-2)n'] }));
    for (let p = 0; p < sut.link.length; p++) {
      const kind = sut.linkKind[p];
      if (kind === 'external') expect(sut.portAt[p]).toBeGreaterThanOrEqual(0);
      else {
        expect(kind === 'corner' || kind === 'bend').toBe(true);
        expect(sut.link[sut.link[p]!]).toBe(p);
      }
    }
    expect(sut.ports.map((p) => p.id).sort()).toEqual(['v(0,-2)n/g(0,-2)ne', 'v(0,-2)n/g(0,-2)nw']);
  });

  it('has a boundary site on each of the 12k + 6 boundary vertices of a radius-k hexagon', () => {
    // A radius-k hexagon has 12k + 6 boundary vertices (6(2k+1) perimeter edges, one vertex per edge; from memory).
    for (const k of [0, 1, 4]) expect(buildMesh(definition({ kind: 'hexagon', radius: k })).sites.length).toBe(12 * k + 6);
  });

  it('round-trips gate ids and names every cell c(q,r)', () => {
    const sut = buildMesh(definition({ kind: 'rectangle', rows: 2, columns: 2 }));
    expect(sut.cells.map((c) => c.id)).toEqual(['c(0,0)', 'c(1,0)', 'c(0,1)', 'c(1,1)']);
    for (const g of sut.gates) {
      const p = parseGateId(g.id);
      expect(gateId(p.cell, (['e', 'ne', 'nw'] as const)[p.direction]!)).toBe(g.id);
    }
    expect(cellId({ q: -3, r: 2 })).toBe('c(-3,2)');
  });

  it('rejects an unknown dead gate and a non-boundary I/O site with a MeshError naming them', () => {
    expect(() => buildMesh(definition({ kind: 'hexagon', radius: 1 }, { deadGates: ['g(9,9)e'] }))).toThrow(/g\(9,9\)e/);
    expect(() => buildMesh(definition({ kind: 'hexagon', radius: 1 }, { ioSites: ['v(0,0)n'] }))).toThrow(MeshError);
  });
});
