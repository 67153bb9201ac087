// Sets the outer phase of one gate a circuit owns: a coupler's phase, or one of the circuit's phase shifters.
import type { ConfigurationFile } from '@hexloom/contracts';
import type { Configuration } from '@hexloom/mesh';
import { setCircuitPhases } from '@hexloom/synth';

/**
 * A new content with `gate` at outer phase `phaseRad`: on a coupler of the circuit, in its coupler entry and its
 * gate setting; on any other gate, recorded as a phase of the circuit and in the setting (libs/synth setCircuitPhases).
 * @throws Error when the gate has no setting in `content`.
 */
export function setGatePhase(content: ConfigurationFile, circuitId: string, gate: string, phaseRad: number): ConfigurationFile {
  const circuit = content.circuits.find((c) => c.id === circuitId);
  if (circuit?.couplers.some((c) => c.gate === gate)) {
    if (!content.gates.some((g) => g.gate === gate)) throw new Error(`Gate ${gate} has no setting in this configuration`);
    return {
      ...content,
      circuits: content.circuits.map((c) => (c.id !== circuitId ? c : { ...c, couplers: c.couplers.map((cp) => (cp.gate === gate ? { ...cp, phaseRad } : cp)) })),
      gates: content.gates.map((g) => (g.gate === gate ? { ...g, phaseRad } : g)),
    };
  }
  return setCircuitPhases(content as Configuration, circuitId, [{ gate, phaseRad }]) as ConfigurationFile;
}
