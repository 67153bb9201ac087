// The team's audit log, newest first, read in growing pages.
import { auditEventSchema } from '@hexloom/contracts';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';

const eventsSchema = auditEventSchema.array();

/** The most the server gives in one answer (GET /audit `limit` maximum). */
export const AUDIT_LIMIT_MAX = 500;

/**
 * Loads GET /api/teams/:teamId/audit?limit= (owners only: pass `enabled: false` for anyone else). Showing more asks
 * again with a larger limit; the previous page stays on screen meanwhile.
 */
export function useAuditLog(teamId: string, limit: number, enabled: boolean) {
  const capped = Math.min(Math.max(1, Math.round(limit)), AUDIT_LIMIT_MAX);
  return useQuery({
    queryKey: ['teams', teamId, 'audit', capped] as const,
    enabled,
    placeholderData: keepPreviousData,
    queryFn: ({ signal }) => apiFetch(`/api/teams/${encodeURIComponent(teamId)}/audit?limit=${capped}`, eventsSchema, { signal }),
  });
}
