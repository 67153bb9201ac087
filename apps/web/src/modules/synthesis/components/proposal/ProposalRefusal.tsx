// A synthesis the server refused: its reason and message in words, with any notes it made on the way.
import { Callout } from '@blueprintjs/core';
import type { Proposal } from '@hexloom/contracts';
import { describeReason } from '../../utils/describeReason.js';
import { RealisationNotes } from './RealisationNotes.js';

/** A danger callout titled by the reason; the server's own message under it. */
export function ProposalRefusal({ proposal }: { proposal: Extract<Proposal, { ok: false }> }) {
  return (
    <div className="hx-stack" data-testid="proposal-refusal">
      <Callout intent="danger" icon="disable" title={describeReason(proposal.reason)} role="alert">
        <p style={{ margin: 0 }}>{proposal.message}</p>
      </Callout>
      <RealisationNotes notes={proposal.notes} />
    </div>
  );
}
