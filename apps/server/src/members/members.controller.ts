/** /api/teams/:teamId/members routes. */
import { Body, Controller, Delete, Get, HttpCode, Param, Patch } from '@nestjs/common';
import { ApiBody, ApiConflictResponse, ApiNoContentResponse, ApiOkResponse, ApiOperation, ApiParam, ApiTags } from '@nestjs/swagger';
import { type ChangeRole, changeRoleSchema, type Member, memberSchema, type User } from '@hexloom/contracts';
import { z } from 'zod';
import { CurrentUser } from '../common/current-user.decorator.js';
import { openApiSchema } from '../common/openapi-schema.js';
import { TeamRoles } from '../common/team-roles.decorator.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import { MembersService } from './members.service.js';

const teamParamsSchema = z.object({ teamId: z.uuid() });
const memberParamsSchema = z.object({ teamId: z.uuid(), userId: z.uuid() });
type MemberParams = z.output<typeof memberParamsSchema>;

/** Members of one team: any member reads, owners change roles and remove. */
@ApiTags('members')
@ApiParam({ name: 'teamId', format: 'uuid' })
@Controller('teams/:teamId/members')
export class MembersController {
  constructor(private readonly members: MembersService) {}

  @Get()
  @TeamRoles('owner', 'designer', 'reviewer', 'viewer')
  @ApiOperation({ summary: 'List the members of the team (any member)' })
  @ApiOkResponse({ schema: openApiSchema(z.array(memberSchema)) })
  list(@Param(new ZodValidationPipe(teamParamsSchema)) params: z.output<typeof teamParamsSchema>): Promise<Member[]> {
    return this.members.list(params.teamId);
  }

  @Patch(':userId')
  @TeamRoles('owner')
  @ApiOperation({ summary: "Change a member's role (owners)" })
  @ApiParam({ name: 'userId', format: 'uuid' })
  @ApiBody({ schema: openApiSchema(changeRoleSchema, 'input') })
  @ApiOkResponse({ schema: openApiSchema(memberSchema) })
  @ApiConflictResponse({ description: 'Would leave the team without an owner' })
  changeRole(
    @CurrentUser() user: User,
    @Param(new ZodValidationPipe(memberParamsSchema)) params: MemberParams,
    @Body(new ZodValidationPipe(changeRoleSchema)) body: ChangeRole,
  ): Promise<Member> {
    return this.members.changeRole(user, params.teamId, params.userId, body.role);
  }

  @Delete(':userId')
  @HttpCode(204)
  @TeamRoles('owner')
  @ApiOperation({ summary: 'Remove a member from the team (owners)' })
  @ApiParam({ name: 'userId', format: 'uuid' })
  @ApiNoContentResponse({ description: 'Removed' })
  @ApiConflictResponse({ description: 'Would leave the team without an owner' })
  remove(@CurrentUser() user: User, @Param(new ZodValidationPipe(memberParamsSchema)) params: MemberParams): Promise<void> {
    return this.members.remove(user, params.teamId, params.userId);
  }
}
