// The studies this browser remembers on a version, to pick which one is shown.
import { HTMLSelect, FormGroup } from '@blueprintjs/core';
import type { PastYieldJob } from '../utils/pastYieldJobs.js';

export type PastYieldJobsProps = {
  jobs: readonly PastYieldJob[];
  selectedJobId: string | undefined;
  onSelect: (jobId: string) => void;
};

/** "Study 2 (newest): 200 runs, seed 1, from W01 to E01"; nothing when there is at most one. */
export function PastYieldJobs({ jobs, selectedJobId, onSelect }: PastYieldJobsProps) {
  if (jobs.length < 2) return null;
  return (
    <FormGroup label="Study shown" labelFor="yield-past" inline>
      <HTMLSelect
        id="yield-past"
        value={selectedJobId}
        onChange={(e) => onSelect(e.currentTarget.value)}
        options={jobs.map((j, i) => ({
          value: j.jobId,
          label: `Study ${jobs.length - i}${i === 0 ? ' (newest)' : ''}: ${j.request.runs.toLocaleString('en-GB')} runs, seed ${j.request.seed}`,
        }))}
      />
    </FormGroup>
  );
}
