// The team home's list of versions waiting for the signed-in member's review, each linking to that version.
import { Card, Spinner } from '@blueprintjs/core';
import { Link } from 'react-router-dom';
import { StatusTag } from '../../chips/components/StatusTag.js';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { formatDate } from '../../teams/utils/formatDate.js';
import { useWaitingReviews } from '../api/useWaitingReviews.js';
import { configurationVersionPath } from '../utils/configurationVersionPath.js';
import '../versions.css';

/** Props of {@link WaitingForMyReview}. */
export type WaitingForMyReviewProps = { teamId: string; teamSlug: string };

/** Oldest request first; "Nothing waits for your review" when the list is empty. Every member may see their own list. */
export function WaitingForMyReview({ teamId, teamSlug }: WaitingForMyReviewProps) {
  const waiting = useWaitingReviews(teamId);
  const count = waiting.data?.length;
  return (
    <section className="hx-stack" aria-labelledby="waiting-review-heading" data-testid="waiting-for-my-review">
      <h2 id="waiting-review-heading" className="hx-section-title">
        Waiting for your review{count ? ` (${count})` : ''}
      </h2>
      {waiting.isPending && <Spinner size={30} aria-label="Loading the reviews waiting for you" />}
      <ApiErrorCallout error={waiting.error} title="Could not load the reviews waiting for you" onRetry={() => void waiting.refetch()} />
      {count === 0 && <p className="hx-muted">Nothing waits for your review.</p>}
      {count !== undefined && count > 0 && (
        <ul className="hx-waiting-list">
          {waiting.data?.map((w) => (
            <li key={w.reviewId}>
              <Card compact>
                <Link to={configurationVersionPath(teamSlug, w.configurationId, w.versionNumber)} className="hx-waiting-link">
                  {w.configurationName} v{w.versionNumber}
                </Link>{' '}
                <StatusTag status={w.versionStatus} />
                <p className="hx-muted hx-waiting-detail">
                  On chip {w.chipName}, saved by {w.author}. {w.requestedBy} asked you on {formatDate(w.requestedAt)}.
                </p>
              </Card>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
