/** Query schemas of the sign-in routes. */
import { z } from 'zod';

/** A same-site path to come back to (no scheme, no `//host`, no backslashes). */
export const returnToSchema = z
  .string()
  .max(2000)
  .regex(/^\/(?![/\\])[^\\]*$/, 'a path on this site starting with a single "/"');

/** GET /api/auth/login query. */
export const loginQuerySchema = z.object({ returnTo: returnToSchema.optional() });
export type LoginQuery = z.infer<typeof loginQuerySchema>;

/** GET /api/auth/callback query. */
export const callbackQuerySchema = z.object({ code: z.string().min(1).max(500), state: z.string().min(1).max(200) });

/** What the state cookie holds. */
export const oauthStateCookieSchema = z.object({ state: z.string().min(1), returnTo: returnToSchema });
export type OAuthStateCookie = z.infer<typeof oauthStateCookieSchema>;
