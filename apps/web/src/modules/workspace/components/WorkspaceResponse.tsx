// The whole chip's response at one circuit's outputs, computed in the browser's solver worker, with the mask and tuning.
import { Callout, Spinner } from '@blueprintjs/core';
import type { ConfigurationFile, Mask } from '@hexloom/contracts';
import { useMemo } from 'react';
import type { CommentBand } from '../../response/components/CommentBands.js';
import { ResponsePlots } from '../../response/components/ResponsePlots.js';
import { TuningPanel } from '../../response/components/TuningPanel.js';
import { useWorkerResponse } from '../../response/hooks/useWorkerResponse.js';
import { circuitPairs } from '../utils/circuitPairs.js';

/** The plotted span: -20 .. +20 GHz around the carrier at 1,024 points. */
export const WORKSPACE_GRID = { kind: 'span', startOffsetHz: -20e9, stopOffsetHz: 20e9, points: 1024 } as const;

type Props = {
  content: ConfigurationFile;
  circuitId: string | undefined;
  mask: Mask | undefined;
  /** Bands review comments point at, shaded on the plot. */
  bands?: readonly CommentBand[];
  /** Live tuning is offered when the user may edit and the circuit is not locked. */
  tunable: boolean;
  onTune: (content: ConfigurationFile) => void;
};

/** Recomputed on every change of the draft (a slider drag included), without a round trip to the server. */
export function WorkspaceResponse({ content, circuitId, mask, bands = [], tunable, onTune }: Props) {
  const pairs = useMemo(() => circuitPairs(content, circuitId), [content, circuitId]);
  const response = useWorkerResponse({ content, pairs, grid: WORKSPACE_GRID });
  if (!circuitId) return <Callout intent="primary">Select a circuit to see the chip's response at its outputs.</Callout>;
  if (pairs.length === 0) return <Callout intent="primary">This circuit has no input and output to simulate between.</Callout>;
  return (
    <section className="hx-workspace-response" data-testid="workspace-response">
      <div className="hx-response-plots">
        {response.error && <Callout intent="danger" title="The simulation failed">{response.error}</Callout>}
        {response.spectra ? <ResponsePlots spectra={response.spectra} {...(mask ? { mask } : {})} referenceFrequencyHz={content.mesh.technology.referenceFrequencyHz} title={`Circuit ${circuitId}`} bands={bands} /> : <Spinner size={30} aria-label="Simulating" />}
        <p className="hx-muted" aria-live="polite">
          {response.computing ? 'Simulating the whole chip in the browser…' : 'Whole chip, simulated in the browser.'}
        </p>
      </div>
      {tunable && <TuningPanel content={content} circuitId={circuitId} onChange={onTune} />}
    </section>
  );
}
