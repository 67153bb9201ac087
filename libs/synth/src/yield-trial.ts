/** One Monte Carlo run of a configured chip: random coupler and phase errors on every used gate, then the mask. */
import type { Configuration, Mesh } from '@hexloom/mesh';
import type { GatePerturbation } from '@hexloom/solver';
import type { FilterSpec } from '@hexloom/contracts';
import { checkMask, checkRatio } from './check-mask.js';
import { designCircuit } from './design-circuit.js';
import { SynthInputError } from './synth-input-error.js';
import { coarseVerification } from './verify-circuit.js';
import type { MaskRegion } from './mask-types.js';
import type { MonteCarloRun } from './monte-carlo.js';
import { responseFigures } from './response-figures.js';
import type { RandomStream } from './seeded-normal.js';
import { netlistFromMesh } from '@hexloom/solver';
import { simulateTransmission, transmissionOf } from './simulate-transmission.js';

/** Standard deviations of the fabrication and drive errors of one gate. */
export type ToleranceModel = {
  /** Splitting-angle error of each 3 dB coupler of a gate, radians (coupler imbalance). */
  couplerSigmaRad: number;
  /** Error of the internal and outer phases, radians (heater calibration, thermal crosstalk). */
  phaseSigmaRad: number;
};

export type YieldStudy = {
  mesh: Mesh;
  configuration: Configuration;
  from: string;
  to: string;
  offsetsHz: readonly number[];
  mask: readonly MaskRegion[];
  tolerance: ToleranceModel;
};

/** Monte Carlo runs stop once -120 dB of the launched energy is left in the mesh, far below any mask (common practice). */
export const MONTE_CARLO_IMPULSE = { energyTolerance: 1e-12 };

/** Gates the configuration sets (idle gates keep their parked state; their errors matter far less). */
const usedGates = (configuration: Configuration): string[] => configuration.gates.map((g) => g.gate);

/** Draws an independent normal error for each coupler and phase of every used gate. */
export function drawPerturbations(gates: readonly string[], tolerance: ToleranceModel, random: RandomStream): Record<string, GatePerturbation> {
  const out: Record<string, GatePerturbation> = {};
  for (const gate of gates) {
    out[gate] = {
      coupler1ErrorRad: tolerance.couplerSigmaRad * random.normal(),
      coupler2ErrorRad: tolerance.couplerSigmaRad * random.normal(),
      thetaErrorRad: tolerance.phaseSigmaRad * random.normal(),
      phiErrorRad: tolerance.phaseSigmaRad * random.normal(),
    };
  }
  return out;
}

/** A trial for runMonteCarloChunk: simulate the perturbed chip and report mask pass and the quoted figures. */
export function yieldTrial(study: YieldStudy): (random: RandomStream) => MonteCarloRun {
  const gates = usedGates(study.configuration);
  const chip = netlistFromMesh({ mesh: study.mesh, configuration: study.configuration });
  return (random) => {
    const perturbations = drawPerturbations(gates, study.tolerance, random);
    const response = transmissionOf(chip, chip.withPerturbations(perturbations), { from: study.from, to: study.to, offsetsHz: study.offsetsHz, impulse: MONTE_CARLO_IMPULSE });
    const mask = checkMask(response, study.mask);
    const figures = responseFigures(response);
    return {
      pass: mask.pass,
      figures: {
        worstMarginDb: mask.worst?.margin ?? 0,
        insertionLossDb: figures.insertionLossDb,
        bandwidth3dBHz: figures.bandwidth3dBHz,
        rejectionDb: figures.rejectionDb,
        peakFrequencyHz: figures.peakFrequencyHz,
      },
    };
  };
}

/** A study of a circuit against its whole specification: every output, its mask regions and its own targets. */
export type SpecYieldStudy = { mesh: Mesh; configuration: Configuration; spec: FilterSpec; circuitId: string; tolerance: ToleranceModel };

/**
 * A trial that perturbs every used gate and verifies the circuit against its spec on every output (mask and targets,
 * coarse grid); a run passes only when every check does. Figures: the worst check ratio (1 on the limit, see
 * `checkRatio`) and the figures of the first main output.
 * @throws SynthInputError when the spec cannot be designed or the circuit is not in the configuration.
 */
export function specYieldTrial(study: SpecYieldStudy): (random: RandomStream) => MonteCarloRun {
  const circuit = study.configuration.circuits.find((c) => c.id === study.circuitId);
  if (!circuit) throw new SynthInputError(`synth: there is no circuit ${study.circuitId} in this configuration (circuits: ${study.configuration.circuits.map((c) => c.id).join(', ') || 'none'})`);
  const { design, unitDelayS } = designCircuit(study.spec.spec, study.mesh.definition.technology);
  const verify = coarseVerification({ spec: study.spec, design, mesh: study.mesh, configuration: study.configuration, circuit, unitDelayS });
  const gates = usedGates(study.configuration);
  const chip = netlistFromMesh({ mesh: study.mesh, configuration: study.configuration });
  return (random) => {
    const verification = verify(chip, chip.withPerturbations(drawPerturbations(gates, study.tolerance, random)));
    const checks = verification.flatMap((v) => v.mask.checks);
    const main = verification.find((v) => v.role === 'main');
    return { pass: checks.every((c) => c.pass), figures: { worstCheckRatio: checks.reduce((m, c) => Math.max(m, checkRatio(c)), 0), ...(main?.figures ?? {}) } };
  };
}

export type GateSensitivity = { gate: string; quantity: 'coupler' | 'phase'; dMarginPerRad: number };

/**
 * Which gates matter most: the change of the worst mask margin (or, without a mask, of the peak power) per radian of
 * coupler or phase error on each used gate, by central differences of `stepRad` (common practice).
 */
export function gateSensitivities(study: YieldStudy, stepRad = 0.01): GateSensitivity[] {
  const figure = (perturbations: Record<string, GatePerturbation>): number => {
    const response = simulateTransmission({ mesh: study.mesh, configuration: study.configuration, from: study.from, to: study.to, offsetsHz: study.offsetsHz, perturbations });
    return study.mask.length > 0 ? (checkMask(response, study.mask).worst?.margin ?? 0) : response.powerDb.reduce((m, p) => Math.max(m, p), -Infinity);
  };
  const out: GateSensitivity[] = [];
  for (const gate of usedGates(study.configuration)) {
    for (const quantity of ['coupler', 'phase'] as const) {
      const p = (sign: number): Record<string, GatePerturbation> => ({ [gate]: quantity === 'coupler' ? { coupler1ErrorRad: sign * stepRad } : { thetaErrorRad: sign * stepRad } });
      out.push({ gate, quantity, dMarginPerRad: (figure(p(1)) - figure(p(-1))) / (2 * stepRad) });
    }
  }
  return out.sort((a, b) => Math.abs(b.dMarginPerRad) - Math.abs(a.dMarginPerRad));
}
