// Cancels a running yield job.
import { yieldJobSchema } from '@hexloom/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../core/api/apiFetch.js';
import { yieldJobsPath, type YieldVersionRef } from './yieldJobPaths.js';
import { yieldQueryKeys } from './yieldQueryKeys.js';

/** DELETE .../yield-jobs/:jobId (owners, designers, reviewers); answers the job, now `cancelled` if it was running. */
export function useCancelYieldJob(ref: YieldVersionRef) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (jobId: string) => apiFetch(yieldJobsPath(ref, jobId), yieldJobSchema, { method: 'DELETE' }),
    onSuccess: (job) => queryClient.setQueryData(yieldQueryKeys.job(ref, job.id), job),
  });
}
