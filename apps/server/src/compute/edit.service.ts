/** Edits proposed on a version: synthesise a spec, place, remove or re-route a circuit (nothing is saved here). */
import { Injectable } from '@nestjs/common';
import type { CircuitFigures, CircuitSpec, ConfigurationFile, Proposal, RouteRequestFile, SynthesiseBody } from '@hexloom/contracts';
import { placeCircuit, removeCircuit, type RouteRequest } from '@hexloom/mesh';
import { type ResponseFigures, synthesise } from '@hexloom/synth';
import { buildChipMesh } from '../chips/chips.service.js';
import type { ConfigurationVersionRow } from '../db/schema/index.js';
import { NothingToRerouteError } from './compute-errors.js';

/** The figures saved with a version: the quoted response figures and the worst mask margin, finite values only. */
function quotedFigures(f: ResponseFigures, worstMarginDb: number | null): Record<string, number> {
  const all: Record<string, number | null> = {
    insertionLossDb: f.insertionLossDb,
    peakFrequencyHz: f.peakFrequencyHz,
    bandwidth3dBHz: f.bandwidth3dBHz,
    band3dBLowHz: f.band3dBHz[0],
    band3dBHighHz: f.band3dBHz[1],
    rejectionDb: f.rejectionDb,
    delayRippleIn3dBBandPs: f.delayRippleIn3dBBandPs,
    worstMarginDb,
  };
  return Object.fromEntries(Object.entries(all).filter((e): e is [string, number] => typeof e[1] === 'number' && Number.isFinite(e[1])));
}

const withoutCircuit = <T>(record: Record<string, T>, id: string): Record<string, T> => Object.fromEntries(Object.entries(record).filter(([k]) => k !== id));

/** Builds proposals from library calls; the client saves one with POST .../versions and its base version. */
@Injectable()
export class EditService {
  /** Synthesises `body.spec` onto what the version leaves free; the figures of each verified output are proposed for saving. */
  synthesise(version: ConfigurationVersionRow, body: SynthesiseBody): Proposal {
    return this.synthesiseOn(version, version.content, body, version.specs, version.figures);
  }

  /** Places a circuit from a route request. */
  place(version: ConfigurationVersionRow, request: RouteRequestFile): Proposal {
    const placed = placeCircuit(version.content, request as RouteRequest, buildChipMesh(version.content.mesh));
    if (!placed.ok) return { ok: false, reason: placed.reason, message: placed.message, notes: [] };
    return this.success(version, placed.configuration as ConfigurationFile, placed.circuit as ConfigurationFile['circuits'][number], version.specs, version.figures);
  }

  /** Removes a circuit; its gates return to the parked state (MeshError, a 422, for an unknown circuit). */
  remove(version: ConfigurationVersionRow, circuitId: string): Proposal {
    const content = removeCircuit(version.content, circuitId) as ConfigurationFile;
    return this.success(version, content, null, version.specs.filter((s) => s.circuitId !== circuitId), withoutCircuit(version.figures, circuitId));
  }

  /** Removes then places the circuit again: from the given request, or by re-synthesising its saved spec. */
  reroute(version: ConfigurationVersionRow, circuitId: string, request: RouteRequestFile | undefined): Proposal {
    if (request && request.id !== circuitId) throw new NothingToRerouteError(circuitId, `the request's id is "${request.id}"`);
    const freed = removeCircuit(version.content, circuitId) as ConfigurationFile;
    const specs = version.specs.filter((s) => s.circuitId !== circuitId);
    const figures = withoutCircuit(version.figures, circuitId);
    if (request) {
      const placed = placeCircuit(freed, request as RouteRequest, buildChipMesh(freed.mesh));
      if (!placed.ok) return { ok: false, reason: placed.reason, message: placed.message, notes: [] };
      return this.success(version, placed.configuration as ConfigurationFile, placed.circuit as ConfigurationFile['circuits'][number], specs, figures);
    }
    const saved = version.specs.find((s) => s.circuitId === circuitId);
    if (!saved) throw new NothingToRerouteError(circuitId, 'it has no saved spec; send a route request');
    return this.synthesiseOn(version, freed, { circuitId, spec: saved.spec }, specs, figures);
  }

  private synthesiseOn(version: ConfigurationVersionRow, content: ConfigurationFile, body: SynthesiseBody, specs: CircuitSpec[], figures: CircuitFigures): Proposal {
    const result = synthesise({ spec: body.spec, mesh: buildChipMesh(content.mesh), configuration: content, circuitId: body.circuitId });
    if (!result.ok) return { ok: false, reason: result.reason, message: result.message, notes: result.notes };
    const verification = result.verification.map((v) => ({ from: v.from, to: v.to, pass: v.mask.pass, figures: quotedFigures(v.figures, v.mask.worst?.margin ?? null) }));
    const first = verification[0];
    const newFigures = first ? { ...figures, [body.circuitId]: first.figures } : figures;
    return {
      ok: true,
      basedOnVersion: version.number,
      content: result.configuration as ConfigurationFile,
      circuit: result.circuit as ConfigurationFile['circuits'][number],
      notes: result.notes,
      design: result.design,
      verification,
      figures: newFigures,
      specs: [...specs.filter((s) => s.circuitId !== body.circuitId), { circuitId: body.circuitId, spec: body.spec }],
    };
  }

  private success(version: ConfigurationVersionRow, content: ConfigurationFile, circuit: ConfigurationFile['circuits'][number] | null, specs: CircuitSpec[], figures: CircuitFigures): Proposal {
    return { ok: true, basedOnVersion: version.number, content, circuit, notes: [], design: null, verification: [], figures, specs };
  }
}
