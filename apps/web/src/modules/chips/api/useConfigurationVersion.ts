// One version of a configuration, with its content (gate states and circuits).
import { configurationVersionSchema } from '@hexloom/contracts';
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { chipQueryKeys } from './chipQueryKeys.js';

/** Loads GET /api/teams/:teamId/configurations/:configurationId/versions/:number (any member); versions never change. */
export function useConfigurationVersion(teamId: string, configurationId: string, number: number | undefined) {
  return useQuery({
    queryKey: chipQueryKeys.version(teamId, configurationId, number ?? 0),
    enabled: number !== undefined,
    staleTime: Infinity,
    queryFn: ({ signal }) => apiFetch(`/api/teams/${encodeURIComponent(teamId)}/configurations/${encodeURIComponent(configurationId)}/versions/${number}`, configurationVersionSchema, { signal }),
  });
}
