// API paths of one version's Monte Carlo yield jobs.

/** Where a version's yield jobs live: start (POST), read (GET /:jobId), follow (/:jobId/events), cancel (DELETE). */
export type YieldVersionRef = { teamId: string; configurationId: string; versionNumber: number };

/** `/api/teams/:teamId/configurations/:configurationId/versions/:n/yield-jobs`, with a job id when given. */
export function yieldJobsPath(ref: YieldVersionRef, jobId?: string): string {
  const base = `/api/teams/${encodeURIComponent(ref.teamId)}/configurations/${encodeURIComponent(ref.configurationId)}/versions/${ref.versionNumber}/yield-jobs`;
  return jobId ? `${base}/${encodeURIComponent(jobId)}` : base;
}

/** The job's server-sent event stream (`progress` events whose data is the job). */
export function yieldJobEventsPath(ref: YieldVersionRef, jobId: string): string {
  return `${yieldJobsPath(ref, jobId)}/events`;
}
