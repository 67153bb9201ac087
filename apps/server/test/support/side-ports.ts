// Test helper: the west and east I/O ports of a chip, top to bottom.
import { buildMesh, vertexPosition, type MeshDefinition } from '@hexloom/mesh';

/** Port ids on the west and east sides, each sorted by height. */
export function sidePorts(definition: MeshDefinition): { west: string[]; east: string[] } {
  const mesh = buildMesh(definition);
  const xs = mesh.ports.map((p) => vertexPosition(p.site).x);
  const mid = (Math.min(...xs) + Math.max(...xs)) / 2;
  const byHeight = (ids: string[]): string[] =>
    ids.sort((a, b) => vertexPosition(a.split('/')[0] ?? '').y - vertexPosition(b.split('/')[0] ?? '').y || (a < b ? -1 : 1));
  return {
    west: byHeight(mesh.ports.filter((_p, i) => (xs[i] ?? 0) < mid).map((p) => p.id)),
    east: byHeight(mesh.ports.filter((_p, i) => (xs[i] ?? 0) >= mid).map((p) => p.id)),
  };
}
