/** Reviews and comments on a version: request, decide, threaded comments with optional anchors. */
import { z } from 'zod';
import { gateIdSchema } from '../mesh/mesh-definition.js';

const login = z.string().trim().min(1).max(80);

/** POST .../review-requests body: the logins of the reviewers. */
export const requestReviewSchema = z.object({ reviewers: z.array(login).min(1).max(10), message: z.string().max(2000).default('') });
export type RequestReview = z.infer<typeof requestReviewSchema>;

/** POST .../decision body. */
export const reviewDecisionSchema = z.object({ decision: z.enum(['approve', 'request_changes']), note: z.string().max(2000).default('') });
export type ReviewDecision = z.infer<typeof reviewDecisionSchema>;

export const reviewSchema = z.object({
  id: z.uuid(),
  versionNumber: z.number().int().positive(),
  reviewer: z.string(),
  requestedBy: z.string(),
  requestedAt: z.string(),
  decision: z.enum(['approve', 'request_changes']).nullable(),
  note: z.string(),
  decidedAt: z.string().nullable(),
});
export type Review = z.infer<typeof reviewSchema>;

/** Where a comment points: a gate, or a frequency range (offsets from the reference, Hz). */
export const commentAnchorSchema = z.union([
  z.object({ gate: gateIdSchema }).strict(),
  z
    .object({ fromHz: z.number().finite(), toHz: z.number().finite() })
    .strict()
    .refine((a) => a.toHz >= a.fromHz, { message: 'toHz must be >= fromHz', path: ['toHz'] }),
]);
export type CommentAnchor = z.infer<typeof commentAnchorSchema>;

/** POST .../comments body; `@login` of a team member in the text mails that member. */
export const createCommentSchema = z.object({
  body: z.string().trim().min(1).max(5000),
  parentId: z.uuid().optional(),
  anchor: commentAnchorSchema.optional(),
});
export type CreateComment = z.infer<typeof createCommentSchema>;

/** PATCH .../comments/:commentId body: resolve (true) or reopen (false) the thread this comment starts. */
export const updateCommentSchema = z.object({ resolved: z.boolean() }).strict();
export type UpdateComment = z.infer<typeof updateCommentSchema>;

/**
 * A comment as the server answers it. `mentions` are the team members named as `@login` in the body (parsed by the
 * server when the comment was written); `resolvedAt`/`resolvedBy` are set on a thread's first comment once resolved.
 */
export const commentSchema = z.object({
  id: z.uuid(),
  versionNumber: z.number().int().positive(),
  parentId: z.uuid().nullable(),
  author: z.string(),
  body: z.string(),
  anchor: commentAnchorSchema.nullable(),
  mentions: z.array(z.string()),
  createdAt: z.string(),
  resolvedAt: z.string().nullable(),
  resolvedBy: z.string().nullable(),
});
export type Comment = z.infer<typeof commentSchema>;
