/** The checks each kind of specification asks of its own outputs, and the figures that kind reports. */
import type { FilterSpecBody } from '@hexloom/contracts';
import type { Circuit } from '@hexloom/mesh';
import { delayLineTargets, delaySetTargets, type TargetResult } from './delay-targets.js';
import type { CircuitDesign } from './design-circuit.js';
import { equaliserTargets } from './equaliser-targets.js';
import { latticeTargets } from './lattice-targets.js';
import type { SampledResponse } from './mask-types.js';
import { ringTargets } from './ring-targets.js';

/**
 * Turns a spec's targets (delay and tolerance, steps and balance, notch depth or width, band width, ripple, rejection,
 * slope, shape) into checks on the simulated outputs (in `circuitOutputs` order), with the figures of each output.
 */
export function specTargets(spec: FilterSpecBody, design: CircuitDesign, responses: readonly SampledResponse[], unitDelayS: number, circuit: Circuit): TargetResult & { basePs?: number } {
  const first = responses[0] as SampledResponse;
  switch (spec.kind) {
    case 'delay-line':
      if (design.kind !== 'delay-line') break;
      return delayLineTargets(first, design);
    case 'ttd-set':
      if (design.kind !== 'ttd-set') break;
      return delaySetTargets(responses, design);
    case 'ring-notch':
    case 'add-drop':
    case 'coupled-ring-bandpass':
      return ringTargets(spec, design, responses, unitDelayS);
    case 'mzi-lattice':
    case 'transversal':
      if (design.kind !== 'mzi-lattice') break;
      return latticeTargets(spec, design, first, unitDelayS);
    case 'allpass-equaliser':
      return equaliserTargets(spec, circuit, first, unitDelayS);
  }
  throw new Error(`synth: spec ${spec.kind} does not match design ${design.kind}`);
}
