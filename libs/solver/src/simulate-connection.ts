/** One call for the usual question: the response from one port to another, with its run and power balance. */
import type { FrequencyGrid } from './frequency-grid.js';
import type { ImpulseOptions } from './impulse-response.js';
import { impulseResponse } from './impulse-response.js';
import type { Netlist } from './netlist.js';
import { outputPortIndex } from './netlist.js';
import type { PowerBalance } from './power-balance.js';
import { powerBalance } from './power-balance.js';
import type { ImpulseRunSummary } from './s-matrix.js';
import type { Spectrum } from './spectrum.js';
import { spectrumFromImpulse } from './spectrum.js';

export type ConnectionInput = {
  from: string;
  to: string;
  grid: FrequencyGrid;
  unitDelayS: number;
  referenceFrequencyHz: number;
  impulse?: ImpulseOptions;
};

export type ConnectionResult = { from: string; to: string; spectrum: Spectrum; run: ImpulseRunSummary; powerBalance: PowerBalance };

/** Impulse response from `from`, spectrum at `to` (fast route), and where the light of `from` went. */
export function simulateConnection(netlist: Netlist, input: ConnectionInput): ConnectionResult {
  const q = outputPortIndex(netlist, input.to);
  const ir = impulseResponse(netlist, input.from, input.impulse);
  const h = ir.outputs[q];
  if (!h) throw new Error(`solver: no impulse response for output ${input.to}`);
  return {
    from: input.from,
    to: input.to,
    spectrum: spectrumFromImpulse({ impulse: h, grid: input.grid, unitDelayS: input.unitDelayS, referenceFrequencyHz: input.referenceFrequencyHz }),
    run: { inputPort: input.from, steps: ir.steps, residualEnergy: ir.residualEnergy, converged: ir.converged, warning: ir.warning },
    powerBalance: powerBalance(netlist, ir, [input.to]),
  };
}
