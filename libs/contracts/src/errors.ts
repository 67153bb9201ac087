/** The JSON shape of every error answer of the API. */
import { z } from 'zod';

/** One offending field of a rejected request. */
export const fieldIssueSchema = z.object({ path: z.string(), message: z.string() });
export type FieldIssue = z.infer<typeof fieldIssueSchema>;

export const apiErrorSchema = z.object({
  statusCode: z.number().int(),
  error: z.string(),
  message: z.string(),
  issues: z.array(fieldIssueSchema).optional(),
});
export type ApiError = z.infer<typeof apiErrorSchema>;
