// Sets the power cross-coupling of one coupler gate of a circuit, in the circuit and in the gate settings.
import type { ConfigurationFile } from '@hexloom/contracts';

/**
 * A new content with coupler `gate` of circuit `circuitId` at power cross-coupling `kappa` (clamped to 0..1),
 * both in the circuit's coupler list and in the gate's split setting; the input is not changed.
 * @throws Error when the circuit has no such coupler.
 */
export function setCouplerKappa(content: ConfigurationFile, circuitId: string, gate: string, kappa: number): ConfigurationFile {
  const k = Math.min(1, Math.max(0, kappa));
  const circuit = content.circuits.find((c) => c.id === circuitId);
  if (!circuit?.couplers.some((c) => c.gate === gate)) throw new Error(`Circuit ${circuitId} has no coupler on gate ${gate}`);
  return {
    ...content,
    circuits: content.circuits.map((c) => (c.id !== circuitId ? c : { ...c, couplers: c.couplers.map((cp) => (cp.gate === gate ? { ...cp, kappa: k } : cp)) })),
    gates: content.gates.map((g) => (g.gate === gate ? { ...g, state: 'split' as const, kappa: k } : g)),
  };
}
