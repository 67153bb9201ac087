/** Verifies a placed circuit against its specification: whole-chip simulation of every output, mask and targets. */
import type { FilterSpec } from '@hexloom/contracts';
import type { Circuit, Configuration, Mesh } from '@hexloom/mesh';
import { netlistFromMesh, type ImpulseOptions, type MeshNetlist, type Netlist } from '@hexloom/solver';
import { checkMask, checkRatio, maskReport, type MaskCheck, type MaskReport } from './check-mask.js';
import { circuitOutputs, type OutputRole } from './circuit-outputs.js';
import type { CircuitDesign } from './design-circuit.js';
import type { MaskRegion } from './mask-types.js';
import { transmissionsFrom, type Refinement, type Transmission } from './simulate-transmission.js';
import { specTargets } from './spec-targets.js';
import { SynthInputError } from './synth-input-error.js';
import { MONTE_CARLO_DENSITY, verificationOffsets } from './verification-grid.js';

/** One verified output: ports by id and by the chip's name for them, the response, its checks and its figures. */
export type Verification = {
  from: string;
  fromName: string;
  to: string;
  toName: string;
  role: OutputRole;
  response: Transmission;
  /** Mask regions that apply to this output, then the spec's own targets (kind `target`). */
  mask: MaskReport;
  /** The figures of the spec's kind for this output (units in the names: Db, Hz, Ps, PsPerGHz). */
  figures: Record<string, number>;
};

/** A failed check and the output it failed on. */
export type FailedCheck = MaskCheck & { to: string; toName: string };

/** The verdict over every output: passes only when every check of every output does. */
export type Verdict = { pass: boolean; failed: FailedCheck[]; checkCount: number };

export type VerifyInput = {
  spec: FilterSpec;
  design: CircuitDesign;
  mesh: Mesh;
  configuration: Configuration;
  circuit: Circuit;
  unitDelayS: number;
  impulse?: ImpulseOptions;
};

/** Bisection rounds on top of the grid, so narrow features are resolved (see `transmissionsFrom`). */
const REFINE = { rounds: 6, maxAddedPoints: 3000 };

/** The chip's name of a port: its label, else its id. */
export function portName(mesh: Mesh, nameOrId: string): { id: string; name: string } {
  const port = mesh.ports[mesh.portIndex.get(nameOrId) ?? -1];
  return port ? { id: port.id, name: port.label ?? port.id } : { id: nameOrId, name: nameOrId };
}

/** Whether a mask region applies to an output: its port names it (id or label), or it has none and the output is a main one. */
const applies = (mesh: Mesh, region: MaskRegion, to: { id: string }, role: OutputRole): boolean =>
  region.port === undefined ? role === 'main' : portName(mesh, region.port).id === to.id;

type Prepared = {
  input: VerifyInput;
  regions: MaskRegion[];
  outputs: (ReturnType<typeof circuitOutputs>[number] & { fromPort: { id: string; name: string }; toPort: { id: string; name: string } })[];
};

/** The outputs of the spec with their port ids and names; refuses mask regions that name a port that is not an output. */
function prepare(input: VerifyInput): Prepared {
  const { spec, mesh } = input;
  const regions = spec.mask.regions as MaskRegion[];
  const outputs = circuitOutputs(spec.spec).map((o) => ({ ...o, fromPort: portName(mesh, o.from), toPort: portName(mesh, o.to) }));
  for (const r of regions)
    if (r.port !== undefined && !outputs.some((o) => o.toPort.id === portName(mesh, r.port as string).id))
      throw new SynthInputError(`synth: a ${r.kind} mask region names port ${r.port}, which is not an output of this ${spec.spec.kind} (${outputs.map((o) => o.to).join(', ')})`);
  return { input, regions, outputs };
}

