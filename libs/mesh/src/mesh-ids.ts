/** Stable human-readable ids of cells, vertices (sites), gates, gate ports and external ports. */
import { type Axial, AXIAL_OFFSETS, HEX_DIRECTIONS } from './axial.js';
import { MeshError } from './mesh-error.js';

/** Id of a cell: `c(q,r)`, e.g. `c(2,-1)`. */
export type CellId = string;
/** Id of a cell corner (vertex, and the boundary site there): `v(q,r)n` (top corner of cell q,r) or `v(q,r)s` (bottom corner). */
export type VertexId = string;
/** Id of a gate: `g(q,r)e`, `g(q,r)ne` or `g(q,r)nw`, the east, north-east or north-west edge of cell (q,r). */
export type GateId = string;
/** A port of a gate: side `a` (the cell named in the gate id) or `b` (its neighbour) and end `0` or `1`. */
export type GatePortLabel = 'a0' | 'a1' | 'b0' | 'b1';
/** Id of an external port at an I/O site: `<vertex id>/<gate id>`, e.g. `v(0,0)s/g(-1,1)e`. */
export type PortId = string;

/** The canonical edge directions a gate id may use (every edge is the e, ne or nw edge of exactly one cell). */
export type GateDirection = 'e' | 'ne' | 'nw';

export function cellId(cell: Axial): CellId {
  return `c(${cell.q},${cell.r})`;
}

export function vertexId(cell: Axial, corner: 'n' | 's'): VertexId {
  return `v(${cell.q},${cell.r})${corner}`;
}

export function gateId(cell: Axial, direction: GateDirection): GateId {
  return `g(${cell.q},${cell.r})${direction}`;
}

export function portId(vertex: VertexId, gate: GateId): PortId {
  return `${vertex}/${gate}`;
}

const CELL_RE = /^c\((-?\d+),(-?\d+)\)$/;
const GATE_RE = /^g\((-?\d+),(-?\d+)\)(e|ne|nw)$/;

/** Parses `c(q,r)`; throws a MeshError naming the bad id. */
export function parseCellId(id: string): Axial {
  const m = CELL_RE.exec(id);
  if (!m) throw new MeshError('invalid-id', `"${id}" is not a cell id (expected c(q,r))`);
  return { q: Number(m[1]), r: Number(m[2]) };
}

/** Parses `g(q,r)dir` into the anchor cell and the direction index (0, 1 or 2). */
export function parseGateId(id: string): { cell: Axial; direction: number } {
  const m = GATE_RE.exec(id);
  if (!m) throw new MeshError('invalid-id', `"${id}" is not a gate id (expected g(q,r)e, g(q,r)ne or g(q,r)nw)`);
  return { cell: { q: Number(m[1]), r: Number(m[2]) }, direction: HEX_DIRECTIONS.indexOf(m[3] as GateDirection) };
}

/**
 * The canonical vertex of corner `corner` (0..5) of a cell; corner i lies between edges i and i+1,
 * at 30 + 60 i degrees counter-clockwise from east. Each vertex is the top (n) or bottom (s) corner of one cell.
 */
export function cornerVertex(cell: Axial, corner: number): { cell: Axial; corner: 'n' | 's' } {
  const k = ((corner % 6) + 6) % 6;
  const at = (dq: number, dr: number, c: 'n' | 's') => ({ cell: { q: cell.q + dq, r: cell.r + dr }, corner: c });
  switch (k) {
    case 0:
      return at(1, -1, 's');
    case 1:
      return at(0, 0, 'n');
    case 2:
      return at(0, -1, 's');
    case 3:
      return at(-1, 1, 'n');
    case 4:
      return at(0, 0, 's');
    default:
      return at(0, 1, 'n');
  }
}

/** The canonical gate of edge `direction` (0..5) of a cell: anchor cell and direction 0..2. */
export function canonicalEdge(cell: Axial, direction: number): { cell: Axial; direction: number } {
  const d = ((direction % 6) + 6) % 6;
  if (d < 3) return { cell, direction: d };
  const o = AXIAL_OFFSETS[d]!;
  return { cell: { q: cell.q + o.q, r: cell.r + o.r }, direction: d - 3 };
}
