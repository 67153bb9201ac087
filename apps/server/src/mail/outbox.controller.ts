/** GET /api/teams/:teamId/outbox: the messages the local fake transport kept (owners). */
import { Controller, Get } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiParam, ApiTags } from '@nestjs/swagger';
import { type OutboxMessage, outboxMessageSchema } from '@hexloom/contracts';
import { z } from 'zod';
import type { TeamAccess } from '../common/authed-request.js';
import { openApiSchema } from '../common/openapi-schema.js';
import { CurrentTeamAccess } from '../common/team-access.decorator.js';
import { TeamRoles } from '../common/team-roles.decorator.js';
import { MailService } from './mail.service.js';

/** The team's outbox (empty when mail goes through SMTP). */
@ApiTags('mail')
@ApiParam({ name: 'teamId', format: 'uuid' })
@Controller('teams/:teamId/outbox')
@TeamRoles('owner')
export class OutboxController {
  constructor(private readonly mail: MailService) {}

  @Get()
  @ApiOperation({ summary: 'List the e-mail kept in the outbox for this team, newest first (owners)' })
  @ApiOkResponse({ schema: openApiSchema(z.array(outboxMessageSchema)) })
  list(@CurrentTeamAccess() access: TeamAccess): Promise<OutboxMessage[]> {
    return this.mail.outbox(access.teamId);
  }
}
