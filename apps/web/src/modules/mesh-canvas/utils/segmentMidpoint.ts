// The middle of a segment.
import type { CanvasPoint } from './canvasPoint.js';
import type { CanvasSegment } from './gateSegment.js';

/** Midpoint of `segment`. */
export function segmentMidpoint(segment: CanvasSegment): CanvasPoint {
  return { x: (segment.from.x + segment.to.x) / 2, y: (segment.from.y + segment.to.y) / 2 };
}
