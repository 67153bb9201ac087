// Remove or re-route one circuit of a saved version: the server answers a proposal (not saved).
import { proposalSchema } from '@hexloom/contracts';
import { useMutation } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';

export type CircuitAction = { action: 'remove' | 'reroute'; circuitId: string };

/** POST .../versions/:number/circuits/:circuitId/{remove,reroute} (designers and owners). */
export function useCircuitAction(teamId: string, configurationId: string, versionNumber: number) {
  return useMutation({
    mutationFn: ({ action, circuitId }: CircuitAction) =>
      apiFetch(
        `/api/teams/${encodeURIComponent(teamId)}/configurations/${encodeURIComponent(configurationId)}/versions/${versionNumber}/circuits/${encodeURIComponent(circuitId)}/${action}`,
        proposalSchema,
        { method: 'POST', body: {} },
      ),
  });
}
