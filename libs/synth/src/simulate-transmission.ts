/** Simulates one input-to-output transmission of a whole configured chip (leakage included) on a frequency list. */
import type { Configuration, Mesh } from '@hexloom/mesh';
import { impulseResponse, netlistFromMesh, outputPortIndex, spectrumFromImpulse, type GatePerturbation, type ImpulseOptions, type MeshNetlist, type Netlist } from '@hexloom/solver';
import type { SampledResponse } from './mask-types.js';

export type Transmission = SampledResponse & {
  re: Float64Array;
  im: Float64Array;
  /** Impulse steps run, and the energy left in the mesh when the run stopped. */
  steps: number;
  residualEnergy: number;
  warning: string | null;
};

/**
 * Power (dB) and group delay (ps) from port `from` to port `to` at `offsetsHz` (offsets from the reference
 * frequency), computed by the solver's fast route on the whole chip: every gate, parked or not, with its
 * loss and extinction.
 */
export function simulateTransmission(input: {
  mesh: Mesh;
  configuration: Configuration;
  from: string;
  to: string;
  offsetsHz: readonly number[];
  perturbations?: Readonly<Record<string, GatePerturbation>>;
  /** Stopping rule of the impulse run (solver defaults when absent). */
  impulse?: ImpulseOptions;
}): Transmission {
  const chip = netlistFromMesh({ mesh: input.mesh, configuration: input.configuration, ...(input.perturbations ? { perturbations: input.perturbations } : {}) });
  return transmissionOf(chip, chip.netlist, input);
}

/** The same on an already compiled chip (and, for Monte Carlo runs, a perturbed copy of its netlist). */
export function transmissionOf(chip: MeshNetlist, netlist: Netlist, input: { from: string; to: string; offsetsHz: readonly number[]; impulse?: ImpulseOptions }): Transmission {
  const ir = impulseResponse(netlist, input.from, input.impulse);
  const out = ir.outputs[outputPortIndex(netlist, input.to)];
  if (!out) throw new Error(`synth: the solver returned no output for port ${input.to}`);
  const spectrum = spectrumFromImpulse({ impulse: out, grid: { kind: 'list', offsetsHz: input.offsetsHz }, unitDelayS: chip.unitDelayS, referenceFrequencyHz: chip.referenceFrequencyHz });
  const powerDb = Array.from(spectrum.re, (re, i) => 10 * Math.log10(Math.max(re * re + (spectrum.im[i] as number) ** 2, 1e-30)));
  return {
    frequencyHz: Array.from(spectrum.offsetsHz),
    powerDb,
    groupDelayPs: Array.from(spectrum.groupDelayS, (s) => s * 1e12),
    re: spectrum.re,
    im: spectrum.im,
    steps: ir.steps,
    residualEnergy: ir.residualEnergy,
    warning: ir.warning,
  };
}
