// Parser of GET /api/auth/providers (not yet in @hexloom/contracts, so checked here by hand).
import type { ResponseSchema } from '../../core/api/apiFetch.js';

/** The identity providers the server can sign people in with; 'local' is the built-in development one. */
export type AuthProviderName = 'github' | 'local';

export type AuthProviders = { provider: AuthProviderName };

/** Checks `{ provider: 'github' | 'local' }` and throws a TypeError naming the bad value otherwise. */
export const authProvidersSchema: ResponseSchema<AuthProviders> = {
  parse(data: unknown): AuthProviders {
    const provider = typeof data === 'object' && data !== null ? (data as Record<string, unknown>)['provider'] : undefined;
    if (provider === 'github' || provider === 'local') return { provider };
    throw new TypeError(`provider must be 'github' or 'local', got ${JSON.stringify(provider)}`);
  },
};
