/** Specification -> design -> placement on the free part of the chip -> tuning -> simulation -> mask check. */
import type { FilterSpec } from '@hexloom/contracts';
import { placeCircuit, routeCircuit, type Circuit, type Configuration, type Mesh, type RouteRequest } from '@hexloom/mesh';
import type { ImpulseOptions } from '@hexloom/solver';
import { alignCouplers } from './align-couplers.js';
import { checkMask, type MaskReport } from './check-mask.js';
import { chooseDelayUnits } from './delay-design.js';
import { designCircuit, type CircuitDesign } from './design-circuit.js';
import type { MaskRegion } from './mask-types.js';
import type { RealisationNote } from './realisation-note.js';
import { responseFigures, type ResponseFigures } from './response-figures.js';
import { simulateTransmission, type Transmission } from './simulate-transmission.js';
import { SynthInputError } from './synth-input-error.js';
import { tuneLattice } from './tune-lattice.js';
import { tuneLoops, type LoopTuning } from './tune-loops.js';
import { verificationOffsets } from './verification-grid.js';

export type Verification = { from: string; to: string; response: Transmission; mask: MaskReport; figures: ResponseFigures };

export type SynthesisSuccess = {
  ok: true;
  /** FSR of the realised circuit, Hz: of its rings, of its lattice stage, or the unit FSR for paths and trees. */
  fsrHz: number;
  configuration: Configuration;
  circuit: Circuit;
  design: CircuitDesign;
  notes: RealisationNote[];
  tunings: LoopTuning[];
  verification: Verification[];
};

export type SynthesisFailure = { ok: false; reason: string; message: string; notes: RealisationNote[] };

export type SynthesiseInput = { spec: FilterSpec; mesh: Mesh; configuration: Configuration; circuitId: string; impulse?: ImpulseOptions };

const failure = (reason: string, message: string, notes: RealisationNote[] = []): SynthesisFailure => ({ ok: false, reason, message, notes });

