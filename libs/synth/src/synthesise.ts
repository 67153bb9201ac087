/** Specification -> design -> placement on the free part of the chip -> tuning -> simulation -> mask check. */
import type { FilterSpec } from '@hexloom/contracts';
import { placeCircuit, type Circuit, type Configuration, type Mesh, type RouteRequest } from '@hexloom/mesh';
import { netlistFromMesh, type ImpulseOptions } from '@hexloom/solver';
import { alignCouplers } from './align-couplers.js';
import { designCircuit, type CircuitDesign } from './design-circuit.js';
import { placeDelayLine, placeDelaySet } from './place-delays.js';
import type { RealisationNote } from './realisation-note.js';
import { SynthInputError } from './synth-input-error.js';
import { tuneLattice } from './tune-lattice.js';
import { tuneLoops, type LoopTuning } from './tune-loops.js';
import { quietParking } from './quiet-parking.js';
import { rebalanceSplitters } from './rebalance-splitters.js';
import { verificationCost, verifyCircuit, type Verdict, type Verification, type VerifyInput } from './verify-circuit.js';

export type { Verification } from './verify-circuit.js';

export type SynthesisSuccess = {
  ok: true;
  /** FSR of the realised circuit, Hz: of its rings, of its lattice stage, or the unit FSR for paths and trees. */
  fsrHz: number;
  configuration: Configuration;
  circuit: Circuit;
  design: CircuitDesign;
  notes: RealisationNote[];
  tunings: LoopTuning[];
  /** Every output of the circuit, simulated on the whole chip, with its mask and target checks and figures. */
  verification: Verification[];
  /** Passes only when every check of every output does; an unmet target is a failed verdict, never a silent pass. */
  verdict: Verdict;
  /** Delay sets: the base delay of output 0 the checks used (the spec's, or fitted when it left the base free), ps. */
  basePs?: number;
};

export type SynthesisFailure = { ok: false; reason: string; message: string; notes: RealisationNote[] };

export type SynthesiseInput = { spec: FilterSpec; mesh: Mesh; configuration: Configuration; circuitId: string; impulse?: ImpulseOptions };

const failure = (reason: string, message: string, notes: RealisationNote[] = []): SynthesisFailure => ({ ok: false, reason, message, notes });

/**
 * Designs the circuit of `spec`, places it through the mesh router on what `configuration` leaves free (inside the
 * spec's region, if any), tunes every loop to the requested centre, then simulates the whole chip from the input to
 * every output and checks each against the mask regions that apply to it and the spec's own targets (`verdict`).
 * Impossible requests (no route, wrong parity, a delay set no whole-unit lengths can meet, a band the loss does not
 * allow) come back as `{ ok: false }` with a reason; a placed circuit that misses a target is `ok` with a failed verdict.
 */
