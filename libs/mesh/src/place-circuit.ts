/** Adds a routed circuit to a configuration, or removes one and frees its gates; inputs are not mutated. */
import { buildMesh } from './build-mesh.js';
import { CONFIGURATION_SCHEMA_VERSION, type Circuit, type Configuration } from './configuration.js';
import type { ParkedState } from './gate-state.js';
import type { MeshDefinition } from './mesh-definition.js';
import { MeshError } from './mesh-error.js';
import type { Mesh } from './mesh.js';
import { declareSettingPhases } from './declare-phases.js';
import { routeCircuit } from './route-circuit.js';
import { settleGates } from './settle-gates.js';
import type { RouteFailure } from './route-failure.js';
import type { RouteRequest } from './route-request.js';

/** A configuration with the new circuit, or the reason it could not be placed. */
export type PlaceResult = { readonly ok: true; readonly configuration: Configuration; readonly circuit: Circuit; readonly pathLengthsUnits: readonly number[] } | RouteFailure;

/** A configuration with no circuit: every gate parked. */
export function emptyConfiguration(mesh: MeshDefinition, parkedState: ParkedState = 'bar'): Configuration {
  return { schemaVersion: CONFIGURATION_SCHEMA_VERSION, mesh, parkedState, gates: [], circuits: [] };
}

/**
 * Routes `request` on what the configuration leaves free and returns the extended configuration. Every gate the
 * other circuits use keeps its state, kappa and the phase their light sees: the router only shares a gate's other
 * waveguide in the same state, and the settings are rebuilt from what each circuit needs (see `settleGates`).
 */
export function placeCircuit(configuration: Configuration, request: RouteRequest, mesh: Mesh = buildMesh(configuration.mesh)): PlaceResult {
  const base = declareSettingPhases(mesh, configuration);
  const r = routeCircuit(mesh, base.circuits, request);
  if (!r.ok) return r;
  return { ok: true, configuration: settleGates(mesh, { ...base, circuits: [...base.circuits, r.circuit] }), circuit: r.circuit, pathLengthsUnits: r.pathLengthsUnits };
}

/**
 * The configuration without circuit `id`; gates only it used return to the parked state, gates it shared keep the
 * setting the remaining circuits need (their phases included). Throws MeshError if there is no such circuit.
 */
export function removeCircuit(configuration: Configuration, id: string, mesh: Mesh = buildMesh(configuration.mesh)): Configuration {
  if (!configuration.circuits.some((c) => c.id === id)) throw new MeshError('unknown-circuit', `there is no circuit ${id} in this configuration`);
  const base = declareSettingPhases(mesh, configuration);
  return settleGates(mesh, { ...base, circuits: base.circuits.filter((c) => c.id !== id) });
}
