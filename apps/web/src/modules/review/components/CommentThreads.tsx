// The comment threads of one version: a new-comment box for writers and every thread, open ones first.
import { Spinner, Switch } from '@blueprintjs/core';
import { useState } from 'react';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { useComments } from '../api/useComments.js';
import type { NameOf } from '../utils/approvalLine.js';
import { commentThreads } from '../utils/commentThreads.js';
import { CommentComposer } from './CommentComposer.js';
import { CommentThreadCard } from './CommentThreadCard.js';

export type CommentThreadsProps = {
  teamId: string;
  configurationId: string;
  versionNumber: number;
  members: readonly { login: string; name: string }[];
  nameOf: NameOf;
  canWrite: boolean;
  selectedGateId: string | undefined;
  onPinGate: ((gateId: string | undefined) => void) | undefined;
};

/** Threads load with the version; "Hide resolved threads" leaves only open discussions. */
export function CommentThreads(props: CommentThreadsProps) {
  const { teamId, configurationId, versionNumber, members, nameOf, canWrite, selectedGateId, onPinGate } = props;
  const comments = useComments(teamId, configurationId, versionNumber);
  const [hideResolved, setHideResolved] = useState(false);
  const threads = commentThreads(comments.data ?? []);
  const open = threads.filter((t) => t.root.resolvedAt === null);
  const resolved = threads.filter((t) => t.root.resolvedAt !== null);
  const shown = hideResolved ? open : [...open, ...resolved];
  return (
    <section className="hx-comments" aria-label={`Comments on version ${versionNumber}`}>
      <h3 className="hx-panel-title">Comments on v{versionNumber}</h3>
      {canWrite ? (
        <CommentComposer teamId={teamId} configurationId={configurationId} versionNumber={versionNumber} members={members} selectedGateId={selectedGateId} />
      ) : null}
      <ApiErrorCallout error={comments.error} title="Could not load the comments" onRetry={() => void comments.refetch()} />
      {comments.isPending ? <Spinner size={20} aria-label="Loading the comments" /> : null}
      {comments.data ? (
        <>
          <div className="hx-comments-bar">
            <span className="hx-muted">
              {open.length} open {open.length === 1 ? 'thread' : 'threads'}, {resolved.length} resolved
            </span>
            <Switch checked={hideResolved} label="Hide resolved threads" onChange={() => setHideResolved((h) => !h)} />
          </div>
          {shown.length === 0 ? <p className="hx-muted">{threads.length === 0 ? 'No comments on this version yet.' : 'Every thread is resolved.'}</p> : null}
          <ul className="hx-threads" aria-label="Threads">
            {shown.map((t) => (
              <CommentThreadCard key={t.root.id} {...{ teamId, configurationId, versionNumber, members, nameOf, canWrite, onPinGate }} thread={t} />
            ))}
          </ul>
        </>
      ) : null}
    </section>
  );
}
