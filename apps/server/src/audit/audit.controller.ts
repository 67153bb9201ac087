/** GET /api/teams/:teamId/audit: the team's audit log (owners). */
import { Controller, Get, Query } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiParam, ApiQuery, ApiTags } from '@nestjs/swagger';
import { type AuditEvent, auditEventSchema, type AuditQuery, auditQuerySchema } from '@hexloom/contracts';
import { z } from 'zod';
import type { TeamAccess } from '../common/authed-request.js';
import { openApiSchema } from '../common/openapi-schema.js';
import { CurrentTeamAccess } from '../common/team-access.decorator.js';
import { TeamRoles } from '../common/team-roles.decorator.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import { AuditService } from './audit.service.js';

/** Audit log routes of one team. */
@ApiTags('audit')
@Controller('teams/:teamId/audit')
export class AuditController {
  constructor(private readonly audit: AuditService) {}

  @Get()
  @TeamRoles('owner')
  @ApiOperation({ summary: 'List the newest audit events of the team, newest first' })
  @ApiParam({ name: 'teamId', format: 'uuid' })
  @ApiQuery({ name: 'limit', required: false, schema: { type: 'integer', minimum: 1, maximum: 500, default: 100 } })
  @ApiOkResponse({ schema: openApiSchema(z.array(auditEventSchema)) })
  list(
    @CurrentTeamAccess() access: TeamAccess,
    @Query(new ZodValidationPipe(auditQuerySchema)) query: AuditQuery,
  ): Promise<AuditEvent[]> {
    return this.audit.listForTeam(access.teamId, query.limit);
  }
}
