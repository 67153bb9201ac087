/** Edits proposed on a version, computed on worker threads: synthesise a spec, place, remove or re-route a circuit. */
import { Injectable } from '@nestjs/common';
import type { Proposal, RouteRequestFile, SynthesiseBody } from '@hexloom/contracts';
import type { ChipRow, ConfigurationVersionRow } from '../db/schema/index.js';
import { ComputePoolService } from './compute-pool.service.js';
import type { ProposalBase } from './edit-proposals.js';

export { outputVerification } from './edit-proposals.js';

const base = (v: ConfigurationVersionRow): ProposalBase => ({ number: v.number, content: v.content, specs: v.specs });

/** Builds proposals (see edit-proposals); the client saves one with POST .../versions and its base version. */
@Injectable()
export class EditService {
  constructor(private readonly compute: ComputePoolService) {}

  /** Synthesises `body.spec` onto what the version leaves free; every circuit with a spec is verified again on the result. */
  synthesise(version: ConfigurationVersionRow, chip: ChipRow, body: SynthesiseBody): Promise<Proposal> {
    return this.compute.run({ kind: 'synthesise', version: base(version), chip: chip.definition, body });
  }

  /** Places a circuit from a route request. */
  place(version: ConfigurationVersionRow, chip: ChipRow, request: RouteRequestFile): Promise<Proposal> {
    return this.compute.run({ kind: 'place', version: base(version), chip: chip.definition, request });
  }

  /** Removes a circuit; its gates return to the parked state (a 422 for an unknown circuit). */
  remove(version: ConfigurationVersionRow, chip: ChipRow, circuitId: string): Promise<Proposal> {
    return this.compute.run({ kind: 'remove', version: base(version), chip: chip.definition, circuitId });
  }

  /** Removes then places the circuit again: from the given request, or by re-synthesising its saved spec. */
  reroute(version: ConfigurationVersionRow, chip: ChipRow, circuitId: string, request: RouteRequestFile | undefined): Promise<Proposal> {
    return this.compute.run({ kind: 'reroute', version: base(version), chip: chip.definition, circuitId, request });
  }
}
