// Starts a Monte Carlo yield job on a saved version.
import { type StartYieldJob, yieldJobSchema } from '@hexloom/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { yieldJobsPath, type YieldVersionRef } from './yieldJobPaths.js';
import { yieldQueryKeys } from './yieldQueryKeys.js';

/** POST .../versions/:n/yield-jobs (owners, designers, reviewers); 202 with the running job, 429 when the team has too many. */
export function useStartYieldJob(ref: YieldVersionRef) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: StartYieldJob) => apiFetch(yieldJobsPath(ref), yieldJobSchema, { method: 'POST', body }),
    onSuccess: (job) => queryClient.setQueryData(yieldQueryKeys.job(ref, job.id), job),
  });
}
