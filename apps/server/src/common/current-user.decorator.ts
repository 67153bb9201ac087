/** Parameter decorator giving a handler the signed-in user. */
import { createParamDecorator, type ExecutionContext, UnauthorizedException } from '@nestjs/common';
import type { User } from '@hexloom/contracts';
import type { AuthedRequest } from './authed-request.js';

/** Injects the signed-in `User`; throws 401 if the route was reached without one. */
export const CurrentUser = createParamDecorator((_data: unknown, ctx: ExecutionContext): User => {
  const user = ctx.switchToHttp().getRequest<AuthedRequest>().user;
  if (!user) throw new UnauthorizedException('Sign in first');
  return user;
});
