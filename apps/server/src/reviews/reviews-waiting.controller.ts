/** GET /api/teams/:teamId/reviews/waiting: the versions waiting for the signed-in member's review. */
import { Controller, Get, Param } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiParam, ApiTags } from '@nestjs/swagger';
import { type User, type WaitingReview, waitingReviewsSchema } from '@hexloom/contracts';
import { z } from 'zod';
import { CurrentUser } from '../common/current-user.decorator.js';
import { openApiSchema } from '../common/openapi-schema.js';
import { TeamRoles } from '../common/team-roles.decorator.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import { ReviewsWaitingService } from './reviews-waiting.service.js';

const teamParams = z.object({ teamId: z.uuid() });

/** Under /teams/:teamId/reviews. */
@ApiTags('reviews')
@ApiParam({ name: 'teamId', format: 'uuid' })
@Controller('teams/:teamId/reviews')
export class ReviewsWaitingController {
  constructor(private readonly waiting: ReviewsWaitingService) {}

  @Get('waiting')
  @TeamRoles('owner', 'designer', 'reviewer', 'viewer')
  @ApiOperation({ summary: 'List the versions the signed-in member was asked to review and has not decided, oldest request first (any member)' })
  @ApiOkResponse({ schema: openApiSchema(waitingReviewsSchema) })
  list(@CurrentUser() user: User, @Param(new ZodValidationPipe(teamParams)) p: z.output<typeof teamParams>): Promise<WaitingReview[]> {
    return this.waiting.listForReviewer(p.teamId, user.id);
  }
}
