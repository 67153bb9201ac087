// Invites someone to a team by e-mail address (owners only).
import { invitationSchema, type CreateInvitation } from '@hexloom/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { teamQueryKeys } from './teamQueryKeys.js';

/** POST /api/teams/:teamId/invitations; refreshes the invitation list. */
export function useCreateInvitation(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateInvitation) =>
      apiFetch(`/api/teams/${encodeURIComponent(teamId)}/invitations`, invitationSchema, { method: 'POST', body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: teamQueryKeys.invitations(teamId) }),
  });
}
