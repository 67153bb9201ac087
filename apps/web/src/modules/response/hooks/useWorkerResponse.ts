// The whole chip's response between port pairs, recomputed in the solver worker whenever the content changes.
import type { ConfigurationFile, FrequencyGridBody, SpectrumFile } from '@hexloom/contracts';
import type { PortPair } from '@hexloom/synth';
import { useContext, useEffect, useRef, useState } from 'react';
import type { SolverAnswer } from '../workers/solverProtocol.js';
import type { SolverWorkerFactory, SolverWorkerLike } from '../workers/solverWorkerLike.js';
import { SolverWorkerContext } from './SolverWorkerContext.js';

/** What to simulate: the content, the pairs (by port id or label) and the frequency grid. */
export type WorkerResponseInput = { content: ConfigurationFile; pairs: readonly PortPair[]; grid: FrequencyGridBody };

/** The newest spectra (one per pair), whether a newer request is still being computed, and the last error in words. */
export type WorkerResponse = { spectra: SpectrumFile[] | undefined; computing: boolean; error?: string };

type Shown = { id: number; spectra: SpectrumFile[] | undefined; error: string | undefined };

/**
 * Posts every change of `content`, `pairs` or `grid` to one solver worker (from `factory`, else the
 * `SolverWorkerContext`) and shows each answer newer than the one shown: while a slider drags, the worker computes
 * only the newest request and the plot follows it. No pairs: nothing is computed.
 */
export function useWorkerResponse({ content, pairs, grid }: WorkerResponseInput, factory?: SolverWorkerFactory): WorkerResponse {
  const contextFactory = useContext(SolverWorkerContext);
  const create = factory ?? contextFactory;
  const worker = useRef<SolverWorkerLike | null>(null);
  const sent = useRef(0);
  const [latestId, setLatestId] = useState(0);
  const [shown, setShown] = useState<Shown>({ id: 0, spectra: undefined, error: undefined });
  const pairsKey = JSON.stringify(pairs.map((p) => [p.from, p.to]));
  const gridKey = JSON.stringify(grid);

  useEffect(
    () => () => {
      worker.current?.terminate();
      worker.current = null;
    },
    [create],
  );

  useEffect(() => {
    const list: PortPair[] = JSON.parse(pairsKey).map(([from, to]: [string, string]) => ({ from, to }));
    if (list.length === 0) return;
    if (!worker.current) {
      const w = create();
      w.onmessage = (event: MessageEvent<SolverAnswer>) => {
        const answer = event.data;
        setShown((prev) => (answer.id <= prev.id ? prev : answer.ok ? { id: answer.id, spectra: answer.spectra, error: undefined } : { id: answer.id, spectra: prev.spectra, error: answer.error }));
      };
      w.onerror = (event: ErrorEvent) => {
        setShown((prev) => ({ id: sent.current, spectra: prev.spectra, error: `The browser's solver stopped: ${event.message || 'it could not start'}` }));
      };
      worker.current = w;
    }
    const id = ++sent.current;
    setLatestId(id);
    worker.current.postMessage({ id, content, pairs: list, grid: JSON.parse(gridKey) as FrequencyGridBody });
  }, [create, content, pairsKey, gridKey]);

  const computing = pairsKey !== '[]' && shown.id < latestId;
  return shown.error === undefined ? { spectra: shown.spectra, computing } : { spectra: shown.spectra, computing, error: shown.error };
}
