// The e-mail the local fake transport kept for one team (owners only).
import { outboxMessageSchema } from '@hexloom/contracts';
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';

const outboxSchema = outboxMessageSchema.array();

/** Loads GET /api/teams/:teamId/outbox, newest first; a non-owner gets the server's 403. */
export function useOutbox(teamId: string | undefined) {
  return useQuery({
    queryKey: ['teams', teamId, 'outbox'] as const,
    enabled: teamId !== undefined,
    queryFn: ({ signal }) => apiFetch(`/api/teams/${encodeURIComponent(teamId ?? '')}/outbox`, outboxSchema, { signal }),
  });
}
