// One chip of a team.
import { chipSchema } from '@hexloom/contracts';
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { chipPaths } from './chipPaths.js';
import { chipQueryKeys } from './chipQueryKeys.js';

/** Loads GET /api/teams/:teamId/chips/:chipId (any member). */
export function useChip(teamId: string, chipId: string) {
  return useQuery({
    queryKey: chipQueryKeys.chip(teamId, chipId),
    queryFn: ({ signal }) => apiFetch(chipPaths(teamId, chipId), chipSchema, { signal }),
  });
}
