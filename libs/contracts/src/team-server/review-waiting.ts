/** Reviews waiting for the signed-in member across a team: the versions they were asked to review and have not decided. */
import { z } from 'zod';
import { versionStatusSchema } from './configuration-version.js';

/** One undecided review request of the signed-in member. */
export const waitingReviewSchema = z.object({
  reviewId: z.uuid(),
  configurationId: z.uuid(),
  configurationName: z.string(),
  chipId: z.uuid(),
  chipName: z.string(),
  versionNumber: z.number().int().positive(),
  versionStatus: versionStatusSchema,
  /** Login of the version's author. */
  author: z.string(),
  /** Login of the member who asked for the review. */
  requestedBy: z.string(),
  requestedAt: z.string(),
});
export type WaitingReview = z.infer<typeof waitingReviewSchema>;

/** GET /api/teams/:teamId/reviews/waiting answer, oldest request first. */
export const waitingReviewsSchema = z.array(waitingReviewSchema);
