/** GET /api/health: liveness with a database round trip. */
import { Controller, Get, Inject } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { HEXLOOM_VERSION, type Health, healthSchema } from '@hexloom/contracts';
import { sql } from 'drizzle-orm';
import { openApiSchema } from '../common/openapi-schema.js';
import { Public } from '../common/public.decorator.js';
import { DATABASE, type Database } from '../db/database.js';

/** Public health answer. */
@ApiTags('health')
@Controller('health')
export class HealthController {
  private readonly startedAtMs = Date.now();

  constructor(@Inject(DATABASE) private readonly db: Database) {}

  @Get()
  @Public()
  @ApiOperation({ summary: 'Server and database health' })
  @ApiOkResponse({ schema: openApiSchema(healthSchema) })
  async check(): Promise<Health> {
    await this.db.execute(sql`select 1`);
    return { status: 'ok', version: HEXLOOM_VERSION, database: 'ok', uptimeS: (Date.now() - this.startedAtMs) / 1000 };
  }
}