/** Simulates every output on `offsetsHz` (one impulse run per input) and checks it against its mask regions and targets. */
function check(p: Prepared, chip: MeshNetlist, netlist: Netlist, offsetsHz: readonly number[], refine: Refinement | undefined, impulse: ImpulseOptions | undefined): { verification: Verification[]; basePs?: number } {
  const { spec, design, mesh, circuit, unitDelayS } = p.input;
  const responses = new Map<string, Transmission>();
  for (const from of [...new Set(p.outputs.map((o) => o.fromPort.id))]) {
    const tos = p.outputs.filter((o) => o.fromPort.id === from).map((o) => o.toPort.id);
    transmissionsFrom(chip, netlist, { from, to: tos, offsetsHz, ...(refine ? { refine } : {}), ...(impulse ? { impulse } : {}) }).forEach((t, k) => responses.set(`${from}>${tos[k]}`, t));
  }
  const ordered = p.outputs.map((o) => responses.get(`${o.fromPort.id}>${o.toPort.id}`) as Transmission);
  const targets = specTargets(spec.spec, design, ordered, unitDelayS, circuit);
  const verification = p.outputs.map((o, k): Verification => {
    const response = ordered[k] as Transmission;
    const own = p.regions.filter((r) => applies(mesh, r, o.toPort, o.role));
    const report = maskReport([...checkMask(response, own).checks, ...(targets.checks[k] ?? [])]);
    return { from: o.fromPort.id, fromName: o.fromPort.name, to: o.toPort.id, toName: o.toPort.name, role: o.role, response, mask: report, figures: targets.figures[k] ?? {} };
  });
  return { verification, ...(targets.basePs !== undefined ? { basePs: targets.basePs } : {}) };
}

/**
 * Simulates the whole chip from each input to each output of the spec (one impulse run per input), checks every
 * output against the mask regions that apply to it and the spec's own targets, and returns the verdict over all.
 * @throws SynthInputError for a mask region naming a port that is not an output, or with no sample in its range.
 */
export function verifyCircuit(input: VerifyInput): { verification: Verification[]; verdict: Verdict; basePs?: number } {
  const p = prepare(input);
  const chip = netlistFromMesh({ mesh: input.mesh, configuration: input.configuration });
  const offsetsHz = verificationOffsets(input.design, p.regions, input.unitDelayS);
  const { verification, basePs } = check(p, chip, chip.netlist, offsetsHz, REFINE, input.impulse);
  const failed = verification.flatMap((v) => v.mask.checks.filter((c) => !c.pass).map((c) => ({ ...c, to: v.to, toName: v.toName })));
  const checkCount = verification.reduce((n, v) => n + v.mask.checks.length, 0);
  return { verification, verdict: { pass: failed.length === 0, failed, checkCount }, ...(basePs !== undefined ? { basePs } : {}) };
}

/**
 * The cost of a compiled chip (or a patched copy of its netlist) for the spec: the largest check ratio over every
 * output on the coarse Monte Carlo grid (below 1 when every check is met; see `checkRatio`), leaving out the checks
 * `ignore` selects.
 */
export function verificationCost(input: VerifyInput, ignore: (c: MaskCheck) => boolean = () => false): (chip: MeshNetlist, netlist: Netlist) => number {
  const verify = coarseVerification(input);
  return (chip, netlist) => verify(chip, netlist).reduce((m, v) => v.mask.checks.reduce((mm, c) => (ignore(c) ? mm : Math.max(mm, checkRatio(c))), m), 0);
}

/**
 * Every output verified on the coarse Monte Carlo grid (no refinement, impulse stopped at -120 dB), on a compiled chip
 * or a perturbed copy of its netlist: what parking searches and Monte Carlo runs check.
 */
export function coarseVerification(input: VerifyInput): (chip: MeshNetlist, netlist: Netlist) => Verification[] {
  const p = prepare(input);
  const offsetsHz = verificationOffsets(input.design, p.regions, input.unitDelayS, MONTE_CARLO_DENSITY);
  return (chip, netlist) => check(p, chip, netlist, offsetsHz, undefined, { energyTolerance: 1e-12 }).verification;
}
