/** Sets each coupler of a placed circuit so that the ring (or rings) it couples sees the designed coupling. */
import type { Circuit, Configuration } from '@hexloom/mesh';
import { circuitLoops, passesStraight } from './circuit-loops.js';

/**
 * `kappas[k]` is the designed power cross-coupling of `circuit.couplers[k]` (from the ring, or between rings).
 * A ring that passes its coupler on one waveguide couples out through the gate's cross path, so the gate gets
 * kappa; a ring drawn across the gate couples out through the bar path, so the gate gets 1 - kappa (the gate is a
 * lossless 2x2 coupler, bar + cross = 1; common practice).
 */
export function alignCouplers(configuration: Configuration, circuit: Circuit, kappas: readonly number[]): { configuration: Configuration; circuit: Circuit } {
  const crossing = new Map<string, boolean>();
  for (const loop of circuitLoops(circuit)) for (const t of loop.traversals) if (t.coupler && !crossing.has(t.gate)) crossing.set(t.gate, !passesStraight(t));
  const gateKappa = new Map<string, number>();
  const couplers = circuit.couplers.map((c, k) => {
    const designed = kappas[k] ?? c.kappa;
    const kappa = crossing.get(c.gate) ? 1 - designed : designed;
    gateKappa.set(c.gate, kappa);
    return { ...c, kappa };
  });
  const updatedCircuit: Circuit = { ...circuit, couplers };
  const gates = configuration.gates.map((g) => (gateKappa.has(g.gate) ? { ...g, state: 'split' as const, kappa: gateKappa.get(g.gate) as number } : g));
  const circuits = configuration.circuits.map((c) => (c.id === circuit.id ? updatedCircuit : c));
  return { configuration: { ...configuration, gates, circuits }, circuit: updatedCircuit };
}
