// A pure edit of one gate in a configuration: its state, coupler kappa and phase.
import type { ConfigurationFile } from '@hexloom/contracts';

export type GateEdit = { state: 'bar' | 'cross' | 'split'; kappa?: number; phaseRad?: number };

/**
 * The content with `gateId` set as asked (a new setting when the gate was parked). A split gate keeps a kappa in
 * [0, 1] (0.5 by default); bar and cross drop the kappa. The input is not mutated.
 */
export function setGateSetting(content: ConfigurationFile, gateId: string, edit: GateEdit): ConfigurationFile {
  const existing = content.gates.find((g) => g.gate === gateId);
  const kappa = edit.state === 'split' ? Math.min(1, Math.max(0, edit.kappa ?? existing?.kappa ?? 0.5)) : undefined;
  const phaseRad = edit.phaseRad ?? existing?.phaseRad;
  const setting = { gate: gateId, state: edit.state, ...(kappa !== undefined ? { kappa } : {}), ...(phaseRad !== undefined ? { phaseRad } : {}), ...(existing?.circuit ? { circuit: existing.circuit } : {}) };
  const gates = existing ? content.gates.map((g) => (g.gate === gateId ? setting : g)) : [...content.gates, setting];
  // A circuit's coupler follows its gate, so the circuit and the gate never disagree.
  const circuits = content.circuits.map((c) =>
    c.couplers.some((k) => k.gate === gateId) && kappa !== undefined ? { ...c, couplers: c.couplers.map((k) => (k.gate === gateId ? { ...k, kappa } : k)) } : c,
  );
  return { ...content, gates, circuits };
}
