// One thread: its first comment, the replies, a reply box and resolve / reopen.
import { Button, Tag } from '@blueprintjs/core';
import { useState } from 'react';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { formatDate } from '../../teams/utils/formatDate.js';
import { useCommentMutation } from '../api/useCommentMutation.js';
import type { NameOf } from '../utils/approvalLine.js';
import type { CommentThread } from '../utils/commentThreads.js';
import { CommentComposer } from './CommentComposer.js';
import { CommentItem } from './CommentItem.js';

export type CommentThreadCardProps = {
  teamId: string;
  configurationId: string;
  versionNumber: number;
  thread: CommentThread;
  members: readonly { login: string; name: string }[];
  nameOf: NameOf;
  /** False for viewers: the thread is shown without Reply or Resolve. */
  canWrite: boolean;
  onPinGate: ((gateId: string | undefined) => void) | undefined;
};

/** Replies are indented under the first comment; a resolved thread says by whom and when. */
export function CommentThreadCard({ teamId, configurationId, versionNumber, thread, members, nameOf, canWrite, onPinGate }: CommentThreadCardProps) {
  const [replying, setReplying] = useState(false);
  const resolve = useCommentMutation(teamId, configurationId, versionNumber);
  const { root } = thread;
  const resolved = root.resolvedAt !== null;
  return (
    <li className={resolved ? 'hx-thread hx-thread-resolved' : 'hx-thread'} data-testid={`thread-${root.id}`}>
      <CommentItem comment={root} nameOf={nameOf} onPinGate={onPinGate} />
      {thread.replies.length > 0 ? (
        <ul className="hx-replies" aria-label="Replies">
          {thread.replies.map((r) => (
            <li key={r.id}>
              <CommentItem comment={r} nameOf={nameOf} onPinGate={onPinGate} />
            </li>
          ))}
        </ul>
      ) : null}
      {resolved ? (
        <p className="hx-thread-state">
          <Tag minimal intent="success" icon="tick">
            Resolved
          </Tag>{' '}
          by {nameOf(root.resolvedBy ?? '')}, {formatDate(root.resolvedAt ?? '')}
        </p>
      ) : null}
      <ApiErrorCallout error={resolve.error} title={resolved ? 'Could not reopen the thread' : 'Could not resolve the thread'} />
      {canWrite ? (
        <div className="hx-button-row">
          {!replying ? <Button size="small" icon="comment" text="Reply" aria-label={`Reply to ${nameOf(root.author)}`} onClick={() => setReplying(true)} /> : null}
          <Button
            size="small"
            icon={resolved ? 'undo' : 'tick'}
            text={resolved ? 'Reopen' : 'Resolve'}
            aria-label={resolved ? `Reopen the thread of ${nameOf(root.author)}` : `Resolve the thread of ${nameOf(root.author)}`}
            loading={resolve.isPending}
            onClick={() => resolve.mutate({ kind: 'resolve', commentId: root.id, resolved: !resolved })}
          />
        </div>
      ) : null}
      {canWrite && replying ? (
        <div className="hx-reply-box">
          <CommentComposer teamId={teamId} configurationId={configurationId} versionNumber={versionNumber} members={members} parentId={root.id} onDone={() => setReplying(false)} />
          <Button size="small" variant="minimal" text="Cancel reply" onClick={() => setReplying(false)} />
        </div>
      ) : null}
    </li>
  );
}
