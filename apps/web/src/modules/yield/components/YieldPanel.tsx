// The Yield tab: start a Monte Carlo study of a saved version, follow it live, cancel it, and read its result.
import { Callout } from '@blueprintjs/core';
import type { ConfigurationVersion, StartYieldJob, TeamRole } from '@hexloom/contracts';
import { useMemo, useState } from 'react';
import { ApiRequestError } from '../../core/api/ApiRequestError.js';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { PageSpinner } from '../../core/components/PageSpinner.js';
import { useCancelYieldJob } from '../api/useCancelYieldJob.js';
import { useStartYieldJob } from '../api/useStartYieldJob.js';
import { useYieldJob } from '../api/useYieldJob.js';
import { readPastYieldJobs, rememberYieldJob } from '../utils/pastYieldJobs.js';
import { PastYieldJobs } from './PastYieldJobs.js';
import { YieldJobForm } from './YieldJobForm.js';
import { YieldJobView } from './YieldJobView.js';
import '../yield.css';

export type YieldPanelProps = { teamId: string; configurationId: string; version: ConfigurationVersion; role: TeamRole };

/** Roles the server lets start and cancel yield jobs (POST and DELETE .../yield-jobs). */
const MAY_RUN: readonly TeamRole[] = ['owner', 'designer', 'reviewer'];

const startTitle = (error: Error | null): string =>
  error instanceof ApiRequestError && error.statusCode === 429 ? 'Too many yield studies are running' : 'Could not start the yield study';

/** Owners, designers and reviewers get the form and Cancel; viewers see the studies only. */
export function YieldPanel({ teamId, configurationId, version, role }: YieldPanelProps) {
  const ref = useMemo(() => ({ teamId, configurationId, versionNumber: version.number }), [teamId, configurationId, version.number]);
  const mayRun = MAY_RUN.includes(role);
  const [past, setPast] = useState(() => readPastYieldJobs(version.id));
  const [selected, setSelected] = useState<string | undefined>(past[0]?.jobId);
  const start = useStartYieldJob(ref);
  const cancel = useCancelYieldJob(ref);
  const job = useYieldJob(ref, selected);
  const request = past.find((j) => j.jobId === selected)?.request;

  const run = (body: StartYieldJob) => {
    cancel.reset();
    start.mutate(body, {
      onSuccess: (started) => {
        setPast(rememberYieldJob(version.id, { jobId: started.id, request: body }));
        setSelected(started.id);
      },
    });
  };

  return (
    <section className="hx-stack hx-yield-panel" data-testid="yield-panel" aria-label={`Yield of version ${version.number}`}>
      <h2>Monte Carlo yield of v{version.number}</h2>
      {mayRun ? (
        <YieldJobForm version={version} pending={start.isPending} onStart={run} />
      ) : (
        <Callout intent="primary">Viewers can read the yield studies of this version; owners, designers and reviewers start them.</Callout>
      )}
      <ApiErrorCallout error={start.error} title={startTitle(start.error)} />
      <ApiErrorCallout error={cancel.error} title="Could not cancel the study" />
      <PastYieldJobs jobs={past} selectedJobId={selected} onSelect={setSelected} />
      {selected === undefined ? (
        <p className="hx-muted">No yield study of this version has been run in this browser yet.</p>
      ) : job.isPending ? (
        <PageSpinner label="Loading the study" />
      ) : job.isError ? (
        <ApiErrorCallout error={job.error} title="Could not load the study" onRetry={() => void job.refetch()} />
      ) : (
        <YieldJobView
          job={job.data}
          mode={job.mode}
          content={version.content}
          request={request}
          onCancel={mayRun ? () => cancel.mutate(job.data.id) : undefined}
          cancelling={cancel.isPending}
          onStartAgain={mayRun && request ? () => run(request) : undefined}
        />
      )}
    </section>
  );
}
