// The chip's ports with their names, wiring and whether a circuit already uses them (for the synthesis drawer).
import type { ConfigurationFile } from '@hexloom/contracts';

export type PortChoice = { id: string; label: string; wiredTo: string; free: boolean };

/** Every port of the chip, in the chip's order, marked free when no circuit of the content uses it. */
export function portChoices(content: ConfigurationFile): PortChoice[] {
  const used = new Set(content.circuits.flatMap((c) => c.ports));
  return content.mesh.ports.map((p) => ({ id: p.id, label: p.label ?? p.id, wiredTo: p.wiredTo, free: !used.has(p.id) }));
}
