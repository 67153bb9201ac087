/** Whole-unit path lengths for a true-time-delay set: the base that best fits every output's parity, or why none does. */
import { SynthInputError } from './synth-input-error.js';

export type DelaySetPlanInput = {
  stepS: number;
  /** Fixed base delay of output 0, s; undefined lets the plan choose it. */
  baseS: number | undefined;
  toleranceS: number;
  unitDelayS: number;
  /** Shortest free path from the input to each output, units (its parity is the parity of every path there). */
  minima: readonly number[];
};

/** Per output: the requested delay and the whole-unit length that realises it best. */
export type DelaySetPlan = {
  /** Requested delay of each output (base + k step), s. */
  requestedS: number[];
  /** Path length of each output, units (of that output's parity, at least its shortest path). */
  units: number[];
  /** Realised minus requested delay of each output, s. */
  errorsS: number[];
  maxErrorS: number;
  withinTolerance: boolean;
};

const SCAN_STEPS = 400;

/** Length nearest `ideal` with the parity of `min` and at least `min` units. */
function nearestOfParity(ideal: number, min: number): number {
  const parity = ((min % 2) + 2) % 2;
  const below = Math.floor((ideal - parity) / 2) * 2 + parity;
  const best = ideal - below <= below + 2 - ideal ? below : below + 2;
  return Math.max(min, best);
}

function planAt(baseUnits: number, input: DelaySetPlanInput): DelaySetPlan {
  const stepUnits = input.stepS / input.unitDelayS;
  const units = input.minima.map((min, k) => nearestOfParity(baseUnits + k * stepUnits, min));
  const requestedS = input.minima.map((_m, k) => (baseUnits + k * stepUnits) * input.unitDelayS);
  const errorsS = units.map((u, k) => u * input.unitDelayS - (requestedS[k] as number));
  const maxErrorS = errorsS.reduce((m, e) => Math.max(m, Math.abs(e)), 0);
  return { requestedS, units, errorsS, maxErrorS, withinTolerance: maxErrorS <= input.toleranceS + 1e-18 };
}

/**
 * Every path from the input to one output has the parity of the shortest one (the hexagonal lattice is bipartite,
 * graph theory, common practice), so output k can only take lengths n_k of its parity near base + k step. With a
 * free base the base is scanned over one period of two units above the shortest feasible base and the one with the
 * smallest largest error wins (ties: the shortest); adding two units to every output keeps the errors.
 */
export function planDelaySet(input: DelaySetPlanInput): DelaySetPlan {
  const { stepS, unitDelayS, minima } = input;
  if (!(stepS > 0)) throw new SynthInputError(`synth: a delay step must be positive, got ${stepS} s`);
  if (minima.length < 2) throw new SynthInputError(`synth: a delay set needs at least 2 outputs, got ${minima.length}`);
  const stepUnits = stepS / unitDelayS;
  if (input.baseS !== undefined) return planAt(input.baseS / unitDelayS, input);
  const lowest = Math.max(...minima.map((m, k) => m - k * stepUnits));
  let best = planAt(lowest, input);
  for (let i = 1; i < SCAN_STEPS; i++) {
    const candidate = planAt(lowest + (2 * i) / SCAN_STEPS, input);
    if (candidate.maxErrorS < best.maxErrorS - 1e-18) best = candidate;
  }
  return best;
}

/** The same plan with `extraUnits` (even) more on every output: same errors, a longer trunk to route around others. */
export function lengthenPlan(plan: DelaySetPlan, extraUnits: number, unitDelayS: number): DelaySetPlan {
  return { ...plan, units: plan.units.map((u) => u + extraUnits), requestedS: plan.requestedS.map((r) => r + extraUnits * unitDelayS) };
}
