// Mesh chips for the adapter tests and the benchmark, built through libs/mesh's public API.
import { buildMesh, CONFIGURATION_SCHEMA_VERSION, DEMO_TECHNOLOGY, MESH_SCHEMA_VERSION, type Configuration, type GateSetting, type Mesh, type MeshDefinition, type MeshShape, type TechnologyProfile } from '@hexloom/mesh';

/** Demo technology (invented): 650 um unit, n_g 4.2, 0.25 dB per gate, 25 dB extinction. */
export const DEMO_TECH: TechnologyProfile = { ...DEMO_TECHNOLOGY, bendLossDb: 0, phaseShifter: { ...DEMO_TECHNOLOGY.phaseShifter, maxPowerW: 0.08, maxVoltageV: 12 } };

/** A mesh whose I/O sites are every `everyNth` boundary vertex (in the mesh's own site order). */
export function meshWithIo(shape: MeshShape, technology: TechnologyProfile = DEMO_TECH, everyNth = 1): Mesh {
  const bare: MeshDefinition = { schemaVersion: MESH_SCHEMA_VERSION, name: 'solver test chip', shape, technology, ioSites: [], ports: [], deadGates: [] };
  const sites = buildMesh(bare).sites.map((s) => s.vertex).filter((_, i) => i % everyNth === 0);
  return buildMesh({ ...bare, ioSites: sites });
}

/** A configuration with a deterministic spread of states on every gate (a stand-in for routed circuits). */
export function spreadConfiguration(mesh: Mesh, parkedState: 'bar' | 'cross' = 'bar'): Configuration {
  const gates: GateSetting[] = mesh.gates
    .filter((g) => g.index % 3 !== 0)
    .map((g) => ({ gate: g.id, state: 'split', kappa: ((g.index * 37) % 100) / 100, phaseRad: ((g.index * 53) % 628) / 100 }));
  return { schemaVersion: CONFIGURATION_SCHEMA_VERSION, mesh: mesh.definition, parkedState, gates, circuits: [] };
}
