// Write a comment or reply, or resolve / reopen a thread, on one version.
import { commentSchema, type CreateComment } from '@hexloom/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { reviewPath } from './reviewPaths.js';
import { reviewQueryKeys } from './reviewQueryKeys.js';

/** What to send: a new comment or reply (POST .../comments), or a thread's resolved mark (PATCH .../comments/:id). */
export type CommentAction = { kind: 'create'; body: CreateComment } | { kind: 'resolve'; commentId: string; resolved: boolean };

/** Sends a comment action for version `number`, then refreshes the version's comments. */
export function useCommentMutation(teamId: string, configurationId: string, number: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (action: CommentAction) =>
      action.kind === 'create'
        ? apiFetch(reviewPath(teamId, configurationId, number, 'comments'), commentSchema, { method: 'POST', body: action.body })
        : apiFetch(reviewPath(teamId, configurationId, number, `comments/${encodeURIComponent(action.commentId)}`), commentSchema, {
            method: 'PATCH',
            body: { resolved: action.resolved },
          }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reviewQueryKeys.comments(teamId, configurationId, number) }),
  });
}
