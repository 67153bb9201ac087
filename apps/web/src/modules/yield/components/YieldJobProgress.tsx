// A running job: a progress bar fed by its event stream (or by polling), runs done in words, and Cancel.
import { Button, ProgressBar } from '@blueprintjs/core';
import type { YieldJob } from '@hexloom/contracts';
import type { YieldFollowMode } from '../api/useYieldJob.js';

export type YieldJobProgressProps = {
  job: YieldJob;
  mode: YieldFollowMode;
  /** Offered only to roles that may cancel (owners, designers, reviewers). */
  onCancel?: (() => void) | undefined;
  cancelling?: boolean;
};

/** Percent done of a job, 0..100, from its runs done and total. */
export function yieldPercent(job: YieldJob): number {
  return job.runsTotal > 0 ? Math.round((100 * job.runsDone) / job.runsTotal) : 0;
}

/** The bar and its caption ("Running: 120 of 200 runs (60 %)"); the caption is a polite live region. */
export function YieldJobProgress({ job, mode, onCancel, cancelling = false }: YieldJobProgressProps) {
  const percent = yieldPercent(job);
  return (
    <div className="hx-stack" data-testid="yield-progress">
      <ProgressBar value={percent / 100} intent={job.status === 'done' ? 'success' : 'primary'} animate={job.status === 'running'} stripes={job.status === 'running'} aria-label="Yield study progress" />
      <p aria-live="polite" style={{ margin: 0 }}>
        {job.status === 'done' ? 'Done' : 'Running'}: {job.runsDone.toLocaleString('en-GB')} of {job.runsTotal.toLocaleString('en-GB')} runs ({percent} %)
        {job.status === 'running' && <span className="hx-muted">{mode === 'polling' ? ' · the live stream failed, so the page checks every 2 seconds' : ' · live'}</span>}
      </p>
      {onCancel && <Button icon="stop" intent="danger" variant="outlined" text="Cancel the study" loading={cancelling} onClick={onCancel} style={{ alignSelf: 'flex-start' }} />}
    </div>
  );
}
