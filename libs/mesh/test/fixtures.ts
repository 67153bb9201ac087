// Shared test fixtures: a demo technology profile and mesh-definition builders.
import { buildMesh, DEMO_TECHNOLOGY, makeMeshDefinition, type Circuit, type Mesh, type MeshDefinition, type MeshShape, vertexPosition } from '../src/index.js';

export { DEMO_TECHNOLOGY };

export function definition(shape: MeshShape, extra: Partial<MeshDefinition> = {}): MeshDefinition {
  return { schemaVersion: 1, name: 'fixture', shape, technology: DEMO_TECHNOLOGY, ioSites: [], ports: [], deadGates: [], ...extra };
}


/** The demo chip: 12 columns x 8 rows, I/O on the west and east sides (demo, invented). */
export function demoMesh(rows = 8, columns = 12): Mesh {
  return buildMesh(makeMeshDefinition({ name: 'demo', shape: { kind: 'rectangle', rows, columns }, technology: DEMO_TECHNOLOGY }));
}

/** West-side and east-side port ids of a mesh made with the left-right preset, north to south. */
export function sidePorts(mesh: Mesh): { west: string[]; east: string[] } {
  const xs = mesh.ports.map((p) => vertexPosition(p.site).x);
  const mid = (Math.min(...xs) + Math.max(...xs)) / 2;
  const byRow = (ids: string[]) => ids.sort((a, b) => vertexPosition(a.split('/')[0]!).y - vertexPosition(b.split('/')[0]!).y || (a < b ? -1 : 1));
  return { west: byRow(mesh.ports.filter((_p, i) => xs[i]! < mid).map((p) => p.id)), east: byRow(mesh.ports.filter((_p, i) => xs[i]! >= mid).map((p) => p.id)) };
}

/**
 * Delay in units from `from` to every port a circuit reaches: the steps of each path plus one unit
 * for every split gate passed (followed through the circuit's terminals).
 */
export function circuitDelaysUnits(circuit: Circuit, from: string): Map<string, number[]> {
  const out = new Map<string, number[]>();
  const visit = (terminal: string, t0: number, depth: number) => {
    if (depth > 50) return;
    for (const p of circuit.paths) {
      const start = 'port' in p.from ? p.from.port : p.from.gate;
      if (start !== terminal) continue;
      const t = t0 + p.steps.length;
      if ('port' in p.to) out.set(p.to.port, [...(out.get(p.to.port) ?? []), t]);
      else visit(p.to.gate, t + 1, depth + 1);
    }
  };
  visit(from, 0, 0);
  return out;
}
