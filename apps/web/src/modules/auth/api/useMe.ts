// The signed-in user and their teams.
import { meSchema } from '@hexloom/contracts';
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';

/** Query key of GET /api/me. */
export const ME_KEY = ['me'] as const;

/** Loads GET /api/me; a 401 error means "not signed in". */
export function useMe() {
  return useQuery({
    queryKey: ME_KEY,
    queryFn: ({ signal }) => apiFetch('/api/me', meSchema, { signal }),
  });
}
