/** GET /api/me: the signed-in user and their teams. */
import { Controller, Get } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiTags, ApiUnauthorizedResponse } from '@nestjs/swagger';
import { type Me, meSchema, type User } from '@hexloom/contracts';
import { CurrentUser } from '../common/current-user.decorator.js';
import { openApiSchema } from '../common/openapi-schema.js';
import { TeamsService } from '../teams/teams.service.js';

/** Who am I; 401 when not signed in. */
@ApiTags('auth')
@Controller('me')
export class MeController {
  constructor(private readonly teams: TeamsService) {}

  @Get()
  @ApiOperation({ summary: 'The signed-in user and the teams they belong to' })
  @ApiOkResponse({ schema: openApiSchema(meSchema) })
  @ApiUnauthorizedResponse({ description: 'Not signed in' })
  async me(@CurrentUser() user: User): Promise<Me> {
    return { user, teams: await this.teams.listMine(user.id) };
  }
}
