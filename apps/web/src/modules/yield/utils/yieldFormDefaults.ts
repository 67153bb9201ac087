// What the yield form starts from: the chip's stated spreads, or defaults the form names.
import type { ConfigurationFile, StartYieldJob } from '@hexloom/contracts';

/** Spreads used when the chip states none, rad (typical of thermally tuned silicon-nitride gates; from memory). */
export const DEFAULT_SPREADS = { couplerSigmaRad: 0.02, phaseSigmaRad: 0.05 } as const;

/** Runs and seed of a new study. */
export const DEFAULT_RUNS = 200;
export const DEFAULT_SEED = 1;

/** Frequency grid of every study: -20 .. +20 GHz around the carrier at 401 points (100 MHz steps). */
export const YIELD_GRID: StartYieldJob['grid'] = { kind: 'span', startOffsetHz: -20e9, stopOffsetHz: 20e9, points: 401 };

/** The spreads to prefill and whether they are the chip's own (`chip`) or the defaults above (`default`). */
export function defaultSpreads(content: ConfigurationFile): { couplerSigmaRad: number; phaseSigmaRad: number; source: 'chip' | 'default' } {
  const tolerance = content.mesh.technology.tolerance;
  return tolerance ? { ...tolerance, source: 'chip' } : { ...DEFAULT_SPREADS, source: 'default' };
}
