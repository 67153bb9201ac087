/** S-matrix between chosen ports of a netlist, by one impulse run per input port. */
import { dtftDirect, dtftUniform } from './dtft.js';
import type { FrequencyGrid } from './frequency-grid.js';
import { gridOffsetsHz, isPowerOfTwo } from './frequency-grid.js';
import type { ComplexSeries, ImpulseOptions } from './impulse-response.js';
import { impulseResponse } from './impulse-response.js';
import type { Netlist } from './netlist.js';
import { inputPortIndex, outputPortIndex } from './netlist.js';
import { SolverInputError } from './unit-delay.js';

/** Summary of one impulse run, for reports. */
export type ImpulseRunSummary = { inputPort: string; steps: number; residualEnergy: number; converged: boolean; warning: string | null };

/** S_ij(f) = response at port i to a wave launched at port j; flat index `(f * P + i) * P + j`. */
export type SMatrix = {
  ports: readonly string[];
  referenceFrequencyHz: number;
  unitDelayS: number;
  offsetsHz: Float64Array;
  re: Float64Array;
  im: Float64Array;
  runs: readonly ImpulseRunSummary[];
};

export type SMatrixInput = {
  ports: readonly string[];
  grid: FrequencyGrid;
  unitDelayS: number;
  referenceFrequencyHz: number;
  impulse?: ImpulseOptions;
};

/** H(w) of one impulse response on a grid (FFT for a power-of-two FSR grid, direct sum otherwise). */
export function responseOnGrid(h: ComplexSeries, grid: FrequencyGrid, offsetsHz: Float64Array, unitDelayS: number): ComplexSeries {
  const n = offsetsHz.length;
  if (grid.kind === 'fsr' && n >= 2 && isPowerOfTwo(n)) {
    const x = dtftUniform(h, n);
    const re = new Float64Array(n), im = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const bin = (i - n / 2 + n) % n;
      re[i] = x.re[bin] ?? 0;
      im[i] = x.im[bin] ?? 0;
    }
    return { re, im };
  }
  return dtftDirect(h, offsetsHz.map((f) => 2 * Math.PI * f * unitDelayS));
}

/** Builds the S-matrix between `ports` (each must be both an input and an output of the netlist). */
export function sMatrix(netlist: Netlist, input: SMatrixInput): SMatrix {
  const { ports, grid, unitDelayS, referenceFrequencyHz } = input;
  if (ports.length === 0) throw new SolverInputError('solver: an S-matrix needs at least one port');
  if (new Set(ports).size !== ports.length) throw new SolverInputError(`solver: duplicate port in S-matrix ports ${ports.join(', ')}`);
  const outIdx = ports.map((p) => outputPortIndex(netlist, p));
  ports.forEach((p) => inputPortIndex(netlist, p));
  const offsetsHz = gridOffsetsHz(grid, unitDelayS);
  const pCount = ports.length, fCount = offsetsHz.length;
  const re = new Float64Array(fCount * pCount * pCount), im = new Float64Array(fCount * pCount * pCount);
  const runs: ImpulseRunSummary[] = [];
  ports.forEach((from, j) => {
    const ir = impulseResponse(netlist, from, input.impulse);
    runs.push({ inputPort: from, steps: ir.steps, residualEnergy: ir.residualEnergy, converged: ir.converged, warning: ir.warning });
    outIdx.forEach((q, i) => {
      const h = responseOnGrid(ir.outputs[q] as ComplexSeries, grid, offsetsHz, unitDelayS);
      for (let f = 0; f < fCount; f++) {
        re[(f * pCount + i) * pCount + j] = h.re[f] ?? 0;
        im[(f * pCount + i) * pCount + j] = h.im[f] ?? 0;
      }
    });
  });
  return { ports, referenceFrequencyHz, unitDelayS, offsetsHz, re, im, runs };
}
