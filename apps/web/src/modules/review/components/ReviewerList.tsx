// Who was asked to review the version, and what each one decided.
import type { Review } from '@hexloom/contracts';
import { formatDate } from '../../teams/utils/formatDate.js';
import type { NameOf } from '../utils/approvalLine.js';

const DECISION_WORDS: Record<NonNullable<Review['decision']>, string> = { approve: 'approved', request_changes: 'requested changes to' };

/** One line per named reviewer: their decision on this exact version with its note, or "no decision yet". */
export function ReviewerList({ reviews, nameOf }: { reviews: readonly Review[]; nameOf: NameOf }) {
  if (reviews.length === 0) return <p className="hx-muted">Nobody has been asked to review this version yet.</p>;
  return (
    <ul className="hx-reviewers" aria-label="Reviewers">
      {reviews.map((r) => (
        <li key={r.id}>
          <strong>{nameOf(r.reviewer)}</strong>{' '}
          {r.decision && r.decidedAt
            ? `${DECISION_WORDS[r.decision]} v${r.versionNumber} on ${formatDate(r.decidedAt)}`
            : `asked by ${nameOf(r.requestedBy)} on ${formatDate(r.requestedAt)}; no decision yet`}
          {r.decision && r.note ? <q className="hx-review-note">{r.note}</q> : null}
        </li>
      ))}
    </ul>
  );
}
