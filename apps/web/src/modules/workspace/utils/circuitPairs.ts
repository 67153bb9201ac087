// The port pairs worth plotting for one circuit: its input to every one of its outputs.
import type { ConfigurationFile } from '@hexloom/contracts';

/** Input = the circuit's first port; every other port is an output (all overlaid on one plot). */
export function circuitPairs(content: ConfigurationFile, circuitId: string | undefined): { from: string; to: string }[] {
  const circuit = content.circuits.find((c) => c.id === circuitId);
  if (!circuit || circuit.ports.length < 2) return [];
  const [from, ...outputs] = circuit.ports;
  return outputs.map((to) => ({ from: from!, to }));
}
