// Query keys of yield jobs, so the stream and the mutations update exactly what they change.
import type { YieldVersionRef } from './yieldJobPaths.js';

/** Query key builders for one version's yield jobs. */
export const yieldQueryKeys = {
  job: (ref: YieldVersionRef, jobId: string) => ['yield-jobs', ref.teamId, ref.configurationId, ref.versionNumber, jobId] as const,
};
