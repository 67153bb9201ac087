/** Simulates input-to-output transmissions of a whole configured chip (leakage included) on a frequency list. */
import type { Configuration, Mesh } from '@hexloom/mesh';
import { impulseResponse, netlistFromMesh, outputPortIndex, spectrumFromImpulse, type ComplexSeries, type GatePerturbation, type ImpulseOptions, type MeshNetlist, type Netlist } from '@hexloom/solver';
import type { SampledResponse } from './mask-types.js';

export type Transmission = SampledResponse & {
  re: Float64Array;
  im: Float64Array;
  /** Impulse steps run, and the energy left in the mesh when the run stopped. */
  steps: number;
  residualEnergy: number;
  warning: string | null;
};

/** Grid refinement: rounds of bisection, and the most points it may add. */
export type Refinement = { rounds: number; maxAddedPoints: number };

type Impulse = { h: ComplexSeries; steps: number; residualEnergy: number; warning: string | null };

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
  refine?: Refinement;
}): Transmission {
  const chip = netlistFromMesh({ mesh: input.mesh, configuration: input.configuration, ...(input.perturbations ? { perturbations: input.perturbations } : {}) });
  return transmissionOf(chip, chip.netlist, input);
}

/** The same on an already compiled chip (and, for Monte Carlo runs, a perturbed copy of its netlist). */
export function transmissionOf(chip: MeshNetlist, netlist: Netlist, input: { from: string; to: string; offsetsHz: readonly number[]; impulse?: ImpulseOptions; refine?: Refinement }): Transmission {
  return transmissionsFrom(chip, netlist, { ...input, to: [input.to] })[0] as Transmission;
}

/** Every transmission from one input port, from a single impulse run (outputs in the order of `to`). */
export function transmissionsFrom(chip: MeshNetlist, netlist: Netlist, input: { from: string; to: readonly string[]; offsetsHz: readonly number[]; impulse?: ImpulseOptions; refine?: Refinement }): Transmission[] {
  const ir = impulseResponse(netlist, input.from, input.impulse);
  return input.to.map((to) => {
    const h = ir.outputs[outputPortIndex(netlist, to)];
    if (!h) throw new Error(`synth: the solver returned no output for port ${to}`);
    const impulse: Impulse = { h, steps: ir.steps, residualEnergy: ir.residualEnergy, warning: ir.warning };
    const base = sample(chip, impulse, input.offsetsHz);
    return input.refine ? refined(chip, impulse, base, input.refine) : base;
  });
}

function sample(chip: MeshNetlist, ir: Impulse, offsetsHz: readonly number[]): Transmission {
  const spectrum = spectrumFromImpulse({ impulse: ir.h, grid: { kind: 'list', offsetsHz }, unitDelayS: chip.unitDelayS, referenceFrequencyHz: chip.referenceFrequencyHz });
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

/**
 * Bisects every interval where the power moves by more than 0.5 dB or the group delay by more than 2 % of its
 * span (at least 0.5 ps) between neighbouring samples, so narrow delay peaks at band edges and deep notches are
 * resolved; each round re-samples only the new midpoints from the same impulse response.
 */
function refined(chip: MeshNetlist, ir: Impulse, base: Transmission, refine: Refinement): Transmission {
  let t = base;
  let added = 0;
  for (let round = 0; round < refine.rounds && added < refine.maxAddedPoints; round++) {
    const d = t.groupDelayPs;
    let dMin = Infinity;
    let dMax = -Infinity;
    for (const x of d) {
      dMin = Math.min(dMin, x);
      dMax = Math.max(dMax, x);
    }
    const delayStep = Math.max(0.5, 0.02 * (dMax - dMin));
    const mids: number[] = [];
    for (let i = 0; i + 1 < t.frequencyHz.length && added + mids.length < refine.maxAddedPoints; i++) {
      const f0 = t.frequencyHz[i] as number;
      const f1 = t.frequencyHz[i + 1] as number;
      if (f1 - f0 < 1e3) continue;
      if (Math.abs((t.powerDb[i + 1] as number) - (t.powerDb[i] as number)) > 0.5 || Math.abs((d[i + 1] as number) - (d[i] as number)) > delayStep) mids.push((f0 + f1) / 2);
    }
    if (mids.length === 0) break;
    added += mids.length;
    t = merge(t, sample(chip, ir, mids));
  }
  return t;
}

/** Two samplings of one response merged in increasing frequency. */
function merge(a: Transmission, b: Transmission): Transmission {
  const order = [...a.frequencyHz.map((f, i) => ({ f, src: a, i })), ...b.frequencyHz.map((f, i) => ({ f, src: b, i }))].sort((x, y) => x.f - y.f);
  return {
    frequencyHz: order.map((o) => o.f),
    powerDb: order.map((o) => o.src.powerDb[o.i] as number),
    groupDelayPs: order.map((o) => o.src.groupDelayPs[o.i] as number),
    re: Float64Array.from(order, (o) => o.src.re[o.i] as number),
    im: Float64Array.from(order, (o) => o.src.im[o.i] as number),
    steps: a.steps,
    residualEnergy: a.residualEnergy,
    warning: a.warning,
  };
}
