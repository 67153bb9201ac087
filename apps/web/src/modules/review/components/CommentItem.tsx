// One comment: who wrote it and when, what it points at, and its text.
import type { Comment } from '@hexloom/contracts';
import { formatDate } from '../../teams/utils/formatDate.js';
import type { NameOf } from '../utils/approvalLine.js';
import { CommentAnchorLabel } from './CommentAnchorLabel.js';
import { CommentBody } from './CommentBody.js';

export type CommentItemProps = { comment: Comment; nameOf: NameOf; onPinGate: ((gateId: string | undefined) => void) | undefined };

/** The author's name, the date, the anchor and the text with mentions highlighted. */
export function CommentItem({ comment, nameOf, onPinGate }: CommentItemProps) {
  return (
    <article className="hx-comment" aria-label={`Comment by ${nameOf(comment.author)}`} data-testid={`comment-${comment.id}`}>
      <header className="hx-comment-head">
        <strong>{nameOf(comment.author)}</strong>
        <span className="hx-muted">{formatDate(comment.createdAt)}</span>
        <CommentAnchorLabel anchor={comment.anchor} onPinGate={onPinGate} />
      </header>
      <CommentBody body={comment.body} mentions={comment.mentions} />
    </article>
  );
}
