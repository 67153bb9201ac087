/** `@TeamRoles(...)`: the roles of the `:teamId` team allowed on a route. */
import { applyDecorators, SetMetadata, UseGuards } from '@nestjs/common';
import { ApiForbiddenResponse, ApiNotFoundResponse } from '@nestjs/swagger';
import type { TeamRole } from '@hexloom/contracts';
import { TeamRolesGuard } from './team-roles.guard.js';

/** Metadata key holding the allowed roles. */
export const TEAM_ROLES_KEY = 'hexloom:teamRoles';

/** Allows members of `:teamId` holding one of `roles`; others get 403, an unknown team 404. */
export function TeamRoles(...roles: TeamRole[]): MethodDecorator & ClassDecorator {
  return applyDecorators(
    SetMetadata(TEAM_ROLES_KEY, roles),
    UseGuards(TeamRolesGuard),
    ApiForbiddenResponse({ description: `Not a member of the team, or role not in: ${roles.join(', ')}` }),
    ApiNotFoundResponse({ description: 'Unknown team' }),
  );
}
