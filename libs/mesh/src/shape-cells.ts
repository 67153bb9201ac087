/** Expands a mesh shape into its list of cells, checked and in reading order (r, then q). */
import type { Axial } from './axial.js';
import type { MeshShape } from './mesh-definition.js';
import { MeshError } from './mesh-error.js';
import { cellId } from './mesh-ids.js';

const isCount = (n: number) => Number.isInteger(n) && n >= 1 && n <= 500;

/** The cells of a shape; throws MeshError on an empty, oversized or duplicated list. */
export function shapeCells(shape: MeshShape): Axial[] {
  const cells: Axial[] = [];
  if (shape.kind === 'rectangle') {
    if (!isCount(shape.rows) || !isCount(shape.columns))
      throw new MeshError('invalid-shape', `rectangle ${shape.rows} x ${shape.columns} must have 1..500 rows and columns`);
    for (let r = 0; r < shape.rows; r++)
      for (let col = 0; col < shape.columns; col++) cells.push({ q: col - Math.floor(r / 2), r });
  } else if (shape.kind === 'hexagon') {
    const k = shape.radius;
    if (!Number.isInteger(k) || k < 0 || k > 300) throw new MeshError('invalid-shape', `hexagon radius ${k} must be an integer 0..300`);
    for (let r = -k; r <= k; r++)
      for (let q = Math.max(-k, -r - k); q <= Math.min(k, -r + k); q++) cells.push({ q, r });
  } else {
    if (shape.cells.length === 0) throw new MeshError('invalid-shape', 'an explicit cell list must not be empty');
    const seen = new Set<string>();
    for (const c of shape.cells) {
      if (!Number.isInteger(c.q) || !Number.isInteger(c.r)) throw new MeshError('invalid-shape', `cell (${c.q},${c.r}) must have integer coordinates`);
      const id = cellId(c);
      if (seen.has(id)) throw new MeshError('duplicate-cell', `cell ${id} is listed twice`);
      seen.add(id);
      cells.push({ q: c.q, r: c.r });
    }
    cells.sort((a, b) => a.r - b.r || a.q - b.q);
  }
  return cells;
}
