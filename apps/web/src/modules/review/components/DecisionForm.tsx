// A named reviewer approves or requests changes on the exact version shown, with a note for the author.
import { Button, FormGroup, TextArea } from '@blueprintjs/core';
import { useId, useState } from 'react';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { useReviewMutation } from '../api/useReviewMutation.js';

export type DecisionFormProps = { teamId: string; configurationId: string; versionNumber: number };

/** "Approve v3" and "Request changes on v3" post to that version's decision route; the note goes to the author. */
export function DecisionForm({ teamId, configurationId, versionNumber }: DecisionFormProps) {
  const [note, setNote] = useState('');
  const mutation = useReviewMutation(teamId, configurationId, versionNumber);
  const noteId = useId();
  const decide = (decision: 'approve' | 'request_changes') => mutation.mutate({ kind: 'decide', body: { decision, note: note.trim() } }, { onSuccess: () => setNote('') });
  const pending = mutation.isPending ? mutation.variables : undefined;
  return (
    <section className="hx-review-decision" aria-label={`Your decision on version ${versionNumber}`}>
      <FormGroup label={`Note for the author about v${versionNumber} (optional)`} labelFor={noteId}>
        <TextArea id={noteId} fill value={note} maxLength={2000} onChange={(e) => setNote(e.target.value)} />
      </FormGroup>
      <ApiErrorCallout error={mutation.error} title={`Could not record your decision on v${versionNumber}`} />
      <div className="hx-button-row">
        <Button intent="success" icon="tick-circle" text={`Approve v${versionNumber}`} loading={pending?.kind === 'decide' && pending.body.decision === 'approve'} disabled={mutation.isPending} onClick={() => decide('approve')} />
        <Button intent="warning" icon="edit" text={`Request changes on v${versionNumber}`} loading={pending?.kind === 'decide' && pending.body.decision === 'request_changes'} disabled={mutation.isPending} onClick={() => decide('request_changes')} />
      </div>
    </section>
  );
}
