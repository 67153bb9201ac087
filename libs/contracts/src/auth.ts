/** GET /api/auth/providers answer: which identity provider signs people in. */
import { z } from 'zod';

/** 'github' = the code host's OAuth app; 'local' = the server's built-in development provider. */
export const authProviderNameSchema = z.enum(['github', 'local']);
export type AuthProviderName = z.infer<typeof authProviderNameSchema>;

export const authProvidersSchema = z.object({ provider: authProviderNameSchema });
export type AuthProviders = z.infer<typeof authProvidersSchema>;
