// The diff between two versions of a configuration.
import { versionDiffSchema } from '@hexloom/contracts';
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { versionQueryKeys } from './versionQueryKeys.js';

/**
 * Loads GET /api/teams/:teamId/configurations/:configurationId/diff?from=&to= (any member); versions never change,
 * so the answer is kept. Nothing is asked until both numbers are given and differ.
 */
export function useVersionDiff(teamId: string, configurationId: string, from: number | undefined, to: number | undefined) {
  return useQuery({
    queryKey: versionQueryKeys.diff(teamId, configurationId, from ?? 0, to ?? 0),
    enabled: from !== undefined && to !== undefined && from !== to,
    staleTime: Infinity,
    queryFn: ({ signal }) =>
      apiFetch(`/api/teams/${encodeURIComponent(teamId)}/configurations/${encodeURIComponent(configurationId)}/diff?from=${from}&to=${to}`, versionDiffSchema, { signal }),
  });
}
