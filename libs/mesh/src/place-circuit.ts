/** Adds a routed circuit to a configuration, or removes one and frees its gates; inputs are not mutated. */
import { buildMesh } from './build-mesh.js';
import { CONFIGURATION_SCHEMA_VERSION, type Circuit, type Configuration } from './configuration.js';
import type { ParkedState } from './gate-state.js';
import type { MeshDefinition } from './mesh-definition.js';
import { MeshError } from './mesh-error.js';
import type { Mesh } from './mesh.js';
import { circuitSettings, routeCircuit } from './route-circuit.js';
import type { RouteFailure } from './route-failure.js';
import type { RouteRequest } from './route-request.js';

/** A configuration with the new circuit, or the reason it could not be placed. */
export type PlaceResult = { readonly ok: true; readonly configuration: Configuration; readonly circuit: Circuit; readonly pathLengthsUnits: readonly number[] } | RouteFailure;

/** A configuration with no circuit: every gate parked. */
export function emptyConfiguration(mesh: MeshDefinition, parkedState: ParkedState = 'bar'): Configuration {
  return { schemaVersion: CONFIGURATION_SCHEMA_VERSION, mesh, parkedState, gates: [], circuits: [] };
}

/** Routes `request` on what the configuration leaves free and returns the extended configuration. */
export function placeCircuit(configuration: Configuration, request: RouteRequest, mesh: Mesh = buildMesh(configuration.mesh)): PlaceResult {
  const r = routeCircuit(mesh, configuration.circuits, request);
  if (!r.ok) return r;
  const touched = new Set(r.settings.map((s) => s.gate));
  const gates = [...configuration.gates.filter((g) => !touched.has(g.gate)), ...r.settings];
  return { ok: true, configuration: { ...configuration, gates, circuits: [...configuration.circuits, r.circuit] }, circuit: r.circuit, pathLengthsUnits: r.pathLengthsUnits };
}

/**
 * The configuration without circuit `id`; gates only it used return to the parked state, gates it
 * shared keep the setting the remaining circuits need. Throws MeshError if there is no such circuit.
 */
export function removeCircuit(configuration: Configuration, id: string, mesh: Mesh = buildMesh(configuration.mesh)): Configuration {
  if (!configuration.circuits.some((c) => c.id === id)) throw new MeshError('unknown-circuit', `there is no circuit ${id} in this configuration`);
  const circuits = configuration.circuits.filter((c) => c.id !== id);
  const gates = configuration.gates.filter((g) => g.circuit !== id);
  const kept = new Set(gates.map((g) => g.gate));
  for (const c of circuits)
    for (const s of circuitSettings(mesh, c)) {
      if (kept.has(s.gate)) continue;
      kept.add(s.gate);
      gates.push(s);
    }
  return { ...configuration, circuits, gates };
}
