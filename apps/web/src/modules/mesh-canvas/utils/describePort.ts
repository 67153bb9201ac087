// An external port in words, by the chip's own label (never the internal port id).
import type { PortWiring } from '@hexloom/mesh';

/** Words for each kind of port wiring. */
export const PORT_WIRING_WORDS: Readonly<Record<PortWiring, string>> = { fibre: 'fibre', modulator: 'modulator', detector: 'detector', none: 'not wired' };

/** "port W11, fibre, circuit notch", or "unlabelled port, detector" when the chip gives the port no label. */
export function describePort(port: { label: string | undefined; wiredTo: PortWiring }, circuit?: string): string {
  return `${port.label ? `port ${port.label}` : 'unlabelled port'}, ${PORT_WIRING_WORDS[port.wiredTo]}${circuit ? `, circuit ${circuit}` : ''}`;
}
