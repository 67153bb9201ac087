/** Per-cell tables: the six gates (by edge direction) and six corner vertices of every cell. */
import { canonicalEdge, cornerVertex, gateId, vertexId, type GateDirection } from './mesh-ids.js';
import type { Mesh } from './mesh.js';

export type CellFrame = { readonly gates: Int32Array; readonly corners: Int32Array };

const DIRS: readonly GateDirection[] = ['e', 'ne', 'nw'];
const cache = new WeakMap<Mesh, CellFrame>();

/** `gates[c * 6 + i]`: gate on edge i of cell c; `corners[c * 6 + i]`: vertex at corner i (between edges i and i+1). */
export function cellFrame(mesh: Mesh): CellFrame {
  const hit = cache.get(mesh);
  if (hit) return hit;
  const gates = new Int32Array(mesh.cells.length * 6);
  const corners = new Int32Array(mesh.cells.length * 6);
  for (const c of mesh.cells) {
    for (let i = 0; i < 6; i++) {
      const e = canonicalEdge(c, i);
      gates[c.index * 6 + i] = mesh.gateIndex.get(gateId(e.cell, DIRS[e.direction]!))!;
      const v = cornerVertex(c, i);
      corners[c.index * 6 + i] = mesh.vertexIndex.get(vertexId(v.cell, v.corner))!;
    }
  }
  const frame = { gates, corners };
  cache.set(mesh, frame);
  return frame;
}
