// The chips of one team.
import { chipSchema } from '@hexloom/contracts';
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { chipQueryKeys } from './chipQueryKeys.js';

const chipsSchema = chipSchema.array();

/** Loads GET /api/teams/:teamId/chips (any member). */
export function useChips(teamId: string) {
  return useQuery({
    queryKey: chipQueryKeys.chips(teamId),
    queryFn: ({ signal }) => apiFetch(`/api/teams/${encodeURIComponent(teamId)}/chips`, chipsSchema, { signal }),
  });
}
