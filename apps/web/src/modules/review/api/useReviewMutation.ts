// Request a review or decide on one version; both answer the version's reviews and change its status.
import { reviewSchema, type RequestReview, type ReviewDecision } from '@hexloom/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '../../core/api/apiFetch.js';
import { chipQueryKeys } from '../../chips/api/chipQueryKeys.js';
import { reviewPath } from './reviewPaths.js';
import { reviewQueryKeys } from './reviewQueryKeys.js';

const reviewsSchema = z.array(reviewSchema);

/** What to send: a review request (POST .../reviews) or a decision (POST .../decision). */
export type ReviewAction = { kind: 'request'; body: RequestReview } | { kind: 'decide'; body: ReviewDecision };

/**
 * Sends a review action for version `number`; on success stores the answered reviews and refreshes the configuration
 * and the version (their status changes: in review, approved, changes requested).
 */
export function useReviewMutation(teamId: string, configurationId: string, number: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (action: ReviewAction) =>
      apiFetch(reviewPath(teamId, configurationId, number, action.kind === 'request' ? 'reviews' : 'decision'), reviewsSchema, { method: 'POST', body: action.body }),
    onSuccess: async (reviews) => {
      queryClient.setQueryData(reviewQueryKeys.reviews(teamId, configurationId, number), reviews);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: chipQueryKeys.configuration(teamId, configurationId), exact: true }),
        queryClient.invalidateQueries({ queryKey: chipQueryKeys.version(teamId, configurationId, number), exact: true }),
      ]);
    },
  });
}
