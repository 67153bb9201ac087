// One job in whatever state it is: running (progress, cancel), done (result), or ended early (why, and start again).
import { Button, Callout } from '@blueprintjs/core';
import type { ConfigurationFile, StartYieldJob, YieldJob } from '@hexloom/contracts';
import type { YieldFollowMode } from '../api/useYieldJob.js';
import { formatDate } from '../../teams/utils/formatDate.js';
import { YieldJobProgress } from './YieldJobProgress.js';
import { YieldResult } from './YieldResult.js';

export type YieldJobViewProps = {
  job: YieldJob;
  mode: YieldFollowMode;
  content: ConfigurationFile;
  request: StartYieldJob | undefined;
  /** Given to roles that may cancel and start jobs. */
  onCancel?: (() => void) | undefined;
  cancelling?: boolean;
  onStartAgain?: (() => void) | undefined;
};

/** The job's state in words, never its raw status value. */
export function YieldJobView({ job, mode, content, request, onCancel, cancelling, onStartAgain }: YieldJobViewProps) {
  const again = onStartAgain && request ? <Button icon="refresh" intent="primary" text="Start it again" onClick={onStartAgain} /> : null;
  const runs = `${job.runsDone.toLocaleString('en-GB')} of ${job.runsTotal.toLocaleString('en-GB')} runs`;
  return (
    <section className="hx-stack" data-testid="yield-job" aria-label="Yield study">
      <p className="hx-muted" style={{ margin: 0 }}>
        Started by {job.createdBy || 'a teammate'} on {formatDate(job.createdAt)}
      </p>
      {job.status === 'running' && <YieldJobProgress job={job} mode={mode} onCancel={onCancel} cancelling={cancelling ?? false} />}
      {job.status === 'done' && <YieldJobProgress job={job} mode={mode} />}
      {job.status === 'done' && <YieldResult job={job} content={content} request={request} />}
      {job.status === 'cancelled' && (
        <Callout intent="warning" title="Cancelled">
          <p>The study was cancelled after {runs}.</p>
          {again}
        </Callout>
      )}
      {job.status === 'interrupted' && (
        <Callout intent="warning" title="Interrupted" data-testid="yield-interrupted">
          <p>The server stopped while this study ran ({runs} done), so it will not finish. {job.error ? `The server says: ${job.error}.` : ''}</p>
          {again ?? (onStartAgain ? <p className="hx-muted">Start a new study with the form above.</p> : null)}
        </Callout>
      )}
      {job.status === 'failed' && (
        <Callout intent="danger" title="The study failed">
          <p>{job.error ?? 'The server did not say why.'}</p>
          {again}
        </Callout>
      )}
    </section>
  );
}
