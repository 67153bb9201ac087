// The versions the signed-in member was asked to review in one team and has not decided.
import { waitingReviewsSchema } from '@hexloom/contracts';
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { versionQueryKeys } from './versionQueryKeys.js';

/** Loads GET /api/teams/:teamId/reviews/waiting (any member), oldest request first. */
export function useWaitingReviews(teamId: string) {
  return useQuery({
    queryKey: versionQueryKeys.waitingReviews(teamId),
    queryFn: ({ signal }) => apiFetch(`/api/teams/${encodeURIComponent(teamId)}/reviews/waiting`, waitingReviewsSchema, { signal }),
  });
}
