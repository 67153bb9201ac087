/** Parameter decorator giving a handler the caller's role in the `:teamId` team. */
import { createParamDecorator, type ExecutionContext, ForbiddenException } from '@nestjs/common';
import type { AuthedRequest, TeamAccess } from './authed-request.js';

/** Injects the `TeamAccess` the TeamRolesGuard established. */
export const CurrentTeamAccess = createParamDecorator((_data: unknown, ctx: ExecutionContext): TeamAccess => {
  const access = ctx.switchToHttp().getRequest<AuthedRequest>().teamAccess;
  if (!access) throw new ForbiddenException('No team access was established for this route');
  return access;
});
