/** The review requests of one member across a team that still wait for their decision. */
import { Inject, Injectable } from '@nestjs/common';
import type { WaitingReview } from '@hexloom/contracts';
import { and, asc, eq, isNull } from 'drizzle-orm';
import { DATABASE, type Database } from '../db/database.js';
import { loginMap } from '../db/login-map.js';
import { chips, configurations, configurationVersions, reviews } from '../db/schema/index.js';

/** Reads undecided reviews; the membership itself is checked by the route's team-role guard. */
@Injectable()
export class ReviewsWaitingService {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  /** Versions of the team's configurations that `userId` was asked to review and has not decided, oldest request first. */
  async listForReviewer(teamId: string, userId: string): Promise<WaitingReview[]> {
    const rows = await this.db
      .select({
        reviewId: reviews.id,
        configurationId: configurations.id,
        configurationName: configurations.name,
        chipId: chips.id,
        chipName: chips.name,
        versionNumber: configurationVersions.number,
        versionStatus: configurationVersions.status,
        authorId: configurationVersions.authorId,
        requestedById: reviews.requestedBy,
        requestedAt: reviews.requestedAt,
      })
      .from(reviews)
      .innerJoin(configurationVersions, eq(configurationVersions.id, reviews.versionId))
      .innerJoin(configurations, eq(configurations.id, configurationVersions.configurationId))
      .innerJoin(chips, eq(chips.id, configurations.chipId))
      .where(and(eq(reviews.reviewerId, userId), isNull(reviews.decision), eq(configurations.teamId, teamId)))
      .orderBy(asc(reviews.requestedAt), asc(reviews.id));
    const logins = await loginMap(this.db, rows.flatMap((r) => [r.authorId, r.requestedById]));
    return rows.map(({ authorId, requestedById, requestedAt, ...row }) => ({
      ...row,
      author: logins.get(authorId) ?? '',
      requestedBy: logins.get(requestedById) ?? '',
      requestedAt: requestedAt.toISOString(),
    }));
  }
}
