/** First guard of the callback: validates the query and checks `state` against the signed cookie. */
import { timingSafeEqual } from 'node:crypto';
import { type CanActivate, type ExecutionContext, Injectable } from '@nestjs/common';
import type { AuthedRequest } from '../common/authed-request.js';
import { parseInput } from '../common/parse-input.js';
import { callbackQuerySchema, oauthStateCookieSchema } from './auth.schemas.js';
import { OAuthStateMismatchError } from './oauth-state.error.js';
import { OAUTH_STATE_COOKIE } from './session-cookie.js';

const sameText = (a: string, b: string): boolean => {
  const x = Buffer.from(a);
  const y = Buffer.from(b);
  return x.length === y.length && timingSafeEqual(x, y);
};

/** 400 with issues for a bad query, 400 for a missing/forged state; sets `req.oauthReturnTo`. */
@Injectable()
export class OAuthStateGuard implements CanActivate {
  canActivate(context: ExecutionContext): boolean {
    const req = context.switchToHttp().getRequest<AuthedRequest>();
    const query = parseInput(callbackQuerySchema, req.query, 'query');
    const cookie = oauthStateCookieSchema.safeParse(req.signedCookies?.[OAUTH_STATE_COOKIE]);
    if (!cookie.success) throw new OAuthStateMismatchError('missing-cookie');
    if (!sameText(cookie.data.state, query.state)) throw new OAuthStateMismatchError('mismatch');
    req.oauthReturnTo = cookie.data.returnTo;
    if (cookie.data.invitation) req.oauthInvitation = cookie.data.invitation;
    return true;
  }
}
