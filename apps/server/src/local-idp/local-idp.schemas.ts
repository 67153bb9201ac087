/** Request schemas of the fake identity provider's endpoints (OAuth field names). */
import { z } from 'zod';

const emptyToUndefined = (v: unknown): unknown => (typeof v === 'string' && v.trim() === '' ? undefined : v);

/** GET /api/local-idp/authorize query. */
export const authorizeQuerySchema = z.object({
  client_id: z.string().min(1),
  redirect_uri: z.url(),
  state: z.string().min(1).max(200),
  scope: z.string().optional(),
});
export type AuthorizeQuery = z.infer<typeof authorizeQuerySchema>;

/** POST /api/local-idp/authorize form: the OAuth fields plus the chosen or typed account. */
export const authorizeFormSchema = authorizeQuerySchema.extend({
  login: z
    .string()
    .trim()
    .regex(/^[A-Za-z0-9](?:[A-Za-z0-9-]{0,38})$/, 'letters, digits and dashes, 1 to 39 characters, not starting with a dash'),
  name: z.preprocess(emptyToUndefined, z.string().trim().max(100).optional()),
  email: z.preprocess(emptyToUndefined, z.string().trim().toLowerCase().pipe(z.email()).optional()),
});
export type AuthorizeForm = z.infer<typeof authorizeFormSchema>;

/** POST /api/local-idp/access_token body (form or JSON). */
export const accessTokenBodySchema = z.object({
  client_id: z.string().min(1),
  client_secret: z.string().optional(),
  code: z.string().min(1),
  redirect_uri: z.string().optional(),
});
export type AccessTokenBody = z.infer<typeof accessTokenBodySchema>;

