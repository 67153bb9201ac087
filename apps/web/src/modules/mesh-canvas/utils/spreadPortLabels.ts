// Moves port labels outwards until no two overlap, so crowded mesh edges stay readable at any zoom.
import type { CanvasPoint } from './canvasPoint.js';
import type { PortAnchor } from './portAnchor.js';

/** A label to place: its text, where the port wants it, and the direction it may move in. */
export type LabelRequest = { text: string; anchor: PortAnchor };
/** A placed label; `moved` says it left its first spot (the canvas then draws a leader line to the marker). */
export type PlacedLabel = { at: CanvasPoint; moved: boolean };

type Box = { x0: number; y0: number; x1: number; y1: number };

/** Character width and line height of the port labels, as fractions of the cell side (monospace at 0.32 side). */
export const PORT_LABEL_FONT = { size: 0.32, charWidth: 0.2, lineHeight: 0.36 } as const;

function boxOf(at: CanvasPoint, textAnchor: PortAnchor['textAnchor'], text: string, side: number): Box {
  const w = Math.max(1, text.length) * PORT_LABEL_FONT.charWidth * side;
  const h = PORT_LABEL_FONT.lineHeight * side;
  const x0 = textAnchor === 'start' ? at.x : textAnchor === 'end' ? at.x - w : at.x - w / 2;
  return { x0, y0: at.y - h / 2, x1: x0 + w, y1: at.y + h / 2 };
}

const overlaps = (a: Box, b: Box) => a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;

/**
 * Greedy placement in the given order: each label keeps its spot when free, else steps outwards (by its own width
 * for labels running sideways, by a line for labels above or below the mesh), at most `maxSteps` times.
 */
export function spreadPortLabels(requests: readonly LabelRequest[], side: number, maxSteps = 8): PlacedLabel[] {
  const placed: Box[] = [];
  return requests.map(({ text, anchor }) => {
    const sideways = anchor.textAnchor !== 'middle' && Math.abs(anchor.outward.x) > 0.5;
    let at = anchor.label;
    let box = boxOf(at, anchor.textAnchor, text, side);
    const step = sideways ? box.x1 - box.x0 + 0.15 * side : PORT_LABEL_FONT.lineHeight * side + 0.05 * side;
    let steps = 0;
    while (steps < maxSteps && placed.some((p) => overlaps(p, box))) {
      steps += 1;
      at = { x: anchor.label.x + anchor.outward.x * step * steps, y: anchor.label.y + anchor.outward.y * step * steps };
      box = boxOf(at, anchor.textAnchor, text, side);
    }
    placed.push(box);
    return { at, moved: steps > 0 };
  });
}
