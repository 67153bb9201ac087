// The ports a picker offers: the free ones, by label.
import type { ChipPort } from './portResolver.js';
import type { PortOption } from './specFormValues.js';

/** Free ports only, each sent by its label (or its id when it has no label) and shown by its label. */
export function freePortOptions(ports: readonly ChipPort[]): PortOption[] {
  return ports.filter((p) => p.free).map((p, k) => ({ ref: p.label || p.id, label: p.label || `Unlabelled port ${k + 1}`, wiredTo: p.wiredTo }));
}
