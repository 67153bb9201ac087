// Removes a member from a team (owners only).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { ME_KEY } from '../../auth/api/useMe.js';
import { teamQueryKeys } from './teamQueryKeys.js';

/** DELETE /api/teams/:teamId/members/:userId; refreshes the member list and the user's teams. */
export function useRemoveMember(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) =>
      apiFetch(`/api/teams/${encodeURIComponent(teamId)}/members/${encodeURIComponent(userId)}`, undefined, {
        method: 'DELETE',
      }),
    onSuccess: async () => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: teamQueryKeys.members(teamId) }),
        queryClient.invalidateQueries({ queryKey: ME_KEY }),
      ]);
    },
  });
}
