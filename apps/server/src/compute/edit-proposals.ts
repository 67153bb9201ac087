/** Proposals for edits of a version, as pure functions of plain data: synthesise, place, remove, re-route a circuit. */
import type { CircuitSpec, ConfigurationFile, MeshDefinitionFile, OutputVerification, Proposal, RouteRequestFile, SynthesiseBody } from '@hexloom/contracts';
import { placeCircuit, removeCircuit, type Configuration, type Mesh, type RouteRequest } from '@hexloom/mesh';
import { savedFigures, synthesise, type Verification } from '@hexloom/synth';
import { buildChipMesh } from '../chips/build-chip-mesh.js';
import { recomputeFigures } from '../configurations/recompute-figures.js';
import { NothingToRerouteError } from './compute-errors.js';

/** What a proposal needs of the version it is based on. */
export type ProposalBase = { number: number; content: ConfigurationFile; specs: CircuitSpec[] };

/** A verified output in the API shape: ports by id and name, its checks and its figures (finite values only). */
export function outputVerification(v: Verification): OutputVerification {
  return {
    from: v.from, fromName: v.fromName, to: v.to, toName: v.toName, role: v.role, pass: v.mask.pass,
    checks: v.mask.checks,
    figures: Object.fromEntries(Object.entries(v.figures).filter((e) => Number.isFinite(e[1]))),
  };
}

/**
 * The version's content on the chip as it is now: edits route on the chip's current definition (its dead gates,
 * technology and wiring), not on the copy saved with the version, so a gate marked dead since is avoided.
 */
const onCurrentChip = (version: ProposalBase, chip: MeshDefinitionFile): ConfigurationFile => ({ ...version.content, mesh: chip });

/** Figures of every circuit with a spec on the proposed content, and the verdicts of all of them. */
function verifyAll(mesh: Mesh, content: ConfigurationFile, specs: readonly CircuitSpec[]) {
  const { figures, verdicts } = recomputeFigures(mesh, content, specs);
  return { figures, others: verdicts.map((v) => ({ circuitId: v.circuitId, pass: v.pass, failed: v.failed })) };
}

function success(version: ProposalBase, content: ConfigurationFile, circuit: ConfigurationFile['circuits'][number] | null, specs: CircuitSpec[]): Proposal {
  const { figures, others } = verifyAll(buildChipMesh(content.mesh), content, specs);
  return { ok: true, basedOnVersion: version.number, content, circuit, notes: [], design: null, verification: [], verdict: null, others, figures, specs };
}

function synthesiseOn(version: ProposalBase, content: ConfigurationFile, body: SynthesiseBody, specs: CircuitSpec[]): Proposal {
  const mesh = buildChipMesh(content.mesh);
  const result = synthesise({ spec: body.spec, mesh, configuration: content as Configuration, circuitId: body.circuitId });
  if (!result.ok) return { ok: false, reason: result.reason, message: result.message, notes: result.notes };
  const proposed = result.configuration as ConfigurationFile;
  // The new circuit was just verified; the others are verified again (its leakage and parking reach them a little).
  const rest = verifyAll(mesh, proposed, specs.filter((s) => s.circuitId !== body.circuitId));
  return {
    ok: true,
    basedOnVersion: version.number,
    content: proposed,
    circuit: result.circuit as ConfigurationFile['circuits'][number],
    notes: result.notes,
    design: result.design,
    verification: result.verification.map(outputVerification),
    verdict: { pass: result.verdict.pass, checks: result.verdict.checkCount, failed: result.verdict.failed.length },
    others: rest.others,
    figures: { ...rest.figures, [body.circuitId]: savedFigures(result.verification, result.verdict) },
    specs: [...specs.filter((s) => s.circuitId !== body.circuitId), { circuitId: body.circuitId, spec: body.spec }],
  };
}

/** Synthesises `body.spec` onto what the version leaves free; every circuit with a spec is verified again on the result. */
export function synthesiseProposal(version: ProposalBase, chip: MeshDefinitionFile, body: SynthesiseBody): Proposal {
  return synthesiseOn(version, onCurrentChip(version, chip), body, version.specs);
}

/** Places a circuit from a route request. */
export function placeProposal(version: ProposalBase, chip: MeshDefinitionFile, request: RouteRequestFile): Proposal {
  const content = onCurrentChip(version, chip);
  const placed = placeCircuit(content as Configuration, request as RouteRequest, buildChipMesh(content.mesh));
  if (!placed.ok) return { ok: false, reason: placed.reason, message: placed.message, notes: [] };
  return success(version, placed.configuration as ConfigurationFile, placed.circuit as ConfigurationFile['circuits'][number], version.specs);
}

/** Removes a circuit; its gates return to the parked state (MeshError, a 422, for an unknown circuit). */
export function removeProposal(version: ProposalBase, chip: MeshDefinitionFile, circuitId: string): Proposal {
  const content = removeCircuit(onCurrentChip(version, chip) as Configuration, circuitId) as ConfigurationFile;
  return success(version, content, null, version.specs.filter((s) => s.circuitId !== circuitId));
}

/** Removes then places the circuit again: from the given request, or by re-synthesising its saved spec. */
export function rerouteProposal(version: ProposalBase, chip: MeshDefinitionFile, circuitId: string, request: RouteRequestFile | undefined): Proposal {
  if (request && request.id !== circuitId) throw new NothingToRerouteError(circuitId, `the request's id is "${request.id}"`);
  const freed = removeCircuit(onCurrentChip(version, chip) as Configuration, circuitId) as ConfigurationFile;
  const specs = version.specs.filter((s) => s.circuitId !== circuitId);
  if (request) {
    const placed = placeCircuit(freed as Configuration, request as RouteRequest, buildChipMesh(freed.mesh));
    if (!placed.ok) return { ok: false, reason: placed.reason, message: placed.message, notes: [] };
    return success(version, placed.configuration as ConfigurationFile, placed.circuit as ConfigurationFile['circuits'][number], specs);
  }
  const saved = version.specs.find((s) => s.circuitId === circuitId);
  if (!saved) throw new NothingToRerouteError(circuitId, 'it has no saved spec; send a route request');
  return synthesiseOn(version, freed, { circuitId, spec: saved.spec }, specs);
}
