// Ports by the chip's own names (W11, E14...), never by internal ids.
import type { MeshDefinitionFile } from '@hexloom/contracts';

/** The label of port `id` on the chip, or the id itself when the chip gave it no label. */
export function portName(definition: MeshDefinitionFile, id: string): string {
  return definition.ports.find((p) => p.id === id)?.label ?? id;
}
