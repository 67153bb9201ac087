// Corner k of a hexagonal cell in the drawing (corner k lies between edges k and k + 1).
import type { Axial } from '@hexloom/mesh';
import type { CanvasPoint } from './canvasPoint.js';
import { cellCentre } from './cellCentre.js';

/**
 * Corner `corner` (0..5) of `cell`, at 30 + 60 k degrees counter-clockwise from east, as libs/mesh numbers
 * corners (`cornerVertex`). The y axis points south, so the sine is subtracted.
 */
export function cellCorner(cell: Axial, corner: number, side: number): CanvasPoint {
  const c = cellCentre(cell, side);
  const angle = ((30 + 60 * corner) * Math.PI) / 180;
  return { x: c.x + side * Math.cos(angle), y: c.y - side * Math.sin(angle) };
}
