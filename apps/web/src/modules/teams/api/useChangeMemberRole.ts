// Changes a member's role (owners only; the server refuses to leave a team without an owner).
import { memberSchema, type TeamRole } from '@hexloom/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { ME_KEY } from '../../auth/api/useMe.js';
import { teamQueryKeys } from './teamQueryKeys.js';

export type ChangeMemberRoleVars = { userId: string; role: TeamRole };

/** PATCH /api/teams/:teamId/members/:userId with `{ role }`; refreshes members and the user's own roles. */
export function useChangeMemberRole(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: ChangeMemberRoleVars) =>
      apiFetch(`/api/teams/${encodeURIComponent(teamId)}/members/${encodeURIComponent(userId)}`, memberSchema, {
        method: 'PATCH',
        body: { role },
      }),
    onSuccess: async () => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: teamQueryKeys.members(teamId) }),
        queryClient.invalidateQueries({ queryKey: ME_KEY }),
      ]);
    },
  });
}
