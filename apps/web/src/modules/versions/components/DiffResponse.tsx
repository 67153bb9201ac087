// The responses of versions A and B between the same circuit's ports, overlaid on one plot (legend "v2 W11 → E11").
import { Callout, FormGroup, HTMLSelect, Spinner } from '@blueprintjs/core';
import type { ConfigurationVersion, FrequencyGridBody } from '@hexloom/contracts';
import { useId, useMemo, useState } from 'react';
import { ResponsePlots } from '../../response/components/ResponsePlots.js';
import { useWorkerResponse } from '../../response/hooks/useWorkerResponse.js';
import { circuitPairs } from '../../workspace/utils/circuitPairs.js';
import { versionSpectrum } from '../utils/versionSpectrum.js';

/** The compared span: −20 … +20 GHz around the carrier at 1,024 points, as in the workspace. */
export const DIFF_GRID: FrequencyGridBody = { kind: 'span', startOffsetHz: -20e9, stopOffsetHz: 20e9, points: 1024 };

/** Props of {@link DiffResponse}; `preferredCircuits` (the changed ones) are offered first. */
export type DiffResponseProps = { a: ConfigurationVersion; b: ConfigurationVersion; preferredCircuits: readonly string[] };

/** Each version's whole chip is simulated in the browser's solver worker; a circuit missing from one version shows only the other. */
export function DiffResponse({ a, b, preferredCircuits }: DiffResponseProps) {
  const selectId = useId();
  const circuits = useMemo(() => {
    const ids = [...new Set([...b.content.circuits, ...a.content.circuits].map((c) => c.id))];
    return [...ids.filter((id) => preferredCircuits.includes(id)), ...ids.filter((id) => !preferredCircuits.includes(id))];
  }, [a, b, preferredCircuits]);
  const [chosen, setChosen] = useState<string | undefined>(undefined);
  const circuitId = chosen !== undefined && circuits.includes(chosen) ? chosen : circuits[0];
  const pairsA = useMemo(() => circuitPairs(a.content, circuitId), [a.content, circuitId]);
  const pairsB = useMemo(() => circuitPairs(b.content, circuitId), [b.content, circuitId]);
  const responseA = useWorkerResponse({ content: a.content, pairs: pairsA, grid: DIFF_GRID });
  const responseB = useWorkerResponse({ content: b.content, pairs: pairsB, grid: DIFF_GRID });
  const spectra = useMemo(
    () => [...(responseA.spectra ?? []).map((s) => versionSpectrum(s, a.number)), ...(responseB.spectra ?? []).map((s) => versionSpectrum(s, b.number))],
    [responseA.spectra, responseB.spectra, a.number, b.number],
  );
  const ready = (pairsA.length === 0 || responseA.spectra !== undefined) && (pairsB.length === 0 || responseB.spectra !== undefined);
  const mask = (b.specs.find((s) => s.circuitId === circuitId) ?? a.specs.find((s) => s.circuitId === circuitId))?.spec.mask;
  const error = responseA.error ?? responseB.error;
  return (
    <section className="hx-stack" aria-labelledby="diff-response-heading" data-testid="diff-response">
      <h3 id="diff-response-heading" className="hx-panel-title">
        Responses of v{a.number} and v{b.number}
      </h3>
      {circuits.length === 0 ? (
        <Callout intent="primary">Neither version has a circuit to simulate.</Callout>
      ) : (
        <>
          <FormGroup label="Circuit" labelFor={selectId} inline>
            <HTMLSelect id={selectId} value={circuitId} options={circuits} onChange={(e) => setChosen(e.currentTarget.value)} />
          </FormGroup>
          {pairsA.length === 0 && <p className="hx-muted">v{a.number} has no circuit {circuitId} with an input and an output: only v{b.number} is plotted.</p>}
          {pairsB.length === 0 && <p className="hx-muted">v{b.number} has no circuit {circuitId} with an input and an output: only v{a.number} is plotted.</p>}
          {error && <Callout intent="danger" title="The simulation failed">{error}</Callout>}
          {ready && spectra.length > 0 ? (
            <ResponsePlots spectra={spectra} {...(mask ? { mask } : {})} referenceFrequencyHz={b.content.mesh.technology.referenceFrequencyHz} title={`Circuit ${circuitId}, v${a.number} and v${b.number}`} />
          ) : (
            !error && <Spinner size={30} aria-label="Simulating both versions" />
          )}
        </>
      )}
    </section>
  );
}
