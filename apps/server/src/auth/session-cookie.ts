/** Names and attributes of the cookies the sign-in flow sets. */
import type { CookieOptions } from 'express';

/** Signed cookie carrying the raw session token. */
export const SESSION_COOKIE = 'hexloom_session';

/** Short-lived signed cookie carrying the OAuth `state` and where to return after sign-in. */
export const OAUTH_STATE_COOKIE = 'hexloom_oauth_state';

/** Sessions last 30 days. */
export const SESSION_LIFETIME_MS = 30 * 24 * 60 * 60 * 1000;

/** The state cookie outlives the provider's 10-minute codes a little. */
export const OAUTH_STATE_LIFETIME_MS = 15 * 60 * 1000;

/** HttpOnly, SameSite=Lax, signed; Secure when served over https. */
export function sessionCookieOptions(secure: boolean): CookieOptions {
  return { httpOnly: true, sameSite: 'lax', signed: true, secure, path: '/', maxAge: SESSION_LIFETIME_MS };
}

/** Same attributes as the session cookie, scoped to the auth routes and short-lived. */
export function oauthStateCookieOptions(secure: boolean): CookieOptions {
  return { httpOnly: true, sameSite: 'lax', signed: true, secure, path: '/api/auth', maxAge: OAUTH_STATE_LIFETIME_MS };
}

/** The attributes to clear a cookie with: same path and flags, unsigned (an empty value needs no signature). */
export function clearingOptions(options: CookieOptions): CookieOptions {
  const { signed: _signed, maxAge: _maxAge, ...rest } = options;
  return rest;
}
