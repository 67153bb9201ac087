/** Bench export routes of one version: drive values (JSON or CSV) and Touchstone of the simulated S-parameters. */
import { Controller, Get, Param, Query, Res } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiParam, ApiProduces, ApiQuery, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import { benchExportQuerySchema, benchExportSchema, driveLimitErrorSchema, touchstoneQuerySchema, versionNumberParamSchema } from '@hexloom/contracts';
import type { Response } from 'express';
import { z } from 'zod';
import { openApiSchema } from '../common/openapi-schema.js';
import { TeamRoles } from '../common/team-roles.decorator.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import { BenchExportService, type ExportFile } from './bench-export.service.js';

const versionParams = z.object({ teamId: z.uuid(), configurationId: z.uuid(), number: versionNumberParamSchema });
type VersionParams = z.output<typeof versionParams>;

const sendFile = (res: Response, file: ExportFile): void => {
  res.attachment(file.fileName).type(file.mediaType).send(file.text);
};

/** Any member may export; every export carries the cautions and the approval mark. */
@ApiTags('bench')
@ApiParam({ name: 'teamId', format: 'uuid' })
@ApiParam({ name: 'configurationId', format: 'uuid' })
@ApiParam({ name: 'number', schema: { type: 'integer', minimum: 1 } })
@Controller('teams/:teamId/configurations/:configurationId/versions/:number')
@TeamRoles('owner', 'designer', 'reviewer', 'viewer')
export class BenchExportController {
  constructor(private readonly bench: BenchExportService) {}

  @Get('bench-export')
  @ApiOperation({ summary: 'Bench export: gate states, drive values per phase shifter, total power, checksum; JSON or CSV (any member)' })
  @ApiQuery({ name: 'format', required: false, schema: { type: 'string', enum: ['json', 'csv'], default: 'json' } })
  @ApiProduces('application/json', 'text/csv')
  @ApiOkResponse({ schema: openApiSchema(benchExportSchema) })
  @ApiUnprocessableEntityResponse({ description: 'A drive value exceeds its limit (each shifter listed)', schema: openApiSchema(driveLimitErrorSchema) })
  async benchExport(@Param(new ZodValidationPipe(versionParams)) p: VersionParams, @Query(new ZodValidationPipe(benchExportQuerySchema)) q: z.output<typeof benchExportQuerySchema>, @Res() res: Response): Promise<void> {
    if (q.format === 'csv') {
      sendFile(res, await this.bench.benchExportCsv(p.teamId, p.configurationId, p.number));
      return;
    }
    const exported = await this.bench.benchExport(p.teamId, p.configurationId, p.number);
    sendFile(res, { fileName: `${exported.configuration.replace(/[^A-Za-z0-9_-]+/g, '-')}-v${p.number}.bench.json`, mediaType: 'application/json', text: `${JSON.stringify(exported, null, 2)}\n` });
  }

  @Get('touchstone')
  @ApiOperation({ summary: 'Touchstone (.sNp) of the simulated S-parameters between the given ports on a span of offsets (any member)' })
  @ApiQuery({ name: 'ports', description: 'port ids or labels; repeat the parameter or separate with ; (port ids hold commas)' })
  @ApiQuery({ name: 'startOffsetHz', schema: { type: 'number' } })
  @ApiQuery({ name: 'stopOffsetHz', schema: { type: 'number' } })
  @ApiQuery({ name: 'points', schema: { type: 'integer', minimum: 2, maximum: 20001 } })
  @ApiProduces('text/plain')
  @ApiOkResponse({ description: 'Touchstone 1.1 text, RI format, GHz, 50 ohm' })
  async touchstone(@Param(new ZodValidationPipe(versionParams)) p: VersionParams, @Query(new ZodValidationPipe(touchstoneQuerySchema)) q: z.output<typeof touchstoneQuerySchema>, @Res() res: Response): Promise<void> {
    sendFile(res, await this.bench.touchstone(p.teamId, p.configurationId, p.number, q));
  }
}
