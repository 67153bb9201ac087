// Revokes a pending invitation (owners only).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { teamQueryKeys } from './teamQueryKeys.js';

/** DELETE /api/teams/:teamId/invitations/:invitationId; refreshes the invitation list. */
export function useRevokeInvitation(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: string) =>
      apiFetch(`/api/teams/${encodeURIComponent(teamId)}/invitations/${encodeURIComponent(invitationId)}`, undefined, {
        method: 'DELETE',
      }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: teamQueryKeys.invitations(teamId) }),
  });
}
