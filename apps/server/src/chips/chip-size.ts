/** The largest chip the team server takes: its compute answers within about a second at this size. */
import type { MeshDefinitionFile } from '@hexloom/contracts';
import { InvalidChipError } from './chip-errors.js';

/** Most cells of a chip on the team server (a 60 x 60 rectangle; the libraries and the CLI take larger ones). */
export const SERVER_MAX_CELLS = 3_600;

/** Cells of a definition's shape: rows x columns, 3k(k + 1) + 1 for a hexagon of radius k, or the listed cells. */
export function cellCount(definition: MeshDefinitionFile): number {
  const s = definition.shape;
  if (s.kind === 'rectangle') return s.rows * s.columns;
  if (s.kind === 'hexagon') return 3 * s.radius * (s.radius + 1) + 1;
  return s.cells.length;
}

/** 422 naming the size when the chip is larger than `SERVER_MAX_CELLS`. */
export function checkChipSize(definition: MeshDefinitionFile): void {
  const n = cellCount(definition);
  if (n > SERVER_MAX_CELLS) throw new InvalidChipError(`the chip has ${n} cells; the team server takes chips of at most ${SERVER_MAX_CELLS} cells (60 x 60); use the CLI for larger meshes`);
}