export function synthesise({ spec, mesh, configuration, circuitId, impulse }: SynthesiseInput): SynthesisSuccess | SynthesisFailure {
  const body = spec.spec;
  const technology = mesh.definition.technology;
  let designed;
  try {
    designed = designCircuit(body, technology);
  } catch (error) {
    if (error instanceof SynthInputError) return failure('impossible-design', error.message);
    throw error;
  }
  const { design, unitDelayS } = designed;
  const notes = [...designed.notes];
  const region = body.region ? { region: body.region } : {};
  const place = (request: RouteRequest) => placeCircuit(configuration, request, mesh);

  let placed: { configuration: Configuration; circuit: Circuit } | SynthesisFailure;
  let centres: number[] = [];
  let couplerKappas: number[] = [];
  const delayArgs = { mesh, configuration, circuitId, region, unitDelayS };
  switch (design.kind) {
    case 'delay-line': {
      if (body.kind !== 'delay-line') throw new Error('unreachable');
      const r = placeDelayLine(delayArgs, design, body.from, body.to);
      notes.push(...r.notes);
      placed = r.ok ? r : failure(r.reason, r.message, notes);
      break;
    }
    case 'ttd-set': {
      if (body.kind !== 'ttd-set') throw new Error('unreachable');
      const r = placeDelaySet(delayArgs, design, body.from, body.outputs);
      notes.push(...r.notes);
      placed = r.ok ? r : failure(r.reason, r.message, notes);
      break;
    }
    case 'ring-notch': {
      if (body.kind !== 'ring-notch') throw new Error('unreachable');
      couplerKappas = [design.ring.powerCoupling];
      centres = [design.centreOffsetHz];
      const r = place({ kind: 'ring', id: circuitId, from: body.from, to: body.to, perimeterUnits: design.perimeterUnits, kappa: design.ring.powerCoupling, ...region });
      placed = r.ok ? r : failure(r.reason, r.message, notes);
      break;
    }
    case 'add-drop': {
      if (body.kind !== 'add-drop') throw new Error('unreachable');
      couplerKappas = [design.ring.powerCoupling, design.ring.powerCoupling];
      centres = [design.centreOffsetHz];
      const r = place({ kind: 'add-drop-ring', id: circuitId, from: body.from, to: body.through, drop: body.drop, perimeterUnits: design.perimeterUnits, kappa: design.ring.powerCoupling, ...region });
      placed = r.ok ? r : failure(r.reason, r.message, notes);
      break;
    }
    case 'coupled-ring-bandpass': {
      if (body.kind !== 'coupled-ring-bandpass') throw new Error('unreachable');
      couplerKappas = design.chain.powerCouplings;
      centres = couplerKappas.slice(1).map(() => design.centreOffsetHz);
      const r = place({ kind: 'coupled-rings', id: circuitId, from: body.from, to: body.through, drop: body.to, rings: body.order, kappas: couplerKappas, ...region });
      placed = r.ok ? r : failure(r.reason, r.message, notes);
      break;
    }
    case 'mzi-lattice': {
      if (body.kind !== 'mzi-lattice' && body.kind !== 'transversal') throw new Error('unreachable');
      const stages = design.lattice.stagePhasesRad.length;
      // The router takes each coupler's cross-coupling as seen from the bus; the lattice frame puts the long arm
      // first, which turns the first and last couplers around (see tuneLattice).
      const kappas = design.lattice.couplerAnglesRad.map((t, k) => (k === 0 || k === stages ? Math.cos(t) ** 2 : Math.sin(t) ** 2));
      const r = place({ kind: 'mzi-lattice', id: circuitId, from: body.from, to: body.to, lengthDifferencesUnits: Array.from({ length: stages }, () => design.armDifferenceUnits), kappas, ...region });
      placed = r.ok ? { configuration: tuneLattice(r.configuration, r.circuit, design.lattice, technology.extinctionDb), circuit: r.circuit } : failure(r.reason, r.message, notes);
      break;
    }
    case 'allpass-equaliser': {
      if (body.kind !== 'allpass-equaliser') throw new Error('unreachable');
      const stages = design.equaliser.stages;
      couplerKappas = stages.map((st) => st.powerCoupling);
      centres = stages.map((st) => st.resonanceOffsetHz);
      const r = place({ kind: 'rings-on-bus', id: circuitId, from: body.from, to: body.to, rings: stages.map((st) => ({ perimeterUnits: design.perimeterUnits, kappa: st.powerCoupling })), ...region });
      placed = r.ok ? r : failure(r.reason, r.message, notes);
      break;
    }
  }
  if ('reason' in placed) return placed;
  let { configuration: result, circuit } = placed;
  if (couplerKappas.length > 0) ({ configuration: result, circuit } = alignCouplers(result, circuit, couplerKappas));
  let tunings: LoopTuning[] = [];
  if (centres.length > 0) ({ configuration: result, tunings } = tuneLoops(result, circuit, { offsetsHz: centres, unitDelayS, extinctionDb: technology.extinctionDb }));
  circuit = result.circuits.find((c) => c.id === circuit.id) ?? circuit;
  let checked: ReturnType<typeof verifyCircuit>;
  try {
    result = parkQuietly({ spec, design, mesh, configuration: result, circuit, unitDelayS }, notes);
    if (design.kind === 'ttd-set') ({ configuration: result, circuit } = rebalanceSplitters(mesh, result, circuit));
    checked = verifyCircuit({ spec, design, mesh, configuration: result, circuit, unitDelayS, ...(impulse ? { impulse } : {}) });
  } catch (error) {
    if (error instanceof SynthInputError) return failure('invalid-mask', error.message, notes);
    throw error;
  }
  return { ok: true, fsrHz: realisedFsrHz(design, unitDelayS), configuration: result, circuit, design, notes, tunings, verification: checked.verification, verdict: checked.verdict, ...(checked.basePs !== undefined ? { basePs: checked.basePs } : {}) };
}

/** Once a check fails, the idle gates are re-parked until every check is within this share of its limit (some margin for the fine grid). */
const PARKING_TARGET = 0.8;

/**
 * Leakage through finite extinction couples a circuit to the idle gates around it, and the parked loops can send that
 * light back in phase. When a check fails on the coarse grid, idle gates near the circuit (none another circuit parked
 * on purpose) are re-parked by a greedy search until every check is within `PARKING_TARGET` of its limit, and a note
 * says what changed. A circuit that meets its checks keeps the chip's parking.
 */
function parkQuietly(input: VerifyInput, notes: RealisationNote[]): Configuration {
  // A delay set's balance is set afterwards by its split ratios; the parking works on the delays.
  const cost = verificationCost(input, (c) => input.design.kind === 'ttd-set' && c.quantity === 'amplitude imbalance');
  const chip = netlistFromMesh({ mesh: input.mesh, configuration: input.configuration });
  if (cost(chip, chip.netlist) <= 1) return input.configuration;
  const q = quietParking({ mesh: input.mesh, configuration: input.configuration, circuit: input.circuit, cost, goodEnough: PARKING_TARGET });
  if (q.gatesChanged > 0)
    notes.push({ quantity: 'idle gates re-parked against leakage', requested: null, achieved: q.gatesChanged, unit: 'gates', note: `light leaked through finite extinction came back from parked cells; ${q.gatesChanged} idle gates near the circuit were parked in their other state, worst check ${q.costBefore.toFixed(2)} -> ${q.costAfter.toFixed(2)} of its limit (${q.evaluations} trial simulations)` });
  return q.configuration;
}

/** The period of the response in frequency: 1 / (L T_u) for rings of L units, the lattice FSR, else the unit FSR. */
function realisedFsrHz(design: CircuitDesign, unitDelayS: number): number {
  switch (design.kind) {
    case 'ring-notch':
    case 'add-drop':
    case 'coupled-ring-bandpass':
    case 'allpass-equaliser':
      return 1 / (design.perimeterUnits * unitDelayS);
    case 'mzi-lattice':
      return design.latticeFsrHz;
    default:
      return 1 / unitDelayS;
  }
}
