// Yield jobs this browser started on a version, with what was asked, remembered across reloads (the API lists none).
import { type StartYieldJob, startYieldJobSchema } from '@hexloom/contracts';

const KEY_PREFIX = 'hexloom.yield-jobs.';
/** How many jobs are remembered per version. */
export const PAST_JOBS_KEPT = 10;

/** A remembered job: its id and the body it was started with (the job answer does not repeat it). */
export type PastYieldJob = { jobId: string; request: StartYieldJob };

/** Jobs remembered for `versionId`, newest first; empty when storage is unavailable or unreadable. */
export function readPastYieldJobs(versionId: string): PastYieldJob[] {
  try {
    const raw = globalThis.localStorage?.getItem(KEY_PREFIX + versionId);
    const parsed: unknown = raw ? JSON.parse(raw) : [];
    if (!Array.isArray(parsed)) return [];
    return parsed.flatMap((item: unknown) => {
      if (typeof item !== 'object' || item === null) return [];
      const { jobId, request } = item as { jobId?: unknown; request?: unknown };
      const body = startYieldJobSchema.safeParse(request);
      return typeof jobId === 'string' && body.success ? [{ jobId, request: body.data }] : [];
    });
  } catch {
    return [];
  }
}

/** Puts the job first in the version's list (once) and returns the new list. */
export function rememberYieldJob(versionId: string, job: PastYieldJob): PastYieldJob[] {
  const next = [job, ...readPastYieldJobs(versionId).filter((j) => j.jobId !== job.jobId)].slice(0, PAST_JOBS_KEPT);
  try {
    globalThis.localStorage?.setItem(KEY_PREFIX + versionId, JSON.stringify(next));
  } catch {
    // Private browsing may refuse storage; the list then lasts as long as the page.
  }
  return next;
}
