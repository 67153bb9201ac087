// The server's answer to a synthesis: the accepted proposal with its checks and an "Add to workspace" button, or the refusal.
import { Button } from '@blueprintjs/core';
import type { FilterSpecKind, Proposal } from '@hexloom/contracts';
import { OtherCircuits } from './OtherCircuits.js';
import { OutputVerificationCard } from './OutputVerificationCard.js';
import { ProposalRefusal } from './ProposalRefusal.js';
import { ProposalSummary } from './ProposalSummary.js';
import { RealisationNotes } from './RealisationNotes.js';

export type ProposalViewProps = {
  proposal: Proposal;
  /** The kind of the spec sent, so each figure takes that kind's label. */
  kind?: FilterSpecKind | undefined;
  /** Called with the accepted proposal when the user adds it to the workspace. */
  onAccept: (proposal: Extract<Proposal, { ok: true }>) => void;
};

/** Summary, notes, each output's checks and figures, the other circuits, then the accept button. */
export function ProposalView({ proposal, kind, onAccept }: ProposalViewProps) {
  if (!proposal.ok) return <ProposalRefusal proposal={proposal} />;
  return (
    <section className="hx-stack" data-testid="proposal" aria-label="Synthesised circuit">
      <ProposalSummary proposal={proposal} />
      <RealisationNotes notes={proposal.notes} />
      {proposal.verification.map((output) => (
        <OutputVerificationCard key={`${output.from}->${output.to}`} output={output} kind={kind} />
      ))}
      <OtherCircuits others={proposal.others} />
      <div>
        <Button intent="primary" icon="add-to-artifact" text="Add to workspace" onClick={() => onAccept(proposal)} />
        <span className="hx-muted hx-synth-accept-note"> Nothing is saved until the version is saved.</span>
      </div>
    </section>
  );
}
