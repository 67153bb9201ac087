/** Records phase shifters of a circuit both in the circuit (which owns them) and in the gate settings. */
import type { Circuit, Configuration, GateSetting, PhaseSetting } from '@hexloom/mesh';

/**
 * The configuration with `phases` set on circuit `circuitId`: each replaces any phase the circuit had on that gate,
 * and the gate's setting takes it, so a later placement or removal of another circuit keeps the tuning.
 */
export function setCircuitPhases(configuration: Configuration, circuitId: string, phases: readonly PhaseSetting[]): Configuration {
  const byGate = new Map(phases.map((p) => [p.gate, p.phaseRad]));
  const circuits = configuration.circuits.map((c): Circuit => {
    if (c.id !== circuitId) return c;
    const kept = (c.phases ?? []).filter((p) => !byGate.has(p.gate));
    return { ...c, phases: [...kept, ...phases.map((p) => ({ gate: p.gate, phaseRad: p.phaseRad }))] };
  });
  const seen = new Set<string>();
  const gates = configuration.gates.map((g): GateSetting => {
    const phaseRad = byGate.get(g.gate);
    if (phaseRad === undefined) return g;
    seen.add(g.gate);
    return { ...g, phaseRad };
  });
  for (const [gate, phaseRad] of byGate) if (!seen.has(gate)) throw new Error(`synth: circuit ${circuitId} sets the phase of gate ${gate}, which has no setting`);
  return { ...configuration, circuits, gates };
}
