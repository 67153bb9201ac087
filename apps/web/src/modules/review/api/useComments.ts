// The comments of one version, oldest first.
import { commentSchema } from '@hexloom/contracts';
import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '../../core/api/apiFetch.js';
import { reviewPath } from './reviewPaths.js';
import { reviewQueryKeys } from './reviewQueryKeys.js';

const commentsSchema = z.array(commentSchema);

/** Loads GET .../versions/:number/comments (any member); feed the answer to `gatePins` and `bandShades` for pins. */
export function useComments(teamId: string, configurationId: string, number: number) {
  return useQuery({
    queryKey: reviewQueryKeys.comments(teamId, configurationId, number),
    queryFn: ({ signal }) => apiFetch(reviewPath(teamId, configurationId, number, 'comments'), commentsSchema, { signal }),
  });
}
