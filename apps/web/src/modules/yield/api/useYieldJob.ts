// One yield job, kept current by its server-sent event stream, or by polling when the stream fails.
import { type YieldJob, yieldJobSchema } from '@hexloom/contracts';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useContext, useEffect, useState } from 'react';
import { apiFetch } from '../../core/api/apiFetch.js';
import { EventSourceFactoryContext } from '../hooks/EventSourceFactoryContext.js';
import { yieldJobEventsPath, yieldJobsPath, type YieldVersionRef } from './yieldJobPaths.js';
import { yieldQueryKeys } from './yieldQueryKeys.js';

/** How often the job is read when its stream is not available, ms. */
export const YIELD_POLL_MS = 2_000;

/** How the job is being followed: `stream` (events), `polling` (the stream failed) or `idle` (it has ended). */
export type YieldFollowMode = 'stream' | 'polling' | 'idle';

/**
 * GET .../yield-jobs/:jobId, then, while the job runs, its `progress` events (each one the job) replace it.
 * If the stream errors before the job ends, the stream is closed and the job is polled every `YIELD_POLL_MS`.
 */
export function useYieldJob(ref: YieldVersionRef, jobId: string | undefined) {
  const queryClient = useQueryClient();
  const openStream = useContext(EventSourceFactoryContext);
  const [streamFailed, setStreamFailed] = useState(false);
  const key = yieldQueryKeys.job(ref, jobId ?? '');
  const query = useQuery({
    queryKey: key,
    enabled: jobId !== undefined,
    queryFn: async ({ signal }) => {
      const fresh = await apiFetch(yieldJobsPath(ref, jobId), yieldJobSchema, { signal });
      return newer(queryClient.getQueryData<YieldJob>(key), fresh);
    },
    refetchInterval: (q) => (streamFailed && q.state.data?.status === 'running' ? YIELD_POLL_MS : false),
  });
  const running = query.data?.status === 'running';
  const { teamId, configurationId, versionNumber } = ref;

  useEffect(() => setStreamFailed(false), [jobId]);

  useEffect(() => {
    if (!jobId || !running || streamFailed) return;
    const source = openStream(yieldJobEventsPath({ teamId, configurationId, versionNumber }, jobId));
    let ended = false;
    source.addEventListener('progress', (event) => {
      const parsed = yieldJobSchema.safeParse(safeJson(event.data));
      if (!parsed.success) return;
      queryClient.setQueryData<YieldJob>(yieldQueryKeys.job({ teamId, configurationId, versionNumber }, jobId), parsed.data);
      if (parsed.data.status !== 'running') {
        ended = true;
        source.close();
      }
    });
    source.onerror = () => {
      if (ended) return;
      source.close();
      setStreamFailed(true);
    };
    return () => source.close();
  }, [jobId, running, streamFailed, openStream, queryClient, teamId, configurationId, versionNumber]);

  const mode: YieldFollowMode = !running ? 'idle' : streamFailed ? 'polling' : 'stream';
  return { ...query, mode };
}

/** A read that left before a streamed event may answer after it: progress of a running job never goes back. */
function newer(cached: YieldJob | undefined, fresh: YieldJob): YieldJob {
  return cached && cached.id === fresh.id && cached.status === 'running' && fresh.status === 'running' && cached.runsDone > fresh.runsDone ? cached : fresh;
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}
