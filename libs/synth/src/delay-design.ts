/** Delay lines and true-time-delay sets in whole units of the mesh. */
import { SynthInputError } from './synth-input-error.js';

export type DelayChoice = {
  /** Path length in units (same parity as the shortest path: the lattice is bipartite). */
  units: number;
  requestedS: number;
  achievedS: number;
  errorS: number;
  withinTolerance: boolean;
};

export type DelayChoiceInput = {
  requestedS: number;
  unitDelayS: number;
  /** Length of the shortest path between the two ports, units. */
  minUnits: number;
  toleranceS: number;
};

/**
 * The realisable length nearest the request: at least `minUnits` and of its parity, since all paths between
 * two given vertices of a bipartite lattice have lengths of one parity (graph theory, common practice).
 */
export function chooseDelayUnits({ requestedS, unitDelayS, minUnits, toleranceS }: DelayChoiceInput): DelayChoice {
  if (!(requestedS > 0)) throw new SynthInputError(`synth: a delay must be positive, got ${requestedS} s`);
  if (!(unitDelayS > 0)) throw new SynthInputError(`synth: unitDelayS must be positive, got ${unitDelayS}`);
  const ideal = requestedS / unitDelayS;
  const parity = minUnits % 2;
  const below = Math.floor((ideal - parity) / 2) * 2 + parity;
  const candidates = [below, below + 2].filter((u) => u >= minUnits);
  const units = candidates.length === 0 ? minUnits : candidates.reduce((best, u) => (Math.abs(u - ideal) < Math.abs(best - ideal) ? u : best));
  const achievedS = units * unitDelayS;
  const errorS = achievedS - requestedS;
  return { units, requestedS, achievedS, errorS, withinTolerance: Math.abs(errorS) <= toleranceS + 1e-18 };
}

/**
 * Lengths of a true-time-delay set: output k gets base + k * step. A step must be an even number of units
 * (every branch of a splitter tree leaves the same splitter, so branch lengths differ by even amounts), so the
 * step is rounded to the nearest even number of units and the error reported.
 */
export function chooseDelaySet(input: { stepS: number; count: number; unitDelayS: number; baseUnits: number }): {
  stepUnits: number;
  unitsPerOutput: number[];
  achievedStepS: number;
  stepErrorS: number;
} {
  const { stepS, count, unitDelayS, baseUnits } = input;
  if (!(Number.isInteger(count) && count >= 2)) throw new SynthInputError(`synth: a delay set needs at least 2 outputs, got ${count}`);
  const stepUnits = Math.max(2, Math.round(stepS / unitDelayS / 2) * 2);
  const achievedStepS = stepUnits * unitDelayS;
  return {
    stepUnits,
    unitsPerOutput: Array.from({ length: count }, (_, k) => baseUnits + k * stepUnits),
    achievedStepS,
    stepErrorS: achievedStepS - stepS,
  };
}
