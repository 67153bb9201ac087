/** Measured-spectrum routes of one version: upload (CSV or Touchstone), list, compare with the simulation. */
import { Body, Controller, Get, HttpCode, Param, Post, UploadedFile, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import {
  ApiBody, ApiConsumes, ApiCreatedResponse, ApiOkResponse, ApiOperation, ApiParam, ApiPayloadTooLargeResponse, ApiTags, ApiUnprocessableEntityResponse, ApiUnsupportedMediaTypeResponse,
} from '@nestjs/swagger';
import { type Comparison, comparisonSchema, type Measurement, measurementSchema, type MeasurementUploadFields, measurementUploadFieldsSchema, type User, versionNumberParamSchema } from '@hexloom/contracts';
import { z } from 'zod';
import { CurrentUser } from '../common/current-user.decorator.js';
import { openApiSchema } from '../common/openapi-schema.js';
import { TeamRoles } from '../common/team-roles.decorator.js';
import { MAX_UPLOAD_BYTES, type UploadedFileLike, uploadedText } from '../common/uploaded-text.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import { MeasurementsService } from './measurements.service.js';

const versionParams = z.object({ teamId: z.uuid(), configurationId: z.uuid(), number: versionNumberParamSchema });
const measurementParams = versionParams.extend({ measurementId: z.uuid() });
type VersionParams = z.output<typeof versionParams>;

/** Accepted names: spectrum CSV and Touchstone .sNp. */
const MEASUREMENT_NAMES = [/\.csv$/i, /\.s\d{1,2}p$/i];

/** Under /teams/:teamId/configurations/:configurationId/versions/:number/measurements. */
@ApiTags('measurements')
@ApiParam({ name: 'teamId', format: 'uuid' })
@ApiParam({ name: 'configurationId', format: 'uuid' })
@ApiParam({ name: 'number', schema: { type: 'integer', minimum: 1 } })
@Controller('teams/:teamId/configurations/:configurationId/versions/:number/measurements')
export class MeasurementsController {
  constructor(private readonly measurements: MeasurementsService) {}

  @Get()
  @TeamRoles('owner', 'designer', 'reviewer', 'viewer')
  @ApiOperation({ summary: 'List the measured spectra attached to a version (any member)' })
  @ApiOkResponse({ schema: openApiSchema(z.array(measurementSchema)) })
  list(@Param(new ZodValidationPipe(versionParams)) p: VersionParams): Promise<Measurement[]> {
    return this.measurements.list(p.teamId, p.configurationId, p.number);
  }

  @Post()
  @HttpCode(201)
  @TeamRoles('owner', 'designer', 'reviewer')
  @UseInterceptors(FileInterceptor('file', { limits: { fileSize: MAX_UPLOAD_BYTES, files: 1, fields: 10 } }))
  @ApiOperation({ summary: 'Attach a measured spectrum (CSV or Touchstone .sNp) of the connection from -> to; 413/415/422 on bad files (owners, designers, reviewers)' })
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file', 'from', 'to'],
      properties: { file: { type: 'string', format: 'binary' }, from: { type: 'string' }, to: { type: 'string' }, label: { type: 'string' } },
    },
  })
  @ApiCreatedResponse({ schema: openApiSchema(measurementSchema) })
  @ApiPayloadTooLargeResponse({ description: `File above ${MAX_UPLOAD_BYTES} bytes` })
  @ApiUnsupportedMediaTypeResponse({ description: 'Not a .csv or .sNp name, or not UTF-8 text' })
  @ApiUnprocessableEntityResponse({ description: 'Unreadable data (line and reason) or values out of range' })
  upload(
    @CurrentUser() user: User,
    @Param(new ZodValidationPipe(versionParams)) p: VersionParams,
    @Body(new ZodValidationPipe(measurementUploadFieldsSchema)) fields: MeasurementUploadFields,
    @UploadedFile() file: UploadedFileLike | undefined,
  ): Promise<Measurement> {
    return this.measurements.upload(user, p.teamId, p.configurationId, p.number, fields, uploadedText(file, MEASUREMENT_NAMES));
  }

  @Get(':measurementId/comparison')
  @TeamRoles('owner', 'designer', 'reviewer', 'viewer')
  @ApiOperation({ summary: 'Simulated versus measured power on the measured grid, with residual figures (any member)' })
  @ApiParam({ name: 'measurementId', format: 'uuid' })
  @ApiOkResponse({ schema: openApiSchema(comparisonSchema) })
  compare(@Param(new ZodValidationPipe(measurementParams)) p: z.output<typeof measurementParams>): Promise<Comparison> {
    return this.measurements.compare(p.teamId, p.configurationId, p.number, p.measurementId);
  }
}
