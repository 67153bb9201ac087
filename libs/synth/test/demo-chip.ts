// Test fixture: the invented demo chip (12 x 8 cells, I/O on the west and east sides) and its side ports.
import { buildMesh, DEMO_TECHNOLOGY, emptyConfiguration, makeMeshDefinition, vertexPosition, type Configuration, type Mesh, type TechnologyProfile } from '@hexloom/mesh';

export { DEMO_TECHNOLOGY };

export function demoChip(technology: TechnologyProfile = DEMO_TECHNOLOGY): { mesh: Mesh; configuration: Configuration; west: string[]; east: string[] } {
  const definition = makeMeshDefinition({ name: 'demo', shape: { kind: 'rectangle', rows: 8, columns: 12 }, technology });
  const mesh = buildMesh(definition);
  const xs = mesh.ports.map((p) => vertexPosition(p.site).x);
  const mid = (Math.min(...xs) + Math.max(...xs)) / 2;
  const byRow = (ids: string[]): string[] => ids.sort((a, b) => vertexPosition(a.split('/')[0] as string).y - vertexPosition(b.split('/')[0] as string).y || (a < b ? -1 : 1));
  return {
    mesh,
    configuration: emptyConfiguration(definition),
    west: byRow(mesh.ports.filter((_p, i) => (xs[i] as number) < mid).map((p) => p.id)),
    east: byRow(mesh.ports.filter((_p, i) => (xs[i] as number) >= mid).map((p) => p.id)),
  };
}
