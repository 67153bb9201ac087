/** Review and comment routes of one version. */
import { Body, Controller, Get, HttpCode, Param, Patch, Post } from '@nestjs/common';
import { ApiBody, ApiCreatedResponse, ApiNotFoundResponse, ApiOkResponse, ApiOperation, ApiParam, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import {
  type Comment, commentSchema, type CreateComment, createCommentSchema, type RequestReview, requestReviewSchema, type Review, type ReviewDecision, reviewDecisionSchema, reviewSchema, type UpdateComment, updateCommentSchema, type User, versionNumberParamSchema } from '@hexloom/contracts';
import { z } from 'zod';
import { CurrentUser } from '../common/current-user.decorator.js';
import { openApiSchema } from '../common/openapi-schema.js';
import { TeamRoles } from '../common/team-roles.decorator.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import { CommentsService } from './comments.service.js';
import { ReviewsService } from './reviews.service.js';

const versionParams = z.object({ teamId: z.uuid(), configurationId: z.uuid(), number: versionNumberParamSchema });
type VersionParams = z.output<typeof versionParams>;
const commentParams = versionParams.extend({ commentId: z.uuid() });
type CommentParams = z.output<typeof commentParams>;

/** Under /teams/:teamId/configurations/:configurationId/versions/:number. */
@ApiTags('reviews')
@ApiParam({ name: 'teamId', format: 'uuid' })
@ApiParam({ name: 'configurationId', format: 'uuid' })
@ApiParam({ name: 'number', schema: { type: 'integer', minimum: 1 } })
@Controller('teams/:teamId/configurations/:configurationId/versions/:number')
export class ReviewsController {
  constructor(
    private readonly reviews: ReviewsService,
    private readonly comments: CommentsService,
  ) {}

  @Get('reviews')
  @TeamRoles('owner', 'designer', 'reviewer', 'viewer')
  @ApiOperation({ summary: 'List the review requests and decisions of a version (any member)' })
  @ApiOkResponse({ schema: openApiSchema(z.array(reviewSchema)) })
  list(@Param(new ZodValidationPipe(versionParams)) p: VersionParams): Promise<Review[]> {
    return this.reviews.list(p.teamId, p.configurationId, p.number);
  }

  @Post('reviews')
  @HttpCode(201)
  @TeamRoles('owner', 'designer')
  @ApiOperation({ summary: 'Request a review of a version from named reviewers (not its author); mails them (designers, owners)' })
  @ApiBody({ schema: openApiSchema(requestReviewSchema, 'input') })
  @ApiCreatedResponse({ schema: openApiSchema(z.array(reviewSchema)) })
  @ApiUnprocessableEntityResponse({ description: 'A reviewer is not a member, is a viewer, or is the author' })
  request(@CurrentUser() user: User, @Param(new ZodValidationPipe(versionParams)) p: VersionParams, @Body(new ZodValidationPipe(requestReviewSchema)) body: RequestReview): Promise<Review[]> {
    return this.reviews.request(user, p.teamId, p.configurationId, p.number, body);
  }

  @Post('decision')
  @HttpCode(200)
  @TeamRoles('owner', 'designer', 'reviewer')
  @ApiOperation({ summary: 'Approve or request changes, as a named reviewer of this exact version (never its author); mails the author' })
  @ApiBody({ schema: openApiSchema(reviewDecisionSchema, 'input') })
  @ApiOkResponse({ schema: openApiSchema(z.array(reviewSchema)) })
  decide(@CurrentUser() user: User, @Param(new ZodValidationPipe(versionParams)) p: VersionParams, @Body(new ZodValidationPipe(reviewDecisionSchema)) body: ReviewDecision): Promise<Review[]> {
    return this.reviews.decide(user, p.teamId, p.configurationId, p.number, body);
  }

  @Get('comments')
  @TeamRoles('owner', 'designer', 'reviewer', 'viewer')
  @ApiOperation({ summary: 'List the comments of a version, oldest first (any member)' })
  @ApiOkResponse({ schema: openApiSchema(z.array(commentSchema)) })
  listComments(@Param(new ZodValidationPipe(versionParams)) p: VersionParams): Promise<Comment[]> {
    return this.comments.list(p.teamId, p.configurationId, p.number);
  }

  @Post('comments')
  @HttpCode(201)
  @TeamRoles('owner', 'designer', 'reviewer')
  @ApiOperation({ summary: 'Comment on a version, optionally replying or anchored to a gate or frequency range; @login mails that member' })
  @ApiBody({ schema: openApiSchema(createCommentSchema, 'input') })
  @ApiCreatedResponse({ schema: openApiSchema(commentSchema) })
  comment(@CurrentUser() user: User, @Param(new ZodValidationPipe(versionParams)) p: VersionParams, @Body(new ZodValidationPipe(createCommentSchema)) body: CreateComment): Promise<Comment> {
    return this.comments.create(user, p.teamId, p.configurationId, p.number, body);
  }

  @Patch('comments/:commentId')
  @HttpCode(200)
  @TeamRoles('owner', 'designer', 'reviewer')
  @ApiParam({ name: 'commentId', format: 'uuid' })
  @ApiOperation({ summary: 'Resolve or reopen the thread a comment starts (owners, designers, reviewers)' })
  @ApiBody({ schema: openApiSchema(updateCommentSchema, 'input') })
  @ApiOkResponse({ schema: openApiSchema(commentSchema) })
  @ApiNotFoundResponse({ description: 'No such comment on this version' })
  @ApiUnprocessableEntityResponse({ description: 'The comment is a reply; resolve the first comment of its thread' })
  updateComment(@CurrentUser() user: User, @Param(new ZodValidationPipe(commentParams)) p: CommentParams, @Body(new ZodValidationPipe(updateCommentSchema)) body: UpdateComment): Promise<Comment> {
    return this.comments.update(user, p.teamId, p.configurationId, p.number, p.commentId, body);
  }
}
