// Everything the canvas draws, in drawing units: cell outlines, gate segments, port markers and the bounds.
import type { Mesh, PortWiring } from '@hexloom/mesh';
import type { CanvasPoint } from './canvasPoint.js';
import { cellCorner } from './cellCorner.js';
import type { CanvasBounds } from './fitTransform.js';
import { gateSegment, type CanvasSegment } from './gateSegment.js';
import { portAnchor, type PortAnchor } from './portAnchor.js';
import { spreadPortLabels, type PlacedLabel } from './spreadPortLabels.js';

/** Side of a cell (one gate) in drawing units. */
export const CELL_SIDE = 40;

/** A drawn cell: its id and the SVG `points` of its outline. */
export type LaidOutCell = { id: string; points: string; corners: CanvasPoint[] };
/** A drawn gate. */
export type LaidOutGate = { id: string; segment: CanvasSegment };
/** A drawn external port; `label` is the chip's own label, undefined when the chip gives none. */
export type LaidOutPort = { id: string; label: string | undefined; wiredTo: PortWiring; anchor: PortAnchor; placed: PlacedLabel };
/** The whole drawing. */
export type MeshLayout = { side: number; cells: LaidOutCell[]; gates: LaidOutGate[]; ports: LaidOutPort[]; bounds: CanvasBounds };

/** Lays out `mesh` with cells of side `side`; port labels are spread so none overlap, and the bounds include them. */
export function meshLayout(mesh: Mesh, side = CELL_SIDE): MeshLayout {
  const cells = mesh.cells.map((c) => {
    const corners = [0, 1, 2, 3, 4, 5].map((k) => cellCorner(c, k, side));
    return { id: c.id, corners, points: corners.map((p) => `${round(p.x)},${round(p.y)}`).join(' ') };
  });
  const gates = mesh.gates.map((g) => ({ id: g.id, segment: gateSegment(g.id, side) }));
  const anchored = mesh.ports.map((p) => ({ id: p.id, label: p.label, wiredTo: p.wiredTo, anchor: portAnchor(mesh, p, side) }));
  const labelled = anchored.filter((p) => p.label !== undefined);
  const spots = new Map(spreadPortLabels(labelled.map((p) => ({ text: p.label ?? '', anchor: p.anchor })), side).map((spot, i) => [labelled[i]!.id, spot]));
  const ports = anchored.map((p) => ({ ...p, placed: spots.get(p.id) ?? { at: p.anchor.label, moved: false } }));
  const bounds = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };
  const include = (x: number, y: number) => {
    bounds.minX = Math.min(bounds.minX, x);
    bounds.maxX = Math.max(bounds.maxX, x);
    bounds.minY = Math.min(bounds.minY, y);
    bounds.maxY = Math.max(bounds.maxY, y);
  };
  for (const c of cells) for (const p of c.corners) include(p.x, p.y);
  for (const p of ports) {
    const w = (p.label?.length ?? 0) * 0.2 * side;
    const { x, y } = p.placed.at;
    include(p.anchor.marker.x, p.anchor.marker.y);
    include(p.anchor.textAnchor === 'end' ? x - w : p.anchor.textAnchor === 'start' ? x + w : x - w / 2, y - 0.2 * side);
    include(p.anchor.textAnchor === 'middle' ? x + w / 2 : x, y + 0.2 * side);
  }
  return { side, cells, gates, ports, bounds: Number.isFinite(bounds.minX) ? bounds : { minX: 0, minY: 0, maxX: side, maxY: side } };
}

function round(v: number): number {
  return Math.round(v * 100) / 100;
}
