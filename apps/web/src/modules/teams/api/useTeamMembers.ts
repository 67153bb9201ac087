// The members of one team.
import { memberSchema } from '@hexloom/contracts';
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { teamQueryKeys } from './teamQueryKeys.js';

const membersSchema = memberSchema.array();

/** Loads GET /api/teams/:teamId/members (any member may read it). */
export function useTeamMembers(teamId: string) {
  return useQuery({
    queryKey: teamQueryKeys.members(teamId),
    queryFn: ({ signal }) => apiFetch(`/api/teams/${encodeURIComponent(teamId)}/members`, membersSchema, { signal }),
  });
}