/**
 * Designs the circuit of `spec`, places it through the mesh router on what `configuration` leaves free (inside the
 * spec's region, if any), tunes every loop to the requested centre, then simulates the whole chip and checks the mask.
 * Impossible requests (no route, wrong parity, a band the loss does not allow) come back as `{ ok: false }` with a reason.
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
  let outputs: { from: string; to: string }[];
  let centres: number[] = [];
  let couplerKappas: number[] = [];
  switch (design.kind) {
    case 'delay-line': {
      if (body.kind !== 'delay-line') throw new Error('unreachable');
      const shortest = routeCircuit(mesh, configuration.circuits, { kind: 'path', id: circuitId, from: body.from, to: body.to, ...region });
      if (!shortest.ok) return failure(shortest.reason, shortest.message);
      const choice = chooseDelayUnits({ requestedS: design.delayS, unitDelayS, minUnits: shortest.pathLengthsUnits[0] ?? 0, toleranceS: design.toleranceS });
      if (choice.errorS !== 0) notes.push({ quantity: 'delay', requested: design.delayS * 1e12, achieved: choice.achievedS * 1e12, unit: 'ps', note: `${choice.units} units: paths between these ports have ${choice.units % 2 === 0 ? 'even' : 'odd'} lengths of at least ${shortest.pathLengthsUnits[0]} units${choice.withinTolerance ? '' : '; outside the tolerance'}` });
      const r = place({ kind: 'delay-line', id: circuitId, from: body.from, to: body.to, lengthUnits: choice.units, ...region });
      placed = r.ok ? r : failure(r.reason, r.message, notes);
      outputs = [{ from: body.from, to: body.to }];
      break;
    }
    case 'ttd-set': {
      if (body.kind !== 'ttd-set') throw new Error('unreachable');
      const minima: number[] = [];
      for (const port of body.outputs) {
        const r = routeCircuit(mesh, configuration.circuits, { kind: 'path', id: circuitId, from: body.from, to: port, ...region });
        if (!r.ok) return failure(r.reason, r.message);
        minima.push(r.pathLengthsUnits[0] ?? 0);
      }
      const stepUnits = design.stepS / unitDelayS;
      const shortestBase = Math.max(...minima.map((m, k) => m - k * stepUnits));
      // Branches leave a shared trunk, so each needs more than its own shortest path; add common delay until the
      // tree fits (every output keeps the same relative delays), unless the spec fixed the base.
      const extras = design.baseS !== undefined ? [0] : [2, 6, 10, 16, 24, 34, 48];
      let lastFailure: SynthesisFailure | undefined;
      placed = failure('not-enough-free-area', 'no splitter tree tried');
      for (const extra of extras) {
        const base = design.baseS !== undefined ? design.baseS / unitDelayS : shortestBase + extra;
        const attemptNotes: RealisationNote[] = [];
        const delays = body.outputs.map((port, k) => {
          const choice = chooseDelayUnits({ requestedS: (base + k * stepUnits) * unitDelayS, unitDelayS, minUnits: minima[k] as number, toleranceS: design.toleranceS });
          if (Math.abs(choice.errorS) > 1e-15) attemptNotes.push({ quantity: `delay to ${port}`, requested: (base + k * stepUnits) * unitDelayS * 1e12, achieved: choice.achievedS * 1e12, unit: 'ps', note: `${choice.units} units (whole units of the right parity)` });
          return { port, delayUnits: choice.units };
        });
        const r = place({ kind: 'splitter-tree', id: circuitId, from: body.from, outputs: delays, ...region });
        if (r.ok) {
          notes.push(...attemptNotes);
          placed = r;
          lastFailure = undefined;
          break;
        }
        lastFailure = failure(r.reason, r.message, notes);
      }
      if (lastFailure) placed = lastFailure;
      outputs = body.outputs.map((to) => ({ from: body.from, to }));
      break;
    }
    case 'ring-notch': {
      if (body.kind !== 'ring-notch') throw new Error('unreachable');
      couplerKappas = [design.ring.powerCoupling];
      centres = [design.centreOffsetHz];
      const r = place({ kind: 'ring', id: circuitId, from: body.from, to: body.to, perimeterUnits: design.perimeterUnits, kappa: design.ring.powerCoupling, ...region });
      placed = r.ok ? r : failure(r.reason, r.message, notes);
      outputs = [{ from: body.from, to: body.to }];
      break;
    }
    case 'add-drop': {
      if (body.kind !== 'add-drop') throw new Error('unreachable');
      couplerKappas = [design.ring.powerCoupling, design.ring.powerCoupling];
      centres = [design.centreOffsetHz];
      const r = place({ kind: 'add-drop-ring', id: circuitId, from: body.from, to: body.through, drop: body.drop, perimeterUnits: design.perimeterUnits, kappa: design.ring.powerCoupling, ...region });
      placed = r.ok ? r : failure(r.reason, r.message, notes);
      outputs = [{ from: body.from, to: body.drop }, { from: body.from, to: body.through }];
      break;
    }
    case 'coupled-ring-bandpass': {
      if (body.kind !== 'coupled-ring-bandpass') throw new Error('unreachable');
      couplerKappas = design.chain.powerCouplings;
      centres = couplerKappas.slice(1).map(() => design.centreOffsetHz);
      const r = place({ kind: 'coupled-rings', id: circuitId, from: body.from, to: body.through, drop: body.to, rings: body.order, kappas: couplerKappas, ...region });
      placed = r.ok ? r : failure(r.reason, r.message, notes);
      outputs = [{ from: body.from, to: body.to }, { from: body.from, to: body.through }];
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
      outputs = [{ from: body.from, to: body.to }];
      break;
    }
    case 'allpass-equaliser': {
      if (body.kind !== 'allpass-equaliser') throw new Error('unreachable');
      const stages = design.equaliser.stages;
      couplerKappas = stages.map((st) => st.powerCoupling);
      centres = stages.map((st) => st.resonanceOffsetHz);
      const r = place({ kind: 'rings-on-bus', id: circuitId, from: body.from, to: body.to, rings: stages.map((st) => ({ perimeterUnits: design.perimeterUnits, kappa: st.powerCoupling })), ...region });
      placed = r.ok ? r : failure(r.reason, r.message, notes);
      outputs = [{ from: body.from, to: body.to }];
      break;
    }
  }
  if ('reason' in placed) return placed;
  let { configuration: result, circuit } = placed;
  if (couplerKappas.length > 0) ({ configuration: result, circuit } = alignCouplers(result, circuit, couplerKappas));
  let tunings: LoopTuning[] = [];
  if (centres.length > 0) ({ configuration: result, tunings } = tuneLoops(result, circuit, { offsetsHz: centres, unitDelayS, extinctionDb: technology.extinctionDb }));
  circuit = result.circuits.find((c) => c.id === circuit.id) ?? circuit;
  const offsetsHz = verificationOffsets(design, spec.mask.regions as MaskRegion[], unitDelayS);
  const portId = (name: string): string => mesh.ports[mesh.portIndex.get(name) ?? -1]?.id ?? name;
  const verification = outputs.map(({ from: fromName, to: toName }, k) => {
    const from = portId(fromName);
    const to = portId(toName);
    const response = simulateTransmission({ mesh, configuration: result, from, to, offsetsHz, ...(impulse ? { impulse } : {}) });
    return { from, to, response, mask: k === 0 ? checkMask(response, spec.mask.regions as MaskRegion[]) : checkMask(response, []), figures: responseFigures(response) };
  });
  return { ok: true, fsrHz: realisedFsrHz(design, unitDelayS), configuration: result, circuit, design, notes, tunings, verification };
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
