/** Axial hex coordinates (pointy-top cells): the six neighbour directions and cell centres. */

/** A cell position in axial coordinates (q, r); r grows downwards (south). */
export type Axial = { readonly q: number; readonly r: number };

/** The six edge directions of a pointy-top cell, counter-clockwise from east. */
export type HexDirection = 'e' | 'ne' | 'nw' | 'w' | 'sw' | 'se';

/** Directions in index order 0..5 (counter-clockwise, 60 degrees apart). */
export const HEX_DIRECTIONS: readonly HexDirection[] = ['e', 'ne', 'nw', 'w', 'sw', 'se'];

/** Axial offset of the neighbour across edge i (the usual axial convention, e.g. redblobgames.com "Hexagonal Grids"). */
export const AXIAL_OFFSETS: readonly Axial[] = [
  { q: 1, r: 0 },
  { q: 1, r: -1 },
  { q: 0, r: -1 },
  { q: -1, r: 0 },
  { q: -1, r: 1 },
  { q: 0, r: 1 },
];

/** The neighbour of `cell` across edge `direction` (index 0..5). */
export function axialNeighbour(cell: Axial, direction: number): Axial {
  const d = AXIAL_OFFSETS[((direction % 6) + 6) % 6]!;
  return { q: cell.q + d.q, r: cell.r + d.r };
}

/** Hex distance between two cells (number of cell steps). */
export function axialDistance(a: Axial, b: Axial): number {
  const dq = a.q - b.q;
  const dr = a.r - b.r;
  return (Math.abs(dq) + Math.abs(dr) + Math.abs(dq + dr)) / 2;
}

/**
 * Centre of a cell in a plane with x to the east and y to the south, for a cell of
 * circumradius 1 (pointy-top layout): x = sqrt(3) (q + r/2), y = 1.5 r.
 */
export function axialCentre(cell: Axial): { x: number; y: number } {
  return { x: Math.sqrt(3) * (cell.q + cell.r / 2), y: 1.5 * cell.r };
}
