// Asks the server to synthesise a spec onto the free part of a version's chip (designers and owners).
import { proposalSchema, type SynthesiseBody } from '@hexloom/contracts';
import { useMutation } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';

/** Which version to synthesise on. */
export type SynthesiseTarget = { teamId: string; configurationId: string; versionNumber: number };

/** POST /api/teams/:teamId/configurations/:configurationId/versions/:number/synthesise; the answer parsed with proposalSchema. Nothing is saved. */
export function useSynthesise({ teamId, configurationId, versionNumber }: SynthesiseTarget) {
  return useMutation({
    mutationFn: (body: SynthesiseBody) =>
      apiFetch(`/api/teams/${encodeURIComponent(teamId)}/configurations/${encodeURIComponent(configurationId)}/versions/${versionNumber}/synthesise`, proposalSchema, {
        method: 'POST',
        body,
      }),
  });
}
