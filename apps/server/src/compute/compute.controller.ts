/** Compute routes of one version: simulate (cached), mask check, synthesise, circuits, Monte Carlo yield jobs. */
import { SkipThrottle } from '@nestjs/throttler';
import { SIGN_IN_THROTTLER, UserOrAddressThrottlerGuard } from '../common/rate-limit.js';
import { Body, Controller, Delete, Get, HttpCode, Param, Post, Res, Sse, type MessageEvent, UseGuards } from '@nestjs/common';
import { ApiAcceptedResponse, ApiBody, ApiOkResponse, ApiOperation, ApiParam, ApiProduces, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import {
  type MaskCheckAnswer, maskCheckAnswerSchema, type MaskCheckBody, maskCheckBodySchema, type PlaceCircuitBody, placeCircuitBodySchema, type Proposal, proposalSchema,
  type RerouteCircuitBody, rerouteCircuitBodySchema, type SimulateBody, simulateBodySchema, spectrumFileSchema, type StartYieldJob, startYieldJobSchema,
  type SynthesiseBody, synthesiseBodySchema, type User, type YieldJob, yieldJobSchema, versionNumberParamSchema } from '@hexloom/contracts';
import type { Response } from 'express';
import { map, type Observable } from 'rxjs';
import { z } from 'zod';
import { CurrentUser } from '../common/current-user.decorator.js';
import { openApiSchema } from '../common/openapi-schema.js';
import { TeamRoles } from '../common/team-roles.decorator.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import { ConfigurationsService } from '../configurations/configurations.service.js';
import { EditService } from './edit.service.js';
import { SimulationService } from './simulation.service.js';
import { YieldJobsService } from './yield-jobs.service.js';

const versionParams = z.object({ teamId: z.uuid(), configurationId: z.uuid(), number: versionNumberParamSchema });
const circuitParams = versionParams.extend({ circuitId: z.string().regex(/^[A-Za-z][A-Za-z0-9_-]{0,63}$/) });
const jobParams = versionParams.extend({ jobId: z.uuid() });
type VersionParams = z.output<typeof versionParams>;
type JobParams = z.output<typeof jobParams>;

/** Under /teams/:teamId/configurations/:configurationId/versions/:number. */
@ApiTags('compute')
@ApiParam({ name: 'teamId', format: 'uuid' })
@ApiParam({ name: 'configurationId', format: 'uuid' })
@ApiParam({ name: 'number', schema: { type: 'integer', minimum: 1 } })
@UseGuards(UserOrAddressThrottlerGuard)
@SkipThrottle({ [SIGN_IN_THROTTLER]: true })
@Controller('teams/:teamId/configurations/:configurationId/versions/:number')
export class ComputeController {
  constructor(
    private readonly configurations: ConfigurationsService,
    private readonly simulation: SimulationService,
    private readonly edits: EditService,
    private readonly jobs: YieldJobsService,
  ) {}

  @Post('simulate')
  @HttpCode(200)
  @TeamRoles('owner', 'designer', 'reviewer', 'viewer')
  @ApiOperation({ summary: 'Simulate the whole chip from one port to another on a grid; cached by content hash (header X-Hexloom-Cache: hit|miss) (any member)' })
  @ApiBody({ schema: openApiSchema(simulateBodySchema, 'input') })
  @ApiOkResponse({ schema: openApiSchema(spectrumFileSchema) })
  async simulate(@Param(new ZodValidationPipe(versionParams)) p: VersionParams, @Body(new ZodValidationPipe(simulateBodySchema)) body: SimulateBody, @Res({ passthrough: true }) res: Response) {
    const ref = await this.configurations.findVersionOrFail(p.teamId, p.configurationId, p.number);
    const answer = await this.simulation.simulate(p.teamId, ref.version.content, body);
    res.setHeader('X-Hexloom-Cache', answer.cached ? 'hit' : 'miss');
    res.setHeader('ETag', `"${answer.hash}"`);
    return answer.spectrum;
  }

  @Post('mask-check')
  @HttpCode(200)
  @TeamRoles('owner', 'designer', 'reviewer', 'viewer')
  @ApiOperation({ summary: 'Check the simulated response between two ports against a mask, with the quoted figures (any member)' })
  @ApiBody({ schema: openApiSchema(maskCheckBodySchema, 'input') })
  @ApiOkResponse({ schema: openApiSchema(maskCheckAnswerSchema) })
  async maskCheck(@Param(new ZodValidationPipe(versionParams)) p: VersionParams, @Body(new ZodValidationPipe(maskCheckBodySchema)) body: MaskCheckBody): Promise<MaskCheckAnswer> {
    const ref = await this.configurations.findVersionOrFail(p.teamId, p.configurationId, p.number);
    return this.simulation.maskCheck(ref.version.content, body);
  }

  @Post('synthesise')
  @HttpCode(200)
  @TeamRoles('owner', 'designer')
  @ApiOperation({ summary: 'Synthesise a specification onto the free part of the chip; answers a proposal to save, or why it is impossible (designers, owners)' })
  @ApiBody({ schema: openApiSchema(synthesiseBodySchema, 'input') })
  @ApiOkResponse({ schema: openApiSchema(proposalSchema) })
  async synthesise(@Param(new ZodValidationPipe(versionParams)) p: VersionParams, @Body(new ZodValidationPipe(synthesiseBodySchema)) body: SynthesiseBody): Promise<Proposal> {
    const ref = await this.configurations.findVersionOrFail(p.teamId, p.configurationId, p.number);
    return this.edits.synthesise(ref.version, ref.chip, body);
  }

  @Post('circuits')
  @HttpCode(200)
  @TeamRoles('owner', 'designer')
  @ApiOperation({ summary: 'Place a circuit from a route request; answers a proposal to save, or why it cannot be routed (designers, owners)' })
  @ApiBody({ schema: openApiSchema(placeCircuitBodySchema, 'input') })
  @ApiOkResponse({ schema: openApiSchema(proposalSchema) })
  async place(@Param(new ZodValidationPipe(versionParams)) p: VersionParams, @Body(new ZodValidationPipe(placeCircuitBodySchema)) body: PlaceCircuitBody): Promise<Proposal> {
    const ref = await this.configurations.findVersionOrFail(p.teamId, p.configurationId, p.number);
    return this.edits.place(ref.version, ref.chip, body.request);
  }

  @Post('circuits/:circuitId/remove')
  @HttpCode(200)
  @TeamRoles('owner', 'designer')
  @ApiOperation({ summary: 'Propose the version without a circuit (its gates parked again) (designers, owners)' })
  @ApiParam({ name: 'circuitId' })
  @ApiOkResponse({ schema: openApiSchema(proposalSchema) })
  @ApiUnprocessableEntityResponse({ description: 'No such circuit' })
  async remove(@Param(new ZodValidationPipe(circuitParams)) p: z.output<typeof circuitParams>): Promise<Proposal> {
    const ref = await this.configurations.findVersionOrFail(p.teamId, p.configurationId, p.number);
    return this.edits.remove(ref.version, ref.chip, p.circuitId);
  }

  @Post('circuits/:circuitId/reroute')
  @HttpCode(200)
  @TeamRoles('owner', 'designer')
  @ApiOperation({ summary: 'Re-route a circuit from a new request, or re-synthesise it from its saved spec (designers, owners)' })
  @ApiParam({ name: 'circuitId' })
  @ApiBody({ schema: openApiSchema(rerouteCircuitBodySchema, 'input') })
  @ApiOkResponse({ schema: openApiSchema(proposalSchema) })
  async reroute(@Param(new ZodValidationPipe(circuitParams)) p: z.output<typeof circuitParams>, @Body(new ZodValidationPipe(rerouteCircuitBodySchema)) body: RerouteCircuitBody): Promise<Proposal> {
    const ref = await this.configurations.findVersionOrFail(p.teamId, p.configurationId, p.number);
    return this.edits.reroute(ref.version, ref.chip, p.circuitId, body.request);
  }

  @Post('yield-jobs')
  @HttpCode(202)
  @TeamRoles('owner', 'designer', 'reviewer')
  @ApiOperation({ summary: 'Start a Monte Carlo yield study in worker threads; poll it or follow its events (owners, designers, reviewers)' })
  @ApiBody({ schema: openApiSchema(startYieldJobSchema, 'input') })
  @ApiAcceptedResponse({ schema: openApiSchema(yieldJobSchema) })
  start(@CurrentUser() user: User, @Param(new ZodValidationPipe(versionParams)) p: VersionParams, @Body(new ZodValidationPipe(startYieldJobSchema)) body: StartYieldJob): Promise<YieldJob> {
    return this.jobs.start(user, p.teamId, p.configurationId, p.number, body);
  }

  @Get('yield-jobs/:jobId')
  @TeamRoles('owner', 'designer', 'reviewer', 'viewer')
  @ApiOperation({ summary: 'Read a yield job: status, runs done, summary when done (any member)' })
  @ApiParam({ name: 'jobId', format: 'uuid' })
  @ApiOkResponse({ schema: openApiSchema(yieldJobSchema) })
  job(@Param(new ZodValidationPipe(jobParams)) p: JobParams): Promise<YieldJob> {
    return this.jobs.get(p.teamId, p.configurationId, p.number, p.jobId);
  }

  @Sse('yield-jobs/:jobId/events')
  @TeamRoles('owner', 'designer', 'reviewer', 'viewer')
  @ApiOperation({ summary: 'Server-sent `progress` events of a yield job (the job JSON), pushed as it makes progress, until it is done, cancelled, failed or interrupted; at most 4 open streams per user (any member)' })
  @ApiParam({ name: 'jobId', format: 'uuid' })
  @ApiProduces('text/event-stream')
  @ApiOkResponse({ description: 'text/event-stream of `progress` events whose data is the job', schema: openApiSchema(yieldJobSchema) })
  async events(@CurrentUser() user: User, @Param(new ZodValidationPipe(jobParams)) p: JobParams): Promise<Observable<MessageEvent>> {
    const updates = await this.jobs.follow(user.id, p.teamId, p.configurationId, p.number, p.jobId);
    return updates.pipe(map((job): MessageEvent => ({ type: 'progress', data: job })));
  }

  @Delete('yield-jobs/:jobId')
  @HttpCode(200)
  @TeamRoles('owner', 'designer', 'reviewer')
  @ApiOperation({ summary: 'Cancel a running yield job (owners, designers, reviewers)' })
  @ApiParam({ name: 'jobId', format: 'uuid' })
  @ApiOkResponse({ schema: openApiSchema(yieldJobSchema) })
  cancel(@CurrentUser() user: User, @Param(new ZodValidationPipe(jobParams)) p: JobParams): Promise<YieldJob> {
    return this.jobs.cancel(user, p.teamId, p.configurationId, p.number, p.jobId);
  }
}
