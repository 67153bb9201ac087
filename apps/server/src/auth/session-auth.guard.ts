/** Global guard: resolves the signed session cookie to a user; 401 on non-public routes without one. */
import { type CanActivate, type ExecutionContext, Injectable, UnauthorizedException } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { AuthedRequest } from '../common/authed-request.js';
import { IS_PUBLIC } from '../common/public.decorator.js';
import { SESSION_COOKIE } from './session-cookie.js';
import { SessionsService } from './sessions.service.js';

/** Attaches `req.user` and `req.sessionId` when the cookie names a live session. */
@Injectable()
export class SessionAuthGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly sessions: SessionsService,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const isPublic = this.reflector.getAllAndOverride<boolean | undefined>(IS_PUBLIC, [context.getHandler(), context.getClass()]);
    if (isPublic) return true;
    const req = context.switchToHttp().getRequest<AuthedRequest>();
    const token: unknown = req.signedCookies?.[SESSION_COOKIE];
    const session = typeof token === 'string' && token.length > 0 ? await this.sessions.resolve(token) : null;
    if (!session) throw new UnauthorizedException('Sign in first');
    req.user = session.user;
    req.sessionId = session.sessionId;
    return true;
  }
}
