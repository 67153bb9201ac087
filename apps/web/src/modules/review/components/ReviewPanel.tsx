// The review of one version: its approval, the named reviewers, a review request, a decision, and comment threads.
import { Spinner } from '@blueprintjs/core';
import type { ConfigurationVersion, TeamRole } from '@hexloom/contracts';
import { useVersionStatuses } from '../hooks/useVersionStatuses.js';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { useReviews } from '../api/useReviews.js';
import { canDiscuss, canRequestReview, reviewerCandidates } from '../utils/reviewRoles.js';
import { ApprovalSummary } from './ApprovalSummary.js';
import { CommentThreads } from './CommentThreads.js';
import { DecisionForm } from './DecisionForm.js';
import { RequestReviewForm } from './RequestReviewForm.js';
import { ReviewerList } from './ReviewerList.js';
import '../review.css';

export type ReviewPanelProps = {
  teamId: string;
  configurationId: string;
  /** The version shown; requests, decisions and comments all go to this exact version. */
  version: ConfigurationVersion;
  /** The team's members (undefined while they load). */
  members: { login: string; name: string; role: string }[] | undefined;
  /** The signed-in user's login. */
  meLogin: string;
  /** The signed-in user's role in the team. */
  role: TeamRole;
  /** The gate selected on the canvas, offered as the anchor of a new comment. */
  selectedGateId?: string | undefined;
  /** Called with a comment's gate when its anchor is clicked (the workspace selects it on the canvas). */
  onPinGate?: (gateId: string | undefined) => void;
};

/**
 * Self-contained: loads the configuration's versions (for the status of each), the version's reviews and comments.
 * Viewers read everything and see no write control; only a named reviewer who is not the author sees the decision.
 */
export function ReviewPanel({ teamId, configurationId, version, members, meLogin, role, selectedGateId, onPinGate }: ReviewPanelProps) {
  const statuses = useVersionStatuses(teamId, configurationId, version);
  const reviews = useReviews(teamId, configurationId, version.number);
  const nameOf = (login: string): string => members?.find((m) => m.login === login)?.name ?? login;
  const isAuthor = version.author === meLogin;
  const named = reviews.data?.some((r) => r.reviewer === meLogin) ?? false;
  const mentionable = (members ?? []).filter((m) => m.login !== meLogin);
  const canWrite = canDiscuss(role);
  return (
    <section className="hx-review" aria-label={`Review of version ${version.number}`} data-testid="review-panel">
      <h3 className="hx-panel-title">Review of v{version.number}</h3>
      <ApprovalSummary version={statuses.current} versions={statuses.versions} nameOf={nameOf} />
      <ApiErrorCallout error={statuses.error} title="Could not load the other versions" onRetry={statuses.refetch} />
      <ApiErrorCallout error={reviews.error} title="Could not load the reviews" onRetry={() => void reviews.refetch()} />
      {reviews.isPending ? <Spinner size={20} aria-label="Loading the reviews" /> : null}
      {reviews.data ? <ReviewerList reviews={reviews.data} nameOf={nameOf} /> : null}
      {canRequestReview(role) && members ? (
        <RequestReviewForm teamId={teamId} configurationId={configurationId} versionNumber={version.number} candidates={reviewerCandidates(members, version.author)} />
      ) : null}
      {canWrite && reviews.data && named && !isAuthor ? <DecisionForm teamId={teamId} configurationId={configurationId} versionNumber={version.number} /> : null}
      {canWrite && reviews.data && isAuthor ? <p className="hx-muted">You wrote v{version.number}, so a teammate decides on it.</p> : null}
      {canWrite && reviews.data && !named && !isAuthor ? <p className="hx-muted">Only a teammate named as reviewer of v{version.number} approves it or asks for changes.</p> : null}
      <CommentThreads
        teamId={teamId}
        configurationId={configurationId}
        versionNumber={version.number}
        members={mentionable}
        nameOf={nameOf}
        canWrite={canWrite}
        selectedGateId={selectedGateId}
        onPinGate={onPinGate}
      />
    </section>
  );
}
