/** /api/teams/:teamId/invitations routes (owners). */
import { Body, Controller, Delete, Get, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBody, ApiConflictResponse, ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiOperation, ApiParam, ApiTags } from '@nestjs/swagger';
import { type CreateInvitation, createInvitationSchema, type Invitation, invitationSchema, type User } from '@hexloom/contracts';
import { z } from 'zod';
import type { TeamAccess } from '../common/authed-request.js';
import { CurrentUser } from '../common/current-user.decorator.js';
import { openApiSchema } from '../common/openapi-schema.js';
import { CurrentTeamAccess } from '../common/team-access.decorator.js';
import { TeamRoles } from '../common/team-roles.decorator.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import { InvitationsService } from './invitations.service.js';

const invitationParamsSchema = z.object({ teamId: z.uuid(), invitationId: z.uuid() });

/** Invitations of one team; owners only. */
@ApiTags('invitations')
@ApiParam({ name: 'teamId', format: 'uuid' })
@Controller('teams/:teamId/invitations')
@TeamRoles('owner')
export class InvitationsController {
  constructor(private readonly invitations: InvitationsService) {}

  @Get()
  @ApiOperation({ summary: 'List the invitations of the team, newest first (owners)' })
  @ApiOkResponse({ schema: openApiSchema(z.array(invitationSchema)) })
  list(@CurrentTeamAccess() access: TeamAccess): Promise<Invitation[]> {
    return this.invitations.list(access.teamId);
  }

  @Post()
  @HttpCode(201)
  @ApiOperation({ summary: 'Invite an e-mail address with a role (owners)' })
  @ApiBody({ schema: openApiSchema(createInvitationSchema, 'input') })
  @ApiCreatedResponse({ schema: openApiSchema(invitationSchema) })
  @ApiConflictResponse({ description: 'Already a member, or an invitation is pending' })
  create(
    @CurrentUser() user: User,
    @CurrentTeamAccess() access: TeamAccess,
    @Body(new ZodValidationPipe(createInvitationSchema)) body: CreateInvitation,
  ): Promise<Invitation> {
    return this.invitations.create(user, access.teamId, body);
  }

  @Delete(':invitationId')
  @HttpCode(204)
  @ApiOperation({ summary: 'Revoke a pending invitation (owners)' })
  @ApiParam({ name: 'invitationId', format: 'uuid' })
  @ApiNoContentResponse({ description: 'Revoked' })
  @ApiConflictResponse({ description: 'Already accepted' })
  revoke(
    @CurrentUser() user: User,
    @Param(new ZodValidationPipe(invitationParamsSchema)) params: z.output<typeof invitationParamsSchema>,
  ): Promise<void> {
    return this.invitations.revoke(user, params.teamId, params.invitationId);
  }
}
