/** Query schemas of the sign-in routes. */
import { z } from 'zod';

/** A same-site path to come back to (no scheme, no `//host`, no backslashes). */
export const returnToSchema = z
  .string()
  .max(2000)
  .regex(/^\/(?![/\\])[^\\]*$/, 'a path on this site starting with a single "/"');

/** GET /api/auth/login query. */
/** The invitation token of an invitation link (base64url). */
const invitationTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{16,64}$/, 'an invitation token');

export const loginQuerySchema = z.object({ returnTo: returnToSchema.optional(), invitation: invitationTokenSchema.optional() });
export type LoginQuery = z.infer<typeof loginQuerySchema>;

/** GET /api/auth/callback query. */
export const callbackQuerySchema = z.object({ code: z.string().min(1).max(500), state: z.string().min(1).max(200) });

/** What the state cookie holds. */
export const oauthStateCookieSchema = z.object({ state: z.string().min(1), returnTo: returnToSchema, invitation: invitationTokenSchema.optional() });
export type OAuthStateCookie = z.infer<typeof oauthStateCookieSchema>;
