// The invitations of one team (owners only).
import { invitationSchema } from '@hexloom/contracts';
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { teamQueryKeys } from './teamQueryKeys.js';

const invitationsSchema = invitationSchema.array();

/** Loads GET /api/teams/:teamId/invitations; only runs when `enabled` (the user is an owner). */
export function useTeamInvitations(teamId: string, enabled: boolean) {
  return useQuery({
    queryKey: teamQueryKeys.invitations(teamId),
    queryFn: ({ signal }) => apiFetch(`/api/teams/${encodeURIComponent(teamId)}/invitations`, invitationsSchema, { signal }),
    enabled,
  });
}
