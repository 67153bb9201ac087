// Name teammates to review the version shown (owners and designers).
import { Button, Checkbox, FormGroup, TextArea } from '@blueprintjs/core';
import { useId, useState } from 'react';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { useReviewMutation } from '../api/useReviewMutation.js';

export type RequestReviewFormProps = {
  teamId: string;
  configurationId: string;
  versionNumber: number;
  /** Members who may review this version (no viewers, not the author). */
  candidates: readonly { login: string; name: string; role: string }[];
};

/** A checkbox per possible reviewer, an optional message, and "Request review of vN". */
export function RequestReviewForm({ teamId, configurationId, versionNumber, candidates }: RequestReviewFormProps) {
  const [chosen, setChosen] = useState<string[]>([]);
  const [message, setMessage] = useState('');
  const [sentTo, setSentTo] = useState<string[]>([]);
  const mutation = useReviewMutation(teamId, configurationId, versionNumber);
  const messageId = useId();
  const toggle = (login: string) => setChosen((c) => (c.includes(login) ? c.filter((l) => l !== login) : [...c, login]));
  const submit = () =>
    mutation.mutate(
      { kind: 'request', body: { reviewers: chosen, message: message.trim() } },
      {
        onSuccess: () => {
          setSentTo(chosen);
          setChosen([]);
          setMessage('');
        },
      },
    );
  if (candidates.length === 0) return <p className="hx-muted">No teammate can review this version: viewers cannot, nor can its author.</p>;
  return (
    <form
      className="hx-review-request"
      aria-label={`Request a review of version ${versionNumber}`}
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      <fieldset className="hx-fieldset">
        <legend>Reviewers for v{versionNumber}</legend>
        {candidates.map((m) => (
          <Checkbox key={m.login} checked={chosen.includes(m.login)} onChange={() => toggle(m.login)} label={`${m.name} (${m.login}), ${m.role}`} />
        ))}
      </fieldset>
      <FormGroup label="Message to the reviewers (optional)" labelFor={messageId}>
        <TextArea id={messageId} fill value={message} maxLength={2000} onChange={(e) => setMessage(e.target.value)} />
      </FormGroup>
      <ApiErrorCallout error={mutation.error} title="Could not request the review" />
      <Button type="submit" intent="primary" icon="people" loading={mutation.isPending} disabled={chosen.length === 0} text={`Request review of v${versionNumber}`} />
      {sentTo.length > 0 && !mutation.error ? (
        <p role="status" className="hx-muted">
          Review requested from {sentTo.join(', ')}; each was sent an e-mail.
        </p>
      ) : null}
    </form>
  );
}
