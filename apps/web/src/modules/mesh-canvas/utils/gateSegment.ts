// The two ends of a gate (a cell edge) in the drawing.
import { parseGateId } from '@hexloom/mesh';
import type { CanvasPoint } from './canvasPoint.js';
import { cellCorner } from './cellCorner.js';

/** A straight segment between two points. */
export type CanvasSegment = { from: CanvasPoint; to: CanvasPoint };

/**
 * The edge of gate `gateId` (`g(q,r)e|ne|nw`): edge d of the anchor cell runs from corner d - 1 to corner d,
 * the same two vertices libs/mesh gives as the gate's end 0 and end 1.
 */
export function gateSegment(gateId: string, side: number): CanvasSegment {
  const { cell, direction } = parseGateId(gateId);
  return { from: cellCorner(cell, direction - 1, side), to: cellCorner(cell, direction, side) };
}
