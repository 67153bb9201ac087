// A short human description of a mesh shape.
import type { Chip } from '@hexloom/contracts';

/** "12 x 8 cells", "hexagon of radius 2", or "23 cells". */
export function describeShape(shape: Chip['definition']['shape']): string {
  if (shape.kind === 'rectangle') return `${shape.columns} x ${shape.rows} cells`;
  if (shape.kind === 'hexagon') return `hexagon of radius ${shape.radius}`;
  return `${shape.cells.length} cells`;
}
