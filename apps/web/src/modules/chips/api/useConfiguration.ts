// One configuration with the list of its versions.
import { configurationDetailSchema } from '@hexloom/contracts';
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { chipQueryKeys } from './chipQueryKeys.js';

/** Loads GET /api/teams/:teamId/configurations/:configurationId (any member). */
export function useConfiguration(teamId: string, configurationId: string) {
  return useQuery({
    queryKey: chipQueryKeys.configuration(teamId, configurationId),
    queryFn: ({ signal }) => apiFetch(`/api/teams/${encodeURIComponent(teamId)}/configurations/${encodeURIComponent(configurationId)}`, configurationDetailSchema, { signal }),
  });
}
