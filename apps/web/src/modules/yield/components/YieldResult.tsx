// A finished job: the yield in words, the spread of each figure, and (replayed here) the margin histogram and gate ranking.
import { Button, Callout, HTMLTable, ProgressBar } from '@blueprintjs/core';
import type { ConfigurationFile, StartYieldJob, YieldJob } from '@hexloom/contracts';
import { useState } from 'react';
import { formatFigure, formatNumber } from '../../figures/utils/formatFigure.js';
import { useYieldReplay } from '../hooks/useYieldReplay.js';
import { GateSensitivityList } from './GateSensitivityList.js';
import { MarginHistogram } from './MarginHistogram.js';

export type YieldResultProps = {
  job: YieldJob;
  content: ConfigurationFile;
  /** The body the job was started with, when this browser remembers it (needed to replay the runs). */
  request: StartYieldJob | undefined;
};

/** "Yield 87.5 % of 200 runs" with its standard error. */
export function yieldSentence(summary: NonNullable<YieldJob['summary']>): string {
  return `Yield ${formatNumber(100 * summary.yield, 3)} % of ${summary.runs.toLocaleString('en-GB')} runs (${summary.passed.toLocaleString('en-GB')} met the mask; standard error ${formatNumber(100 * summary.yieldStdError, 2)} %)`;
}

/** Summary from the server; the per-run histogram and the sensitivities are recomputed from the same seed on request. */
export function YieldResult({ job, content, request }: YieldResultProps) {
  const [replaying, setReplaying] = useState(false);
  const replay = useYieldReplay(content, request, replaying);
  const summary = job.summary;
  if (!summary) return <Callout intent="warning">The study finished without a summary.</Callout>;
  const mismatch = replay.marginsDb && replay.passed !== summary.passed;
  return (
    <section className="hx-stack" data-testid="yield-result">
      <p className="hx-yield-figure" style={{ fontSize: 18, margin: 0 }}>
        <strong>{yieldSentence(summary)}</strong>
      </p>
      <HTMLTable compact aria-label="Spread of the figures over the runs">
        <thead>
          <tr>
            <th scope="col">Figure</th>
            <th scope="col">Median</th>
            <th scope="col">5 % to 95 % of runs</th>
          </tr>
        </thead>
        <tbody>
          {Object.entries(summary.figures).map(([name, s]) => (
            <tr key={name}>
              <td>{formatFigure(name, s.p50).label}</td>
              <td>{formatFigure(name, s.p50).text}</td>
              <td>
                {formatFigure(name, s.p05).text} to {formatFigure(name, s.p95).text}
              </td>
            </tr>
          ))}
        </tbody>
      </HTMLTable>
      <h3>Worst mask margin of each run</h3>
      {!request ? (
        <p className="hx-muted">The histogram replays the study's runs from its seed; this browser does not have the settings of this study. Start it again here to see it.</p>
      ) : !replaying ? (
        <Button icon="timeline-bar-chart" text={`Show the histogram and gate sensitivities (replays ${summary.runs.toLocaleString('en-GB')} runs in this browser)`} onClick={() => setReplaying(true)} style={{ alignSelf: 'flex-start' }} />
      ) : replay.error ? (
        <Callout intent="danger" title="The replay failed">{replay.error}</Callout>
      ) : !replay.marginsDb ? (
        <div className="hx-stack">
          <ProgressBar value={replay.runsTotal > 0 ? replay.runsDone / replay.runsTotal : 0} aria-label="Replay progress" />
          <p className="hx-muted" aria-live="polite">
            Replaying run {replay.runsDone} of {replay.runsTotal}…
          </p>
        </div>
      ) : (
        <>
          <MarginHistogram marginsDb={replay.marginsDb} />
          {mismatch && <Callout intent="warning">This browser counted {replay.passed} passing runs where the server counted {summary.passed}: the web app and the server may be of different versions.</Callout>}
          <h3>Gate sensitivities</h3>
          <GateSensitivityList sensitivities={replay.sensitivities ?? []} />
        </>
      )}
    </section>
  );
}
