// Phase shifters of a gate in words.
import type { ShifterKind } from '@hexloom/contracts';

/** "internal phase θ" (sets the coupling) or "outer phase φ" (sets the output phase). */
export function shifterName(shifter: ShifterKind): string {
  return shifter === 'theta' ? 'internal phase θ' : 'outer phase φ';
}
