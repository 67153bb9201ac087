// Centre of a hexagonal cell in the drawing, from libs/mesh's axial convention.
import { axialCentre, type Axial } from '@hexloom/mesh';
import type { CanvasPoint } from './canvasPoint.js';

/** Centre of `cell` for cells of side (= circumradius) `side` drawing units (pointy-top, x east, y south). */
export function cellCentre(cell: Axial, side: number): CanvasPoint {
  const c = axialCentre(cell);
  return { x: c.x * side, y: c.y * side };
}
