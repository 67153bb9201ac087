/** /api/teams routes: list mine, create, read one. */
import { Body, Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBody, ApiConflictResponse, ApiCreatedResponse, ApiOkResponse, ApiOperation, ApiParam, ApiTags } from '@nestjs/swagger';
import { type CreateTeam, createTeamSchema, type MyTeam, myTeamSchema, type Team, teamSchema, type User } from '@hexloom/contracts';
import { z } from 'zod';
import { CurrentUser } from '../common/current-user.decorator.js';
import { openApiSchema } from '../common/openapi-schema.js';
import { TeamRoles } from '../common/team-roles.decorator.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import { TeamsService } from './teams.service.js';

const teamParamsSchema = z.object({ teamId: z.uuid() });

/** Team routes; any signed-in user may create a team and becomes its owner. */
@ApiTags('teams')
@Controller('teams')
export class TeamsController {
  constructor(private readonly teams: TeamsService) {}

  @Get()
  @ApiOperation({ summary: 'List the teams the signed-in user belongs to, with their role' })
  @ApiOkResponse({ schema: openApiSchema(z.array(myTeamSchema)) })
  listMine(@CurrentUser() user: User): Promise<MyTeam[]> {
    return this.teams.listMine(user.id);
  }

  @Post()
  @HttpCode(201)
  @ApiOperation({ summary: 'Create a team; the creator becomes its owner' })
  @ApiBody({ schema: openApiSchema(createTeamSchema, 'input') })
  @ApiCreatedResponse({ schema: openApiSchema(teamSchema) })
  @ApiConflictResponse({ description: 'Slug already taken' })
  create(@CurrentUser() user: User, @Body(new ZodValidationPipe(createTeamSchema)) body: CreateTeam): Promise<Team> {
    return this.teams.create(user, body);
  }

  @Get(':teamId')
  @TeamRoles('owner', 'designer', 'reviewer', 'viewer')
  @ApiOperation({ summary: 'Read one team (any member)' })
  @ApiParam({ name: 'teamId', format: 'uuid' })
  @ApiOkResponse({ schema: openApiSchema(teamSchema) })
  findOne(@Param(new ZodValidationPipe(teamParamsSchema)) params: z.output<typeof teamParamsSchema>): Promise<Team> {
    return this.teams.findOrFail(params.teamId);
  }
}
