// The ports of one circuit, by the chip's labels, for the yield form's from/to pickers.
import type { ConfigurationFile } from '@hexloom/contracts';

/** One choice: the port id sent to the server and the chip's label shown to the user. */
export type PortOption = { id: string; label: string };

/** The circuit's ports in its own order (first = its input), each named by its chip label (or id without one). */
export function circuitPortOptions(content: ConfigurationFile, circuitId: string | undefined): PortOption[] {
  const circuit = content.circuits.find((c) => c.id === circuitId);
  if (!circuit) return [];
  return circuit.ports.map((id) => ({ id, label: content.mesh.ports.find((p) => p.id === id)?.label ?? id }));
}
