/** Ring perimeters a hexagonal mesh can realise, and the nearest one to a requested FSR. */
import type { RealisationNote } from './realisation-note.js';
import { SynthInputError } from './synth-input-error.js';

/**
 * True when a closed loop of `units` can be drawn around a patch of cells: perimeter 6n - 2s for n cells
 * with s shared edges gives 6 and every even length from 10 on, but never 8 or an odd length
 * (hexagonal-lattice counting, common practice).
 */
export function isRealisablePerimeter(units: number): boolean {
  return Number.isInteger(units) && units % 2 === 0 && (units === 6 || units >= 10);
}

/** The realisable perimeter whose FSR 1 / (L T_u) is nearest the request, with a note when it differs. */
export function perimeterForFsr(fsrHz: number, unitDelayS: number): { perimeterUnits: number; notes: RealisationNote[] } {
  if (!(fsrHz > 0)) throw new SynthInputError(`synth: a ring FSR must be positive, got ${fsrHz} Hz`);
  const ideal = 1 / (fsrHz * unitDelayS);
  let best = 6;
  for (let l = 6; l <= Math.max(12, Math.ceil(ideal) + 2); l += 2) {
    if (isRealisablePerimeter(l) && Math.abs(1 / (l * unitDelayS) - fsrHz) < Math.abs(1 / (best * unitDelayS) - fsrHz)) best = l;
  }
  const achieved = 1 / (best * unitDelayS);
  const notes: RealisationNote[] =
    Math.abs(achieved - fsrHz) > 1e-9 * fsrHz
      ? [{ quantity: 'ring FSR', requested: fsrHz, achieved, unit: 'Hz', note: `nearest realisable ring is ${best} units (${(ideal).toFixed(2)} units asked)` }]
      : [];
  return { perimeterUnits: best, notes };
}
