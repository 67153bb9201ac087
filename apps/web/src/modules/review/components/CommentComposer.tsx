// Write a new comment (optionally pointing at the selected gate or a typed band) or a reply to a thread.
import { Button, FormGroup, InputGroup, Radio, RadioGroup } from '@blueprintjs/core';
import type { CreateComment } from '@hexloom/contracts';
import { useId, useState } from 'react';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { useCommentMutation } from '../api/useCommentMutation.js';
import { bandAnchor } from '../utils/bandAnchor.js';
import { MentionTextArea } from './MentionTextArea.js';

type AnchorChoice = 'none' | 'gate' | 'band';

export type CommentComposerProps = {
  teamId: string;
  configurationId: string;
  versionNumber: number;
  /** Teammates that can be @mentioned. */
  members: readonly { login: string; name: string }[];
  /** Replies go under this comment; new threads leave it out. */
  parentId?: string;
  /** The gate selected on the canvas, offered as the comment's anchor (new threads only). */
  selectedGateId?: string | undefined;
  /** Runs after the comment is saved (e.g. to close a reply box). */
  onDone?: () => void;
};

/** The text box with @mention suggestions, the anchor choice for a new thread, and "Comment" / "Reply". */
export function CommentComposer({ teamId, configurationId, versionNumber, members, parentId, selectedGateId, onDone }: CommentComposerProps) {
  const [text, setText] = useState('');
  const [choice, setChoice] = useState<AnchorChoice>('none');
  const [fromGhz, setFromGhz] = useState('');
  const [toGhz, setToGhz] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const mutation = useCommentMutation(teamId, configurationId, versionNumber);
  const fromId = useId();
  const toId = useId();
  const isReply = parentId !== undefined;
  const gateChoice = choice === 'gate' && !selectedGateId ? 'none' : choice;

  const submit = () => {
    if (text.trim() === '') return setProblem('Write something first');
    const body: CreateComment = { body: text.trim(), ...(parentId ? { parentId } : {}) };
    if (!isReply && gateChoice === 'gate' && selectedGateId) body.anchor = { gate: selectedGateId };
    if (!isReply && gateChoice === 'band') {
      const band = bandAnchor(fromGhz, toGhz);
      if (!band.ok) return setProblem(band.message);
      body.anchor = band.anchor;
    }
    setProblem(null);
    mutation.mutate(
      { kind: 'create', body },
      {
        onSuccess: () => {
          setText('');
          setFromGhz('');
          setToGhz('');
          setChoice('none');
          onDone?.();
        },
      },
    );
  };

  return (
    <form
      className="hx-comment-composer"
      aria-label={isReply ? 'Reply to the thread' : `New comment on version ${versionNumber}`}
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      <MentionTextArea label={isReply ? 'Your reply' : 'New comment'} value={text} onChange={setText} members={members} />
      {isReply ? null : (
        <RadioGroup label="Points at" inline selectedValue={gateChoice} onChange={(e) => setChoice(e.currentTarget.value as AnchorChoice)}>
          <Radio value="none" label="Nothing in particular" />
          <Radio value="gate" label={selectedGateId ? `The selected gate, ${selectedGateId}` : 'A gate (select one on the mesh first)'} disabled={!selectedGateId} />
          <Radio value="band" label="A frequency band" />
        </RadioGroup>
      )}
      {!isReply && gateChoice === 'band' ? (
        <div className="hx-band-fields">
          <FormGroup label="Band from, GHz from the reference" labelFor={fromId}>
            <InputGroup id={fromId} inputMode="decimal" value={fromGhz} onValueChange={setFromGhz} placeholder="e.g. 1.9" />
          </FormGroup>
          <FormGroup label="Band to, GHz from the reference" labelFor={toId}>
            <InputGroup id={toId} inputMode="decimal" value={toGhz} onValueChange={setToGhz} placeholder="e.g. 2.1" />
          </FormGroup>
        </div>
      ) : null}
      {problem ? (
        <p className="hx-form-problem" role="alert">
          {problem}
        </p>
      ) : null}
      <ApiErrorCallout error={mutation.error} title={isReply ? 'Could not post the reply' : 'Could not post the comment'} />
      <Button type="submit" intent="primary" icon="comment" loading={mutation.isPending} text={isReply ? 'Reply' : 'Comment'} />
    </form>
  );
}
