/** /api/teams/:teamId/chips routes: list, create, read, edit, export chip JSON, calibration. */
import { Body, Controller, Get, HttpCode, Param, Patch, Post, Put, Res, UploadedFile, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import {
  ApiBody, ApiConsumes, ApiCreatedResponse, ApiOkResponse, ApiOperation, ApiParam, ApiPayloadTooLargeResponse, ApiTags,
  ApiUnprocessableEntityResponse, ApiUnsupportedMediaTypeResponse,
} from '@nestjs/swagger';
import {
  type Calibration, calibrationSchema, type Chip, chipSchema, type CreateChip, createChipSchema, meshDefinitionSchema, type UpdateChip, updateChipSchema, type User,
} from '@hexloom/contracts';
import type { Response } from 'express';
import { z } from 'zod';
import { CurrentUser } from '../common/current-user.decorator.js';
import { openApiSchema } from '../common/openapi-schema.js';
import { TeamRoles } from '../common/team-roles.decorator.js';
import { MAX_UPLOAD_BYTES, type UploadedFileLike, uploadedText } from '../common/uploaded-text.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import { CalibrationService } from './calibration.service.js';
import { ChipsService } from './chips.service.js';
import { parseChipJson } from './parse-chip-json.js';

const teamParams = z.object({ teamId: z.uuid() });
const chipParams = z.object({ teamId: z.uuid(), chipId: z.uuid() });
type ChipParams = z.output<typeof chipParams>;

/** Chips of one team: members read, designers and owners change. */
@ApiTags('chips')
@ApiParam({ name: 'teamId', format: 'uuid' })
@Controller('teams/:teamId/chips')
export class ChipsController {
  constructor(
    private readonly chips: ChipsService,
    private readonly calibration: CalibrationService,
  ) {}

  @Get()
  @TeamRoles('owner', 'designer', 'reviewer', 'viewer')
  @ApiOperation({ summary: 'List the chips of the team (any member)' })
  @ApiOkResponse({ schema: openApiSchema(z.array(chipSchema)) })
  list(@Param(new ZodValidationPipe(teamParams)) params: z.output<typeof teamParams>): Promise<Chip[]> {
    return this.chips.list(params.teamId);
  }

  @Post()
  @HttpCode(201)
  @TeamRoles('owner', 'designer')
  @ApiOperation({ summary: 'Create a chip from a template size and technology, or from an uploaded chip JSON (designers, owners)' })
  @ApiBody({ schema: openApiSchema(createChipSchema, 'input') })
  @ApiCreatedResponse({ schema: openApiSchema(chipSchema) })
  @ApiUnprocessableEntityResponse({ description: 'The chip definition cannot be built' })
  create(
    @CurrentUser() user: User,
    @Param(new ZodValidationPipe(teamParams)) params: z.output<typeof teamParams>,
    @Body(new ZodValidationPipe(createChipSchema)) body: CreateChip,
  ): Promise<Chip> {
    return this.chips.create(user, params.teamId, body);
  }

  @Post('import')
  @HttpCode(201)
  @TeamRoles('owner', 'designer')
  @UseInterceptors(FileInterceptor('file', { limits: { fileSize: MAX_UPLOAD_BYTES, files: 1 } }))
  @ApiOperation({ summary: 'Create a chip from an uploaded chip JSON file (mesh definition, schema version 1) (designers, owners)' })
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', required: ['file'], properties: { file: { type: 'string', format: 'binary', description: 'chip .json' } } } })
  @ApiCreatedResponse({ schema: openApiSchema(chipSchema) })
  @ApiPayloadTooLargeResponse({ description: `File above ${MAX_UPLOAD_BYTES} bytes` })
  @ApiUnsupportedMediaTypeResponse({ description: 'Not a .json name, or not UTF-8 text' })
  @ApiUnprocessableEntityResponse({ description: 'Not JSON, not a chip definition, or a definition that cannot be built' })
  importJson(
    @CurrentUser() user: User,
    @Param(new ZodValidationPipe(teamParams)) params: z.output<typeof teamParams>,
    @UploadedFile() file: UploadedFileLike | undefined,
  ): Promise<Chip> {
    return this.chips.create(user, params.teamId, { definition: parseChipJson(uploadedText(file, [/\.json$/i])) });
  }

  @Get(':chipId')
  @TeamRoles('owner', 'designer', 'reviewer', 'viewer')
  @ApiOperation({ summary: 'Read one chip (any member)' })
  @ApiParam({ name: 'chipId', format: 'uuid' })
  @ApiOkResponse({ schema: openApiSchema(chipSchema) })
  findOne(@Param(new ZodValidationPipe(chipParams)) params: ChipParams): Promise<Chip> {
    return this.chips.findOrFail(params.teamId, params.chipId);
  }

  @Patch(':chipId')
  @TeamRoles('owner', 'designer')
  @ApiOperation({ summary: 'Edit the technology profile, port wiring, dead gates or name of a chip (designers, owners)' })
  @ApiParam({ name: 'chipId', format: 'uuid' })
  @ApiBody({ schema: openApiSchema(updateChipSchema, 'input') })
  @ApiOkResponse({ schema: openApiSchema(chipSchema) })
  update(@CurrentUser() user: User, @Param(new ZodValidationPipe(chipParams)) params: ChipParams, @Body(new ZodValidationPipe(updateChipSchema)) body: UpdateChip): Promise<Chip> {
    return this.chips.update(user, params.teamId, params.chipId, body);
  }

  @Get(':chipId/export')
  @TeamRoles('owner', 'designer', 'reviewer', 'viewer')
  @ApiOperation({ summary: 'Download the chip JSON (mesh definition file, schema version 1) (any member)' })
  @ApiParam({ name: 'chipId', format: 'uuid' })
  @ApiOkResponse({ schema: openApiSchema(meshDefinitionSchema) })
  async exportJson(@Param(new ZodValidationPipe(chipParams)) params: ChipParams, @Res() res: Response): Promise<void> {
    const chip = await this.chips.findOrFail(params.teamId, params.chipId);
    res.attachment(`${chip.name.replace(/[^A-Za-z0-9_-]+/g, '-')}.chip.json`).type('application/json').send(`${JSON.stringify(chip.definition, null, 2)}\n`);
  }

  @Get(':chipId/calibration')
  @TeamRoles('owner', 'designer', 'reviewer', 'viewer')
  @ApiOperation({ summary: 'Read the current calibration of a chip (any member); 404 when none was uploaded' })
  @ApiParam({ name: 'chipId', format: 'uuid' })
  @ApiOkResponse({ schema: openApiSchema(calibrationSchema) })
  getCalibration(@Param(new ZodValidationPipe(chipParams)) params: ChipParams): Promise<Calibration> {
    return this.calibration.currentOrFail(params.teamId, params.chipId);
  }

  @Put(':chipId/calibration')
  @TeamRoles('owner', 'designer')
  @UseInterceptors(FileInterceptor('file', { limits: { fileSize: MAX_UPLOAD_BYTES, files: 1 } }))
  @ApiOperation({ summary: 'Upload a calibration CSV (one row per phase shifter); 422 lists each bad line and stores nothing (designers, owners)' })
  @ApiParam({ name: 'chipId', format: 'uuid' })
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', required: ['file'], properties: { file: { type: 'string', format: 'binary', description: 'calibration .csv' } } } })
  @ApiOkResponse({ schema: openApiSchema(calibrationSchema) })
  @ApiPayloadTooLargeResponse({ description: `File above ${MAX_UPLOAD_BYTES} bytes` })
  @ApiUnsupportedMediaTypeResponse({ description: 'Not a .csv name, or not UTF-8 text' })
  @ApiUnprocessableEntityResponse({ description: 'Bad rows (line and reason for each)' })
  uploadCalibration(
    @CurrentUser() user: User,
    @Param(new ZodValidationPipe(chipParams)) params: ChipParams,
    @UploadedFile() file: UploadedFileLike | undefined,
  ): Promise<Calibration> {
    return this.calibration.upload(user, params.teamId, params.chipId, uploadedText(file, [/\.csv$/i]));
  }
}
