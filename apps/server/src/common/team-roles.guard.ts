/** Guard reading `:teamId` and checking the signed-in user's membership role in that team. */
import { type CanActivate, type ExecutionContext, ForbiddenException, Inject, Injectable, NotFoundException, UnauthorizedException } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { TeamRole } from '@hexloom/contracts';
import { and, eq } from 'drizzle-orm';
import { z } from 'zod';
import { DATABASE, type Database } from '../db/database.js';
import { memberships, teams } from '../db/schema/index.js';
import type { AuthedRequest } from './authed-request.js';
import { parseInput } from './parse-input.js';
import { TEAM_ROLES_KEY } from './team-roles.decorator.js';

const teamIdParamsSchema = z.object({ teamId: z.uuid() });

/** 400 for a malformed teamId, 404 for an unknown team, 403 for a non-member or a role not allowed. */
@Injectable()
export class TeamRolesGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    @Inject(DATABASE) private readonly db: Database,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const allowed = this.reflector.getAllAndOverride<TeamRole[] | undefined>(TEAM_ROLES_KEY, [
      context.getHandler(),
      context.getClass(),
    ]);
    if (!allowed) return true;
    const req = context.switchToHttp().getRequest<AuthedRequest>();
    if (!req.user) throw new UnauthorizedException('Sign in first');
    const { teamId } = parseInput(teamIdParamsSchema, { teamId: req.params['teamId'] }, 'params');
    const [team] = await this.db.select({ id: teams.id }).from(teams).where(eq(teams.id, teamId));
    if (!team) throw new NotFoundException(`Team "${teamId}" not found`);
    const [membership] = await this.db
      .select({ role: memberships.role })
      .from(memberships)
      .where(and(eq(memberships.teamId, teamId), eq(memberships.userId, req.user.id)));
    if (!membership) throw new ForbiddenException(`You are not a member of team "${teamId}"`);
    if (!allowed.includes(membership.role)) {
      throw new ForbiddenException(`Role "${membership.role}" may not do this; allowed: ${allowed.join(', ')}`);
    }
    req.teamAccess = { teamId, role: membership.role };
    return true;
  }
}
