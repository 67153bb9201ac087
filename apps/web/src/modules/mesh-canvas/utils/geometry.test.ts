// Canvas geometry: cell centres, corners, gate segments and port anchors agree with hexagon geometry and with libs/mesh.
import { AXIAL_OFFSETS, buildMesh, DEMO_TECHNOLOGY, makeMeshDefinition, vertexPosition } from '@hexloom/mesh';
import { describe, expect, it } from 'vitest';
import { cellCentre } from './cellCentre.js';
import { cellCorner } from './cellCorner.js';
import { fitTransform } from './fitTransform.js';
import { gateSegment } from './gateSegment.js';
import { portAnchor } from './portAnchor.js';
import { segmentMidpoint } from './segmentMidpoint.js';

const SIDE = 40;
const TOL = 1e-9;
const distance = (a: { x: number; y: number }, b: { x: number; y: number }) => Math.hypot(a.x - b.x, a.y - b.y);
const mesh = buildMesh(makeMeshDefinition({ name: 'geometry fixture', shape: { kind: 'rectangle', rows: 3, columns: 4 }, technology: DEMO_TECHNOLOGY, io: 'all' }));
const hexagon = buildMesh(makeMeshDefinition({ name: 'hexagon fixture', shape: { kind: 'hexagon', radius: 2 }, technology: DEMO_TECHNOLOGY, io: 'all' }));

describe('cellCentre', () => {
  it('puts the six neighbours of a cell sqrt(3) * side away (regular hexagon tiling, from memory)', () => {
    const origin = { q: 2, r: -1 };
    for (const o of AXIAL_OFFSETS) {
      const d = distance(cellCentre(origin, SIDE), cellCentre({ q: origin.q + o.q, r: origin.r + o.r }, SIDE));
      expect(Math.abs(d - Math.sqrt(3) * SIDE)).toBeLessThan(TOL);
    }
  });

  it('puts the next-but-one cell along a row 2 sqrt(3) * side away and rows 1.5 side apart (pointy-top layout, from memory)', () => {
    expect(Math.abs(cellCentre({ q: 2, r: 0 }, SIDE).x - 2 * Math.sqrt(3) * SIDE)).toBeLessThan(TOL);
    expect(Math.abs(cellCentre({ q: 0, r: 1 }, SIDE).y - 1.5 * SIDE)).toBeLessThan(TOL);
  });
});

describe('cellCorner', () => {
  it('puts every corner one side from the centre, with the top corner straight north (pointy-top hexagon, from memory)', () => {
    const cell = { q: 1, r: 1 };
    const c = cellCentre(cell, SIDE);
    for (let k = 0; k < 6; k++) expect(Math.abs(distance(c, cellCorner(cell, k, SIDE)) - SIDE)).toBeLessThan(TOL);
    const top = cellCorner(cell, 1, SIDE);
    expect(Math.abs(top.x - c.x)).toBeLessThan(TOL);
    expect(Math.abs(top.y - (c.y - SIDE))).toBeLessThan(TOL);
  });

  it('lands on the vertex libs/mesh names for that corner, so shared corners coincide', () => {
    for (const cell of mesh.cells) {
      for (let k = 0; k < 6; k++) {
        const corner = cellCorner(cell, k, SIDE);
        const matches = mesh.vertices.filter((v) => distance(corner, { x: vertexPosition(v.id).x * SIDE, y: vertexPosition(v.id).y * SIDE }) < 1e-6);
        expect(matches).toHaveLength(1);
      }
    }
  });
});

describe('gateSegment', () => {
  it('is one side long and crosses the line between the two cells it separates at its middle (hexagon geometry, from memory)', () => {
    const a = { q: 1, r: 1 };
    for (const [dir, o] of [['e', AXIAL_OFFSETS[0]!], ['ne', AXIAL_OFFSETS[1]!], ['nw', AXIAL_OFFSETS[2]!]] as const) {
      const s = gateSegment(`g(1,1)${dir}`, SIDE);
      expect(Math.abs(distance(s.from, s.to) - SIDE)).toBeLessThan(TOL);
      const ca = cellCentre(a, SIDE);
      const cb = cellCentre({ q: a.q + o.q, r: a.r + o.r }, SIDE);
      const m = segmentMidpoint(s);
      expect(distance(m, { x: (ca.x + cb.x) / 2, y: (ca.y + cb.y) / 2 })).toBeLessThan(TOL);
      const along = { x: s.to.x - s.from.x, y: s.to.y - s.from.y };
      expect(Math.abs(along.x * (cb.x - ca.x) + along.y * (cb.y - ca.y))).toBeLessThan(1e-6);
    }
  });

  it('runs between the two vertices libs/mesh gives as the gate ends', () => {
    for (const gate of mesh.gates) {
      const s = gateSegment(gate.id, SIDE);
      const [end0, end1] = gate.ends.map((i) => vertexPosition(mesh.vertices[i]!.id));
      expect(distance(s.from, { x: end0!.x * SIDE, y: end0!.y * SIDE })).toBeLessThan(1e-6);
      expect(distance(s.to, { x: end1!.x * SIDE, y: end1!.y * SIDE })).toBeLessThan(1e-6);
    }
  });
});

describe('portAnchor', () => {
  it('draws every port outside every cell (farther from each centre than the inradius sqrt(3)/2 side, from memory)', () => {
    for (const m of [mesh, hexagon]) {
    expect(m.ports.length).toBeGreaterThan(0);
    for (const port of m.ports) {
      const { marker, label } = portAnchor(m, port, SIDE);
      for (const cell of m.cells) {
        expect(distance(marker, cellCentre(cell, SIDE))).toBeGreaterThan((Math.sqrt(3) / 2) * SIDE);
        expect(distance(label, cellCentre(cell, SIDE))).toBeGreaterThan((Math.sqrt(3) / 2) * SIDE);
      }
    }
    }
  });

  it('draws the two ports of one site apart', () => {
    const bySite = new Map<string, { x: number; y: number }[]>();
    for (const m of [mesh, hexagon]) for (const port of m.ports) bySite.set(`${m.definition.name} ${port.site}`, [...(bySite.get(`${m.definition.name} ${port.site}`) ?? []), portAnchor(m, port, SIDE).marker]);
    for (const [, markers] of bySite) {
      expect(markers).toHaveLength(2);
      expect(distance(markers[0]!, markers[1]!)).toBeGreaterThan(0.4 * SIDE);
    }
  });
});

describe('fitTransform', () => {
  it('maps the centre of the bounds to the centre of the viewport and keeps the padding free', () => {
    const bounds = { minX: -100, minY: 20, maxX: 300, maxY: 120 };
    const t = fitTransform(bounds, 800, 400, 16);
    expect(Math.abs(t.k * 100 + t.x - 400)).toBeLessThan(TOL);
    expect(Math.abs(t.k * 70 + t.y - 200)).toBeLessThan(TOL);
    expect(Math.abs(t.k - Math.min(768 / 400, 368 / 100))).toBeLessThan(TOL);
    expect(t.k * bounds.minX + t.x).toBeGreaterThanOrEqual(16 - TOL);
    expect(t.k * bounds.maxX + t.x).toBeLessThanOrEqual(800 - 16 + TOL);
  });
});
