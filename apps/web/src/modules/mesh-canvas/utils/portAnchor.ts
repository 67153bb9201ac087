// Where an external port is drawn: just outside the mesh, beside the boundary site it belongs to.
import { vertexPosition, type ExternalPort, type Mesh } from '@hexloom/mesh';
import type { CanvasPoint } from './canvasPoint.js';
import { cellCentre } from './cellCentre.js';
import { gateSegment } from './gateSegment.js';
import { segmentMidpoint } from './segmentMidpoint.js';

/** Marker position of a port, where its label goes, which way the label text runs, and the site's outward direction. */
export type PortAnchor = { marker: CanvasPoint; label: CanvasPoint; textAnchor: 'start' | 'middle' | 'end'; outward: CanvasPoint };

const unit = (p: CanvasPoint): CanvasPoint => {
  const n = Math.hypot(p.x, p.y) || 1;
  return { x: p.x / n, y: p.y / n };
};

/**
 * The site's outward direction d runs from the mean centre of the cells at the site's vertex to the vertex; the marker
 * sits half a side out along d, and a fifth of a side to the side of d where the port's own gate lies, so the two ports
 * of one site are drawn apart. The label goes further out, its text running away from the mesh.
 */
export function portAnchor(mesh: Mesh, port: ExternalPort, side: number): PortAnchor {
  const at = vertexPosition(port.site);
  const vertex = { x: at.x * side, y: at.y * side };
  const cells = new Set<number>();
  for (const g of mesh.vertices[mesh.vertexIndex.get(port.site) ?? -1]?.gates ?? []) for (const c of mesh.gates[g]!.sideCells) if (c >= 0) cells.add(c);
  const centres = [...cells].map((c) => cellCentre(mesh.cells[c]!, side));
  const mean = centres.length === 0 ? vertex : { x: centres.reduce((s, c) => s + c.x, 0) / centres.length, y: centres.reduce((s, c) => s + c.y, 0) / centres.length };
  const outward = unit({ x: vertex.x - mean.x, y: vertex.y - mean.y });
  const across = { x: -outward.y, y: outward.x };
  const mid = segmentMidpoint(gateSegment(port.gate, side));
  const sign = (mid.x - vertex.x) * across.x + (mid.y - vertex.y) * across.y >= 0 ? 1 : -1;
  const marker = { x: vertex.x + 0.5 * side * outward.x + 0.22 * side * sign * across.x, y: vertex.y + 0.5 * side * outward.y + 0.22 * side * sign * across.y };
  const sideways = Math.abs(outward.x) > 0.5;
  const runX = sideways ? outward.x : sign * across.x;
  const push = sideways ? 0.35 : 0.45;
  const label = { x: marker.x + push * side * outward.x + (sideways ? 0 : 0.1 * side * Math.sign(runX)), y: marker.y + push * side * outward.y };
  return { marker, label, textAnchor: runX > 0.2 ? 'start' : runX < -0.2 ? 'end' : 'middle', outward };
}
