// The configurations of one chip.
import { configurationSummarySchema } from '@hexloom/contracts';
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { chipQueryKeys } from './chipQueryKeys.js';

const summariesSchema = configurationSummarySchema.array();

/** Loads GET /api/teams/:teamId/chips/:chipId/configurations (any member). */
export function useChipConfigurations(teamId: string, chipId: string) {
  return useQuery({
    queryKey: chipQueryKeys.configurations(teamId, chipId),
    queryFn: ({ signal }) => apiFetch(`/api/teams/${encodeURIComponent(teamId)}/chips/${encodeURIComponent(chipId)}/configurations`, summariesSchema, { signal }),
  });
}
