// Which identity provider the server signs people in with.
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { authProvidersSchema } from '@hexloom/contracts';

/** Query key of the provider answer. */
export const AUTH_PROVIDER_KEY = ['auth', 'providers'] as const;

/** Loads GET /api/auth/providers (public). */
export function useAuthProvider() {
  return useQuery({
    queryKey: AUTH_PROVIDER_KEY,
    queryFn: ({ signal }) => apiFetch('/api/auth/providers', authProvidersSchema, { signal }),
    staleTime: Infinity,
  });
}
