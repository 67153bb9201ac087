// Save the workspace as a new version of the configuration (designers and owners).
import { configurationVersionSchema, type ConfigurationVersion, type SaveVersion } from '@hexloom/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { chipQueryKeys } from '../../chips/api/chipQueryKeys.js';

/**
 * POST .../configurations/:id/versions; a stale base answers 409 (ApiRequestError) and the list is refreshed.
 * `onSaved` runs before the refresh (which may replace the workspace that asked for the save).
 */
export function useSaveVersion(teamId: string, configurationId: string, onSaved: (saved: ConfigurationVersion) => void) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SaveVersion) =>
      apiFetch(`/api/teams/${encodeURIComponent(teamId)}/configurations/${encodeURIComponent(configurationId)}/versions`, configurationVersionSchema, { method: 'POST', body }),
    onSuccess: (saved) => onSaved(saved),
    onSettled: () => queryClient.invalidateQueries({ queryKey: chipQueryKeys.configuration(teamId, configurationId) }),
  });
}
