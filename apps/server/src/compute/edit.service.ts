/** Edits proposed on a version: synthesise a spec, place, remove or re-route a circuit (nothing is saved here). */
import { Injectable } from '@nestjs/common';
import type { CircuitSpec, ConfigurationFile, OutputVerification, Proposal, RouteRequestFile, SynthesiseBody } from '@hexloom/contracts';
import { placeCircuit, removeCircuit, type Configuration, type Mesh, type RouteRequest } from '@hexloom/mesh';
import { savedFigures, synthesise, type Verification } from '@hexloom/synth';
import { buildChipMesh } from '../chips/chips.service.js';
import { recomputeFigures } from '../configurations/recompute-figures.js';
import type { ChipRow, ConfigurationVersionRow } from '../db/schema/index.js';
import { NothingToRerouteError } from './compute-errors.js';

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
function onCurrentChip(version: ConfigurationVersionRow, chip: ChipRow): ConfigurationFile {
  return { ...version.content, mesh: chip.definition };
}

/** Builds proposals from library calls; the client saves one with POST .../versions and its base version. */
@Injectable()
export class EditService {
  /** Synthesises `body.spec` onto what the version leaves free; every circuit with a spec is verified again on the result. */
  synthesise(version: ConfigurationVersionRow, chip: ChipRow, body: SynthesiseBody): Proposal {
    return this.synthesiseOn(version, onCurrentChip(version, chip), body, version.specs);
  }

  /** Places a circuit from a route request. */
  place(version: ConfigurationVersionRow, chip: ChipRow, request: RouteRequestFile): Proposal {
    const content = onCurrentChip(version, chip);
    const placed = placeCircuit(content as Configuration, request as RouteRequest, buildChipMesh(content.mesh));
    if (!placed.ok) return { ok: false, reason: placed.reason, message: placed.message, notes: [] };
    return this.success(version, placed.configuration as ConfigurationFile, placed.circuit as ConfigurationFile['circuits'][number], version.specs);
  }

  /** Removes a circuit; its gates return to the parked state (MeshError, a 422, for an unknown circuit). */
  remove(version: ConfigurationVersionRow, chip: ChipRow, circuitId: string): Proposal {
    const content = removeCircuit(onCurrentChip(version, chip) as Configuration, circuitId) as ConfigurationFile;
    return this.success(version, content, null, version.specs.filter((s) => s.circuitId !== circuitId));
  }

  /** Removes then places the circuit again: from the given request, or by re-synthesising its saved spec. */
  reroute(version: ConfigurationVersionRow, chip: ChipRow, circuitId: string, request: RouteRequestFile | undefined): Proposal {
    if (request && request.id !== circuitId) throw new NothingToRerouteError(circuitId, `the request's id is "${request.id}"`);
    const freed = removeCircuit(onCurrentChip(version, chip) as Configuration, circuitId) as ConfigurationFile;
    const specs = version.specs.filter((s) => s.circuitId !== circuitId);
    if (request) {
      const placed = placeCircuit(freed as Configuration, request as RouteRequest, buildChipMesh(freed.mesh));
      if (!placed.ok) return { ok: false, reason: placed.reason, message: placed.message, notes: [] };
      return this.success(version, placed.configuration as ConfigurationFile, placed.circuit as ConfigurationFile['circuits'][number], specs);
    }
    const saved = version.specs.find((s) => s.circuitId === circuitId);
    if (!saved) throw new NothingToRerouteError(circuitId, 'it has no saved spec; send a route request');
    return this.synthesiseOn(version, freed, { circuitId, spec: saved.spec }, specs);
  }

  private synthesiseOn(version: ConfigurationVersionRow, content: ConfigurationFile, body: SynthesiseBody, specs: CircuitSpec[]): Proposal {
    const mesh = buildChipMesh(content.mesh);
    const result = synthesise({ spec: body.spec, mesh, configuration: content as Configuration, circuitId: body.circuitId });
    if (!result.ok) return { ok: false, reason: result.reason, message: result.message, notes: result.notes };
    const allSpecs = [...specs.filter((s) => s.circuitId !== body.circuitId), { circuitId: body.circuitId, spec: body.spec }];
    const proposed = result.configuration as ConfigurationFile;
    // The new circuit was just verified; the others are verified again (its leakage and parking reach them a little).
    const rest = this.verifyAll(mesh, proposed, specs.filter((s) => s.circuitId !== body.circuitId), null);
    const figures = { ...rest.figures, [body.circuitId]: savedFigures(result.verification, result.verdict) };
    const others = rest.others;
    return {
      ok: true,
      basedOnVersion: version.number,
      content: proposed,
      circuit: result.circuit as ConfigurationFile['circuits'][number],
      notes: result.notes,
      design: result.design,
      verification: result.verification.map(outputVerification),
      verdict: { pass: result.verdict.pass, checks: result.verdict.checkCount, failed: result.verdict.failed.length },
      others,
      figures,
      specs: allSpecs,
    };
  }

  private success(version: ConfigurationVersionRow, content: ConfigurationFile, circuit: ConfigurationFile['circuits'][number] | null, specs: CircuitSpec[]): Proposal {
    const { figures, others } = this.verifyAll(buildChipMesh(content.mesh), content, specs, null);
    return { ok: true, basedOnVersion: version.number, content, circuit, notes: [], design: null, verification: [], verdict: null, others, figures, specs };
  }

  /** Figures of every circuit with a spec on the proposed content, and the verdicts of all but `except`. */
  private verifyAll(mesh: Mesh, content: ConfigurationFile, specs: readonly CircuitSpec[], except: string | null) {
    const { figures, verdicts } = recomputeFigures(mesh, content, specs);
    return { figures, others: verdicts.filter((v) => v.circuitId !== except).map((v) => ({ circuitId: v.circuitId, pass: v.pass, failed: v.failed })) };
  }
}
