/** Makes a mesh definition from a shape and an I/O preset (all boundary sites, left and right sides, or none). */
import { axialCentre } from './axial.js';
import { buildMesh } from './build-mesh.js';
import { MESH_SCHEMA_VERSION, type MeshDefinition, type MeshShape, type PortWiring, type TechnologyProfile } from './mesh-definition.js';

/** Which boundary sites become I/O: every one, those on the west and east sides, or none (all bends). */
export type IoPreset = 'all' | 'left-right' | 'none';

/** Vertex position (cell circumradius 1, x east, y south) of `v(q,r)n` / `v(q,r)s`. */
export function vertexPosition(id: string): { x: number; y: number } {
  const m = /^v\((-?\d+),(-?\d+)\)([ns])$/.exec(id);
  if (!m) return { x: Number.NaN, y: Number.NaN };
  const c = axialCentre({ q: Number(m[1]), r: Number(m[2]) });
  return { x: c.x, y: c.y + (m[3] === 'n' ? -1 : 1) };
}

export type MakeMeshOptions = {
  readonly name: string;
  readonly shape: MeshShape;
  readonly technology: TechnologyProfile;
  readonly io?: IoPreset | undefined;
  /** Wiring given to every I/O port (default `fibre`). */
  readonly wiredTo?: PortWiring | undefined;
  readonly deadGates?: readonly string[] | undefined;
};

/** A complete mesh definition; `left-right` picks boundary sites within one cell width of the west or east edge. */
export function makeMeshDefinition(o: MakeMeshOptions): MeshDefinition {
  const bare: MeshDefinition = { schemaVersion: MESH_SCHEMA_VERSION, name: o.name, shape: o.shape, technology: o.technology, ioSites: [], ports: [], deadGates: [...(o.deadGates ?? [])] };
  const mesh = buildMesh(bare);
  const preset = o.io ?? 'left-right';
  let sites = mesh.sites.map((s) => s.vertex);
  if (preset === 'none') sites = [];
  if (preset === 'left-right') {
    const xs = sites.map((s) => vertexPosition(s).x);
    const minX = Math.min(...xs);
    const maxX = Math.max(...xs);
    const halfWidth = Math.sqrt(3) / 2;
    sites = sites.filter((_s, i) => xs[i]! <= minX + halfWidth + 1e-9 || xs[i]! >= maxX - halfWidth - 1e-9);
  }
  const withIo = buildMesh({ ...bare, ioSites: sites });
  return { ...bare, ioSites: sites, ports: withIo.ports.map((p) => ({ id: p.id, wiredTo: o.wiredTo ?? 'fibre' })) };
}
