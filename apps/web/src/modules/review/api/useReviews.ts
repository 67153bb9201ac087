// The review requests and decisions of one version.
import { reviewSchema } from '@hexloom/contracts';
import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '../../core/api/apiFetch.js';
import { reviewPath } from './reviewPaths.js';
import { reviewQueryKeys } from './reviewQueryKeys.js';

const reviewsSchema = z.array(reviewSchema);

/** Loads GET .../versions/:number/reviews (any member). */
export function useReviews(teamId: string, configurationId: string, number: number) {
  return useQuery({
    queryKey: reviewQueryKeys.reviews(teamId, configurationId, number),
    queryFn: ({ signal }) => apiFetch(reviewPath(teamId, configurationId, number, 'reviews'), reviewsSchema, { signal }),
  });
}
