/** Rebuilds the gate settings of a configuration from what its circuits need, keeping idle-gate parking choices. */
import type { Configuration } from './configuration.js';
import type { GateSetting } from './gate-state.js';
import { gateNeeds, type GateNeed } from './gate-needs.js';
import type { Mesh } from './mesh.js';

/** The gate setting that meets a merged need. */
export function settingOfNeed(mesh: Mesh, need: GateNeed): GateSetting {
  return {
    gate: mesh.gates[need.gate]!.id,
    state: need.state,
    ...(need.kappa !== undefined ? { kappa: need.kappa } : {}),
    ...(need.phaseRad !== undefined ? { phaseRad: need.phaseRad } : {}),
    circuit: need.phaseOwner ?? need.circuits[0],
  };
}

/**
 * Every gate a circuit uses gets exactly the setting its circuits need (state, kappa, and the outer phase of the
 * circuit whose light it acts on), so placing or removing one circuit never changes what another one sees. Gates
 * no circuit uses keep an explicit parking setting (one without an owner) and lose any stale owner's setting.
 * Where circuits disagree, the first circuit's need wins here; `checkConfiguration` reports the conflict.
 */
export function settleGates(mesh: Mesh, configuration: Configuration): Configuration {
  const { needs } = gateNeeds(mesh, configuration.circuits);
  const used = new Set([...needs.keys()].map((g) => mesh.gates[g]!.id));
  const parking = configuration.gates.filter((s) => s.circuit === undefined && !used.has(s.gate) && s.state !== 'split');
  const gates = [...parking, ...[...needs.values()].map((n) => settingOfNeed(mesh, n))];
  return { ...configuration, gates };
}
