// Query keys of a version's reviews and comments (under the version's own key, so refreshing a version refreshes them).
import { chipQueryKeys } from '../../chips/api/chipQueryKeys.js';

/** Key builders for the reviews and the comments of one version. */
export const reviewQueryKeys = {
  reviews: (teamId: string, configurationId: string, number: number) => [...chipQueryKeys.version(teamId, configurationId, number), 'reviews'] as const,
  comments: (teamId: string, configurationId: string, number: number) => [...chipQueryKeys.version(teamId, configurationId, number), 'comments'] as const,
};
