/** Configuration routes: list/create per chip, read, versions (save with 409 on a stale base), duplicate, diff. */
import { Body, Controller, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import { ApiBody, ApiConflictResponse, ApiCreatedResponse, ApiOkResponse, ApiOperation, ApiParam, ApiQuery, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import {
  type ConfigurationDetail, configurationDetailSchema, type ConfigurationSummary, configurationSummarySchema, type ConfigurationVersion, configurationVersionSchema,
  type CreateConfiguration, createConfigurationSchema, type DiffQuery, diffQuerySchema, type DuplicateConfiguration, duplicateConfigurationSchema,
  type SaveVersion, saveVersionSchema, staleVersionErrorSchema, type User, type VersionDiff, versionDiffSchema, versionNumberParamSchema } from '@hexloom/contracts';
import { z } from 'zod';
import { CurrentUser } from '../common/current-user.decorator.js';
import { openApiSchema } from '../common/openapi-schema.js';
import { TeamRoles } from '../common/team-roles.decorator.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import { ConfigurationsService } from './configurations.service.js';

const chipParams = z.object({ teamId: z.uuid(), chipId: z.uuid() });
const configurationParams = z.object({ teamId: z.uuid(), configurationId: z.uuid() });
const versionParams = configurationParams.extend({ number: versionNumberParamSchema });
type ConfigurationParams = z.output<typeof configurationParams>;

/** Members read; designers and owners create and save. */
@ApiTags('configurations')
@ApiParam({ name: 'teamId', format: 'uuid' })
@Controller('teams/:teamId')
export class ConfigurationsController {
  constructor(private readonly configurations: ConfigurationsService) {}

  @Get('chips/:chipId/configurations')
  @TeamRoles('owner', 'designer', 'reviewer', 'viewer')
  @ApiOperation({ summary: 'List the configurations of a chip with their newest version and its status (any member)' })
  @ApiParam({ name: 'chipId', format: 'uuid' })
  @ApiOkResponse({ schema: openApiSchema(z.array(configurationSummarySchema)) })
  list(@Param(new ZodValidationPipe(chipParams)) params: z.output<typeof chipParams>): Promise<ConfigurationSummary[]> {
    return this.configurations.list(params.teamId, params.chipId);
  }

  @Post('chips/:chipId/configurations')
  @HttpCode(201)
  @TeamRoles('owner', 'designer')
  @ApiOperation({ summary: 'Create a named configuration of a chip; its version 1 is the given content or every gate parked (designers, owners)' })
  @ApiParam({ name: 'chipId', format: 'uuid' })
  @ApiBody({ schema: openApiSchema(createConfigurationSchema, 'input') })
  @ApiCreatedResponse({ schema: openApiSchema(configurationDetailSchema) })
  @ApiUnprocessableEntityResponse({ description: 'The content breaks the mesh rules' })
  create(
    @CurrentUser() user: User,
    @Param(new ZodValidationPipe(chipParams)) params: z.output<typeof chipParams>,
    @Body(new ZodValidationPipe(createConfigurationSchema)) body: CreateConfiguration,
  ): Promise<ConfigurationDetail> {
    return this.configurations.create(user, params.teamId, params.chipId, body);
  }

  @Get('configurations/:configurationId')
  @TeamRoles('owner', 'designer', 'reviewer', 'viewer')
  @ApiOperation({ summary: 'Read a configuration and the list of its versions, newest first (any member)' })
  @ApiParam({ name: 'configurationId', format: 'uuid' })
  @ApiOkResponse({ schema: openApiSchema(configurationDetailSchema) })
  detail(@Param(new ZodValidationPipe(configurationParams)) params: ConfigurationParams): Promise<ConfigurationDetail> {
    return this.configurations.detail(params.teamId, params.configurationId);
  }

  @Get('configurations/:configurationId/versions/:number')
  @TeamRoles('owner', 'designer', 'reviewer', 'viewer')
  @ApiOperation({ summary: 'Read one version: content, specs, figures and review status (any member)' })
  @ApiParam({ name: 'configurationId', format: 'uuid' })
  @ApiParam({ name: 'number', schema: { type: 'integer', minimum: 1 } })
  @ApiOkResponse({ schema: openApiSchema(configurationVersionSchema) })
  version(@Param(new ZodValidationPipe(versionParams)) params: z.output<typeof versionParams>): Promise<ConfigurationVersion> {
    return this.configurations.version(params.teamId, params.configurationId, params.number);
  }

  @Post('configurations/:configurationId/versions')
  @HttpCode(201)
  @TeamRoles('owner', 'designer')
  @ApiOperation({ summary: 'Save a new immutable version based on baseVersion; 409 with the newer version when the base is stale (designers, owners)' })
  @ApiParam({ name: 'configurationId', format: 'uuid' })
  @ApiBody({ schema: openApiSchema(saveVersionSchema, 'input') })
  @ApiCreatedResponse({ schema: openApiSchema(configurationVersionSchema) })
  @ApiConflictResponse({ description: 'Stale base version', schema: openApiSchema(staleVersionErrorSchema) })
  @ApiUnprocessableEntityResponse({ description: 'The content breaks the mesh rules' })
  save(@CurrentUser() user: User, @Param(new ZodValidationPipe(configurationParams)) params: ConfigurationParams, @Body(new ZodValidationPipe(saveVersionSchema)) body: SaveVersion): Promise<ConfigurationVersion> {
    return this.configurations.save(user, params.teamId, params.configurationId, body);
  }

  @Post('configurations/:configurationId/duplicate')
  @HttpCode(201)
  @TeamRoles('owner', 'designer')
  @ApiOperation({ summary: 'Copy a version (default the newest) into a new configuration of the same chip (designers, owners)' })
  @ApiParam({ name: 'configurationId', format: 'uuid' })
  @ApiBody({ schema: openApiSchema(duplicateConfigurationSchema, 'input') })
  @ApiCreatedResponse({ schema: openApiSchema(configurationDetailSchema) })
  duplicate(
    @CurrentUser() user: User,
    @Param(new ZodValidationPipe(configurationParams)) params: ConfigurationParams,
    @Body(new ZodValidationPipe(duplicateConfigurationSchema)) body: DuplicateConfiguration,
  ): Promise<ConfigurationDetail> {
    return this.configurations.duplicate(user, params.teamId, params.configurationId, body);
  }

  @Get('configurations/:configurationId/diff')
  @TeamRoles('owner', 'designer', 'reviewer', 'viewer')
  @ApiOperation({ summary: 'Diff two versions: gates changed, circuits added, removed or changed, figure changes (any member)' })
  @ApiParam({ name: 'configurationId', format: 'uuid' })
  @ApiQuery({ name: 'from', schema: { type: 'integer', minimum: 1 } })
  @ApiQuery({ name: 'to', schema: { type: 'integer', minimum: 1 } })
  @ApiOkResponse({ schema: openApiSchema(versionDiffSchema) })
  diff(@Param(new ZodValidationPipe(configurationParams)) params: ConfigurationParams, @Query(new ZodValidationPipe(diffQuerySchema)) query: DiffQuery): Promise<VersionDiff> {
    return this.configurations.diff(params.teamId, params.configurationId, query.from, query.to);
  }
}
