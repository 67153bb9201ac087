// The TanStack Query client of the app: no retries on 4xx, one hook for "not signed in", one for failed changes.
import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { ApiRequestError } from './ApiRequestError.js';

export type QueryClientOptions = {
  /** Called when any query or mutation gets a 401 (the session is missing or expired). */
  onUnauthorized?: () => void;
  /** Retries of a failed query on network or 5xx errors (default 2; tests use 0). */
  retries?: number;
  /**
   * Called when a change the user asked for fails (not for 401, nor for 409, which the page answers itself); `retry`
   * runs it again and is given only where trying again can help (network errors and 5xx).
   */
  onMutationError?: (error: Error, retry: (() => void) | undefined) => void;
};

/** Creates the query client; 4xx answers are final, so they are never retried. */
export function createQueryClient(options: QueryClientOptions = {}): QueryClient {
  const retries = options.retries ?? 2;
  const handle = (error: Error): void => {
    if (error instanceof ApiRequestError && error.statusCode === 401) options.onUnauthorized?.();
  };
  return new QueryClient({
    queryCache: new QueryCache({ onError: handle }),
    mutationCache: new MutationCache({
      onError: (error, variables, _context, mutation) => {
        handle(error);
        if (error instanceof ApiRequestError && (error.statusCode === 401 || error.statusCode === 409)) return;
        options.onMutationError?.(error, isRetryable(error) ? () => void mutation.execute(variables).catch(() => undefined) : undefined);
      },
    }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        retry: (failureCount, error) => isRetryable(error) && failureCount < retries,
      },
      mutations: { retry: false },
    },
  });
}

function isRetryable(error: Error): boolean {
  return !(error instanceof ApiRequestError && error.statusCode < 500);
}
