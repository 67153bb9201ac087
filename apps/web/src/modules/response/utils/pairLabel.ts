// The legend label of a port pair: the chip's names of its two ports with an arrow ("W11 → E14").
import type { SpectrumFile } from '@hexloom/contracts';

/** "W11 → E14": the spectrum's port names (labels, else ids) from input to output. */
export function pairLabel(spectrum: Pick<SpectrumFile, 'fromName' | 'toName'>): string {
  return `${spectrum.fromName} → ${spectrum.toName}`;
}
