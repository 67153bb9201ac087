// Signs the user out.
import { useMutation } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';

/**
 * POST /api/auth/logout, then `onSignedOut` (the navbar does a full-page load of /signin,
 * which also drops every cached answer of the old session).
 */
export function useSignOut(onSignedOut: () => void) {
  return useMutation({
    mutationFn: () => apiFetch('/api/auth/logout', undefined, { method: 'POST' }),
    onSuccess: () => onSignedOut(),
  });
}
